import type { TaskGraph } from './task-graph';
import { positionalWeights } from './task-graph';
import { addToStation, emptyStation, fitsStation, type StationRules } from './station-rules';

/**
 * Ranked positional weight heuristic (Helgeson & Birnie 1961): tasks by weight descending, ties by
 * lower task number (input position); open a station, repeatedly add the highest-ranked task whose
 * predecessors are all assigned and that still fits, close it when nothing fits. Returns stations as
 * lists of graph indices. Throws RangeError when a task cannot fit an empty station.
 */
export function rpwStations(g: TaskGraph, rules: StationRules): number[][] {
  const w = positionalWeights(g);
  const rank = g.ids.map((_, k) => k).sort((a, b) => w[b] - w[a] || g.inputIndex[a] - g.inputIndex[b]);
  let assigned = 0n;
  const stations: number[][] = [];
  let left = g.ids.length;
  while (left > 0) {
    let st = emptyStation();
    const tasks: number[] = [];
    for (;;) {
      const k = rank.find(
        (t) => !((assigned >> BigInt(t)) & 1n) && (g.pred[t] & assigned) === g.pred[t] && fitsStation(g, st, t, rules),
      );
      if (k === undefined) break;
      st = addToStation(g, st, k);
      tasks.push(k);
      assigned |= 1n << BigInt(k);
      left -= 1;
    }
    if (tasks.length === 0) throw new RangeError('a task does not fit an empty station (time above the cycle time?)');
    stations.push(tasks);
  }
  return stations;
}
