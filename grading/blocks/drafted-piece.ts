import type { Point } from '@shared/geometry/types';
import type { Piece, PieceEdge } from '../pieces/piece';

/** Which of the style's materials a piece is cut from. The owner may name others ('contrast-2', 'mesh'). */
export type PieceMaterial = 'self' | 'lining' | 'contrast' | 'interfacing' | (string & {});

/** A piece as a block drafts it: the pattern piece plus the block that made it, its material and copies. */
export interface DraftedPiece extends Piece {
  /** Block name ('bodice', 'skirt', 'sleeve', 'peplum', 'facing', 'waistband'). */
  block: string;
  /** Block shape when the block has several ('circle', 'straight'…). */
  shape?: string;
  material: PieceMaterial;
  /** How many of this piece are cut per garment (a mirrored pair counts 2). */
  copies: number;
}

/** Pieces cut per garment: a mirrored pair is two, a piece on the fold is one (opened out), times the quantity. */
export function piecesPerGarment(piece: Pick<Piece, 'cut' | 'quantity'>): number {
  return (piece.cut === 'pair' ? 2 : 1) * piece.quantity;
}

const ON_LINE_MM = 1e-6;

/**
 * The piece opened out about its fold edge: the outline is the half outline plus its mirror image, the fold edge
 * disappears and an edge crossing the fold (waist, neckline, hem) becomes one edge. Notches, drill holes and
 * internal lines are mirrored too (drill holes on the fold once); landmarks keep the drafted half's names; the
 * cut becomes 'cut1'. A piece without a fold is returned unchanged. Throws RangeError when the piece has more
 * than one fold edge or the fold is not straight (a fold line must be).
 */
export function unfoldPiece<T extends Piece>(piece: T): T {
  const folds = piece.edges.filter((e) => e.isFold);
  if (folds.length === 0) return piece;
  if (folds.length > 1) throw new RangeError(`piece ${piece.id} has more than one fold edge`);
  const fold = folds[0];
  const n = piece.outline.length;
  const a = piece.outline[fold.from], b = piece.outline[fold.to];
  const reflect = reflectAcross(a, b);
  for (let i = fold.from; i !== fold.to; i = (i + 1) % n) {
    if (Math.abs(signedDistance(a, b, piece.outline[i])) > 1e-3) throw new RangeError(`fold of piece ${piece.id} is not straight`);
  }
  // Chain position k of original vertex i, walking from the fold's end round to its start.
  const pos = (i: number) => (i - fold.to + n) % n;
  const chain: number[] = [];
  for (let i = fold.to; ; i = (i + 1) % n) {
    chain.push(i);
    if (i === fold.from) break;
  }
  const m = chain.length;
  const total = 2 * m - 2;
  const mirrorAt = (k: number) => (2 * m - 2 - k) % total;
  const outline = [...chain.map((i) => ({ ...piece.outline[i] })), ...chain.slice(1, -1).reverse().map((i) => reflect(piece.outline[i]))];
  const right = piece.edges.filter((e) => !e.isFold).map((e) => ({ ...e, from: pos(e.from), to: pos(e.to) }));
  right.sort((x, y) => x.from - y.from);
  const left = [...right].reverse().map((e) => ({ ...e, from: mirrorAt(e.to), to: mirrorAt(e.from) }));
  const edges = mergeAcrossFold([...right, ...left]);
  const shift = edges[0].from;
  const at = (k: number) => (k - shift + total) % total;
  const mirrorPoint = (p: Point) => reflect(p);
  const onFold = (p: Point) => Math.abs(signedDistance(a, b, p)) < ON_LINE_MM;
  return {
    ...piece,
    outline: [...outline.slice(shift), ...outline.slice(0, shift)],
    edges: edges.map((e) => ({ ...e, from: at(e.from), to: at(e.to) })),
    landmarks: Object.fromEntries(Object.entries(piece.landmarks).map(([k, i]) => [k, at(pos(i))])),
    notches: [...new Set(piece.notches.flatMap((i) => [at(pos(i)), at(mirrorAt(pos(i)))]))].sort((x, y) => x - y),
    drillHoles: [...piece.drillHoles, ...piece.drillHoles.filter((p) => !onFold(p)).map(mirrorPoint)],
    internalLines: [...piece.internalLines, ...piece.internalLines.map((l) => ({ ...l, points: l.points.map(mirrorPoint) }))],
    cut: 'cut1',
  };
}

/** Join neighbouring edges of the same name that meet on the fold (waist, neckline, hem). */
function mergeAcrossFold(edges: PieceEdge[]): PieceEdge[] {
  const out: PieceEdge[] = [];
  for (const e of edges) {
    const last = out[out.length - 1];
    if (last && last.name === e.name && last.to === e.from) last.to = e.to;
    else out.push({ ...e });
  }
  const first = out[0], last = out[out.length - 1];
  if (out.length > 1 && first.name === last.name && last.to === first.from) {
    out.pop();
    out[0] = { ...first, from: last.from };
  }
  return out;
}

function signedDistance(a: Point, b: Point, p: Point): number {
  const l = Math.hypot(b.x - a.x, b.y - a.y);
  return ((b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x)) / l;
}

function reflectAcross(a: Point, b: Point): (p: Point) => Point {
  const l = Math.hypot(b.x - a.x, b.y - a.y);
  const u = { x: (b.x - a.x) / l, y: (b.y - a.y) / l };
  return (p) => {
    const t = (p.x - a.x) * u.x + (p.y - a.y) * u.y;
    const foot = { x: a.x + u.x * t, y: a.y + u.y * t };
    return { x: 2 * foot.x - p.x, y: 2 * foot.y - p.y };
  };
}

/**
 * Split a polyline so it has vertices at the given arc lengths from its start (mm, any order). Returns the new
 * points and, for each requested length, the index of its vertex. Lengths outside (0, length) are clamped to
 * the ends; a length within 1 µm of an existing vertex reuses it.
 */
export function polylineSplitAt(points: readonly Point[], lengthsMm: readonly number[]): { points: Point[]; indices: number[] } {
  const out: Point[] = [{ ...points[0] }];
  const wanted = lengthsMm.map((d, k) => ({ d, k })).sort((x, y) => x.d - y.d);
  const indices = new Array<number>(lengthsMm.length).fill(0);
  let w = 0;
  let run = 0;
  for (let i = 1; i < points.length; i++) {
    const p = points[i - 1], q = points[i];
    const seg = Math.hypot(q.x - p.x, q.y - p.y);
    while (w < wanted.length && wanted[w].d < run + seg - 1e-3) {
      const d = Math.max(run, wanted[w].d);
      if (d - run < 1e-3) indices[wanted[w].k] = out.length - 1;
      else {
        const t = (d - run) / seg;
        out.push({ x: p.x + (q.x - p.x) * t, y: p.y + (q.y - p.y) * t });
        indices[wanted[w].k] = out.length - 1;
      }
      w++;
    }
    out.push({ ...q });
    run += seg;
  }
  while (w < wanted.length) indices[wanted[w++].k] = out.length - 1;
  return { points: out, indices };
}
