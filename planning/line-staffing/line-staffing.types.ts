/** One sewing operation of the style. `minutes` are standard minutes per garment (efficiency 1.0). */
export interface StaffOperation {
  id: string;
  minutes: number;
  /** Machine type the operation runs on (`lockstitch`, `overlock`, `hand work`…). */
  machine: string;
}

/**
 * One person on the line. `efficiency[machineType]` is their pace on that machine type (1.0 = standard
 * minutes, 0.8 = 25 % slower); a machine type missing (or ≤ 0) means they cannot run it. Person p on
 * operation o needs `o.minutes / efficiency[o.machine]` minutes per garment.
 */
export interface StaffPerson {
  id: string;
  efficiency: Record<string, number>;
}

/** The owner's fixed choice: `person` works on `operation`. */
export interface StaffPin {
  person: string;
  operation: string;
  /** Exact share of the operation (0 < share ≤ 1); default: whatever share is best, at least {@link PIN_MIN_SHARE}. */
  share?: number;
}

/** The loaded HiGHS runtime (`await import('highs').then((m) => m.default())`), see {@link loadLineSolver}. */
export type LineSolver = import('highs').Highs;

/** Input to {@link staffLine}. */
export interface StaffLineInput {
  operations: StaffOperation[];
  people: StaffPerson[];
  /** Machines the studio has, by type; a type not listed is taken as unlimited, a count of 0 as none. */
  machines?: Record<string, number>;
  /** Most operations one person may work on (a whole number ≥ 1); default unlimited. */
  maxOperationsPerPerson?: number;
  /** Working minutes in a day, for garments per day. */
  minutesPerDay: number;
  pins?: StaffPin[];
  /** Wall-clock limit of the solve; past it the best plan found is returned with its gap. Default 10 s. */
  timeLimitSeconds?: number;
}

/** One person's share of one operation (0 < share ≤ 1). */
export interface StaffAssignment {
  person: string;
  operation: string;
  share: number;
}

/** A person's minutes per garment against the cycle. */
export interface StaffLoad {
  person: string;
  /** Σ share × minutes ÷ efficiency over the person's operations. */
  minutes: number;
  /** Cycle − minutes. */
  idle: number;
  operations: string[];
}

/** `exact`: HiGHS proved the plan optimal (relative gap ≤ 1e-6); `time-limit`: the time limit stopped the search. */
export type StaffMethod = 'exact' | 'time-limit';

/** Result of {@link staffLine}. */
export interface StaffedLine {
  /** Minutes per garment at the busiest person: the line's cycle time, computed from the returned shares. */
  cycleMinutes: number;
  /** minutesPerDay ÷ cycleMinutes (not rounded down; a day makes ⌊garmentsPerDay⌋ whole garments). */
  garmentsPerDay: number;
  /** Ordered by person then operation, both in input order. */
  assignments: StaffAssignment[];
  /** Every person in input order, idle people included with 0 minutes. */
  loads: StaffLoad[];
  /** Id of the busiest person (first in input order on ties). */
  bottleneck: string;
  /** Proven lower bound on the cycle (minutes). */
  lowerBound: number;
  method: StaffMethod;
  /** (cycleMinutes − lowerBound) ÷ cycleMinutes, 0 when proven optimal. */
  gap: number;
}
