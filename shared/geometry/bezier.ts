import type { Point } from './types';

/** Default flattening tolerance for pattern curves, in mm: the polyline stays within this of the true curve. */
export const CURVE_TOLERANCE_MM = 0.25;

const lerp = (a: Point, b: Point, t: number): Point => ({ x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t });

/**
 * Flatten a cubic Bézier into a polyline with uniform parameter steps.
 * The step count comes from Wang's bound n = ceil(sqrt(3·M / (4·tol))), M = max |P(i) − 2P(i+1) + P(i+2)|,
 * which guarantees every chord lies within `toleranceMm` of the curve. Uniform steps keep vertex index
 * proportional to the curve parameter, which grading relies on to move curve points smoothly.
 * Returns n + 1 points including both ends; a degenerate (all-equal) curve returns its two ends.
 */
export function cubicBezierFlatten(p0: Point, p1: Point, p2: Point, p3: Point, toleranceMm = CURVE_TOLERANCE_MM): Point[] {
  const d1 = Math.hypot(p0.x - 2 * p1.x + p2.x, p0.y - 2 * p1.y + p2.y);
  const d2 = Math.hypot(p1.x - 2 * p2.x + p3.x, p1.y - 2 * p2.y + p3.y);
  const m = Math.max(d1, d2);
  const n = Math.max(1, Math.ceil(Math.sqrt((3 * m) / (4 * Math.max(toleranceMm, 1e-9)))));
  const out: Point[] = [];
  for (let i = 0; i <= n; i++) out.push(cubicBezierPoint(p0, p1, p2, p3, i / n));
  return out;
}

/** Point on a cubic Bézier at parameter t ∈ [0, 1] (de Casteljau). */
export function cubicBezierPoint(p0: Point, p1: Point, p2: Point, p3: Point, t: number): Point {
  const a = lerp(p0, p1, t);
  const b = lerp(p1, p2, t);
  const c = lerp(p2, p3, t);
  return lerp(lerp(a, b, t), lerp(b, c, t), t);
}

/** Flatten a quadratic Bézier (elevated to cubic) within `toleranceMm`. */
export function quadraticBezierFlatten(p0: Point, c: Point, p2: Point, toleranceMm = CURVE_TOLERANCE_MM): Point[] {
  const c1 = lerp(p0, c, 2 / 3);
  const c2 = lerp(p2, c, 2 / 3);
  return cubicBezierFlatten(p0, c1, c2, p2, toleranceMm);
}

/**
 * Flatten a circular arc about `center` from `startRad` to `endRad` (counter-clockwise when end > start)
 * so that the sagitta of every chord is at most `toleranceMm`. Returns both ends; radius ≤ 0 returns the centre.
 */
export function arcFlatten(center: Point, radius: number, startRad: number, endRad: number, toleranceMm = CURVE_TOLERANCE_MM): Point[] {
  if (radius <= 0) return [{ ...center }];
  const sweep = endRad - startRad;
  const maxStep = 2 * Math.acos(Math.max(-1, Math.min(1, 1 - toleranceMm / radius)));
  const n = Math.max(1, Math.ceil(Math.abs(sweep) / Math.max(maxStep, 1e-6)));
  const out: Point[] = [];
  for (let i = 0; i <= n; i++) {
    const a = startRad + (sweep * i) / n;
    out.push({ x: center.x + radius * Math.cos(a), y: center.y + radius * Math.sin(a) });
  }
  return out;
}
