import type { Polygon } from '@shared/geometry/types';
import type { Millimetres } from '@shared/units/units';

/**
 * One pattern piece to nest. The outline is a simple polygon (the cutting line, seam allowance
 * included) in piece-local millimetres, any winding, first vertex not repeated (a repeated closing
 * vertex is tolerated). Its origin is the rotation centre of every placement.
 */
export interface NestingPiece {
  /** Stable identifier; ties between otherwise equal choices break by this id. */
  id: string;
  /** Cutting outline, ≥ 3 vertices, non-zero area. */
  polygon: Polygon;
  /**
   * Copies to cut. When `mirrored` is true this counts pairs: each pair is one normal copy and one
   * mirrored copy (x → −x), so 2 × quantity copies are placed.
   */
  quantity: number;
  /**
   * Allowed rotations in degrees (counter-clockwise, y up). Default [0, 180]; [0] for one-way or
   * napped fabric; any 90° steps where the grain allows. Values are taken modulo 360.
   */
  orientations?: number[];
  /** Cut as left/right pairs (see `quantity`). Default false. */
  mirrored?: boolean;
}

/** Everything the engine needs besides the options. */
export interface NestingInput {
  pieces: NestingPiece[];
  /** Usable fabric width (selvedge trimmed): the strip spans y ∈ [0, stripWidth]. */
  stripWidth: Millimetres;
  /** Minimum clear distance between two pieces (not between a piece and the strip edge). Default 0. */
  gap?: Millimetres;
}

/** Progress report, sent after each improvement and about every 50 separation iterations. */
export interface NestingProgress {
  bestLength: Millimetres;
  elapsedMs: number;
  iteration: number;
}

/** Run controls. All side effects come in through here: time, randomness (seed), progress, cancel. */
export interface NestingOptions {
  /** Seed of the internal mulberry32 generator: same seed + same iteration budget → same marker. */
  seed: number;
  /**
   * Budget in separation iterations (one pass of moves over the overlapping pieces). Default 2000
   * when neither this nor `timeBudgetMs` is given.
   */
  maxIterations?: number;
  /** Wall-clock budget in milliseconds; needs `now`. */
  timeBudgetMs?: number;
  /** Millisecond clock (e.g. `performance.now`); without it the time budget is ignored. */
  now?: () => number;
  onProgress?: (progress: NestingProgress) => void;
  /** Checked between pieces and moves; when aborted the best layout so far is returned with complete: false. */
  signal?: AbortSignal;
  /**
   * Simplification tolerance ε (input units) for outlines with many vertices: they are packed as a
   * Douglas–Peucker simplification grown by ε, which contains the outline, so NFPs stay small.
   * Default `defaultSimplifyTolerance(stripWidth)` = min(1 mm, 1e-3 × stripWidth); 0 disables.
   */
  simplifyTolerance?: number;
  /**
   * Shared with the other lanes of the same search (`sharedMarkerBoard`): every shorter marker is posted
   * there, and a shorter marker posted by another lane replaces this lane's own best. Lanes then interact,
   * so a run with a board is not reproducible from its seed alone.
   */
  board?: MarkerBoard;
}

/**
 * Where one copy goes. To draw it: take the piece polygon, mirror it if `mirrored` (x → −x), rotate
 * about its own origin by `rotation` degrees, then translate by (x, y).
 */
export interface NestingPlacement {
  pieceId: string;
  /** 0-based copy index. For mirrored pieces copy 2k is the normal and 2k + 1 the mirrored half of pair k. */
  copy: number;
  rotation: number;
  mirrored: boolean;
  x: Millimetres;
  y: Millimetres;
}

/** A marker: the strip spans x ∈ [0, length] and y ∈ [0, stripWidth]. */
export interface NestingResult {
  /** One entry per copy, ordered by piece input order, then copy. */
  placements: NestingPlacement[];
  /** Used length: the largest x reached by any placed piece. */
  length: Millimetres;
  /** Total piece area ÷ (length × stripWidth), in [0, 1]. */
  utilisation: number;
  /**
   * False when stopped by the signal before the budget ran out, or when the budget (or signal) ran out
   * during the constructive start so that some pieces were placed by the bounding-box fallback. The
   * layout is valid either way.
   */
  complete: boolean;
  /** Separation iterations run. */
  iterations: number;
}

/** Positions of every item of a marker (the engine's layout snapshot), as lanes share them. */
export interface MarkerSnapshot {
  v: Int32Array;
  x: Float64Array;
  y: Float64Array;
}

/**
 * Where the parallel lanes of one marker search share their shortest marker, so that a lane that has
 * fallen behind carries on from the best marker found by any lane instead of its own (`sharedMarkerBoard`).
 */
export interface MarkerBoard {
  /** Post a feasible marker; it replaces the one held only when it is shorter. */
  offer(snap: MarkerSnapshot, length: number): void;
  /** A marker shorter than `length` posted since this lane last looked, else undefined. */
  take(length: number): { snap: MarkerSnapshot; length: number } | undefined;
}
