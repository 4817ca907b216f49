import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { polygonArea, polygonBBox, polygonSignedArea } from '@shared/geometry/polygon';
import { polygonIsSimple } from '@shared/geometry/polyline';
import { draftRectangle } from '../blocks/rectangle-block';
import { draftBodiceFront } from '../blocks/bodice-block';
import { draftShirtDress } from '../blocks/shirt-dress';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize } from '../size-charts/size-chart';
import { cuttingOutline, validateCuttingOutline } from './cutting-outline';
import { measurePiece } from './piece-measure';
import type { Piece } from './piece';

const M = measurementsForSize(demoSizeChart(), 'M');

describe('cuttingOutline', () => {
  it('squares a rectangle with 10 mm seams and a 30 mm hem (sewcalcs.pages.dev: 1–1.5 cm seams, 2–4 cm hems, web article)', () => {
    const p = draftRectangle({ id: 'r', name: 'r', role: 'x', widthMm: 100, heightMm: 50, cut: 'cut1', allowances: { bottom: 30 } });
    const box = polygonBBox(cuttingOutline(p));
    expect(box).toEqual({ minX: -10, maxX: 110, minY: -30, maxY: 60 });
    expect(polygonArea(cuttingOutline(p))).toBeCloseTo(120 * 90, 6);
  });

  it('adds nothing on a fold edge', () => {
    const p = draftRectangle({ id: 'r', name: 'r', role: 'x', widthMm: 100, heightMm: 50, cut: 'fold', foldEdge: 'left' });
    expect(polygonBBox(cuttingOutline(p)).minX).toBeCloseTo(0, 9);
  });

  it('gives every demo piece a valid cutting line in every size', () => {
    const chart = demoSizeChart();
    for (const size of chart.sizes) {
      for (const p of draftShirtDress(measurementsForSize(chart, size))) {
        const cut = cuttingOutline(p);
        expect(validateCuttingOutline(p, cut), `${p.id} ${size}`).toEqual([]);
        expect(polygonSignedArea(cut)).toBeGreaterThan(polygonArea(p.outline));
      }
    }
  });

  it('front bodice not turned through takes a quarter of the bust plus 1 in seam allowance (common practice)', () => {
    // Unshaped block (waist ease = bust − waist) so the side seam is straight up to the underarm.
    const front = draftBodiceFront(M, { seamMm: 25.4, waistEaseMm: M.bust! - M.waist! });
    const cut = cuttingOutline(front);
    const ua = front.outline[front.landmarks.underarm];
    const width = polygonBBox(cut.filter((p) => p.y < ua.y + 60)).maxX;
    expect(width).toBeCloseTo(M.bust! / 4 + 25.4, 6);
  });
});

const star = fc.integer({ min: 5, max: 14 }).chain((n) =>
  fc.tuple(fc.array(fc.double({ min: 60, max: 200, noNaN: true }), { minLength: n, maxLength: n }), fc.array(fc.constantFrom(0, 6, 10, 16, 30, 40), { minLength: n, maxLength: n })),
);

function starPiece(radii: number[], allowances: number[]): Piece {
  const outline = radii.map((r, i) => ({ x: r * Math.cos((2 * Math.PI * i) / radii.length), y: r * Math.sin((2 * Math.PI * i) / radii.length) }));
  return {
    id: 's', name: 's', role: 'x', outline, edges: allowances.map((a, i) => ({ name: `e${i}`, from: i, to: (i + 1) % radii.length, allowanceMm: a })),
    grainLine: { from: { x: 0, y: 0 }, to: { x: 0, y: 10 } }, notches: [], drillHoles: [], internalLines: [], cut: 'cut1', quantity: 1, landmarks: {}, curveToleranceMm: 0.25,
  };
}

describe('offset properties (fast-check)', () => {
  it('keeps outlines simple, closed and around the sewing line', () => {
    fc.assert(
      fc.property(star, ([radii, allowances]) => {
        const p = starPiece(radii, allowances);
        const cut = cuttingOutline(p);
        expect(cut.length).toBeGreaterThanOrEqual(3);
        expect(polygonIsSimple(cut, 1e-9)).toBe(true);
        expect(polygonSignedArea(cut)).toBeGreaterThanOrEqual(polygonArea(p.outline) - 1e-6);
        expect(validateCuttingOutline(p, cut).filter((i) => i.code !== 'allowance_short')).toEqual([]);
      }),
      { numRuns: 150 },
    );
  });

  it('does not change areas with winding or start vertex', () => {
    fc.assert(
      fc.property(star, fc.nat(), ([radii, allowances], shift) => {
        const p = starPiece(radii, allowances);
        const k = shift % radii.length;
        const rotated = { ...p, outline: [...p.outline.slice(k), ...p.outline.slice(0, k)], edges: p.edges.map((e) => ({ ...e, from: (e.from - k + radii.length) % radii.length, to: (e.to - k + radii.length) % radii.length })) };
        const reversed = { ...p, outline: [...p.outline].reverse() };
        expect(measurePiece(rotated).areaMm2).toBeCloseTo(measurePiece(p).areaMm2, 6);
        expect(measurePiece(reversed).areaMm2).toBeCloseTo(measurePiece(p).areaMm2, 6);
        expect(polygonArea(cuttingOutline(rotated))).toBeCloseTo(polygonArea(cuttingOutline(p)), 0);
        const n = radii.length;
        const flipped = { ...reversed, edges: p.edges.map((e) => ({ ...e, from: n - 1 - e.to, to: n - 1 - e.from })) };
        expect(polygonArea(cuttingOutline(flipped))).toBeCloseTo(polygonArea(cuttingOutline(p)), 0);
      }),
      { numRuns: 100 },
    );
  });

  it('returns [] for a zero-area outline', () => {
    const p = starPiece([100, 100, 100], [10, 10, 10]);
    expect(cuttingOutline({ ...p, outline: [{ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 2, y: 0 }] })).toEqual([]);
  });
});
