import { arcFlatten } from '@shared/geometry/bezier';
import type { Point } from '@shared/geometry/types';
import type { Piece } from '../pieces/piece';
import { OutlineBuilder, type EdgeOptions } from '../pieces/piece';
import { circleSkirtRadius } from './circle-skirt-block';
import { DEFAULT_SEAM_MM } from './measure-input';

/** How a circle skirt or peplum is cut: one piece opened at a seam, or halves or quarters each cut on a fold. */
export type RingCut = 'ring' | 'halves' | 'quarters';

/** Input of {@link draftCircleRing}; lengths in mm. */
export interface CircleRingInput {
  id: string;
  name: string;
  role: string;
  /** Seam length of the whole inner edge (all pieces together). */
  innerEdgeMm: number;
  /** Radial depth: skirt or peplum length. */
  depthMm: number;
  /** Fraction of a full circle, 0 < f ≤ 1. */
  fraction: number;
  cut?: RingCut;
  /** Name and allowance of the opening seam of a 'ring' cut (default 'centre-back', 10 mm). */
  openingName?: string;
  openingAllowanceMm?: number;
  /** Round the two hem corners at the opening of a 'ring' with this radius (mm). Default 0: square corners. */
  cornerRadiusMm?: number;
  seamMm?: number;
  hemMm?: number;
}

/** Hem allowance of a circle skirt or peplum: ⅜ in (American Sewing Guild: full or flared skirt ¼–⅜ in, sizing-and-grading.md §3.4). */
export const HEM_CIRCLE_MM = 0.375 * 25.4;

/** Chord sagitta for ring arcs: 0.05 mm keeps a flattened inner edge within 0.11 mm of its arc length (2π·f·s/3). */
const RING_TOLERANCE_MM = 0.05;

/**
 * A circle skirt or circular peplum. Inner radius r = innerEdge / (2π·f) (sizing-and-grading.md §3.2), outer radius
 * r + depth; centre at the origin, centre front down the negative y axis. 'ring': one piece spanning the whole
 * fraction, opened at the seam named `openingName` at both ends (a full circle opens along one radius, its two
 * seam edges coinciding). 'halves' and 'quarters': one part of the ring drafted from centre front (the fold)
 * to a 'side' seam, cut 'fold' with quantity 2 or 4. Notches on the waist at centre front and at the side
 * positions (a quarter of the inner edge either side of centre front) when they fall on the piece.
 * Edges: opening or fold/side, 'hem' (outer arc), 'waist' (inner arc). Throws RangeError for bad sizes.
 */
