import type { Point, Polygon } from '@shared/geometry/types';
import { polygonOffsetOutward } from './clipper-path';

/**
 * Default simplification tolerance ε in millimetres. Outlines flattened from curves carry hundreds of
 * short edges; a no-fit polygon costs (vertices of A) × (vertices of B) Minkowski quads, so the packed
 * shape is simplified to within ε and grown by ε (it then contains the true outline). Up to 1 mm of
 * extra clearance along an edge is within cutting accuracy (common practice: knife tolerance ≈ 1 mm).
 */
export const SIMPLIFY_TOLERANCE_MM = 1;
/** ε never exceeds this fraction of the strip width, so unit-less benchmark instances are not coarsened. */
export const SIMPLIFY_TOLERANCE_RELATIVE = 1e-3;
/** Outlines with at most this many vertices are packed as they are (benchmark polygons, rectangles). */
export const SIMPLIFY_MIN_VERTICES = 24;

/** The ε used for a strip of `stripWidth`: min(SIMPLIFY_TOLERANCE_MM, SIMPLIFY_TOLERANCE_RELATIVE × width): 1 mm on fabric ≥ 1 m wide. */
export function defaultSimplifyTolerance(stripWidth: number): number {
  return Math.min(SIMPLIFY_TOLERANCE_MM, SIMPLIFY_TOLERANCE_RELATIVE * stripWidth);
}

function segmentDistance(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x, dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  let t = len2 > 0 ? ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2 : 0;
  t = t < 0 ? 0 : t > 1 ? 1 : t;
  return Math.hypot(a.x + t * dx - p.x, a.y + t * dy - p.y);
}

/** Douglas–Peucker on the open chain ring[i..j] (indices mod n); marks kept vertices in `keep`. */
function simplifyChain(ring: Polygon, i: number, j: number, eps: number, keep: Uint8Array): void {
  const n = ring.length;
  const stack: [number, number][] = [[i, j]];
  while (stack.length) {
    const [s, e] = stack.pop()!;
    let far = -1, farD = eps;
    for (let k = s + 1; k < e; k++) {
      const d = segmentDistance(ring[k % n], ring[s % n], ring[e % n]);
      if (d > farD) {
        farD = d;
        far = k;
      }
    }
    if (far < 0) continue;
    keep[far % n] = 1;
    stack.push([s, far], [far, e]);
  }
}

/**
 * Douglas–Peucker simplification of a closed ring (Douglas & Peucker 1973): every removed vertex, and so
 * every point of the original boundary, lies within `eps` of the simplified boundary (Hausdorff distance
 * ≤ eps, original to simplified). The ring is split at its first vertex and the vertex farthest from it,
 * so the result depends on the start vertex (callers pass a canonical ring). Keeps ≥ 3 vertices; the
 * result may self-intersect on very thin rings (callers offset it with a non-zero union).
 */
export function simplifyRing(ring: Polygon, eps: number): Polygon {
  const n = ring.length;
  if (n <= 3 || !(eps > 0)) return ring;
  let far = 1, farD = -1;
  for (let k = 1; k < n; k++) {
    const d = Math.hypot(ring[k].x - ring[0].x, ring[k].y - ring[0].y);
    if (d > farD) {
      farD = d;
      far = k;
    }
  }
  const keep = new Uint8Array(n);
  keep[0] = 1;
  keep[far] = 1;
  simplifyChain(ring, 0, far, eps, keep);
  simplifyChain(ring, far, n, eps, keep);
  const out = ring.filter((_, k) => keep[k]);
  return out.length >= 3 ? out : ring;
}

/**
 * A packing shape for `ring` grown by `grow` (≥ 0, e.g. gap/2) with fewer vertices: the ring simplified
 * within `eps`, then offset outward by `grow + eps` (mitred, so it contains the round offset), plus one
 * Clipper grid step for rounding. The result contains the ring grown by `grow`. When simplification
 * removes nothing, or the ring has ≤ `minVertices` vertices, it is the plain offset by `grow`.
 */
export function simplifiedPackingShape(ring: Polygon, grow: number, eps: number, scale: number, minVertices = SIMPLIFY_MIN_VERTICES): Polygon {
  if (ring.length <= minVertices || !(eps > 0)) return polygonOffsetOutward(ring, grow, scale);
  const simple = simplifyRing(ring, eps);
  if (simple.length >= ring.length) return polygonOffsetOutward(ring, grow, scale);
  return polygonOffsetOutward(simple, grow + eps + 1 / scale, scale);
}
