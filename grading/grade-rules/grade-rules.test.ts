import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { mm, MM_PER_INCH } from '@shared/units/units';
import { draftBodiceBack, draftBodiceFront } from '../blocks/bodice-block';
import { draftShirtDress } from '../blocks/shirt-dress';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize, type SizeChart } from '../size-charts/size-chart';
import type { Piece } from '../pieces/piece';
import { gradePiece, ungradePiece } from './grade-piece';
import { cumulativeMove, type GradeRule } from './grade-rule';
import { gradeStyle, SHIRT_DRESS_SEAMS } from './grade-style';
import { proposeGradeRules } from './propose-grade-rules';
import { checkSeams } from './seam-check';

const IN = MM_PER_INCH;
const demo = demoSizeChart();
const M = measurementsForSize(demo, 'M');

/** A chart with the demo's M values and chosen grades per step (mm), for rule arithmetic checks. */
function chartWithGrades(grades: Partial<Record<keyof typeof M, number[]>>): SizeChart {
  const sizes = ['A', 'B', 'C'];
  const values: SizeChart['values'] = {};
  for (const [k, v] of Object.entries(M) as [keyof typeof M, number][]) {
    const g = grades[k] ?? [0, 0];
    values[k] = [mm(v), mm(v + g[0]), mm(v + g[0] + g[1])];
  }
  return { name: 'test', sizes, values };
}

const ruleAt = (rules: GradeRule[], landmark: string) => rules.find((r) => r.landmark === landmark)!;

describe('proposeGradeRules', () => {
  const chart = chartWithGrades({ bust: [IN, 2 * IN], 'shoulder-width': [12, 12], 'neck-base': [9, 9], waist: [IN, 2 * IN] });
  const front = draftBodiceFront(M);
  const back = draftBodiceBack(M);
  const fr = proposeGradeRules(front, chart, 'A');
  const br = proposeGradeRules(back, chart, 'A');

  it('gives the side seam a quarter of the bust grade, step by step (fashion-incubator.com, "How to create grade rules 2"; §2.1: 1 in → 1/4 in, 2 in → 1/2 in)', () => {
    ruleAt(fr, 'underarm').steps.forEach((s, i) => expect(s.dx).toBeCloseTo([IN / 4, IN / 2][i], 12));
    // §2.4 invariant [computed]: 2 × (front Δx + back Δx) at the bust line = bust grade
    const b = ruleAt(br, 'underarm').steps;
    ruleAt(fr, 'underarm').steps.forEach((s, i) => expect(2 * (s.dx + b[i].dx)).toBeCloseTo([IN, 2 * IN][i], 12));
  });

  it('splits the half shoulder grade between neck and shoulder length (Müller & Sohn, Grading Women & Kids: 6 − 1.5 = 4.5 mm)', () => {
    // back width increment 6 mm (half of a 12 mm grade), neck width increment 1.5 mm (neck 9 mm ÷ 6) [computed]
    const hps = ruleAt(br, 'hps').steps[0].dx;
    const sp = ruleAt(br, 'shoulder').steps[0].dx;
    expect(hps).toBeCloseTo(1.5, 12);
    expect(sp - hps).toBeCloseTo(4.5, 12);
  });

  it('keeps the centre line fixed and throws for an unknown base size', () => {
    expect(ruleAt(fr, 'cf-waist').steps).toEqual([{ dx: 0, dy: 0 }, { dx: 0, dy: 0 }]);
    expect(() => proposeGradeRules(front, chart, 'Z')).toThrow(RangeError);
  });
});

