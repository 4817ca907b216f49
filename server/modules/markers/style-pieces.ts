import type { DataSource } from 'typeorm';
import { loadCuttingPieces, type CuttingPiece } from '../grading/graded-pieces';

export type { CuttingPiece };

/**
 * The style's cutting pieces per size through the grading module's `loadCuttingPieces` (the one place that
 * grades and unfolds pieces). Kept behind this seam so markers and cut plans share one loader.
 */
export function loadStylePieces(ds: DataSource, studioId: number, styleId: number): Promise<Record<string, CuttingPiece[]>> {
  return loadCuttingPieces(ds, studioId, styleId);
}
