import type { LineSolver, StaffAssignment, StaffLineInput, StaffLoad, StaffedLine } from './line-staffing.types';
import { greedyStart } from './greedy-start';
import { lpStart } from './lp-start';
import { buildStaffModel, staffPairs, type StaffPair } from './staffing-model';

/** Default wall-clock limit of one solve, seconds. */
export const DEFAULT_STAFF_TIME_LIMIT_S = 10;
/** Relative gap at which HiGHS stops and the plan counts as proven optimal. */
export const STAFF_MIP_REL_GAP = 1e-6;
/** Shares below this are solver noise (HiGHS's feasibility tolerance is 1e-7 on a share of 1) and dropped. */
export const SHARE_EPSILON = 1e-6;

/** Loads the HiGHS WebAssembly runtime once; pass the result to {@link staffLine}. */
export async function loadLineSolver(): Promise<LineSolver> {
  const { default: loadHighs } = await import('highs');
  return loadHighs();
}

/**
 * Staffs a sewing line for the most garments per day: shares of each operation go to the people able to run its
 * machine type so that the busiest person's minutes per garment (the cycle) is as small as possible. An operation
 * may be shared by several people and a person may run several operations and machine types, within
 * `maxOperationsPerPerson` and the studio's machine counts (a person holds one machine of each type they use).
 * Solved exactly as a mixed-integer program by HiGHS (see {@link buildStaffModel}); without a cap on operations
 * and without scarce machines the model is a plain LP. Precedence between operations is not a constraint: bundles
 * wait between people, as on a progressive bundle line.
 *
 * Minutes are per garment, `minutesPerDay` the working minutes of a day. Shares below {@link SHARE_EPSILON} are
 * dropped and each operation's shares rescaled to sum to exactly 1; the cycle is recomputed from the returned
 * shares. Throws RangeError naming the field for bad input (no operations, no people, duplicate ids, an operation
 * nobody can run, a pin that names an unknown person or operation) and when no plan fits the caps and machines.
 */
export function staffLine(input: StaffLineInput, solver: LineSolver): StaffedLine {
  validate(input);
  const pairs = staffPairs(input);
  const { lp, z } = buildStaffModel(input, pairs);
  const model = solver.createModel({ format: 'lp', data: lp });
  try {
    model.options.set({
      output_flag: false,
      time_limit: input.timeLimitSeconds ?? DEFAULT_STAFF_TIME_LIMIT_S,
      mip_rel_gap: STAFF_MIP_REL_GAP,
      random_seed: 0,
    });
    const start = bestStart(input, pairs, solver);
    if (start) {
      const entries = new Map<string, number>();
      const load = input.people.map(() => 0);
      pairs.forEach((pr, i) => {
        entries.set(pr.x, start.shares[i]);
        if (pr.y) entries.set(pr.y, start.shares[i] > 0 ? 1 : 0);
        load[pr.p] += start.shares[i] * pr.time;
      });
      for (const [key, name] of z) {
        const [p, type] = key.split(/:(.*)/s);
        entries.set(name, start.holds[Number(p)].has(type) ? 1 : 0);
      }
      entries.set('C', Math.max(...load));
      const cols = [...entries].map(([name, v]) => [model.getColByName(name), v] as const).sort((a, b) => a[0] - b[0]);
      model.setSolution({ indices: cols.map((c) => c[0]), values: cols.map((c) => c[1]) });
    }
    const { modelStatus } = model.run();
    const st = solver.constants.modelStatus;
    const hasSolution = Number(model.info.get('primal_solution_status')) === 2;
    if (modelStatus === st.infeasible) throw new RangeError('no plan fits: too few machines or too small a cap on operations per person');
    if (!hasSolution || (modelStatus !== st.optimal && modelStatus !== st.timeLimit))
      throw new RangeError(`no plan found within the time limit (solver status ${modelStatus})`);
    const colValue = model.getSolution().colValue;
    const value = (name: string) => colValue[model.getColByName(name)];
    const isMip = pairs.some((pr) => pr.y) || lp.includes('Binaries');
    const bound = isMip ? Number(model.info.get('mip_dual_bound')) : model.getObjectiveValue();
    const exact = modelStatus === st.optimal;
    return summarise(input, pairs, pairs.map((pr) => value(pr.x)), exact, bound);
  } finally {
    model.dispose();
  }
}

