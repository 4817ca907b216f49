import { cubicBezierFlatten } from '@shared/geometry/bezier';
import { polylineLength } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import type { Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { polylineSplitAt } from './drafted-piece';
import { ARMHOLE_NOTCH_BACK_MM, ARMHOLE_NOTCH_FRONT_MM } from './fitted-bodice-block';
import { DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';

const IN = 25.4;

/** Sleeve lengths of the block library. */
export type SleeveLength = 'short' | 'three-quarter' | 'long';

/** Options of {@link draftSetInSleeve} (mm). Every option but the armhole lengths has a default. */
export interface SetInSleeveOptions {
  /** Sewn armhole lengths of the bodice front and back (one side) the cap must fit. */
  armholeFrontMm: number;
  armholeBackMm: number;
  length?: SleeveLength;
  /** Crown to hem; default: long = arm length, ¾ = 0.75 × arm length (from memory), short = cap height + 4 in. */
  lengthMm?: number;
  /** Cap ease over each armhole half. Defaults front 7/16 in, back 9/16 in: the midpoints of sfdlearningcenter.com
   * "Sleeve Facts" (front ⅜–½ in, back ½–⅝ in; block-drafting-and-line-planning.md §1.6). */
  capEaseFrontMm?: number;
  capEaseBackMm?: number;
  /** Cap height. Default ⅓ of the armhole (pattern-making.com, block-drafting §1.5a). */
  capHeightMm?: number;
  /** Hem width. Default: long = wrist + 3 in (from memory), short = bicep − 30 mm, ¾ in between. */
  hemWidthMm?: number;
  /** Hem allowance. Default 2 in on a long sleeve (turned back, the seed document), 1 in otherwise (from memory). */
  hemMm?: number;
  seamMm?: number;
}

/** Bicep ease the cap must leave over the upper arm: 25 mm minimum (common practice; dresspatternmaking.com
 * suggests 2 in for a standard figure). */
export const MIN_BICEP_EASE_MM = 25;

type Cubic = [Point, Point, Point, Point];

/** Half cap from the underarm (±w, 0) to the crown (0, h). The front is scooped deeper low, the back fuller. */
function halfCap(w: number, h: number, side: 'front' | 'back'): Cubic {
  const s = side === 'front' ? -1 : 1;
  const [low, high] = side === 'front' ? [0.55, 0.42] : [0.68, 0.5];
  return [{ x: s * w, y: 0 }, { x: s * w * low, y: (side === 'front' ? 0.02 : 0.1) * h }, { x: s * w * high, y: h }, { x: 0, y: h }];
}

const capPoints = (c: Cubic) => cubicBezierFlatten(c[0], c[1], c[2], c[3]);

/** Half-bicep width whose half cap is `lengthMm` long at cap height h (bisection; the cap grows with the width). */
export function solveHalfBicep(lengthMm: number, h: number, side: 'front' | 'back'): number {
  if (!(lengthMm > h)) throw new RangeError('capHeightMm must be less than half the armhole');
  let lo = 0, hi = 2 * lengthMm;
  for (let i = 0; i < 60 && hi - lo > 0.001; i++) {
    const mid = (lo + hi) / 2;
    if (polylineLength(capPoints(halfCap(mid, h, side))) < lengthMm) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/**
 * One-piece set-in sleeve: crown at (0, cap height), bicep line y = 0, front half at x < 0. Each half of the cap is
 * solved to its armhole half plus its own ease, so the cap measures armhole + ease within 0.01 mm and front and
 * back differ. Notches: single front at 3 in and double back at 3½ and 3¾ in along the cap from the underarm (as
 * on the bodice armhole: no ease below the notches), and one at the crown for the shoulder seam.
 * Edges: hem, underarm-back, cap, underarm-front (sewn to each other). Cut as a pair. Throws RangeError when the bicep leaves less
 * than 25 mm ease over the upper arm (lower the cap height) or a measurement is missing.
 */
export function draftSetInSleeve(m: BodyMeasurements, o: SetInSleeveOptions): Piece & { bicepMm: number } {
  const h = o.capHeightMm ?? (o.armholeFrontMm + o.armholeBackMm) / 3;
  const wf = solveHalfBicep(o.armholeFrontMm + (o.capEaseFrontMm ?? (7 / 16) * IN), h, 'front');
  const wb = solveHalfBicep(o.armholeBackMm + (o.capEaseBackMm ?? (9 / 16) * IN), h, 'back');
  const bicep = wf + wb;
  if (bicep < need(m, 'upper-arm') + MIN_BICEP_EASE_MM) {
    throw new RangeError(`capHeightMm: the sleeve bicep ${bicep.toFixed(0)} mm leaves under ${MIN_BICEP_EASE_MM} mm ease over the upper arm; lower the cap`);
  }
  const kind = o.length ?? 'long';
  const total = o.lengthMm ?? (kind === 'long' ? need(m, 'arm-length') : kind === 'three-quarter' ? 0.75 * need(m, 'arm-length') : h + 4 * IN);
  const under = total - h;
  if (!(under > 0)) throw new RangeError('lengthMm must be longer than the cap height');
  const longUnder = need(m, 'arm-length') - h;
  const longHem = need(m, 'wrist') + 3 * IN;
  const hemWidth = o.hemWidthMm ?? (kind === 'short' && o.lengthMm === undefined ? bicep - 30 : bicep - (bicep - longHem) * Math.min(1, under / longUnder));
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const shift = (wb - wf) / 2;
  const hemL = { x: shift - hemWidth / 2, y: -under }, hemR = { x: shift + hemWidth / 2, y: -under };
  const b = new OutlineBuilder(hemL, 'hem-front');
  b.edge('hem', { allowanceMm: o.hemMm ?? (kind === 'long' ? 2 * IN : IN) }).line(hemR, 'hem-back');
  b.edge('underarm-back', { allowanceMm: seam }).line({ x: wb, y: 0 }, 'underarm-back');
  b.edge('cap', { allowanceMm: seam });
  const back = polylineSplitAt(capPoints(halfCap(wb, h, 'back')), ARMHOLE_NOTCH_BACK_MM);
  addRun(b, back.points, back.indices);
  b.notch();
  b.landmarks['cap-top'] = b.points.length - 1;
  const frontPts = capPoints(halfCap(wf, h, 'front')).reverse();
  const front = polylineSplitAt(frontPts, [polylineLength(frontPts) - ARMHOLE_NOTCH_FRONT_MM]);
  addRun(b, front.points, front.indices);
  b.landmarks['underarm-front'] = b.points.length - 1;
  b.edge('underarm-front', { allowanceMm: seam }).line(hemL);
  return {
    id: 'sleeve', name: 'Sleeve', role: 'sleeve', ...b.close(),
    grainLine: { from: { x: 0, y: -under + 40 }, to: { x: 0, y: h - 40 } },
    drillHoles: [], internalLines: [{ kind: 'reference', name: 'bicep-line', points: [{ x: -wf, y: 0 }, { x: wb, y: 0 }] }],
    cut: 'pair', quantity: 1, bicepMm: bicep,
  };
}

/** Append a polyline (its first point is the current point) with notches at the given vertex indices. */
function addRun(b: OutlineBuilder, pts: Point[], notchAt: number[]): void {
  const base = b.points.length - 1;
  pts.slice(1).forEach((p) => b.line(p));
  for (const k of notchAt) b.notches.push(base + k);
}