export function draftCircleRing(input: CircleRingInput): Piece & { innerRadiusMm: number; outerRadiusMm: number } {
  if (!(input.depthMm > 0)) throw new RangeError('length must be a positive number of mm');
  const cut = input.cut ?? 'ring';
  const seam = input.seamMm ?? DEFAULT_SEAM_MM;
  const { radiusMm: r, sweep: ringSweep } = cut === 'ring'
    ? openRing(input.innerEdgeMm, input.fraction, input.openingAllowanceMm ?? seam, seam)
    : { radiusMm: circleSkirtRadius(input.innerEdgeMm, input.fraction), sweep: 2 * Math.PI * input.fraction };
  const R = r + input.depthMm;
  const parts = cut === 'ring' ? 1 : cut === 'halves' ? 2 : 4;
  const cf = -Math.PI / 2;
  const sweep = ringSweep / parts;
  const [a0, a1] = cut === 'ring' ? [cf - sweep / 2, cf + sweep / 2] : [cf, cf + sweep / 2];
  const startEdge: [string, EdgeOptions] = cut === 'ring'
    ? [input.openingName ?? 'centre-back', { allowanceMm: input.openingAllowanceMm ?? seam }]
    : ['centre-front', { allowanceMm: 0, isFold: true }];
  const endEdge: [string, EdgeOptions] = cut === 'ring' ? [startEdge[0], startEdge[1]] : ['side', { allowanceMm: seam }];
  // Side positions: a quarter of the inner edge either side of centre front.
  const side = input.innerEdgeMm / (4 * r);
  const notchAngles = [cf - side, cf, cf + side].filter((a) => a > a0 + 1e-9 && a < a1 - 1e-9);
  const at = (rad: number, a: number): Point => ({ x: rad * Math.cos(a), y: rad * Math.sin(a) });
  const b = new OutlineBuilder(at(r, a0), 'waist-start');
  const rho = cut === 'ring' ? (input.cornerRadiusMm ?? 0) : 0;
  if (rho < 0 || rho > input.depthMm / 2) throw new RangeError('cornerRadiusMm must be between 0 and half the length');
  // A rounded corner is a fillet tangent to the opening seam (a radius) and to the hem circle: its centre lies
  // rho inside both, at radius R − rho and angle delta in from the seam.
  const delta = rho > 0 ? Math.asin(rho / (R - rho)) : 0;
  const foot = (R - rho) * Math.cos(delta);
  const fillet = (a: number, from: number, to: number) => arcFlatten(at(R - rho, a), rho, from, to, RING_TOLERANCE_MM).slice(1);
  b.edge(startEdge[0], startEdge[1]).line(at(rho > 0 ? foot : R, a0), 'hem-start');
  b.edge('hem', { allowanceMm: input.hemMm ?? HEM_CIRCLE_MM });
  if (rho > 0) fillet(a0 + delta, a0 - Math.PI / 2, a0 + delta).forEach((p) => b.line(p));
  arcFlatten({ x: 0, y: 0 }, R, a0 + delta, a1 - delta, RING_TOLERANCE_MM).slice(1).forEach((p) => b.line(p));
  if (rho > 0) fillet(a1 - delta, a1 - delta, a1 + Math.PI / 2).forEach((p) => b.line(p));
  b.landmarks['hem-end'] = b.points.length - 1;
  b.edge(endEdge[0], endEdge[1]).line(at(r, a1), 'waist-end');
  b.edge('waist', { allowanceMm: seam });
  const stops = [a1, ...[...notchAngles].reverse(), a0];
  for (let k = 1; k < stops.length; k++) {
    const arc = arcFlatten({ x: 0, y: 0 }, r, stops[k - 1], stops[k], RING_TOLERANCE_MM);
    arc.slice(1).forEach((p) => b.line(p));
    if (k < stops.length - 1) b.notch();
  }
  if (cut !== 'ring' && Math.abs(a0 - cf) < 1e-9) b.notch();
  const mid = (a0 + a1) / 2;
  return {
    id: input.id, name: input.name, role: input.role, ...b.close(),
    grainLine: { from: at(r + 0.2 * input.depthMm, cut === 'ring' ? cf : mid), to: at(R - 0.2 * input.depthMm, cut === 'ring' ? cf : mid) },
    drillHoles: [], internalLines: [], cut: cut === 'ring' ? 'cut1' : 'fold', quantity: parts,
    innerRadiusMm: r, outerRadiusMm: R,
  };
}

/**
 * Radius and sweep of a ring opened at one seam. The two opening allowances lie side by side in the gap the
 * opening leaves; their cutting lines meet the waist's cutting circle (radius r − waist allowance) only if the gap
 * is at least 2·asin(a / (r − s)) wide (each allowance a is a strip along its radius; the strips part where the
 * circle of radius r − s crosses them). A fraction leaving less than that gap is cut on a sweep of 2π minus the
 * gap, the radius grown so the inner sewing edge keeps its length: r = innerEdge / sweep, solved by fixed point
 * (it settles in a few steps: the gap shrinks as r grows). Throws RangeError when the allowances cannot fit.
 */
export function openRing(innerEdgeMm: number, fraction: number, openingAllowanceMm: number, waistAllowanceMm: number): { radiusMm: number; sweep: number } {
  let r = circleSkirtRadius(innerEdgeMm, fraction);
  let sweep = 2 * Math.PI * fraction;
  for (let k = 0; k < 50; k++) {
    const inner = r - waistAllowanceMm;
    if (!(inner > openingAllowanceMm)) throw new RangeError('the ring is too small for its opening allowances: cut it in halves or quarters');
    const gap = 2 * Math.asin(openingAllowanceMm / inner);
    const next = Math.min(2 * Math.PI * fraction, 2 * Math.PI - gap);
    if (Math.abs(next - sweep) < 1e-12) break;
    sweep = next;
    r = innerEdgeMm / sweep;
  }
  return { radiusMm: r, sweep };
}
