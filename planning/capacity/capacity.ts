/** Inputs for the capacity of one section or line, per day. */
export interface CapacityInput {
  people: number;
  /** Working minutes per person per day. */
  minutesPerDay: number;
  /** Efficiency as a fraction (0.6 = 60 %). */
  efficiency: number;
  /** Absenteeism as a fraction (0.1 = 10 %), default 0. */
  absenteeism?: number;
}

/**
 * Available standard minutes per day = people × minutes × (1 − absenteeism) × efficiency
 * (onlineclothingstudy.com 2012/02, "Formula for calculating sewing room capacity", web article).
 */
export function capacityMinutes(input: CapacityInput): number {
  const { people, minutesPerDay, efficiency, absenteeism = 0 } = input;
  if (people < 0 || minutesPerDay < 0 || efficiency < 0 || absenteeism < 0 || absenteeism > 1)
    throw new RangeError('capacity inputs must be non-negative (absenteeism ≤ 1)');
  return people * minutesPerDay * (1 - absenteeism) * efficiency;
}

/** Whole pieces per day from capacity minutes and SAM, rounded down (a part piece is not output). */
export function piecesPerDay(capacity: number, sam: number): number {
  if (!(sam > 0)) throw new RangeError('SAM must be positive');
  return Math.floor(capacity / sam + 1e-9);
}

/** Sum of line capacities and whole pieces of one garment (floor capacity). */
export function floorCapacity(lines: CapacityInput[], sam: number): { minutes: number; pieces: number } {
  const minutes = lines.reduce((acc, l) => acc + capacityMinutes(l), 0);
  return { minutes, pieces: piecesPerDay(minutes, sam) };
}

/** Takt time = available working time ÷ demand (assemblymag.com, article 93267). Same unit as `available`. */
export function taktTime(available: number, demand: number): number {
  if (!(demand > 0)) throw new RangeError('demand must be positive');
  return available / demand;
}

/** Working days needed: ⌈load ÷ capacity per day⌉ (0 for no load). Throws when capacity ≤ 0 and load > 0. */
export function daysNeeded(loadMinutes: number, capacityPerDay: number): number {
  if (loadMinutes <= 0) return 0;
  if (!(capacityPerDay > 0)) throw new RangeError('no capacity for a positive load');
  return Math.ceil(loadMinutes / capacityPerDay - 1e-9);
}
