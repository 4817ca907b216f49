import polygonClipping from 'polygon-clipping';
import { cuttingOutline, gradePiece, type Piece } from '@grading';
import { polygonSignedArea } from '@shared/geometry/polygon';
import type { Point, Polygon } from '@shared/geometry/types';
import type { StoredGradingSet } from './grading-set.repository';

/** One piece to cut for one size, as the cutting and marker area consumes it. */
export interface CuttingPiece {
  pieceId: string;
  name: string;
  /** Cutting outline (sewing line + seam allowance), mm, counter-clockwise. */
  outline: { x: number; y: number }[];
  /** The style's material the piece is cut from ('self' for pieces stored before materials existed). */
  material: string;
  /** Copies per garment (a mirrored pair counts 2). */
  quantity: number;
  /** True when the copies are cut as a mirrored pair (left and right). */
  mirrored: boolean;
  /** Grain line direction in degrees from the piece's x axis, counter-clockwise. */
  grainAngle?: number;
  /** Notches, as their points on the sewing line (the marker plot carries them out to the cutting line). */
  notches?: { x: number; y: number }[];
}

/**
 * A style's cutting pieces per size (the grading area's `cuttingPieces` service, built in
 * cutting-pieces.service.ts); markers, cut plans and costing receive it rather than reading grading's tables.
 */
export type CuttingPieceSource = (studioId: number, styleId: number) => Promise<Record<string, CuttingPiece[]>>;

/**
 * Cutting pieces of a loaded grading set for every size of its run (sizes in the chart's run order): each
 * base piece graded by its stored rules, turned into its cutting outline, and cut-on-fold pieces unfolded into
 * a full piece (the half is mirrored across the fold line and united with itself).
 */
export function cuttingPiecesOf(set: Pick<StoredGradingSet, 'sizeChart' | 'pieces' | 'gradeRules'>, baseSize: string): Record<string, CuttingPiece[]> {
  const key = JSON.stringify([baseSize, set.sizeChart.sizes, set.pieces, set.gradeRules]);
  const hit = memo.get(key);
  if (hit) return structuredClone(hit);
  const sizes = set.sizeChart.sizes;
  const base = sizes.includes(baseSize) ? baseSize : sizes[Math.floor(sizes.length / 2)];
  const out: Record<string, CuttingPiece[]> = Object.fromEntries(sizes.map((s) => [s, [] as CuttingPiece[]]));
  for (const piece of set.pieces) {
    const graded = gradePiece(piece, set.gradeRules[piece.id] ?? [], sizes, base);
    for (const size of sizes) out[size].push(cuttingPieceOf(graded.bySize[size]));
  }
  if (memo.size >= 10) memo.delete(memo.keys().next().value as string);
  memo.set(key, out);
  return structuredClone(out);
}

/** Same content, same result: a small memo (cutting outlines take ~10 ms a piece). */
const memo = new Map<string, Record<string, CuttingPiece[]>>();

/** One graded piece → its cutting piece. */
export function cuttingPieceOf(piece: Piece): CuttingPiece {
  let outline = cuttingOutline(piece);
  const fold = piece.cut === 'fold' ? piece.edges.find((e) => e.isFold) : undefined;
  if (fold && outline.length >= 3) outline = unfold(outline, piece.outline[fold.from], piece.outline[fold.to]);
  const g = piece.grainLine;
  const grainAngle = (Math.atan2(g.to.y - g.from.y, g.to.x - g.from.x) * 180) / Math.PI;
  const mirrored = piece.cut === 'pair';
  return {
    pieceId: piece.id,
    name: piece.name,
    material: 'material' in piece && typeof piece.material === 'string' ? piece.material : 'self',
    outline: outline.map((p) => ({ x: round(p.x), y: round(p.y) })),
    quantity: mirrored ? 2 * piece.quantity : piece.quantity,
    mirrored,
    grainAngle: Number.isFinite(grainAngle) ? round(grainAngle) : undefined,
    notches: piece.notches.map((i) => piece.outline[i]).filter(Boolean).map((p) => ({ x: round(p.x), y: round(p.y) })),
  };
}

const round = (n: number) => Math.round(n * 1000) / 1000;

/** Mirror a half outline across the line a–b and unite both halves (the half is first clipped to its side). */
function unfold(half: Polygon, a: Point, b: Point): Polygon {
  const dx = b.x - a.x, dy = b.y - a.y;
  const len = Math.hypot(dx, dy);
  if (len === 0) return half;
  const ux = dx / len, uy = dy / len;
  const reflect = (p: Point): Point => {
    const t = (p.x - a.x) * ux + (p.y - a.y) * uy;
    const fx = a.x + t * ux, fy = a.y + t * uy;
    return { x: 2 * fx - p.x, y: 2 * fy - p.y };
  };
  // The piece lies on the left of a→b when the sewing line runs counter-clockwise along the fold; keep that side.
  const side = half.reduce((s, p) => s + ((p.x - a.x) * uy - (p.y - a.y) * ux), 0) < 0 ? 1 : -1;
  const far = 1e5;
  const nx = -uy * side, ny = ux * side;
  const halfPlane: Point[] = [
    { x: a.x - ux * far, y: a.y - uy * far },
    { x: a.x + ux * far, y: a.y + uy * far },
    { x: a.x + ux * far + nx * far, y: a.y + uy * far + ny * far },
    { x: a.x - ux * far + nx * far, y: a.y - uy * far + ny * far },
  ];
  const ring = (poly: Polygon) => [poly.map((p) => [p.x, p.y] as [number, number])];
  const kept = polygonClipping.intersection(ring(half), ring(halfPlane));
  const keptRing = kept[0]?.[0]?.slice(0, -1).map(([x, y]) => ({ x, y })) ?? half;
  const mirror = keptRing.map(reflect).reverse();
  const united = polygonClipping.union(ring(keptRing), ring(mirror));
  const best = united
    .map((poly) => poly[0].slice(0, -1).map(([x, y]) => ({ x, y })))
    .sort((p, q) => Math.abs(polygonSignedArea(q)) - Math.abs(polygonSignedArea(p)))[0];
  if (!best) return half;
  return polygonSignedArea(best) < 0 ? [...best].reverse() : best;
}
