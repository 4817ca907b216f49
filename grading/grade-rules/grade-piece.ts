import { polygonSignedArea } from '@shared/geometry/polygon';
import { polygonIsSimple } from '@shared/geometry/polyline';
import type { Piece } from '../pieces/piece';
import { measurePiece, type PieceMeasurements } from '../pieces/piece-measure';
import { applyDisplacement, displacementFor, type GradeRule } from './grade-rule';

/** A problem in a graded size: the outline crosses itself or its winding flipped (the grade is too large). */
export interface GradeIssue {
  pieceId: string;
  size: string;
  code: 'self_intersection' | 'winding_flipped';
  message: string;
}

/** One piece graded over a run: a piece per size (run order), their measurements, and any issues. */
export interface GradedPiece {
  pieceId: string;
  baseSize: string;
  sizes: string[];
  bySize: Record<string, Piece>;
  measurements: Record<string, PieceMeasurements>;
  issues: GradeIssue[];
}

/**
 * Grade a base-size piece to every size of the run with per-step rules (see displacementFor). The base size
 * comes back unchanged. Every graded outline is checked: self-intersection or a flipped (clockwise) winding is
 * reported as an issue, never silently fixed. Throws RangeError for an unknown base size or wrong step counts.
 */
export function gradePiece(piece: Piece, rules: readonly GradeRule[], sizes: readonly string[], baseSize: string): GradedPiece {
  const bySize: Record<string, Piece> = {};
  const measurements: Record<string, PieceMeasurements> = {};
  const issues: GradeIssue[] = [];
  for (const size of sizes) {
    const p = applyDisplacement(piece, displacementFor(piece, rules, sizes, baseSize, size), 1);
    bySize[size] = p;
    measurements[size] = measurePiece(p);
    if (polygonSignedArea(p.outline) <= 0) issues.push({ pieceId: piece.id, size, code: 'winding_flipped', message: `${piece.id} ${size}: outline turned clockwise` });
    else if (!polygonIsSimple(p.outline, 1e-9)) issues.push({ pieceId: piece.id, size, code: 'self_intersection', message: `${piece.id} ${size}: outline crosses itself` });
  }
  return { pieceId: piece.id, baseSize, sizes: [...sizes], bySize, measurements, issues };
}

/**
 * Return a graded piece of `fromSize` to the base size by removing the same rule displacement; exact up to
 * floating-point rounding because the displacement never depends on coordinates.
 */
export function ungradePiece(graded: Piece, rules: readonly GradeRule[], sizes: readonly string[], baseSize: string, fromSize: string): Piece {
  return applyDisplacement(graded, displacementFor(graded, rules, sizes, baseSize, fromSize), -1);
}