describe('gradePiece', () => {
  const pieces = draftShirtDress(M);
  const style = gradeStyle(pieces, demo, 'M');

  it('grades every demo piece without self-intersection or winding flips', () => {
    expect(style.issues).toEqual([]);
    for (const g of Object.values(style.graded)) expect(g.bySize.M).toEqual(pieces.find((p) => p.id === g.pieceId));
  });

  it('agrees with drafting each size from its own measurements at the landmarks (front and back, ≤ 0.5 mm)', () => {
    for (const size of demo.sizes) {
      const drafted = draftShirtDress(measurementsForSize(demo, size));
      for (const id of ['front', 'back']) {
        const d = drafted.find((p) => p.id === id)!;
        const g = style.graded[id].bySize[size];
        for (const [name, i] of Object.entries(d.landmarks)) {
          expect(Math.hypot(d.outline[i].x - g.outline[g.landmarks[name]].x, d.outline[i].y - g.outline[g.landmarks[name]].y), `${id} ${size} ${name}`).toBeLessThan(0.5);
        }
      }
    }
  });

  it('measures each size: areas grow along the run', () => {
    const areas = demo.sizes.map((s) => style.graded.front.measurements[s].areaMm2);
    areas.slice(1).forEach((a, i) => expect(a).toBeGreaterThan(areas[i]));
  });

  it('matches sewn seams in every size: sides, shoulders, cap vs armhole + 15 mm ease, collar band vs neckline', () => {
    const checks = checkSeams(style.graded, SHIRT_DRESS_SEAMS);
    expect(checks).toHaveLength(SHIRT_DRESS_SEAMS.length * demo.sizes.length);
    expect(checks.filter((c) => !c.ok)).toEqual([]);
  });

  it('flags a grade that makes the outline cross itself or flip winding', () => {
    const front = pieces[0];
    const cross = proposeGradeRules(front, demo, 'M').map((r) => (r.landmark === 'underarm' ? { ...r, steps: r.steps.map(() => ({ dx: -200, dy: 0 })) } : r));
    const crossed = gradePiece(front, cross, demo.sizes, 'M');
    expect(crossed.issues.map((i) => [i.size, i.code])).toContainEqual(['XL', 'self_intersection']);
    const all = front.outline.map((p, index) => ({ target: { kind: 'vertex' as const, index }, steps: [0, 0, 0, 0].map(() => ({ dx: -p.x, dy: 0 })) }));
    const flipped = gradePiece(front, all, demo.sizes, 'M');
    expect(flipped.issues.find((i) => i.size === 'XL')?.code).toBe('winding_flipped');
  });

  it('adds steps that differ along the run (break points) and subtracts going down', () => {
    const steps = [{ dx: 10, dy: 0 }, { dx: 10, dy: 1 }, { dx: 15, dy: 2 }, { dx: 20, dy: 3 }];
    expect(cumulativeMove(steps, demo.sizes, 'M', 'XL')).toEqual({ dx: 35, dy: 5 });
    expect(cumulativeMove(steps, demo.sizes, 'M', 'XS')).toEqual({ dx: -20, dy: -1 });
    expect(() => cumulativeMove(steps.slice(1), demo.sizes, 'M', 'XL')).toThrow(RangeError);
  });
});

describe('ungradePiece (fast-check)', () => {
  const front = draftShirtDress(M)[0];
  const move = fc.record({ dx: fc.double({ min: -30, max: 30, noNaN: true }), dy: fc.double({ min: -30, max: 30, noNaN: true }) });
  const rules = fc.uniqueArray(fc.nat({ max: front.outline.length - 1 }), { minLength: 1, maxLength: 12 }).chain((idx) =>
    fc.tuple(fc.constant(idx), fc.array(fc.array(move, { minLength: 4, maxLength: 4 }), { minLength: idx.length, maxLength: idx.length }), fc.array(move, { minLength: 4, maxLength: 4 })),
  );

  it('returns the base piece after grading then un-grading', () => {
    fc.assert(
      fc.property(rules, fc.constantFrom(...demo.sizes), fc.constantFrom(...demo.sizes), ([idx, steps, drillSteps], base, size) => {
        const r: GradeRule[] = idx.map((index, k) => ({ target: { kind: 'vertex', index }, steps: steps[k] }));
        r.push({ target: { kind: 'feature', key: 'drill:0' }, steps: drillSteps });
        const graded = gradePiece(front, r, demo.sizes, base).bySize[size];
        const back: Piece = ungradePiece(graded, r, demo.sizes, base, size);
        back.outline.forEach((p, i) => {
          expect(p.x).toBeCloseTo(front.outline[i].x, 9);
          expect(p.y).toBeCloseTo(front.outline[i].y, 9);
        });
        back.drillHoles.forEach((p, i) => expect(p.x).toBeCloseTo(front.drillHoles[i].x, 9));
        back.internalLines.forEach((l, i) => l.points.forEach((p, j) => expect(p.y).toBeCloseTo(front.internalLines[i].points[j].y, 9)));
        expect(back.grainLine.to.x).toBeCloseTo(front.grainLine.to.x, 9);
      }),
      { numRuns: 100 },
    );
  });
});
