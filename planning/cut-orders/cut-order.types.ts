import type { Millimetres } from '@shared/units';

/** Garments of each size in one marker, e.g. `{ M: 3, L: 2 }`; sizes with 0 may be omitted. */
export type SizeRatio = Record<string, number>;

/** Input to {@link planCutOrder}. Lengths in millimetres; counts are non-negative integers. */
export interface CutOrderInput {
  /** Sizes in display order; the order fixes tie-breaks and output order. */
  sizes: string[];
  /** Garments ordered per size. */
  quantities: Record<string, number>;
  /** Maximum plies in one lay (spread height). */
  maxPlies: number;
  /** Maximum garments placed in one marker. */
  maxGarmentsPerMarker: number;
  /** Cutting-table length: a spread (marker length + end allowance) must not exceed it. */
  maxMarkerLength?: Millimetres;
  /** Allowed over-cut per size as a percentage of its quantity (floored to whole garments). Default 0. */
  overcutPercent?: number;
  /** Allowed over-cut per size in garments; takes precedence over `overcutPercent`. */
  overcut?: Record<string, number>;
  /** Allowance per ply, both ends together. Default {@link DEFAULT_END_ALLOWANCE_PER_PLY_MM} (20 mm). */
  endAllowance?: Millimetres;
  /** Length of one garment of each size laid alone; the default marker length is the sum. */
  garmentLength?: Record<string, Millimetres>;
  /** Marker length for a ratio (e.g. from the nesting engine). Must not decrease when a garment is added. */
  markerLength?: (ratio: SizeRatio) => Millimetres;
  /** Search-node budget for the exact search; past it the best plan so far is returned. Default 1 000 000. */
  nodeBudget?: number;
  /** Candidate ratios above this count switch to a restricted (≤ 3 sizes per marker) heuristic. Default 20 000. */
  maxCandidates?: number;
  /** Checked between search nodes; on abort the best plan so far is returned. */
  signal?: AbortSignal;
}

/** One lay: one marker spread to `plies` plies. */
export interface Lay {
  ratio: SizeRatio;
  plies: number;
  markerLength: Millimetres;
}

/** How the plan was found: `exact` = proven optimal; `heuristic` = best found, optimality not proven. */
export type CutPlanMethod = 'exact' | 'heuristic';

/** Result of {@link planCutOrder}. */
export interface CutOrderPlan {
  /** Lays, most plies first, then by ratio in size order. */
  lays: Lay[];
  /** Σ (marker length + end allowance) × plies, mm. */
  fabricUsed: Millimetres;
  /** LP-relaxation lower bound on fabric used, mm (no plan can use less). */
  lowerBound: Millimetres;
  /** (fabricUsed − lowerBound) / lowerBound, 0 when lowerBound is 0. */
  gap: number;
  /** Lower bound on the number of lays, ⌈Σ quantities ÷ (max garments × max plies)⌉. */
  layLowerBound: number;
  /** Garments cut beyond the quantity, per size (every size listed). */
  overcut: Record<string, number>;
  /** Garments cut per size. */
  cut: Record<string, number>;
  method: CutPlanMethod;
  /** Search nodes visited. */
  nodes: number;
  endAllowance: Millimetres;
}
