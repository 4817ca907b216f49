import type { LineTask } from './line-balancing.types';

/** Tasks renumbered in a stable topological order, times scaled to integers. */
export interface TaskGraph {
  ids: string[];
  /** Input position of each task (the "task number" for tie-breaks). */
  inputIndex: number[];
  /** Integer times (original × scale). */
  time: number[];
  scale: number;
  pred: bigint[];
  succ: number[][];
  machine: (string | undefined)[];
  skill: (string | undefined)[];
}

/** Smallest power of ten (≤ 10⁶) that makes every value an integer. */
export function integerScale(values: number[]): number {
  for (let s = 1; s <= 1e6; s *= 10) if (values.every((v) => Math.abs(v * s - Math.round(v * s)) < 1e-6)) return s;
  return 1e6;
}

/**
 * Builds the graph: validates ids, predecessors and times (> 0), rejects cycles (RangeError), and
 * orders tasks topologically, earliest input position first among ready tasks.
 */
export function buildTaskGraph(tasks: LineTask[], extraValues: number[] = []): TaskGraph {
  const pos = new Map<string, number>();
  tasks.forEach((t, i) => {
    if (pos.has(t.id)) throw new RangeError(`duplicate task id ${t.id}`);
    if (!(t.time > 0) || !Number.isFinite(t.time)) throw new RangeError(`task ${t.id} needs a positive time`);
    pos.set(t.id, i);
  });
  tasks.forEach((t) => t.after.forEach((p) => {
    if (!pos.has(p)) throw new RangeError(`task ${t.id} follows unknown task ${p}`);
  }));
  const indeg = tasks.map((t) => new Set(t.after).size);
  const order: number[] = [];
  const done = new Set<number>();
  while (order.length < tasks.length) {
    const next = tasks.findIndex((t, i) => !done.has(i) && indeg[i] === 0);
    if (next < 0) throw new RangeError('precedence graph has a cycle');
    done.add(next);
    order.push(next);
    tasks.forEach((t, i) => {
      if (new Set(t.after).has(tasks[next].id)) indeg[i] -= 1;
    });
  }
  const newIndex = new Map(order.map((orig, k) => [orig, k]));
  const scale = integerScale([...tasks.map((t) => t.time), ...extraValues]);
  const pred = order.map((orig) =>
    tasks[orig].after.reduce((m, p) => m | (1n << BigInt(newIndex.get(pos.get(p)!)!)), 0n),
  );
  const succ = order.map(() => [] as number[]);
  order.forEach((orig, k) => tasks[orig].after.forEach((p) => {
    const pk = newIndex.get(pos.get(p)!)!;
    if (!succ[pk].includes(k)) succ[pk].push(k);
  }));
  return {
    ids: order.map((o) => tasks[o].id),
    inputIndex: order,
    time: order.map((o) => Math.round(tasks[o].time * scale)),
    scale,
    pred,
    succ,
    machine: order.map((o) => tasks[o].machine),
    skill: order.map((o) => tasks[o].skill),
  };
}

/** Ranked positional weight of each task: own time + times of all transitive successors (scaled units). */
export function positionalWeights(g: TaskGraph): number[] {
  const n = g.ids.length;
  const below: bigint[] = new Array(n).fill(0n);
  for (let k = n - 1; k >= 0; k--) for (const s of g.succ[k]) below[k] |= below[s] | (1n << BigInt(s));
  return below.map((mask, k) => g.time[k] + g.time.reduce((acc, t, j) => ((mask >> BigInt(j)) & 1n ? acc + t : acc), 0));
}
