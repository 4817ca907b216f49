import { polygonArea, polygonSignedArea } from '@shared/geometry/polygon';
import { lineIntersection, polygonContainsPoint, polygonIsSimple, segmentDistance } from '@shared/geometry/polyline';
import type { Point, Polygon } from '@shared/geometry/types';
import { clipperIntersect, clipperUnion } from './clipper-adapter';
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
 * A straight edge named 'hem' is turned up along its fold instead: its allowance is the mirror image, about the
 * hem line, of the piece's own cutting line within one hem depth above it (see mirrorHem); curved hems are offset.
 * Collinear neighbours with different allowances meet in a square step. The result is counter-clockwise,
 * simple and contains the sewing line. Fewer than 3 points or zero area returns [].
 */
export function cuttingOutline(piece: Pick<Piece, 'outline' | 'edges'>): Polygon {
  const ring = piece.outline;
  const n = ring.length;
  if (n < 3 || polygonArea(ring) === 0) return [];
  const ccw = polygonSignedArea(ring) > 0;
  const allow = segmentAllowances(piece);
  const hems = segmentHems(piece);
  const r = ccw ? ring : [...ring].reverse();
  const back = (arr: readonly number[]) => (ccw ? [...arr] : r.map((_, j) => arr[(2 * n - 2 - j) % n]));
  const a = back(allow);
  const runs = straightHemRuns(r, a, back(hems));
  for (const run of runs) for (const i of run.segments) a[i] = 0;
  const base = offsetUnion(r, a);
  if (runs.length === 0 || base.length === 0) return base;
  const maxAllow = Math.max(...a, ...runs.map((h) => h.allowanceMm));
  const mirrored = runs.flatMap((h) => mirrorHem(base, h, maxAllow));
  const [best] = clipperUnion([base, ...mirrored].map((p) => (polygonSignedArea(p) < 0 ? [...p].reverse() : p)));
  return best ?? [];
}

/** Every segment swept out by its allowance, convex corners filled, united (see cuttingOutline). */
function offsetUnion(r: Polygon, a: readonly number[]): Polygon {
  const n = r.length;
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

/** A straight hem: its segment indices, its ends on the counter-clockwise ring, and its allowance. */
interface HemRun {
  segments: number[];
  from: Point;
  to: Point;
  allowanceMm: number;
}

/** 1 for segments of an edge named 'hem' (a hem turned up along the hem fold), 0 otherwise. */
function segmentHems(piece: Pick<Piece, 'outline' | 'edges'>): number[] {
  const n = piece.outline.length;
  const out = new Array<number>(n).fill(0);
  for (const e of piece.edges) {
    if (e.name !== 'hem' || e.isFold) continue;
    for (let i = e.from; i !== e.to; i = (i + 1) % n) out[i] = 1;
  }
  return out;
}

/** Runs of consecutive hem segments with one allowance that lie on one straight line (curved hems are offset). */
function straightHemRuns(r: Polygon, a: readonly number[], hem: readonly number[]): HemRun[] {
  const n = r.length;
  const start = hem.findIndex((h, i) => h && !(hem[(i - 1 + n) % n] && a[(i - 1 + n) % n] === a[i]));
  if (start < 0) return [];
  const runs: HemRun[] = [];
  for (let k = 0; k < n; k++) {
    const i = (start + k) % n;
    if (!hem[i] || a[i] <= 0) continue;
    const last = runs[runs.length - 1];
    const prev = (i - 1 + n) % n;
    if (last && last.segments[last.segments.length - 1] === prev && a[prev] === a[i]) {
      last.segments.push(i);
      last.to = r[(i + 1) % n];
    } else runs.push({ segments: [i], from: r[i], to: r[(i + 1) % n], allowanceMm: a[i] });
  }
  return runs.filter((h) => h.segments.every((i) => lineDistance(h.from, h.to, r[i]) < STRAIGHT_HEM_MM && lineDistance(h.from, h.to, r[(i + 1) % n]) < STRAIGHT_HEM_MM));
}

/** Hem points further than this from the chord between the hem's ends make it a curved hem (offset, not mirrored). */
const STRAIGHT_HEM_MM = 0.01;

function lineDistance(a: Point, b: Point, p: Point): number {
  const l = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  return Math.abs((b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x)) / l;
}

/**
 * The hem allowance as a cutter draws it: the part of the cutting line within one hem depth above the hem fold,
 * reflected about the fold, so the allowance folds up flat onto the piece (a tapered sleeve's hem allowance
 * widens where the sleeve narrows, instead of carrying the taper on).
 */
function mirrorHem(cut: Polygon, h: HemRun, maxAllow: number): Polygon[] {
  const u = unit(sub(h.to, h.from));
  const inward = { x: -u.y, y: u.x };
  const reach = (MITRE_LIMIT + 1) * maxAllow;
  const a0 = add(h.from, u, -reach), b0 = add(h.to, u, reach);
  const strip = [a0, b0, add(b0, inward, h.allowanceMm), add(a0, inward, h.allowanceMm)];
  const reflect = (p: Point): Point => {
    const t = (p.x - h.from.x) * u.x + (p.y - h.from.y) * u.y;
    const foot = add(h.from, u, t);
    return { x: 2 * foot.x - p.x, y: 2 * foot.y - p.y };
  };
  return clipperIntersect([cut], [strip]).map((ring) => ring.map(reflect).reverse());
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
