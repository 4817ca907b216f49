import { describe, expect, it } from 'vitest';
import { studyStandardMinutes } from './time-study';

// Check values: ../shared/reference/production-and-costing.md §1.3 (W1, W4, W5) and §1.1 (the ILO method).
describe('studyStandardMinutes', () => {
  it('gives 0.624 standard minutes for a 0.60 min cycle rated 80 with 10 % bundle and 20 % machine-and-personal allowances', () => {
    // W1, quoted (secondary): Scribd document 722882170 "SAM": BT = 0.60 × 80 % = 0.48; SAM = 0.48 + 0.048 + 0.096 = 0.624.
    const r = studyStandardMinutes({ elements: [{ name: 'sew', observations: [{ minutes: 0.6, rating: 80 }] }], relaxationPercent: 20, contingencyPercent: 10 });
    expect(r.basicMinutes).toBeCloseTo(0.48, 10);
    expect(r.standardMinutes).toBeCloseTo(0.624, 10);
  });

  it('gives 45 s standard for cycles of 30, 25, 35, 30 and 30 s rated 125 with a 20 % allowance', () => {
    // W4, quoted (web homework page, low authority): OT = 30 s, NT = 37.5 s, ST = 45 s. Entered in minutes.
    const observations = [30, 25, 35, 30, 30].map((s) => ({ minutes: s / 60, rating: 125 }));
    const r = studyStandardMinutes({ elements: [{ name: 'cycle', observations }], relaxationPercent: 20 });
    expect(r.elements[0].meanObservedMinutes * 60).toBeCloseTo(30, 10);
    expect(r.basicMinutes * 60).toBeCloseTo(37.5, 10);
    expect(r.standardMinutes * 60).toBeCloseTo(45, 10);
  });

  it('gives a basic time of 880 s for 800 s rated 110', () => {
    // W5, quoted: blog.ergo-mtm.it (illustration of BT = observed × rating ÷ 100 on the 100 scale).
    const r = studyStandardMinutes({ elements: [{ name: 'walk 1 km', observations: [{ minutes: 800 / 60, rating: 110 }] }], relaxationPercent: 0 });
    expect(r.basicMinutes * 60).toBeCloseTo(880, 9);
    expect(r.standardMinutes).toBe(r.basicMinutes);
  });

  it('extends each observation at its own rating before averaging when the pace varies between cycles', () => {
    // ILO method, Kanawaty 1992 (time-study chapters: each observed time is extended to a basic time, and the
    // element's selected basic time is the mean of those), from memory: not a strict oracle, so the check is the
    // difference from "mean time × mean rating". 0.50 min at 100 and 0.40 min at 125 are both 0.50 basic minutes;
    // multiplying the means (0.45 × 112.5 ÷ 100 = 0.50625) would overstate it.
    const r = studyStandardMinutes({ elements: [{ name: 'sew', observations: [{ minutes: 0.5, rating: 100 }, { minutes: 0.4, rating: 125 }] }], relaxationPercent: 0 });
    expect(r.elements[0].basicMinutes).toBeCloseTo(0.5, 12);
    expect(r.elements[0].basicMinutes).not.toBeCloseTo(0.50625, 4);
  });

  it('counts an element done once per bundle at its frequency and sums the elements before adding allowances', () => {
    // ILO method (Kanawaty 1992, occasional elements at their frequency per cycle; allowances as % of basic time),
    // from memory. 0.30 basic per garment + 0.50 once per bundle of 10 = 0.35; with 12 % relaxation and 3 %
    // contingency, 0.35 × 1.15 = 0.4025 (computed by hand).
    const r = studyStandardMinutes({
      elements: [
        { name: 'sew side seam', observations: [{ minutes: 0.3, rating: 100 }] },
        { name: 'tie bundle', observations: [{ minutes: 0.5, rating: 100 }], frequency: 0.1 },
      ],
      relaxationPercent: 12,
      contingencyPercent: 3,
    });
    expect(r.elements.map((e) => e.basicMinutesPerGarment)).toEqual([0.3, 0.05]);
    expect(r.basicMinutes).toBeCloseTo(0.35, 12);
    expect(r.standardMinutes).toBeCloseTo(0.4025, 12);
  });

  it('gives the same standard minutes when the observations are taken in another order', () => {
    const obs = [{ minutes: 0.42, rating: 95 }, { minutes: 0.38, rating: 105 }, { minutes: 0.47, rating: 85 }];
    const a = studyStandardMinutes({ elements: [{ name: 'e', observations: obs }], relaxationPercent: 15 });
    const b = studyStandardMinutes({ elements: [{ name: 'e', observations: [...obs].reverse() }], relaxationPercent: 15 });
    expect(b.standardMinutes).toBeCloseTo(a.standardMinutes, 12);
  });

  it('refuses an element without observations, a rating of 0, a negative allowance and an empty sheet', () => {
    expect(() => studyStandardMinutes({ elements: [{ name: 'hem', observations: [] }], relaxationPercent: 10 })).toThrow(/hem: no observations/);
    expect(() => studyStandardMinutes({ elements: [{ name: 'hem', observations: [{ minutes: 0.5, rating: 0 }] }], relaxationPercent: 10 })).toThrow(/rating/);
    expect(() => studyStandardMinutes({ elements: [{ name: 'hem', observations: [{ minutes: 0.5, rating: 100 }] }], relaxationPercent: -1 })).toThrow(/relaxation/);
    expect(() => studyStandardMinutes({ elements: [], relaxationPercent: 10 })).toThrow(/at least one element/);
  });
});
