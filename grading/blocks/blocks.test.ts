import { describe, expect, it } from 'vitest';
import { polygonIsSimple } from '@shared/geometry/polyline';
import { MM_PER_INCH } from '@shared/units/units';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize } from '../size-charts/size-chart';
import { edgeLength } from '../pieces/piece-measure';
import { CHEST_LINE_ABOVE_BUST_POINT_MM, DART_SHORT_OF_BUST_POINT_MM, draftBodiceBack, draftBodiceFront } from './bodice-block';
import { circleSkirtRadius, draftCircleSkirt, flounceFullness } from './circle-skirt-block';
import { draftShirtDress } from './shirt-dress';
import { draftSkirt } from './skirt-block';
import { draftSleeve, sleeveCapLength } from './sleeve-block';

const IN = MM_PER_INCH;
const M = measurementsForSize(demoSizeChart(), 'M');
const inches = (mm: number) => mm / IN;

describe('circle skirt radius r = W / (2π·f) (sizing-and-grading.md §3.2)', () => {
  // prettyquirkypants.com, "DIY tips: circle skirt, half circle skirt formulas" (web article), W = 26 in.
  it('full circle, W = 26 in: published 4.13 in (truncated; exact π 4.138)', () => {
    const r = inches(circleSkirtRadius(26 * IN, 1));
    expect(r).toBeCloseTo(4.138, 3);
    expect(Math.trunc(r * 100) / 100).toBe(4.13);
  });
  it('half circle, W = 26 in: published 8.2 in (truncated; exact 8.276)', () => {
    const r = inches(circleSkirtRadius(26 * IN, 0.5));
    expect(r).toBeCloseTo(8.276, 3);
    expect(Math.trunc(r * 10) / 10).toBe(8.2);
  });
  it('quarter circle, W = 26 in: published 16.56 in uses π ≈ 3.14 (52/3.14)', () => {
    expect(inches(circleSkirtRadius(26 * IN, 0.25, 3.14))).toBeCloseTo(16.56, 2);
    // exact π gives 16.552; the published figure differs by the π ≈ 3.14 rounding (0.05 %)
    expect(Math.abs(inches(circleSkirtRadius(26 * IN, 0.25)) - 16.56)).toBeLessThan(16.56 * (1 - 3.14 / Math.PI) + 0.005);
  });
  it('full circle, W = 28 in, length 20 in: r ≈ 4.46 in, R = 24.456, π R² = 1879.0 in² (calculatorlib.com, web article)', () => {
    const skirt = draftCircleSkirt({ seamLengthMm: 28 * IN, depthMm: 20 * IN, fraction: 1 });
    expect(inches(skirt.innerRadiusMm)).toBeCloseTo(4.4563, 4);
    expect(inches(skirt.outerRadiusMm)).toBeCloseTo(24.456, 3);
    expect(Math.PI * inches(skirt.outerRadiusMm) ** 2).toBeCloseTo(1879.0, 0);
  });
  it('3/4 circle: W ÷ (1.5π) (calculatorlib.com, web article)', () => {
    expect(circleSkirtRadius(700, 0.75)).toBeCloseTo(700 / (1.5 * Math.PI), 9);
  });
  it('drafts each fraction with a waist seam as long as asked (within flattening tolerance)', () => {
    for (const fraction of [1, 0.75, 0.5, 0.25] as const) {
      const p = draftCircleSkirt({ seamLengthMm: 700, depthMm: 500, fraction });
      expect(polygonIsSimple(p.outline)).toBe(true);
      // the piece is half the circle fraction, cut on the fold
      expect(2 * edgeLength(p, ['waist'])).toBeCloseTo(700, 0);
    }
  });
});

describe('circular flounce', () => {
  // cloningcouture.com, "Drafting circular flounces", 27 Jun 2017 (web article): π ≈ 3.14 in the published figures.
  it('inner diameter 1 in, width 1 in: edges 3.14 and 9.42 in, fullness 3:1', () => {
    const r = circleSkirtRadius(3.14 * IN, 1, 3.14);
    expect(inches(r)).toBeCloseTo(0.5, 9);
    expect(2 * 3.14 * inches(r + IN)).toBeCloseTo(9.42, 9);
    expect(flounceFullness(r, IN)).toBeCloseTo(3, 9);
  });
  it('inner diameter 2 in, outer 4 in: 6.28 and 12.56 in, fullness 2:1', () => {
    const r = circleSkirtRadius(6.28 * IN, 1, 3.14);
    expect(flounceFullness(r, IN)).toBeCloseTo(2, 9);
  });
  it('gathered waist flounce cut from (2 × waist + 10 in) ÷ 2π ≈ 11.15 in for a 30 in waist (common practice, π ≈ 3.14)', () => {
    expect(inches(circleSkirtRadius((2 * 30 + 10) * IN, 1, 3.14))).toBeCloseTo(11.15, 2);
    expect(inches(circleSkirtRadius((2 * 30 + 10) * IN, 1))).toBeCloseTo(11.141, 3);
  });
});

