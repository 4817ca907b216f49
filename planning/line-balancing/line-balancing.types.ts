/** One work element (operation). `time` in minutes (or any one unit used for the cycle time too). */
export interface LineTask {
  id: string;
  time: number;
  /** Ids of tasks that must be done first (direct predecessors). */
  after: string[];
  /** Machine type; with `oneMachinePerStation` a station holds tasks of one machine type (untyped tasks go anywhere). */
  machine?: string;
  /** Skill an operator needs for the task; see `maxSkillsPerStation`. */
  skill?: string;
}

/** Input to {@link balanceLine}: give `cycleTime` (SALBP-1) or `stations` (SALBP-2). */
export interface BalanceLineInput {
  tasks: LineTask[];
  /** SALBP-1: minimise stations for this cycle time. */
  cycleTime?: number;
  /** SALBP-2: minimise the cycle time for this many stations (used when `cycleTime` is absent). */
  stations?: number;
  /** Default true: one machine type per station. */
  oneMachinePerStation?: boolean;
  /** Distinct skills one operator (station) may need; default unlimited. */
  maxSkillsPerStation?: number;
  /** Search-node budget per SALBP-1 solve (default 2 000 000); past it the best found is returned, labelled. */
  nodeBudget?: number;
  signal?: AbortSignal;
}

/** One station (operator) of the line, tasks in precedence-feasible order. */
export interface BalancedStation {
  tasks: string[];
  /** Station time Σ task times. */
  time: number;
  /** Cycle time − station time. */
  idle: number;
}

/** `exact`: proven optimal; `rpw`: ranked-positional-weight heuristic; `partial-search`: best found before the budget ran out. */
export type BalanceMethod = 'exact' | 'rpw' | 'partial-search';

/** Result of {@link balanceLine}. */
export interface LineBalance {
  problem: 'salbp-1' | 'salbp-2';
  cycleTime: number;
  stations: BalancedStation[];
  count: number;
  /** Σt ÷ (m × cycle time) × 100. */
  efficiency: number;
  /** Σt ÷ (m × largest station time) × 100 (the form used in the RPW worked examples). */
  efficiencyAtBottleneck: number;
  /** 100 − efficiency. */
  balanceDelay: number;
  /** √Σ (largest station time − station time)². */
  smoothnessIndex: number;
  /** Index of the station with the largest time (first on ties). */
  bottleneck: number;
  /** SALBP-1: ⌈Σt ÷ c⌉; SALBP-2: max(largest task, Σt ÷ m). */
  lowerBound: number;
  method: BalanceMethod;
  nodes: number;
}
