import type { Point, Polygon } from '@shared/geometry/types';
import { segmentDistance } from '@shared/geometry/polyline';

/** Default simplification tolerance of a traced outline (mm): every dropped point lies within this of the result. */
export const TRACE_SIMPLIFY_TOLERANCE_MM = 0.5;

function douglasPeucker(pts: readonly Point[], tol: number, keep: boolean[], lo: number, hi: number): void {
  const stack: [number, number][] = [[lo, hi]];
  while (stack.length) {
    const [a, b] = stack.pop()!;
    let worst = -1, at = -1;
    for (let i = a + 1; i < b; i++) {
      const d = segmentDistance(pts[i], pts[a], pts[b]);
      if (d > worst) { worst = d; at = i; }
    }
    if (at >= 0 && worst > tol) {
      keep[at] = true;
      stack.push([a, at], [at, b]);
    }
  }
}

/**
 * Simplify a closed ring (Douglas–Peucker): every input point lies within `toleranceMm` of the result's
 * edges. The ring is split at its first point and the point farthest from it, so the result does not depend
 * on a lucky start. Keeps the input's winding and point order; rings of 3 points or fewer come back as they are.
 * The result may in rare cases touch itself where two parts of the ring pass closer than the tolerance.
 */
export function ringSimplify(ring: Polygon, toleranceMm = TRACE_SIMPLIFY_TOLERANCE_MM): Polygon {
  if (ring.length <= 3) return [...ring];
  let far = 0, best = -1;
  for (let i = 1; i < ring.length; i++) {
    const d = Math.hypot(ring[i].x - ring[0].x, ring[i].y - ring[0].y);
    if (d > best) { best = d; far = i; }
  }
  const pts = [...ring, ring[0]];
  const keep = new Array<boolean>(pts.length).fill(false);
  keep[0] = keep[far] = keep[pts.length - 1] = true;
  douglasPeucker(pts, toleranceMm, keep, 0, far);
  douglasPeucker(pts, toleranceMm, keep, far, pts.length - 1);
  return pts.slice(0, -1).filter((_, i) => keep[i]);
}
