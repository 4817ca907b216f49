import type { Millimetres } from '@shared/units';

/** Garments of each size in one marker, e.g. `{ M: 3, L: 2 }`; sizes with 0 may be omitted. */
export type SizeRatio = Record<string, number>;

/**
 * The studio's rates for the money objective, minor units of its currency. Any of them given switches
 * the plan from "least fabric, then fewest lays" to least total cost.
 */
export interface CutCosts {
  /** Fabric price per metre of spread (marker length + end allowance). */
  fabricCostPerMetre?: number;
  /** Cost of each lay: spreading set-up, marker, cutting. */
  layCost?: number;
  /** Cost of each ply spread. */
  plyCost?: number;
}

/** A measured marker: its ratio and plotted length. */
export interface MeasuredMarker {
  ratio: SizeRatio;
  length: Millimetres;
}

/** Input to {@link planCutOrder} and `solveCutOrder`. Lengths in millimetres; counts are non-negative integers. */
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
  /** Solver only: measured markers, the only ratios the plan may use (their lengths, never estimates). */
  markers?: MeasuredMarker[];
  /** Solver only: rates for the money objective; absent = least fabric, then fewest lays. */
  costs?: CutCosts;
  /** Solver only: wall-clock budget for the whole plan, seconds. Default 5. */
  timeLimitSeconds?: number;
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
  /** Relative gap to the proven bound of the objective optimised (0 when exact); see `solveCutOrder`. */
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
  /** Where every marker length in the plan comes from: measured markers or estimates, never both. */
  markerLengths?: 'measured' | 'estimated';
  /** Total cost of the plan in minor units, when the plan was priced with {@link CutCosts}. */
  cost?: number;
}
