import { polygonArea, polygonBBox } from '@shared/geometry/polygon';
import { polylineLength } from '@shared/geometry/polyline';
import { edgePoints, type Piece } from './piece';

/** Measurements of one piece: sewing-line area (mm²), bounding width and height (mm), each edge's length (mm). */
export interface PieceMeasurements {
  areaMm2: number;
  widthMm: number;
  heightMm: number;
  edgeLengthsMm: Record<string, number>;
}

/** Measure a piece on its sewing line. Area does not depend on winding or start vertex. */
export function measurePiece(piece: Piece): PieceMeasurements {
  const box = polygonBBox(piece.outline);
  const edgeLengthsMm: Record<string, number> = {};
  for (const e of piece.edges) edgeLengthsMm[e.name] = (edgeLengthsMm[e.name] ?? 0) + polylineLength(edgePoints(piece, e));
  return { areaMm2: polygonArea(piece.outline), widthMm: box.maxX - box.minX, heightMm: box.maxY - box.minY, edgeLengthsMm };
}

/** Total length (mm) of the named edges of a piece; unknown names throw RangeError. */
export function edgeLength(piece: Piece, names: readonly string[]): number {
  let sum = 0;
  for (const name of names) {
    const edges = piece.edges.filter((e) => e.name === name);
    if (edges.length === 0) throw new RangeError(`piece ${piece.id} has no edge "${name}"`);
    for (const e of edges) sum += polylineLength(edgePoints(piece, e));
  }
  return sum;
}
