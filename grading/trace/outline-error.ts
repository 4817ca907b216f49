import type { Point, Polygon } from '@shared/geometry/types';
import { polygonArea } from '@shared/geometry/polygon';
import { segmentDistance } from '@shared/geometry/polyline';

/** How far a traced outline is from the true one (mm, mm² and a fraction). */
export interface OutlineError {
  /** Mean distance from points every `stepMm` along each outline to the other outline, both ways. */
  meanMm: number;
  /** Hausdorff distance: the largest of those distances. */
  worstMm: number;
  /** (traced area − true area) / true area. */
  areaError: number;
}

function ringSamples(ring: Polygon, step: number): Point[] {
  const out: Point[] = [];
  for (let i = 0; i < ring.length; i++) {
    const a = ring[i], b = ring[(i + 1) % ring.length];
    const n = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / step));
    for (let k = 0; k < n; k++) out.push({ x: a.x + ((b.x - a.x) * k) / n, y: a.y + ((b.y - a.y) * k) / n });
  }
  return out;
}

function distanceToRing(p: Point, ring: Polygon): number {
  let best = Infinity;
  for (let i = 0; i < ring.length; i++) best = Math.min(best, segmentDistance(p, ring[i], ring[(i + 1) % ring.length]));
  return best;
}

/**
 * Compare a traced outline with the true one: the symmetric mean and Hausdorff distances, sampled every
 * `stepMm` along both rings, and the relative area error. Winding and start point do not matter. Either
 * ring empty → every figure Infinity.
 */
export function outlineError(traced: Polygon, truth: Polygon, stepMm = 0.5): OutlineError {
  if (traced.length < 2 || truth.length < 2) return { meanMm: Infinity, worstMm: Infinity, areaError: Infinity };
  const d = [...ringSamples(truth, stepMm).map((p) => distanceToRing(p, traced)), ...ringSamples(traced, stepMm).map((p) => distanceToRing(p, truth))];
  const trueArea = polygonArea(truth);
  return { meanMm: d.reduce((s, v) => s + v, 0) / d.length, worstMm: Math.max(...d), areaError: (polygonArea(traced) - trueArea) / trueArea };
}
