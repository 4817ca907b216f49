import type { Point, Polygon } from './types';
import { GEOMETRY_EPSILON_MM } from './types';

/** Length of an open polyline (sum of its segments); fewer than two points give 0. */
export function polylineLength(points: readonly Point[]): number {
  let sum = 0;
  for (let i = 1; i < points.length; i++) sum += Math.hypot(points[i].x - points[i - 1].x, points[i].y - points[i - 1].y);
  return sum;
}

/**
 * Intersection of the infinite lines (a1,a2) and (b1,b2), or null when they are parallel
 * (|cross| below `tolerance` times the product of the direction lengths).
 */
export function lineIntersection(a1: Point, a2: Point, b1: Point, b2: Point, tolerance = 1e-9): Point | null {
  const dax = a2.x - a1.x, day = a2.y - a1.y, dbx = b2.x - b1.x, dby = b2.y - b1.y;
  const cross = dax * dby - day * dbx;
  if (Math.abs(cross) <= tolerance * Math.hypot(dax, day) * Math.hypot(dbx, dby)) return null;
  const t = ((b1.x - a1.x) * dby - (b1.y - a1.y) * dbx) / cross;
  return { x: a1.x + dax * t, y: a1.y + day * t };
}

function orient(a: Point, b: Point, c: Point): number {
  return (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);
}

/**
 * Whether closed segments (p1,p2) and (q1,q2) properly cross or overlap (touching end to end counts,
 * callers skip neighbouring segments). Uses orientation signs with `tolerance` in mm².
 */
export function segmentsIntersect(p1: Point, p2: Point, q1: Point, q2: Point, tolerance = GEOMETRY_EPSILON_MM): boolean {
  const o1 = orient(p1, p2, q1), o2 = orient(p1, p2, q2), o3 = orient(q1, q2, p1), o4 = orient(q1, q2, p2);
  const s = (v: number) => (Math.abs(v) <= tolerance ? 0 : Math.sign(v));
  const [s1, s2, s3, s4] = [s(o1), s(o2), s(o3), s(o4)];
  if (s1 * s2 < 0 && s3 * s4 < 0) return true;
  const on = (a: Point, b: Point, c: Point) =>
    Math.min(a.x, b.x) - tolerance <= c.x && c.x <= Math.max(a.x, b.x) + tolerance &&
    Math.min(a.y, b.y) - tolerance <= c.y && c.y <= Math.max(a.y, b.y) + tolerance;
  return (s1 === 0 && on(p1, p2, q1)) || (s2 === 0 && on(p1, p2, q2)) || (s3 === 0 && on(q1, q2, p1)) || (s4 === 0 && on(q1, q2, p2));
}

/**
 * Whether a closed ring is simple: at least 3 points, no zero-length edge and no two non-adjacent edges touching.
 * O(n²); pattern outlines have a few hundred vertices. Winding and start vertex do not matter.
 */
export function polygonIsSimple(ring: Polygon, tolerance = GEOMETRY_EPSILON_MM): boolean {
  const n = ring.length;
  if (n < 3) return false;
  for (let i = 0; i < n; i++) {
    const a = ring[i], b = ring[(i + 1) % n];
    if (Math.hypot(b.x - a.x, b.y - a.y) <= tolerance) return false;
  }
  for (let i = 0; i < n; i++) {
    const a1 = ring[i], a2 = ring[(i + 1) % n];
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue;
      if (segmentsIntersect(a1, a2, ring[j], ring[(j + 1) % n], tolerance)) return false;
    }
  }
  return true;
}

/** Even-odd point-in-polygon test; points on the boundary may go either way. */
export function polygonContainsPoint(ring: Polygon, p: Point): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i], b = ring[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** Distance from point p to segment (a,b) in mm. */
export function segmentDistance(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x, dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}
