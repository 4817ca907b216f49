import type { TaskGraph } from './task-graph';
import { addToStation, emptyStation, fitsStation, type StationRules, type StationState } from './station-rules';

/** Outcome of one SALBP-1 search. */
export interface Salbp1Result {
  /** Best stations found (graph indices), or null when none beat `upperBound`. */
  stations: number[][] | null;
  /** True when the search finished: the result is optimal (or proves nothing beats `upperBound`). */
  complete: boolean;
  nodes: number;
}

/**
 * Station-oriented branch and bound for SALBP-1: stations are filled one at a time with maximal
 * loads only (Jackson's dominance rule), largest load first; bound LB1 = used + ⌈remaining time ÷ c⌉;
 * assigned-task sets already reached with no more stations are skipped (memo). Finds a solution with
 * fewer than `upperBound` stations, or proves none exists. Tasks must be topologically numbered.
 */
export function searchSalbp1(
  g: TaskGraph,
  rules: StationRules,
  upperBound: number,
  nodeBudget: number,
  signal?: AbortSignal,
): Salbp1Result {
  const n = g.ids.length;
  const all = (1n << BigInt(n)) - 1n;
  const totalTime = g.time.reduce((a, b) => a + b, 0);
  let bestCount = upperBound;
  let best: number[][] | null = null;
  let nodes = 0;
  let stopped = false;
  const seen = new Map<bigint, number>();
  const path: number[][] = [];

  const loads = (assigned: bigint): number[][] => {
    const out: { tasks: number[]; time: number }[] = [];
    const grow = (st: StationState, mask: bigint, tasks: number[], from: number): void => {
      let extended = false;
      for (let k = 0; k < n; k++) {
        const bit = 1n << BigInt(k);
        if ((mask & bit) || (g.pred[k] & mask) !== g.pred[k] || !fitsStation(g, st, k, rules)) continue;
        extended = true;
        if (k < from) continue; // reachable in increasing order only: avoids permutations
        grow(addToStation(g, st, k), mask | bit, [...tasks, k], k + 1);
      }
      if (!extended && tasks.length > 0) out.push({ tasks, time: st.time });
    };
    grow(emptyStation(), assigned, [], 0);
    return out.sort((a, b) => b.time - a.time).map((l) => l.tasks);
  };

  const dfs = (assigned: bigint, used: number, doneTime: number): void => {
    if (stopped) return;
    if (++nodes > nodeBudget || signal?.aborted) {
      stopped = true;
      return;
    }
    if (assigned === all) {
      if (used < bestCount) {
        bestCount = used;
        best = [...path];
      }
      return;
    }
    if (used + Math.ceil((totalTime - doneTime) / rules.cycle) >= bestCount) return;
    const prev = seen.get(assigned);
    if (prev !== undefined && prev <= used) return;
    seen.set(assigned, used);
    for (const load of loads(assigned)) {
      const mask = load.reduce((m, k) => m | (1n << BigInt(k)), assigned);
      path.push(load);
      dfs(mask, used + 1, doneTime + load.reduce((a, k) => a + g.time[k], 0));
      path.pop();
      if (stopped) return;
      if (bestCount <= Math.ceil(totalTime / rules.cycle)) return; // met the global bound
    }
  };
  dfs(0n, 0, 0);
  return { stations: best, complete: !stopped, nodes };
}
