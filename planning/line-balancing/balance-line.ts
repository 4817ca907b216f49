import type { BalanceLineInput, BalanceMethod, LineBalance } from './line-balancing.types';
import { buildTaskGraph, type TaskGraph } from './task-graph';
import { rpwStations } from './rpw-heuristic';
import { searchSalbp1 } from './salbp1-search';
import type { StationRules } from './station-rules';

const DEFAULT_NODE_BUDGET = 2_000_000;

/**
 * Balances a sewing line. With `cycleTime` (SALBP-1): fewest stations whose loads fit the cycle time.
 * With `stations` only (SALBP-2): smallest cycle time that fits in that many stations (binary search
 * over SALBP-1 solves). Exact branch and bound (see {@link searchSalbp1}), started from the ranked
 * positional weight plan; if the node budget or the signal stops it, the best plan found is returned
 * with `method` 'rpw' or 'partial-search'. Times are in one unit (e.g. minutes); decimals are handled
 * exactly by scaling to integers (≤ 6 decimals). Empty task list → zero stations. Throws RangeError
 * when neither target is given, a task exceeds the cycle time, or the graph is invalid.
 */
export function balanceLine(input: BalanceLineInput): LineBalance {
  const extra = input.cycleTime !== undefined ? [input.cycleTime] : [];
  const g = buildTaskGraph(input.tasks, extra);
  const budget = input.nodeBudget ?? DEFAULT_NODE_BUDGET;
  const rulesFor = (cycle: number): StationRules => ({
    cycle,
    oneMachinePerStation: input.oneMachinePerStation ?? true,
    maxSkills: input.maxSkillsPerStation ?? Infinity,
  });
  const total = g.time.reduce((a, b) => a + b, 0);
  if (input.cycleTime !== undefined) {
    const c = Math.round(input.cycleTime * g.scale);
    if (g.time.some((t) => t > c)) throw new RangeError('a task is longer than the cycle time');
    const { stations, method, nodes } = solveSalbp1(g, rulesFor(c), budget, input.signal);
    return summarise(g, 'salbp-1', c, stations, method, nodes, Math.ceil(total / c));
  }
  if (input.stations === undefined || !(Number.isInteger(input.stations) && input.stations >= 1))
    throw new RangeError('give cycleTime, or stations as an integer ≥ 1');
  const m = input.stations;
  const lb = Math.max(Math.max(0, ...g.time), Math.ceil(total / m));
  let lo = lb;
  let hi = Math.max(lb, total);
  let found: { stations: number[][]; method: BalanceMethod; cycle: number } | null = null;
  let nodes = 0;
  let allExact = true;
  while (lo <= hi) {
    const c = Math.floor((lo + hi) / 2);
    const r = solveSalbp1(g, rulesFor(c), budget, input.signal);
    nodes += r.nodes;
    if (r.stations.length <= m) {
      found = { stations: r.stations, method: r.method, cycle: c };
      hi = c - 1;
    } else {
      if (r.method !== 'exact') allExact = false;
      lo = c + 1;
    }
  }
  if (!found) throw new RangeError('no feasible balance for the given stations');
  const used = Math.max(...found.stations.map((s) => s.reduce((a, k) => a + g.time[k], 0)), 0);
  const method: BalanceMethod = allExact ? 'exact' : found.method === 'exact' ? 'partial-search' : found.method;
  return summarise(g, 'salbp-2', used, found.stations, method, nodes, Math.max(Math.max(0, ...g.time), total / m));
}

function solveSalbp1(g: TaskGraph, rules: StationRules, budget: number, signal?: AbortSignal) {
  if (g.ids.length === 0) return { stations: [] as number[][], method: 'exact' as BalanceMethod, nodes: 0 };
  const rpw = rpwStations(g, rules);
  const lb = Math.ceil(g.time.reduce((a, b) => a + b, 0) / rules.cycle);
  if (rpw.length <= lb) return { stations: rpw, method: 'exact' as BalanceMethod, nodes: 0 };
  const r = searchSalbp1(g, rules, rpw.length, budget, signal);
  const stations = r.stations ?? rpw;
  const method: BalanceMethod = r.complete ? 'exact' : r.stations ? 'partial-search' : 'rpw';
  return { stations, method, nodes: r.nodes };
}

function summarise(
  g: TaskGraph,
  problem: 'salbp-1' | 'salbp-2',
  cycleScaled: number,
  stations: number[][],
  method: BalanceMethod,
  nodes: number,
  lowerBoundScaled: number,
): LineBalance {
  const s = g.scale;
  const times = stations.map((st) => st.reduce((a, k) => a + g.time[k], 0));
  const total = times.reduce((a, b) => a + b, 0);
  const maxT = Math.max(0, ...times);
  const m = stations.length;
  const efficiency = m > 0 && cycleScaled > 0 ? (total / (m * cycleScaled)) * 100 : 0;
  return {
    problem,
    cycleTime: cycleScaled / s,
    stations: stations.map((st, i) => ({
      tasks: [...st].sort((a, b) => a - b).map((k) => g.ids[k]),
      time: times[i] / s,
      idle: (cycleScaled - times[i]) / s,
    })),
    count: m,
    efficiency,
    efficiencyAtBottleneck: m > 0 ? (total / (m * maxT)) * 100 : 0,
    balanceDelay: m > 0 ? 100 - efficiency : 0,
    smoothnessIndex: Math.sqrt(times.reduce((acc, t) => acc + (maxT - t) ** 2, 0)) / s,
    bottleneck: m > 0 ? times.indexOf(maxT) : -1,
    lowerBound: lowerBoundScaled / s,
    method,
    nodes,
  };
}
