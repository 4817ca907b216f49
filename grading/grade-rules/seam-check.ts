import { edgeLength } from '../pieces/piece-measure';
import type { GradedPiece } from './grade-piece';

/** One side of a seam: a piece and the edges (summed) that are sewn. */
export interface SeamSide {
  pieceId: string;
  edges: string[];
}

/**
 * Two edges sewn together; each side may join edges of several pieces (an armhole = front + back). `easeMm` is the intended length of b minus a (0 for seams that match, the cap ease for
 * a sleeve cap against its armhole); `toleranceMm` the accepted deviation from it.
 */
export interface SeamSpec {
  name: string;
  a: SeamSide[];
  b: SeamSide[];
  easeMm?: number;
  toleranceMm: number;
}

/** The check of one seam in one size (lengths in mm). */
export interface SeamCheck {
  seam: string;
  size: string;
  lengthAMm: number;
  lengthBMm: number;
  differenceMm: number;
  expectedMm: number;
  ok: boolean;
}

/**
 * Check that seams sewn together match in every size: |(b − a) − ease| ≤ tolerance. Results come in seam order,
 * then size order. Throws RangeError for a piece or size missing from `graded`.
 */
export function checkSeams(graded: Record<string, GradedPiece>, seams: readonly SeamSpec[]): SeamCheck[] {
  const out: SeamCheck[] = [];
  for (const s of seams) {
    const first = graded[s.a[0]?.pieceId ?? ''];
    if (!first) throw new RangeError(`seam ${s.name}: first piece not graded`);
    for (const size of first.sizes) {
      const a = sideLength(graded, s.a, size, s.name), b = sideLength(graded, s.b, size, s.name);
      const expected = s.easeMm ?? 0;
      out.push({ seam: s.name, size, lengthAMm: a, lengthBMm: b, differenceMm: b - a, expectedMm: expected, ok: Math.abs(b - a - expected) <= s.toleranceMm });
    }
  }
  return out;
}

function sideLength(graded: Record<string, GradedPiece>, parts: readonly SeamSide[], size: string, seam: string): number {
  let sum = 0;
  for (const part of parts) {
    const piece = graded[part.pieceId]?.bySize[size];
    if (!piece) throw new RangeError(`seam ${seam}: ${part.pieceId} has no size ${size}`);
    sum += edgeLength(piece, part.edges);
  }
  return sum;
}
