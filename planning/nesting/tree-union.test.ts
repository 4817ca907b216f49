import ClipperLib from 'clipper-lib';
import type { Paths } from 'clipper-lib';
import { describe, expect, it } from 'vitest';
import { polygonNoFitRings, toClipperPath } from './clipper-path';

/** A half annulus (a peplum-like curved piece) of `k` points per arc, radii r0 < r1, centred at (cx, cy). */
function halfAnnulus(k: number, r0: number, r1: number, cx: number, cy: number) {
  const outer = Array.from({ length: k }, (_, i) => {
    const t = (Math.PI * i) / (k - 1);
    return { x: cx + r1 * Math.cos(t), y: cy + r1 * Math.sin(t) };
  });
  const inner = Array.from({ length: k }, (_, i) => {
    const t = Math.PI - (Math.PI * i) / (k - 1);
    return { x: cx + r0 * Math.cos(t), y: cy + r0 * Math.sin(t) };
  });
  return [...outer, ...inner];
}

function area(rings: { x: number; y: number }[][], scale: number): number {
  return rings.reduce((s, r) => s + ClipperLib.Clipper.Area(toClipperPath(r, scale)), 0) / scale ** 2;
}

/** Area of a − b (even-odd rings), by Clipper. */
function differenceArea(a: { x: number; y: number }[][], b: { x: number; y: number }[][], scale: number): number {
  const c = new ClipperLib.Clipper();
  c.AddPaths(a.map((r) => toClipperPath(r, scale)), ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(b.map((r) => toClipperPath(r, scale)), ClipperLib.PolyType.ptClip, true);
  const out: Paths = [];
  c.Execute(ClipperLib.ClipType.ctDifference, out, ClipperLib.PolyFillType.pftEvenOdd, ClipperLib.PolyFillType.pftEvenOdd);
  return Math.abs(out.reduce((s: number, p) => s + ClipperLib.Clipper.Area(p), 0)) / scale ** 2;
}

describe('no-fit polygons of curved pieces by tree union', () => {
  // Reference: Clipper's single union of every Minkowski quad, the method the tree replaces for grown shapes
  // (it shares no grouping code with the tree). Off-grid half annuli of 24 and 20 points per arc: 48 × 40
  // edge pairs, so the tree is taken.
  const scale = 1000;
  const a = halfAnnulus(24, 100, 300, 0.3333, 0.1111);
  const b = halfAnnulus(20, 50, 150, 0.7777, 0.5555);

  it('contains the single union and stays within a few grid steps of it', () => {
    const flat = polygonNoFitRings(a, b, scale, false);
    const tree = polygonNoFitRings(a, b, scale, true);
    const whole = Math.abs(area(flat, scale));
    expect(whole).toBeGreaterThan(0);
    // Nothing of the true NFP is missing (a missing sliver would let pieces overlap) …
    expect(differenceArea(flat, tree, scale)).toBe(0);
    // … and the tree's NFP is at most 4 grid steps (4e-3 here) wider all round: perimeter × 4e-3 at most.
    const perimeter = flat.reduce((s, r) => s + r.reduce((t, p, i) => t + Math.hypot(p.x - r[(i + 1) % r.length].x, p.y - r[(i + 1) % r.length].y), 0), 0);
    expect(Math.abs(area(tree, scale)) - whole).toBeLessThan(perimeter * 5e-3);
    expect(Math.abs(area(tree, scale)) - whole).toBeGreaterThan(0);
  });

  it('keeps a true pocket and leaves no specks of hole', () => {
    // A ring slit open by 20 units: a 30-unit square fits inside it but cannot pass the slit, so the NFP has a
    // hole (the pocket); 80 × 4 edge pairs take the tree.
    const k = 40;
    const ring = [
      ...Array.from({ length: k }, (_, i) => {
        const t = 0.05 + ((2 * Math.PI - 0.1) * i) / (k - 1);
        return { x: 0.4321 + 300 * Math.cos(t), y: 0.1234 + 300 * Math.sin(t) };
      }),
      ...Array.from({ length: k }, (_, i) => {
        const t = 2 * Math.PI - 0.05 - ((2 * Math.PI - 0.1) * i) / (k - 1);
        return { x: 0.4321 + 200 * Math.cos(t), y: 0.1234 + 200 * Math.sin(t) };
      }),
    ];
    const square = [{ x: 0.1, y: 0.1 }, { x: 30.1, y: 0.1 }, { x: 30.1, y: 30.1 }, { x: 0.1, y: 30.1 }];
    const flat = polygonNoFitRings(ring, square, scale, false);
    const tree = polygonNoFitRings(ring, square, scale, true);
    expect(flat.length).toBe(2);
    expect(tree.length).toBe(2);
    for (const r of tree) expect(Math.abs(area([r], scale))).toBeGreaterThan(1);
    expect(differenceArea(flat, tree, scale)).toBe(0);
    // Either winding: a clockwise ring (the copies that fill the "wholly inside" case must not cancel the quads).
    for (const [ra, sb] of [[ring.slice().reverse(), square], [ring, square.slice().reverse()], [ring.slice().reverse(), square.slice().reverse()]]) {
      expect(differenceArea(polygonNoFitRings(ra, sb, scale, false), polygonNoFitRings(ra, sb, scale, true), scale)).toBe(0);
      // The same region as the counter-clockwise outlines give: winding is not a property of the piece.
      expect(differenceArea(flat, polygonNoFitRings(ra, sb, scale, false), scale)).toBe(0);
      expect(differenceArea(polygonNoFitRings(ra, sb, scale, false), flat, scale)).toBe(0);
    }
    // Specks: the half annuli above leave none either.
    expect(polygonNoFitRings(a, halfAnnulus(20, 10, 40, 0.7777, 0.5555), scale, true)).toHaveLength(1);
  });
});
