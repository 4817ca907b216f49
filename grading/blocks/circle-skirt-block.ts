import { arcFlatten } from '@shared/geometry/bezier';
import type { Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { DEFAULT_HEM_MM, DEFAULT_SEAM_MM } from './measure-input';

/** Fraction of a full circle for circle skirts and flounces. */
export type CircleFraction = 1 | 0.75 | 0.5 | 0.25;

/**
 * Inner (seam-edge) radius r = L / (2π·f) for a seam length L (mm) and circle fraction f
 * (sizing-and-grading.md §3.2, prettyquirkypants.com and calculatorlib.com, web articles). `pi` may be set to
 * 3.14 to reproduce published worked examples. Throws RangeError for non-positive inputs.
 */
export function circleSkirtRadius(seamLengthMm: number, fraction: number, pi = Math.PI): number {
  if (!(seamLengthMm > 0 && fraction > 0 && fraction <= 1)) throw new RangeError('need seam length > 0 and 0 < fraction ≤ 1');
  return seamLengthMm / (2 * pi * fraction);
}

/** Flounce fullness = outer edge ÷ inner edge = (r + d) / r for inner radius r and flounce depth d (mm). */
export function flounceFullness(innerRadiusMm: number, depthMm: number): number {
  return (innerRadiusMm + depthMm) / innerRadiusMm;
}

/** Input for {@link draftCircleSkirt}: seam (waist) length and skirt or flounce depth in mm. */
export interface CircleSkirtInput {
  id?: string;
  name?: string;
  seamLengthMm: number;
  depthMm: number;
  fraction: CircleFraction;
  seamAllowanceMm?: number;
  hemAllowanceMm?: number;
}

/**
 * A circle skirt or flounce as one annular sector of half the fraction's angle, cut on the fold along its
 * straight edge at angle 0 (so a full circle is a half annulus on the fold with one seam). Centre at the origin.
 * Edges: 'waist' (inner arc), 'side-seam', 'hem' (outer arc), 'fold'.
 */
export function draftCircleSkirt(input: CircleSkirtInput): Piece & { innerRadiusMm: number; outerRadiusMm: number } {
  const r = circleSkirtRadius(input.seamLengthMm, input.fraction);
  const R = r + input.depthMm;
  const theta = Math.PI * input.fraction;
  const hem = arcFlatten({ x: 0, y: 0 }, R, 0, theta);
  const waist = arcFlatten({ x: 0, y: 0 }, r, theta, 0);
  const b = new OutlineBuilder({ x: r, y: 0 }, 'waist-fold');
  b.edge('fold', { allowanceMm: 0, isFold: true }).line({ x: R, y: 0 }, 'hem-fold');
  b.edge('hem', { allowanceMm: input.hemAllowanceMm ?? DEFAULT_HEM_MM / 2 });
  hem.slice(1).forEach((p, i) => b.line(p, i === hem.length - 2 ? 'hem-seam' : undefined));
  b.edge('side-seam', { allowanceMm: input.seamAllowanceMm ?? DEFAULT_SEAM_MM }).line(waist[0], 'waist-seam');
  b.edge('waist', { allowanceMm: input.seamAllowanceMm ?? DEFAULT_SEAM_MM });
  waist.slice(1, -1).forEach((p) => b.line(p));
  b.line({ x: r, y: 0 });
  const mid = theta / 2;
  return {
    id: input.id ?? 'circle-skirt', name: input.name ?? 'Circle skirt', role: 'circle-skirt', ...b.close(),
    grainLine: { from: { x: r + 20, y: 5 }, to: { x: R - 20, y: 5 } },
    notches: [], drillHoles: [],
    internalLines: [{ kind: 'reference', name: 'centre', points: [{ x: r * Math.cos(mid), y: r * Math.sin(mid) }, { x: R * Math.cos(mid), y: R * Math.sin(mid) }] }],
    cut: 'fold', quantity: 1, innerRadiusMm: r, outerRadiusMm: R,
  };
}
