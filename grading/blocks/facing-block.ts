import { polygonSignedArea } from '@shared/geometry/polygon';
import { segmentDistance } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import { clipperIntersect, clipperOpenBand } from '../pieces/clipper-adapter';
import { edgePoints, type CutInstruction, type Piece, type PieceEdge } from '../pieces/piece';

/** Options for {@link draftFacing}. */
export interface FacingOptions {
  id: string;
  name: string;
  role: string;
  /** Consecutive edges of the source piece the facing follows, in outline order. */
  edges: string[];
  widthMm: number;
  cut: CutInstruction;
}

const ON_EDGE_MM = 0.01;

/**
 * A facing cut from a piece along a neckline (or front edge): the part of the piece within `widthMm` of the
 * chosen edges, found as clipper's intersection of the piece with a square-ended band around the edges. The
 * path is first carried `widthMm` along the edges before and after, so the ends of the facing follow the shoulder
 * or hem. Facing segments lying on a source edge keep its name and allowance; the rest form the 'inner' edge
 * (allowance 0: finished by overlocking, common practice). Source landmarks on the facing keep their names; the
 * grain line keeps the source direction, centred half a facing width inside the middle of the path.
 * Throws RangeError when an edge is missing or the band misses the piece.
 */
export function draftFacing(source: Piece, o: FacingOptions): Piece {
  const sourceEdges = o.edges.map((name) => {
    const e = source.edges.find((x) => x.name === name);
    if (!e) throw new RangeError(`piece ${source.id} has no edge "${name}"`);
    return e;
  });
  const path = facingPath(source, sourceEdges, o.widthMm);
  const [ring] = clipperIntersect([source.outline], clipperOpenBand(path, o.widthMm));
  if (!ring) throw new RangeError('facing band does not meet the piece');
  const ccw = polygonSignedArea(ring) < 0 ? [...ring].reverse() : ring;
  const names = ccw.map((p, i) => segmentSource(source, p, ccw[(i + 1) % ccw.length]));
  const start = Math.max(0, names.findIndex((nm, i) => nm?.name !== names[(i - 1 + names.length) % names.length]?.name));
  const outline = [...ccw.slice(start), ...ccw.slice(0, start)];
  const segs = [...names.slice(start), ...names.slice(0, start)];
  const edges: PieceEdge[] = [];
  segs.forEach((s, i) => {
    const name = s?.name ?? 'inner';
    if (edges.length && edges[edges.length - 1].name === name) return;
    edges.push({ name, from: i, to: 0, allowanceMm: s ? s.allowanceMm : 0, isFold: s?.isFold });
  });
  edges.forEach((e, i) => (e.to = i + 1 < edges.length ? edges[i + 1].from : 0));
  const landmarks: Record<string, number> = {};
  for (const [name, idx] of Object.entries(source.landmarks)) {
    const p = source.outline[idx];
    const k = outline.findIndex((q) => Math.hypot(q.x - p.x, q.y - p.y) < ON_EDGE_MM);
    if (k >= 0) landmarks[name] = k;
  }
  const mid = insidePoint(path, o.widthMm / 2);
  const g = source.grainLine;
  const gl = Math.hypot(g.to.x - g.from.x, g.to.y - g.from.y) || 1;
  const half = { x: ((g.to.x - g.from.x) / gl) * 0.75 * o.widthMm, y: ((g.to.y - g.from.y) / gl) * 0.75 * o.widthMm };
  return {
    id: o.id, name: o.name, role: o.role, outline, edges, landmarks, notches: [], curveToleranceMm: source.curveToleranceMm,
    grainLine: { from: { x: mid.x - half.x, y: mid.y - half.y }, to: { x: mid.x + half.x, y: mid.y + half.y } },
    drillHoles: [], internalLines: [], cut: o.cut, quantity: 1,
  };
}

/** A point `inset` to the left of (inside, for a counter-clockwise source) the middle of the path. */
function insidePoint(path: Point[], inset: number): Point {
  const i = Math.max(0, Math.floor(path.length / 2) - 1);
  const a = path[i], b = path[i + 1] ?? path[i];
  const l = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  return { x: (a.x + b.x) / 2 - ((b.y - a.y) / l) * inset, y: (a.y + b.y) / 2 + ((b.x - a.x) / l) * inset };
}

function facingPath(source: Piece, edges: PieceEdge[], width: number): Point[] {
  const n = source.outline.length;
  const pts = edges.flatMap((e, i) => (i === 0 ? edgePoints(source, e) : edgePoints(source, e).slice(1)));
  const before = source.outline[(edges[0].from - 1 + n) % n];
  const after = source.outline[(edges[edges.length - 1].to + 1) % n];
  return [toward(pts[0], before, width), ...pts, toward(pts[pts.length - 1], after, width)];
}

function toward(a: Point, b: Point, d: number): Point {
  const l = Math.hypot(b.x - a.x, b.y - a.y);
  const t = Math.min(1, d / Math.max(l, 1e-9));
  return { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t };
}

function segmentSource(source: Piece, a: Point, b: Point): PieceEdge | null {
  const n = source.outline.length;
  for (const e of source.edges) {
    for (let i = e.from; i !== e.to; i = (i + 1) % n) {
      const p = source.outline[i], q = source.outline[(i + 1) % n];
      if (segmentDistance(a, p, q) < ON_EDGE_MM && segmentDistance(b, p, q) < ON_EDGE_MM) return e;
    }
  }
  return null;
}
