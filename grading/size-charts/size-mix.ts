import type { Millimetres } from '@shared/units/units';

/** One size of a run with its half-open body interval [fromMm, toMm) of the primary dimension (mm). */
export interface SizeInterval {
  size: string;
  fromMm: number;
  toMm: number;
}

/** Result of {@link sizeMix}: garments per size (run order), the body counts they came from, and how many
 * measurements fell outside the run and were assigned to the nearest end size. */
export interface SizeMixResult {
  counts: Record<string, number>;
  bodies: Record<string, number>;
  outsideRun: number;
}

/**
 * Split an order of `total` garments over a size run in proportion to how many measured bodies fall in each
 * interval. Largest-remainder (Hamilton) rounding, ties to the earlier size; then every size gets at least
 * `minPerSize`: sizes below the minimum are fixed at it and the rest is re-split over the others.
 * Throws RangeError when total < sizes × minPerSize, on an empty run or non-integer counts.
 * No measurements → an even split.
 */
export function sizeMix(measurements: readonly (Millimetres | number)[], run: readonly SizeInterval[], total: number, minPerSize = 0): SizeMixResult {
  if (run.length === 0) throw new RangeError('size run is empty');
  if (!Number.isInteger(total) || !Number.isInteger(minPerSize) || total < 0 || minPerSize < 0) throw new RangeError('counts must be non-negative integers');
  if (total < run.length * minPerSize) throw new RangeError(`${total} garments cannot give ${minPerSize} to each of ${run.length} sizes`);
  const bodies = run.map(() => 0);
  let outsideRun = 0;
  for (const m of measurements) {
    let i = run.findIndex((s) => m >= s.fromMm && m < s.toMm);
    if (i < 0) {
      outsideRun++;
      i = m < run[0].fromMm ? 0 : run.length - 1;
    }
    bodies[i]++;
  }
  const weights = measurements.length ? bodies : run.map(() => 1);
  const counts = splitWithMinimum(weights, total, minPerSize);
  return {
    counts: Object.fromEntries(run.map((s, i) => [s.size, counts[i]])),
    bodies: Object.fromEntries(run.map((s, i) => [s.size, bodies[i]])),
    outsideRun,
  };
}

function splitWithMinimum(weights: number[], total: number, min: number): number[] {
  const fixed = new Set<number>();
  for (;;) {
    const free = weights.map((_, i) => i).filter((i) => !fixed.has(i));
    const remaining = total - fixed.size * min;
    const shares = largestRemainder(free.map((i) => weights[i]), remaining);
    const result = weights.map(() => min);
    free.forEach((i, k) => (result[i] = shares[k]));
    const below = free.filter((i) => result[i] < min);
    if (below.length === 0) return result;
    below.forEach((i) => fixed.add(i));
  }
}

/** Hamilton apportionment; zero total weight splits evenly. */
function largestRemainder(weights: number[], total: number): number[] {
  if (weights.length === 0) return [];
  const sum = weights.reduce((a, b) => a + b, 0);
  const w = sum > 0 ? weights : weights.map(() => 1);
  const s = sum > 0 ? sum : weights.length;
  const quotas = w.map((x) => (x * total) / s);
  const base = quotas.map(Math.floor);
  let left = total - base.reduce((a, b) => a + b, 0);
  const order = quotas.map((q, i) => ({ i, r: q - Math.floor(q) })).sort((a, b) => b.r - a.r || a.i - b.i);
  for (const { i } of order) {
    if (left-- <= 0) break;
    base[i]++;
  }
  return base;
}