/** The better of the LP-guided start and the greedy one (smaller busiest load). */
function bestStart(input: StaffLineInput, pairs: StaffPair[], solver: LineSolver) {
  const cycle = (s: { shares: number[] } | null) => {
    if (!s) return Infinity;
    const load = input.people.map(() => 0);
    pairs.forEach((pr, i) => (load[pr.p] += s.shares[i] * pr.time));
    return Math.max(...load);
  };
  const a = lpStart(input, pairs, solver);
  const b = greedyStart(input, pairs, 0);
  return cycle(a) <= cycle(b) ? a : b;
}

function validate(input: StaffLineInput): void {
  if (input.operations.length === 0) throw new RangeError('operations: give at least one operation');
  if (input.people.length === 0) throw new RangeError('people: give at least one person');
  const seen = (ids: string[], field: string) => {
    const set = new Set<string>();
    ids.forEach((id, i) => {
      if (set.has(id)) throw new RangeError(`${field}[${i}].id: ${id} appears twice`);
      set.add(id);
    });
  };
  seen(input.operations.map((o) => o.id), 'operations');
  seen(input.people.map((p) => p.id), 'people');
  input.operations.forEach((o, i) => {
    if (!(o.minutes > 0 && Number.isFinite(o.minutes))) throw new RangeError(`operations[${i}].minutes: must be above 0`);
  });
  const cap = input.maxOperationsPerPerson;
  if (cap !== undefined && !(Number.isInteger(cap) && cap >= 1)) throw new RangeError('maxOperationsPerPerson: must be a whole number ≥ 1');
  if (cap !== undefined && cap * input.people.length < input.operations.length)
    throw new RangeError(`maxOperationsPerPerson: ${input.people.length} people × ${cap} cannot cover ${input.operations.length} operations`);
  if (!(input.minutesPerDay > 0)) throw new RangeError('minutesPerDay: must be above 0');
}

function summarise(input: StaffLineInput, pairs: StaffPair[], shares: number[], exact: boolean, bound: number): StaffedLine {
  const kept = pairs.map((pr, i) => ({ pr, share: shares[i] > SHARE_EPSILON ? shares[i] : 0 }));
  // Rescale each operation's shares to sum to exactly 1: the last one takes the remainder.
  const byOp = new Map<number, { pr: StaffPair; share: number }[]>();
  for (const k of kept) if (k.share > 0) byOp.set(k.pr.o, [...(byOp.get(k.pr.o) ?? []), k]);
  for (const list of byOp.values()) {
    const total = list.reduce((a, k) => a + k.share, 0);
    list.forEach((k) => (k.share /= total));
    list[list.length - 1].share = 1 - list.slice(0, -1).reduce((a, k) => a + k.share, 0);
  }
  const live = kept.filter((k) => k.share > 0).sort((a, b) => a.pr.p - b.pr.p || a.pr.o - b.pr.o);
  const assignments: StaffAssignment[] = live.map((k) => ({ person: input.people[k.pr.p].id, operation: input.operations[k.pr.o].id, share: k.share }));
  const minutes = input.people.map(() => 0);
  for (const k of live) minutes[k.pr.p] += k.share * k.pr.time;
  const cycle = Math.max(...minutes);
  const bottleneck = minutes.indexOf(cycle);
  const loads: StaffLoad[] = input.people.map((p, i) => ({
    person: p.id,
    minutes: minutes[i],
    idle: cycle - minutes[i],
    operations: live.filter((k) => k.pr.p === i).map((k) => input.operations[k.pr.o].id),
  }));
  const lowerBound = Math.min(cycle, Math.max(0, bound));
  const gap = exact ? 0 : (cycle - lowerBound) / cycle;
  return {
    cycleMinutes: cycle,
    garmentsPerDay: input.minutesPerDay / cycle,
    assignments,
    loads,
    bottleneck: input.people[bottleneck].id,
    lowerBound,
    method: exact ? 'exact' : 'time-limit',
    gap,
  };
}
