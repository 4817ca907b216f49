import type { Point } from '@shared/geometry/types';
import { polylineLength } from '@shared/geometry/polyline';
import { cubicBezierFlatten, CURVE_TOLERANCE_MM } from '@shared/geometry/bezier';
import type { Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { polylineSplitAt } from './drafted-piece';
import { ARMHOLE_NOTCH_BACK_MM, ARMHOLE_NOTCH_FRONT_MM } from './fitted-bodice-block';
import { DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';

/** Options for {@link draftSleeve} (mm). */
export interface SleeveOptions {
  /** Sewn armhole length of front + back bodice (the cap must fit it). */
  armholeLengthMm: number;
  /** Cap length minus armhole length; 10–20 mm suits a shirt-dress sleeve (common practice). */
  capEaseMm?: number;
  capHeightMm: number;
  /** Underarm seam length (short sleeve ≈ 100 mm). */
  underarmLengthMm?: number;
  /** Narrowing per side at the hem. */
  hemTaperMm?: number;
  seamMm?: number;
  hemMm?: number;
}

/** Half cap from the underarm (b/2, 0) to the crown (0, h): concave low, convex high. */
function halfCap(halfBicep: number, h: number, sign: 1 | -1): [Point, Point, Point, Point] {
  return [{ x: sign * halfBicep, y: 0 }, { x: sign * halfBicep * 0.6, y: 0.05 * h }, { x: sign * halfBicep * 0.45, y: h }, { x: 0, y: h }];
}

/** Cap length (both halves) of the flattened cap for a bicep width and cap height (mm). */
export function sleeveCapLength(bicepMm: number, capHeightMm: number, toleranceMm = CURVE_TOLERANCE_MM): number {
  const [a, b, c, d] = halfCap(bicepMm / 2, capHeightMm, 1);
  return 2 * polylineLength(cubicBezierFlatten(a, b, c, d, toleranceMm));
}

/** Bicep width giving a cap of `capLengthMm` at this cap height (bisection to 0.01 mm; cap grows with bicep). */
export function solveBicepForCap(capLengthMm: number, capHeightMm: number): number {
  let lo = 1, hi = 4 * capLengthMm;
  for (let i = 0; i < 60 && hi - lo > 0.01; i++) {
    const mid = (lo + hi) / 2;
    if (sleeveCapLength(mid, capHeightMm) < capLengthMm) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/**
 * Set-in sleeve whose cap equals armhole + capEase (default 15 mm) within 0.1 mm: the cap height is given and the
 * bicep width is solved. Crown at (0, h), underarm line y = 0, back half at x > 0. Throws RangeError if the
 * solved bicep leaves less than 25 mm ease over the upper arm (common practice minimum wearing ease).
 * Notches: a double back notch and a single front notch at the bodice armhole's notch distances from the underarm
 * (so they meet the armhole's), and one at the crown. Landmarks: hem-front, hem-back, underarm-back, cap-top,
 * underarm-front.
 */
export function draftSleeve(m: BodyMeasurements, o: SleeveOptions): Piece & { bicepMm: number } {
  const capEase = o.capEaseMm ?? 15;
  const bicep = solveBicepForCap(o.armholeLengthMm + capEase, o.capHeightMm);
  if (bicep < need(m, 'upper-arm') + 25) throw new RangeError(`bicep ${bicep.toFixed(1)} mm leaves under 25 mm ease; lower the cap height`);
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const len = o.underarmLengthMm ?? 100;
  const hemHalf = bicep / 2 - (o.hemTaperMm ?? 15);
  const b = new OutlineBuilder({ x: -hemHalf, y: -len }, 'hem-front');
  b.edge('hem', { allowanceMm: o.hemMm ?? 25 }).line({ x: hemHalf, y: -len }, 'hem-back');
  b.edge('underarm-back', { allowanceMm: seam }).line({ x: bicep / 2, y: 0 }, 'underarm-back');
  const back = halfCap(bicep / 2, o.capHeightMm, 1);
  b.edge('cap-back', { allowanceMm: seam });
  addNotchedRun(b, polylineSplitAt(cubicBezierFlatten(back[0], back[1], back[2], back[3]), ARMHOLE_NOTCH_BACK_MM));
  b.landmarks['cap-top'] = b.points.length - 1;
  b.notch();
  const front = halfCap(bicep / 2, o.capHeightMm, -1);
  const frontPts = cubicBezierFlatten(front[3], front[2], front[1], front[0]);
  b.edge('cap-front', { allowanceMm: seam });
  addNotchedRun(b, polylineSplitAt(frontPts, [polylineLength(frontPts) - ARMHOLE_NOTCH_FRONT_MM]));
  b.landmarks['underarm-front'] = b.points.length - 1;
  b.edge('underarm-front', { allowanceMm: seam }).line({ x: -hemHalf, y: -len });
  return {
    id: 'sleeve', name: 'Sleeve', role: 'sleeve', ...b.close(),
    grainLine: { from: { x: 0, y: -len + 20 }, to: { x: 0, y: o.capHeightMm - 30 } },
    drillHoles: [], internalLines: [], cut: 'pair', quantity: 1, bicepMm: bicep,
  };
}

/** Append a split polyline (its first point is the current point), notching the split vertices. */
function addNotchedRun(b: OutlineBuilder, run: { points: Point[]; indices: number[] }): void {
  const base = b.points.length - 1;
  run.points.slice(1).forEach((p) => b.line(p));
  for (const k of run.indices) b.notches.push(base + k);
}
