import type { DataSource } from 'typeorm';
import { badRequest } from '../../errors';
import { loadCuttingPieces, type CuttingPiece } from '../grading/graded-pieces';

export type { CuttingPiece };

/**
 * The style's cutting pieces per size through the grading module's `loadCuttingPieces` (the one place that
 * grades and unfolds pieces). Kept behind this seam so markers and cut plans share one loader.
 */
export function loadStylePieces(ds: DataSource, studioId: number, styleId: number): Promise<Record<string, CuttingPiece[]>> {
  return loadCuttingPieces(ds, studioId, styleId);
}

/**
 * The pieces cut from one fabric: those whose material the style links to it. A style that links no material
 * cuts every piece from any fabric (styles made before materials existed). A fabric no material links to is a
 * 400 on `fabricId` naming the fabrics the style does use.
 */
export function piecesOnFabric(
  pieces: Record<string, CuttingPiece[]>,
  materialFabrics: Record<string, number> | null,
  fabric: { id: number; name?: string },
): Record<string, CuttingPiece[]> {
  const links = Object.entries(materialFabrics ?? {});
  if (!links.length) return pieces;
  const materials = new Set(links.filter(([, id]) => id === fabric.id).map(([m]) => m));
  if (!materials.size) {
    const used = links.map(([m]) => m).join(', ');
    throw badRequest(`fabricId: no material of this style is cut from ${fabric.name ?? 'this fabric'} (link one on the style page; the style uses ${used})`, {
      fabricId: 'No material of this style is cut from this fabric',
    });
  }
  return Object.fromEntries(Object.entries(pieces).map(([size, list]) => [size, list.filter((p) => materials.has(p.material))]));
}
