import { cubicBezierFlatten, CURVE_TOLERANCE_MM } from '@shared/geometry/bezier';
import { polygonSignedArea } from '@shared/geometry/polygon';
import type { Point } from '@shared/geometry/types';

/** How a piece is cut: once, as a mirrored pair, or once on a fold (the fold edge has `isFold`). */
export type CutInstruction = 'cut1' | 'pair' | 'fold';

/**
 * A named run of the outline from vertex `from` to vertex `to` (wrapping past the end), with its seam allowance.
 * Edges cover the outline in order: each edge ends where the next begins.
 */
export interface PieceEdge {
  name: string;
  from: number;
  to: number;
  allowanceMm: number;
  isFold?: boolean;
}

/** A line drawn inside the piece: dart legs, fold lines, placement marks, reference lines. */
export interface InternalLine {
  kind: 'dart' | 'fold' | 'placement' | 'reference';
  name: string;
  points: Point[];
}

/**
 * A pattern piece. Coordinates in mm, y up; the outline is the SEWING line, counter-clockwise, closed implicitly,
 * curves already flattened within `curveToleranceMm`. Notches are outline vertex indices. `landmarks` name
 * outline vertices used by grade rules (e.g. 'underarm', 'hps').
 */
export interface Piece {
  id: string;
  /** What the piece is, for grade-rule proposals: 'front', 'back', 'sleeve', 'collar-band', 'front-facing'… */
  role: string;
  name: string;
  outline: Point[];
  edges: PieceEdge[];
  grainLine: { from: Point; to: Point };
  notches: number[];
  drillHoles: Point[];
  internalLines: InternalLine[];
  cut: CutInstruction;
  quantity: number;
  /** The cloth the piece is cut from when it is not the style's main fabric (e.g. from an imported file). */
  material?: string;
  landmarks: Record<string, number>;
  curveToleranceMm: number;
}

/** Options for the edge being started in an {@link OutlineBuilder}. */
export interface EdgeOptions {
  allowanceMm: number;
  isFold?: boolean;
}

/**
 * Builds a closed outline edge by edge. Call `edge()` before the segments of each edge; curves are flattened with
 * uniform parameter steps (see cubicBezierFlatten) so vertex index tracks the curve parameter.
 */
export class OutlineBuilder {
  readonly points: Point[] = [];
  readonly edges: PieceEdge[] = [];
  readonly landmarks: Record<string, number> = {};
  readonly notches: number[] = [];

  constructor(start: Point, landmark?: string, readonly toleranceMm = CURVE_TOLERANCE_MM) {
    this.points.push({ ...start });
    if (landmark) this.landmarks[landmark] = 0;
  }

  /** Start a new edge at the current point. */
  edge(name: string, options: EdgeOptions): this {
    this.edges.push({ name, from: this.points.length - 1, to: -1, allowanceMm: options.allowanceMm, isFold: options.isFold });
    return this;
  }

  /** Straight segment to `p`, optionally naming the new vertex. */
  line(p: Point, landmark?: string): this {
    this.points.push({ ...p });
    if (landmark) this.landmarks[landmark] = this.points.length - 1;
    return this;
  }

  /** Cubic Bézier from the current point through controls c1, c2 to p. */
  cubic(c1: Point, c2: Point, p: Point, landmark?: string): this {
    const from = this.points[this.points.length - 1];
    const pts = cubicBezierFlatten(from, c1, c2, p, this.toleranceMm);
    for (const q of pts.slice(1, -1)) this.points.push(q);
    return this.line(p, landmark);
  }

  /** Put a notch at the current vertex. */
  notch(): this {
    this.notches.push(this.points.length - 1);
    return this;
  }

  /**
   * Close the outline: the last point must equal the start (it is dropped). Throws if the ring is clockwise or
   * has no edges, so every drafted piece is counter-clockwise.
   */
  close(): Pick<Piece, 'outline' | 'edges' | 'landmarks' | 'notches' | 'curveToleranceMm'> {
    const last = this.points[this.points.length - 1];
    const first = this.points[0];
    if (Math.hypot(last.x - first.x, last.y - first.y) > 1e-6) throw new Error('outline does not return to its start');
    const outline = this.points.slice(0, -1);
    const n = outline.length;
    const edges = this.edges.map((e, i) => ({ ...e, to: i + 1 < this.edges.length ? this.edges[i + 1].from : 0 }));
    if (edges.length === 0 || edges[0].from !== 0) throw new Error('first edge must start at vertex 0');
    if (polygonSignedArea(outline) <= 0) throw new Error('outline must be counter-clockwise');
    const fix = (i: number) => (i >= n ? i - n : i);
    const landmarks = Object.fromEntries(Object.entries(this.landmarks).map(([k, v]) => [k, fix(v)]));
    return { outline, edges: edges.map((e) => ({ ...e, to: fix(e.to) })), landmarks, notches: this.notches.map(fix), curveToleranceMm: this.toleranceMm };
  }
}

/** The outline vertices of an edge in order, from `from` to `to` inclusive (wrapping). */
export function edgePoints(piece: Pick<Piece, 'outline'>, edge: Pick<PieceEdge, 'from' | 'to'>): Point[] {
  const n = piece.outline.length;
  const out: Point[] = [];
  for (let i = edge.from; ; i = (i + 1) % n) {
    out.push(piece.outline[i]);
    if (i === edge.to || out.length > n) break;
  }
  return out;
}

/** Seam allowance of every outline segment i (vertex i → i + 1), from the edge holding it. */
export function segmentAllowances(piece: Pick<Piece, 'outline' | 'edges'>): number[] {
  const n = piece.outline.length;
  const out = new Array<number>(n).fill(0);
  for (const e of piece.edges) {
    for (let i = e.from; i !== e.to; i = (i + 1) % n) out[i] = e.isFold ? 0 : e.allowanceMm;
  }
  return out;
}
