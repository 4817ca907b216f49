import type { BalanceLineInput, LineTask } from './line-balancing.types';
import { buildTaskGraph, positionalWeights } from './task-graph';
import { rpwStations } from './rpw-heuristic';

/** Ranked positional weights by task id (own time + all transitive successors' times), same unit as the times. */
export function rankedPositionalWeights(tasks: LineTask[]): Record<string, number> {
  const g = buildTaskGraph(tasks);
  const w = positionalWeights(g);
  return Object.fromEntries(g.ids.map((id, k) => [id, w[k] / g.scale]));
}

/**
 * Ranked positional weight heuristic alone (labelled heuristic, not optimal in general): stations as
 * task-id lists in assignment order. Tie rule: higher weight, then lower task number (input position).
 * Needs `cycleTime`; throws RangeError without it or when a task exceeds it.
 */
export function balanceLineRpw(input: BalanceLineInput): string[][] {
  if (input.cycleTime === undefined) throw new RangeError('RPW needs a cycle time');
  const g = buildTaskGraph(input.tasks, [input.cycleTime]);
  const stations = rpwStations(g, {
    cycle: Math.round(input.cycleTime * g.scale),
    oneMachinePerStation: input.oneMachinePerStation ?? true,
    maxSkills: input.maxSkillsPerStation ?? Infinity,
  });
  return stations.map((st) => st.map((k) => g.ids[k]));
}
