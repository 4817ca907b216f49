import { polygonArea, polygonSignedArea } from '@shared/geometry/polygon';
import { lineIntersection, polygonContainsPoint, polygonIsSimple, segmentDistance } from '@shared/geometry/polyline';
import type { Point, Polygon } from '@shared/geometry/types';
import { clipperUnion } from './clipper-adapter';
import { segmentAllowances, type Piece } from './piece';

/** Corners whose mitre would reach past this many allowances are squared off instead (common practice). */
export const MITRE_LIMIT = 3;
/** Neighbouring segments closer than this to straight (sine of the turn) count as collinear. */
const COLLINEAR_SIN = 1e-6;

type Vec = { x: number; y: number };
const sub = (a: Point, b: Point): Vec => ({ x: a.x - b.x, y: a.y - b.y });
const unit = (v: Vec): Vec => {
  const l = Math.hypot(v.x, v.y);
  return l === 0 ? { x: 0, y: 0 } : { x: v.x / l, y: v.y / l };
};
const add = (p: Point, v: Vec, k: number): Point => ({ x: p.x + v.x * k, y: p.y + v.y * k });
/** Outward normal of a direction on a counter-clockwise ring (interior on the left). */
const outward = (d: Vec): Vec => ({ x: d.y, y: -d.x });

/**
 * The cutting line: the sewing line offset outward edge by edge by each edge's seam allowance (fold edges 0).
 *
 * Approach: every segment is swept outward by its own allowance into a rectangle; at every convex corner the two
 * neighbouring offset lines are intersected and the wedge between them is filled (a mitred corner). Where the
 * mitre would reach past MITRE_LIMIT × allowance (sharp points) the corner is squared off instead: each offset
 * line runs one allowance past the vertex and the ends are joined. Concave corners need no fill: neighbouring
 * rectangles overlap there. The piece, rectangles and wedges are united with clipper-lib (non-zero fill) and
 * the outer ring is kept, so crossing offset lines on tight curves or unequal allowances never leave loops.
 * Collinear neighbours with different allowances meet in a square step. The result is counter-clockwise,
 * simple and contains the sewing line. Fewer than 3 points or zero area returns [].
 */
export function cuttingOutline(piece: Pick<Piece, 'outline' | 'edges'>): Polygon {
  const ring = piece.outline;
  const n = ring.length;
  if (n < 3 || polygonArea(ring) === 0) return [];
  const ccw = polygonSignedArea(ring) > 0;
  const allow = segmentAllowances(piece);
  const r = ccw ? ring : [...ring].reverse();
  const a = ccw ? allow : r.map((_, j) => allow[(2 * n - 2 - j) % n]);
  const dirs = r.map((p, i) => unit(sub(r[(i + 1) % n], p)));
  const parts: Polygon[] = [r];
  for (let i = 0; i < n; i++) {
    const nrm = outward(dirs[i]);
    if (a[i] > 0) parts.push([r[i], r[(i + 1) % n], add(r[(i + 1) % n], nrm, a[i]), add(r[i], nrm, a[i])].reverse());
    const prev = (i - 1 + n) % n;
    const wedge = cornerWedge(r[i], dirs[prev], dirs[i], a[prev], a[i]);
    if (wedge) parts.push(wedge);
  }
  const [best] = clipperUnion(parts.map((p) => (polygonSignedArea(p) < 0 ? [...p].reverse() : p)));
  return best ?? [];
}

/** Fill of a convex corner between the offset lines, or null at concave or straight corners. */
function cornerWedge(v: Point, dPrev: Vec, dNext: Vec, aPrev: number, aNext: number): Polygon | null {
  const sin = dPrev.x * dNext.y - dPrev.y * dNext.x;
  if (sin <= COLLINEAR_SIN || (aPrev === 0 && aNext === 0)) return null;
  const pPrev = add(v, outward(dPrev), aPrev);
  const pNext = add(v, outward(dNext), aNext);
  const reach = Math.max(aPrev, aNext);
  const x = lineIntersection(add(pPrev, dPrev, -1), pPrev, pNext, add(pNext, dNext, 1));
  // With unequal allowances the offset lines can cross before the corner; the wider band already reaches past
  // the crossing, so only the gap between the two bands' ends is filled (a bevel).
  const dot = (p: Point, q: Point, d: Vec) => (p.x - q.x) * d.x + (p.y - q.y) * d.y;
  if (x && (dot(x, pPrev, dPrev) < 0 || dot(x, pNext, dNext) > 0)) return [v, pPrev, pNext];
  if (x && Math.hypot(x.x - v.x, x.y - v.y) <= MITRE_LIMIT * reach) return [v, pPrev, x, pNext];
  return [v, pPrev, add(pPrev, dPrev, reach), add(pNext, dNext, -reach), pNext];
}

/** A problem found by {@link validateCuttingOutline}. */
export interface CuttingOutlineIssue {
  code: 'empty' | 'not_simple' | 'sewing_line_outside' | 'allowance_short';
  message: string;
}

/**
 * Check a cutting line against its piece: simple; holds every sewing vertex; and at the middle of every sewing
 * segment longer than twice the largest allowance, the cutting line lies exactly that segment's allowance away
 * (fold segments: on the cutting line), within `toleranceMm`.
 */
export function validateCuttingOutline(piece: Pick<Piece, 'outline' | 'edges'>, cut: Polygon, toleranceMm = 0.05): CuttingOutlineIssue[] {
  if (cut.length < 3) return [{ code: 'empty', message: 'cutting outline is empty' }];
  const issues: CuttingOutlineIssue[] = [];
  if (!polygonIsSimple(cut, 1e-9)) issues.push({ code: 'not_simple', message: 'cutting outline crosses itself' });
  if (!piece.outline.every((p) => polygonContainsPoint(cut, p) || distanceToRing(cut, p) < toleranceMm)) {
    issues.push({ code: 'sewing_line_outside', message: 'sewing line leaves the cutting outline' });
  }
  const allow = segmentAllowances(piece);
  const maxAllow = Math.max(...allow);
  const ring = piece.outline;
  ring.forEach((a, i) => {
    const b = ring[(i + 1) % ring.length];
    if (Math.hypot(b.x - a.x, b.y - a.y) <= 2 * maxAllow + 1) return;
    const d = distanceToRing(cut, { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 });
    if (Math.abs(d - allow[i]) > toleranceMm) {
      issues.push({ code: 'allowance_short', message: `segment ${i}: allowance ${d.toFixed(2)} mm, wanted ${allow[i]} mm` });
    }
  });
  return issues;
}

/** Distance (mm) from p to the nearest edge of a closed ring. */
export function distanceToRing(ring: Polygon, p: Point): number {
  let best = Infinity;
  for (let i = 0; i < ring.length; i++) best = Math.min(best, segmentDistance(p, ring[i], ring[(i + 1) % ring.length]));
  return best;
}
