import type { SizeRatio } from './cut-order.types';

/** A candidate marker: garments per size as a vector in size order, with its spread cost. */
export interface RatioCandidate {
  counts: number[];
  garments: number;
  /** Marker length, mm. */
  length: number;
  /** Marker length + end allowance per ply, mm. */
  spread: number;
}

/** Binomial coefficient C(n, k) as a float (only used to size the enumeration). */
function choose(n: number, k: number): number {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return r;
}

/** Number of non-empty ratios of at most `k` garments over `n` sizes: C(n + k, k) − 1. */
export function countRatios(n: number, k: number): number {
  return choose(n + k, k) - 1;
}

/** Converts a count vector to a {@link SizeRatio}, leaving out zero sizes. */
export function toSizeRatio(sizes: string[], counts: number[]): SizeRatio {
  const ratio: SizeRatio = {};
  counts.forEach((c, i) => {
    if (c > 0) ratio[sizes[i]] = c;
  });
  return ratio;
}

/**
 * Every ratio with 1..maxGarments garments (and at most `maxDistinct` sizes) whose spread fits the
 * table. Ordered by garments descending, then count vector descending (lexicographic in size order),
 * so a depth-first search tries full markers first. Deterministic.
 */
export function enumerateRatios(
  sizes: string[],
  maxGarments: number,
  maxDistinct: number,
  markerLength: (ratio: SizeRatio) => number,
  endAllowance: number,
  tableLength: number,
): RatioCandidate[] {
  const n = sizes.length;
  const out: RatioCandidate[] = [];
  const counts = new Array<number>(n).fill(0);
  const visit = (i: number, left: number, distinct: number): void => {
    if (i === n) {
      const garments = maxGarments - left;
      if (garments === 0) return;
      const length = markerLength(toSizeRatio(sizes, counts));
      if (length + endAllowance <= tableLength) {
        out.push({ counts: [...counts], garments, length, spread: length + endAllowance });
      }
      return;
    }
    for (let c = left; c >= 0; c--) {
      if (c > 0 && distinct >= maxDistinct) continue;
      counts[i] = c;
      visit(i + 1, left - c, distinct + (c > 0 ? 1 : 0));
    }
    counts[i] = 0;
  };
  visit(0, maxGarments, 0);
  out.sort((a, b) => b.garments - a.garments || compareDesc(a.counts, b.counts));
  return out;
}

function compareDesc(a: number[], b: number[]): number {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return b[i] - a[i];
  return 0;
}
