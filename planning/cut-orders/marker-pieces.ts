import { polygonRotate } from '@shared/geometry/polygon';
import type { Point } from '@shared/geometry/types';
import type { NestingPiece } from '../nesting';
import { compensateForShrinkage, NO_SHRINKAGE, type Shrinkage } from './shrinkage';

/** One piece of one size as the cutting room gets it from grading. Lengths in mm, piece-local frame. */
export interface MarkerSourcePiece {
  pieceId: string;
  name: string;
  /** Cutting outline (seam allowance included), ≥ 3 vertices, any winding. */
  outline: Point[];
  /** Copies per garment; a mirrored pair counts 2. */
  quantity: number;
  /** Cut as a left and right pair. */
  mirrored: boolean;
  /** Grain line direction, degrees counter-clockwise from the piece's x axis. Default 0. */
  grainAngle?: number;
  /** Notch positions on the cutting line, same frame as the outline. */
  notches?: Point[];
}

/** A fabric as the marker sees it. */
export interface MarkerFabric {
  /** One-way: printed one way, napped or pile; every piece must point the same way along the length. */
  isDirectional: boolean;
  shrinkage?: Shrinkage;
}

/** What a piece key of the prepared marker stands for. */
export interface MarkerPieceLabel {
  size: string;
  name: string;
  /** True for the other half of a pair on one-way fabric (drawn from its own outline, never flipped). */
  isPairHalf: boolean;
}

/** Engine pieces plus what the drawings need per piece key ("M:front", "M:sleeve:pair"). */
export interface PreparedMarkerPieces {
  pieces: NestingPiece[];
  labels: Record<string, MarkerPieceLabel>;
  /** Notches per piece key in the same (marker) frame as the piece's polygon. */
  notches: Record<string, Point[]>;
}

/**
 * Engine pieces for one size ratio: every outline turned so the grain runs along the fabric length
 * (x), grown for shrinkage (x lengthwise, y widthwise, about the piece origin; see `shrinkageFactor`),
 * copies multiplied by the ratio; sizes in code-point order, pieces in their given order.
 *
 * Pairs: on fabric that may be turned, a pair stays one mirrored engine piece (x → −x) with rotations
 * 0° and 180°; its mirrored half may then be turned half round, which is the same shape as mirroring
 * across the grain. On one-way fabric only 0° is allowed, and the engine's x → −x would flip the
 * mirrored half along the grain so it points the other way and shades differently. There the pair is
 * two engine pieces: the piece, and its mirror image across the grain line (y → −y), both at 0°, so
 * both halves keep the fabric's direction (one-way: all pieces one direction, Vilumsone-Nemes,
 * *Industrial Cutting of Textile Materials*, pp. 20, 228).
 *
 * Sizes with 0 garments and pieces with no copies are left out. Throws RangeError on bad shrinkage.
 */
export function prepareMarkerPieces(
  piecesBySize: Record<string, MarkerSourcePiece[]>,
  ratio: Record<string, number>,
  fabric: MarkerFabric,
): PreparedMarkerPieces {
  const out: PreparedMarkerPieces = { pieces: [], labels: {}, notches: {} };
  const shrinkage = fabric.shrinkage ?? NO_SHRINKAGE;
  const orientations = fabric.isDirectional ? [0] : [0, 180];
  for (const [size, n] of Object.entries(ratio).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) {
    if (!(n > 0)) continue;
    for (const p of piecesBySize[size] ?? []) {
      const toMarker = (ring: Point[]) => compensateForShrinkage(p.grainAngle ? polygonRotate(ring, -p.grainAngle) : ring, shrinkage).map(round);
      const outline = toMarker(p.outline);
      const notches = toMarker(p.notches ?? []);
      const id = `${size}:${p.pieceId}`;
      const perGarment = p.mirrored ? Math.max(1, Math.round(p.quantity / 2)) : p.quantity;
      if (!(perGarment > 0)) continue;
      if (p.mirrored && fabric.isDirectional) {
        add(out, { id, polygon: outline, quantity: perGarment * n, mirrored: false, orientations }, { size, name: p.name, isPairHalf: false }, notches);
        add(out, { id: `${id}:pair`, polygon: mirrorAcrossGrain(outline), quantity: perGarment * n, mirrored: false, orientations }, { size, name: p.name, isPairHalf: true }, notches.map(flipY));
      } else {
        add(out, { id, polygon: outline, quantity: perGarment * n, mirrored: p.mirrored, orientations }, { size, name: p.name, isPairHalf: false }, notches);
      }
    }
  }
  return out;
}

/**
 * Mirror image across the grain line (the x axis of the marker frame): y → −y, order reversed so the
 * winding stays as it was. Every point keeps its place along the length, so the piece keeps its direction.
 */
export function mirrorAcrossGrain(ring: Point[]): Point[] {
  return ring.map(flipY).reverse();
}

function add(out: PreparedMarkerPieces, piece: NestingPiece, label: MarkerPieceLabel, notches: Point[]) {
  out.pieces.push(piece);
  out.labels[piece.id] = label;
  if (notches.length) out.notches[piece.id] = notches;
}

const flipY = (q: Point): Point => ({ x: q.x, y: q.y === 0 ? 0 : -q.y });
const round = (q: Point): Point => ({ x: Math.round(q.x * 1000) / 1000, y: Math.round(q.y * 1000) / 1000 });
