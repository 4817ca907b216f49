import { polygonArea, polygonBBox, polygonMirrorX, polygonRotate, polygonToCounterClockwise } from '@shared/geometry/polygon';
import type { Polygon } from '@shared/geometry/types';
import { clipperScaleFor, openRing, polygonOffsetOutward } from './clipper-path';
import { NfpCache } from './nfp-cache';
import { defaultSimplifyTolerance, simplifiedPackingShape } from './simplify-outline';
import type { NestingInput } from './types';

/** One piece in one mirror state and one rotation, precomputed once. */
export interface Variant {
  piece: number;
  mirrored: boolean;
  rotation: number;
  /** Outline grown by gap/2 (simplified, see `buildNestModel`): what the collision code packs. */
  shape: Polygon;
  /** Bounding box of the true outline: keeps the piece inside the strip. */
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
  /** Bounding box of `shape`: the broad phase. */
  sMinX: number;
  sMaxX: number;
  sMinY: number;
  sMaxY: number;
}

/** One copy to place. */
export interface Item {
  piece: number;
  copy: number;
  mirrored: boolean;
  /** Variants allowed for this copy (its mirror state × allowed rotations that fit the width). */
  variants: number[];
  area: number;
}

/** Immutable problem data shared by every search step. */
export interface NestModel {
  width: number;
  variants: Variant[];
  items: Item[];
  totalArea: number;
  /** Depths at or below this count as touching, not overlapping (see `buildNestModel`). */
  touchTolerance: number;
  nfps: NfpCache;
}

const DEFAULT_ORIENTATIONS = [0, 180];
/**
 * Depths up to this many Clipper grid steps count as touching. Packed shapes are on the grid (see
 * `buildNestModel`), so their NFPs are exact and a true contact reads 0 up to float rounding (≈ 1e-13 of the
 * coordinates). Half a grid step, used before, let markers through whose pieces overlapped by up to 8e-7 of the
 * smaller piece's area (albano, 3,000 sweeps, seed 2): on long thin pieces a tiny depth is a long sliver.
 */
const TOUCH_TOLERANCE = 1e-3;

/** Counter-clockwise, starting at the lowest-then-leftmost vertex: winding and start never matter. */
function canonicalRing(ring: Polygon): Polygon {
  const ccw = polygonToCounterClockwise(openRing(ring));
  let k = 0;
  for (let i = 1; i < ccw.length; i++) if (ccw[i].y < ccw[k].y || (ccw[i].y === ccw[k].y && ccw[i].x < ccw[k].x)) k = i;
  return [...ccw.slice(k), ...ccw.slice(0, k)];
}

function normaliseAngle(deg: number): number {
  return ((deg % 360) + 360) % 360;
}

/**
 * Validates the input and precomputes every variant. Each packed outline is grown by gap/2; pieces
 * may touch exactly (so exact tilings stay feasible): depths up to a thousandth of Clipper's resolution
 * (≈ 1e-10 of the largest coordinate) count as touching; shapes off its grid are grown by one grid step. Outlines with many vertices (flattened
 * curves) are packed as a simplified shape that contains them (`simplifiedPackingShape`, tolerance
 * `simplifyTolerance`, default `defaultSimplifyTolerance(stripWidth)`; 0 disables); the bounding
 * boxes that keep pieces inside the strip stay those of the true outlines.
 * Throws a RangeError on an empty or degenerate piece, a non-positive width, or a piece that fits
 * the width in none of its orientations.
 */
export function buildNestModel(input: NestingInput, simplifyTolerance?: number): NestModel {
  const width = input.stripWidth as number;
  if (!(width > 0)) throw new RangeError('stripWidth must be positive');
  const gap = (input.gap ?? 0) as number;
  if (gap < 0) throw new RangeError('gap must be ≥ 0');
  let maxDim = 0;
  const rings = input.pieces.map((p) => {
    const ring = canonicalRing(p.polygon);
    if (ring.length < 3 || polygonArea(ring) <= 0) throw new RangeError(`piece ${p.id}: degenerate outline`);
    for (const q of ring) maxDim = Math.max(maxDim, Math.abs(q.x), Math.abs(q.y));
    return ring;
  });
  const eps = simplifyTolerance ?? defaultSimplifyTolerance(width);
  const scale = clipperScaleFor(maxDim + gap + 2 * eps);
  // One packing shape per piece; every mirror state and rotation is an exact transform of it, so the
  // NFP cache can derive one pair's NFPs from another's.
  // A shape off Clipper's grid (decimals finer than 1/scale, or turned by an angle that is not a multiple
  // of 90°) is rounded when its NFPs are built, by up to 0.71/scale: it is grown by one grid step first, so
  // the rounded shape still contains the outline.
  const onGrid = (ring: Polygon) => ring.every((q) => Math.abs(q.x * scale - Math.round(q.x * scale)) < 1e-6 && Math.abs(q.y * scale - Math.round(q.y * scale)) < 1e-6);
  const packed = rings.map((ring, pi) => {
    const shape = simplifiedPackingShape(ring, gap / 2, eps, scale);
    const square = (input.pieces[pi].orientations ?? DEFAULT_ORIENTATIONS).every((a) => normaliseAngle(a) % 90 === 0);
    return square && onGrid(shape) ? shape : polygonOffsetOutward(shape, 1 / scale, scale);
  });
  const shapeOf = (pi: number, mirrored: boolean, rotation: number) => polygonRotate(mirrored ? polygonMirrorX(packed[pi]) : packed[pi], rotation);
  const variants: Variant[] = [];
  const items: Item[] = [];
  input.pieces.forEach((piece, pi) => {
    const angles = [...new Set((piece.orientations ?? DEFAULT_ORIENTATIONS).map(normaliseAngle))].sort((a, b) => a - b);
    const mirrors = piece.mirrored ? [false, true] : [false];
    const byMirror = new Map<boolean, number[]>();
    for (const m of mirrors) {
      const base = m ? polygonMirrorX(rings[pi]) : rings[pi];
      const ids: number[] = [];
      for (const rotation of angles) {
        const outline = polygonRotate(base, rotation);
        const shape = shapeOf(pi, m, rotation);
        const b = polygonBBox(outline);
        const s = polygonBBox(shape);
        if (b.maxY - b.minY > width) continue;
        ids.push(variants.length);
        variants.push({ piece: pi, mirrored: m, rotation, shape, ...b, sMinX: s.minX, sMaxX: s.maxX, sMinY: s.minY, sMaxY: s.maxY });
      }
      if (ids.length === 0) throw new RangeError(`piece ${piece.id}: wider than the strip in every orientation`);
      byMirror.set(m, ids);
    }
    const area = polygonArea(rings[pi]);
    const copies = piece.mirrored ? 2 * piece.quantity : piece.quantity;
    for (let c = 0; c < copies; c++) {
      const m = piece.mirrored ? c % 2 === 1 : false;
      items.push({ piece: pi, copy: c, mirrored: m, variants: byMirror.get(m)!, area });
    }
  });
  const totalArea = items.reduce((s, it) => s + it.area, 0);
  return { width, variants, items, totalArea, touchTolerance: TOUCH_TOLERANCE / scale, nfps: new NfpCache(variants, shapeOf, scale) };
}