describe('bodice blocks', () => {
  const front = draftBodiceFront(M, { bustEaseMm: 50 });
  const back = draftBodiceBack(M, { bustEaseMm: 50 });
  const bustPointY = M['front-waist-length']! - M['bust-point-height']!;

  it('puts the chest line 2 in above the bust point (common practice)', () => {
    const chest = front.internalLines.find((l) => l.name === 'chest-line')!;
    expect(chest.points[0].y - bustPointY).toBeCloseTo(2 * IN, 9);
    expect(CHEST_LINE_ABOVE_BUST_POINT_MM).toBe(50.8);
  });

  it('stops a 3/4 in waist dart 1 in short of the bust point (common practice)', () => {
    // choose ease so the front dart intake is 3/4 in: excess per quarter = 2 × 19.05 (side takes half)
    const waistEase = M.bust! + 50 - 4 * 2 * 0.75 * IN - M.waist!;
    const f = draftBodiceFront(M, { bustEaseMm: 50, waistEaseMm: waistEase });
    const dart = f.internalLines.find((l) => l.name === 'waist-dart')!;
    expect(dart.points[2].x - dart.points[0].x).toBeCloseTo(0.75 * IN, 9);
    expect(bustPointY - dart.points[1].y).toBeCloseTo(IN, 9);
    expect(DART_SHORT_OF_BUST_POINT_MM).toBe(25.4);
  });

  it('takes a quarter of bust + ease at the underarm and matches side and shoulder seams (Fasanella, quarter split)', () => {
    expect(front.outline[front.landmarks.underarm].x).toBeCloseTo((M.bust! + 50) / 4, 9);
    expect(edgeLength(front, ['side'])).toBeCloseTo(edgeLength(back, ['side']), 9);
    expect(edgeLength(front, ['shoulder'])).toBeCloseTo(edgeLength(back, ['shoulder']), 9);
  });

  it('keeps the sewn side seam equal with a bust dart (dart intake lifts the front underarm)', () => {
    const darted = draftBodiceFront(M, { bustEaseMm: 50, bustDartMm: 25 });
    expect(edgeLength(darted, ['side'])).toBeCloseTo(edgeLength(back, ['side']), 9);
    expect(edgeLength(darted, ['bust-dart'])).toBeCloseTo(25, 9);
    expect(polygonIsSimple(darted.outline)).toBe(true);
  });
});

describe('skirts and sleeve', () => {
  it('drafts straight and A-line panels with a quarter hip at hip level', () => {
    for (const style of ['straight', 'a-line'] as const) {
      for (const panel of ['front', 'back'] as const) {
        const s = draftSkirt(M, { panel, style, lengthMm: 600, hipEaseMm: 40 });
        expect(s.outline[s.landmarks['side-hip']].x).toBeCloseTo((M.hip! + 40) / 4, 9);
        expect(polygonIsSimple(s.outline)).toBe(true);
        const hemX = s.outline[s.landmarks['side-hem']].x;
        expect(hemX).toBeCloseTo(style === 'a-line' ? (M.hip! + 40) / 4 + 60 : (M.hip! + 40) / 4, 9);
      }
    }
  });

  it('fits the sleeve cap to the armhole plus the stated ease within 0.1 mm', () => {
    const s = draftSleeve(M, { armholeLengthMm: 430, capEaseMm: 15, capHeightMm: 120 });
    expect(edgeLength(s, ['cap-front', 'cap-back'])).toBeGreaterThan(445 - 0.1);
    expect(edgeLength(s, ['cap-front', 'cap-back'])).toBeLessThan(445 + 0.1);
    expect(sleeveCapLength(s.bicepMm, 120)).toBeCloseTo(445, 1);
    expect(() => draftSleeve(M, { armholeLengthMm: 200, capHeightMm: 150 })).toThrow(RangeError);
  });
});

describe('draftShirtDress', () => {
  it('returns the eight demo pieces with cut instructions', () => {
    const pieces = draftShirtDress(M);
    expect(pieces.map((p) => [p.id, p.cut, p.quantity])).toEqual([
      ['front', 'pair', 1], ['back', 'fold', 1], ['sleeve', 'pair', 1], ['collar-band', 'fold', 2],
      ['pocket', 'pair', 1], ['belt', 'fold', 1], ['front-facing', 'pair', 1], ['back-neck-facing', 'fold', 1],
    ]);
    for (const p of pieces) expect(polygonIsSimple(p.outline), p.id).toBe(true);
  });
  it('sizes the collar band to the half neckline and the facings to their edges', () => {
    const [front, back, , band, , , ff, bf] = draftShirtDress(M);
    expect(edgeLength(band, ['neckline'])).toBeCloseTo(edgeLength(front, ['neckline']) + edgeLength(back, ['neckline']), 6);
    expect(edgeLength(ff, ['neckline', 'neck-extension', 'front-edge'])).toBeCloseTo(edgeLength(front, ['neckline', 'neck-extension', 'front-edge']), 1);
    expect(edgeLength(bf, ['neckline'])).toBeCloseTo(edgeLength(back, ['neckline']), 1);
    // half the neck base girth is a plausibility check on the neck drafting rule (common practice), not an oracle
    expect(Math.abs(edgeLength(band, ['neckline']) - M['neck-base']! / 2)).toBeLessThan(10);
  });
  it('throws on missing measurements', () => {
    expect(() => draftShirtDress({ bust: 900 })).toThrow(RangeError);
  });
});
