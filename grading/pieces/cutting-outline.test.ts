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
import type { Polygon } from '@shared/geometry/types';
import { draftFittedBodiceBack, draftFittedBodiceFront } from '../blocks/fitted-bodice-block';
import { draftSetInSleeve } from '../blocks/set-in-sleeve-block';
import { draftSkirtShape } from '../blocks/skirt-shapes-block';
import { edgeLength } from './piece-measure';
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

/** Horizontal extent [min x, max x] of a ring cut by the line y = h. */
function widthAt(ring: Polygon, h: number): [number, number] {
  const xs: number[] = [];
  ring.forEach((a, i) => {
    const b = ring[(i + 1) % ring.length];
    if ((a.y - h) * (b.y - h) < 0) xs.push(a.x + ((h - a.y) / (b.y - a.y)) * (b.x - a.x));
  });
  return [Math.min(...xs), Math.max(...xs)];
}

describe('hem allowances turned up along the hem fold', () => {
  it('mirrors a tapered long sleeve\'s 2 in hem about the hem fold instead of carrying the taper on (issue 16)', () => {
    const front = draftFittedBodiceFront(M), back = draftFittedBodiceBack(M);
    const sleeve = draftSetInSleeve(M, { armholeFrontMm: edgeLength(front, ['armhole']), armholeBackMm: edgeLength(back, ['armhole']) });
    const hem = sleeve.edges.find((e) => e.name === 'hem')!;
    const a = hem.allowanceMm;
    const hemY = sleeve.outline[hem.from].y;
    const cut = cuttingOutline(sleeve);
    // A turned-up hem lies flat on the sleeve: the cut line just inside the hem's raw edge must be as wide as the
    // cut line the same distance above the fold (a mirror image), wider than the hem line itself on a taper.
    const below = widthAt(cut, hemY - a + 0.5);
    const above = widthAt(cut, hemY + a - 0.5);
    expect(below[0]).toBeCloseTo(above[0], 1);
    expect(below[1]).toBeCloseTo(above[1], 1);
    expect(below[1] - below[0]).toBeGreaterThan(widthAt(cut, hemY + 0.5)[1] - widthAt(cut, hemY + 0.5)[0]);
    expect(validateCuttingOutline(sleeve, cut)).toEqual([]);
  });

  it('keeps the 30 mm hem of a rectangle a plain extension (a square corner mirrors onto itself)', () => {
    const p = draftRectangle({ id: 'r', name: 'r', role: 'x', widthMm: 100, heightMm: 50, cut: 'cut1', allowances: { bottom: 30 }, bottomNames: ['hem'] });
    expect(polygonBBox(cuttingOutline(p))).toEqual({ minX: -10, maxX: 110, minY: -30, maxY: 60 });
  });

  /** Cosine of the angle between the hem's last segment and the side seam's first (0 = square). */
  const hemCornerCos = (p: Piece) => {
    const hem = p.edges.find((e) => e.name === 'hem')!;
    const n = p.outline.length;
    const corner = p.outline[hem.to], before = p.outline[(hem.to - 1 + n) % n], after = p.outline[(hem.to + 1) % n];
    const u = { x: corner.x - before.x, y: corner.y - before.y }, v = { x: after.x - corner.x, y: after.y - corner.y };
    return (u.x * v.x + u.y * v.y) / (Math.hypot(u.x, u.y) * Math.hypot(v.x, v.y));
  };

  it('squares an A-line hem to the side seam (issue 16: a flared hem met the side seam at 81°)', () => {
    const [front] = draftSkirtShape(M, { shape: 'a-line', lengthMm: 600, hemFlareMm: 80 });
    expect(Math.abs(hemCornerCos(front))).toBeLessThan(1e-9);
    expect(validateCuttingOutline(front, cuttingOutline(front))).toEqual([]);
  });

  it('squares the demo shirt dress hem to its flared side seams, front and back, keeping the side seams equal', () => {
    const [front, back] = draftShirtDress(M);
    for (const p of [front, back]) expect(Math.abs(hemCornerCos(p)), p.id).toBeLessThan(1e-9);
    expect(edgeLength(front, ['side'])).toBeCloseTo(edgeLength(back, ['side']), 9);
  });
});
