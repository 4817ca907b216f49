import type { LineSolver, StaffLineInput } from './line-staffing.types';
import { buildStaffModel, num, type StaffPair } from './staffing-model';

/**
 * A feasible plan to start the MIP from, found with two LPs, or null. (1) The pooled LP: no cap and no machine
 * counts, but each scarce machine type's person-minutes ≤ count × C; its optimal vertex has at most
 * (operations + people) shares above 0, so it is nearly a plan already. (2) From it, each scarce type keeps the
 * `count` people with the most minutes on it and each person the `cap` operations with the most minutes; any
 * operation left without a person gets the least-loaded able person with a free slot. (3) The LP restricted to
 * those pairs: any of its solutions respects the cap and the machines, so it is a plan.
 * Returns the shares in `pairs` order and the machine types each person holds.
 */
export function lpStart(input: StaffLineInput, pairs: StaffPair[], solver: LineSolver): { shares: number[]; holds: Set<string>[] } | null {
  const free = { ...input, maxOperationsPerPerson: undefined, machines: undefined };
  const loose = pairs.map((pr) => ({ ...pr, y: null }));
  const scarce = Object.entries(input.machines ?? {}).filter(([type, count]) => new Set(pairs.filter((pr) => input.operations[pr.o].machine === type).map((pr) => pr.p)).size > count);
  const cuts = scarce.map(([type, count], i) => {
    const work = loose.filter((pr) => input.operations[pr.o].machine === type).map((pr) => `${num(pr.time)} ${pr.x}`);
    return ` a${i}: ${work.join(' + ')} - ${count} C <= 0`;
  });
  const guide = solveLp(buildStaffModel(free, loose, { symmetry: false, extraRows: cuts }).lp, loose, solver);
  if (!guide) return null;
  const cap = input.maxOperationsPerPerson ?? Infinity;
  const n = input.people.length;
  const minutes = (p: number, type: string) => loose.reduce((a, pr, i) => (pr.p === p && input.operations[pr.o].machine === type ? a + guide[i] * pr.time : a), 0);
  const limit = new Map(scarce);
  const holders = new Map<string, Set<number>>();
  for (const [type, count] of scarce) {
    const ranked = Array.from({ length: n }, (_, p) => ({ p, m: minutes(p, type) })).filter((r) => r.m > 0).sort((a, b) => b.m - a.m || a.p - b.p);
    holders.set(type, new Set(ranked.slice(0, count).map((r) => r.p)));
  }
  const pinned = new Set((input.pins ?? []).map((pin) => `${input.people.findIndex((pe) => pe.id === pin.person)}:${input.operations.findIndex((op) => op.id === pin.operation)}`));
  const canUse = (pr: StaffPair) => {
    const type = input.operations[pr.o].machine;
    const h = holders.get(type);
    return !limit.has(type) || h!.has(pr.p) || h!.size < limit.get(type)!;
  };
  const take = (pr: StaffPair) => {
    const type = input.operations[pr.o].machine;
    if (limit.has(type)) holders.get(type)!.add(pr.p);
  };
  const kept = new Set<number>();
  const slots = new Array<number>(n).fill(0);
  // Pins first, then the guide's largest shares in minutes.
  const order = loose.map((pr, i) => ({ i, pin: pinned.has(`${pr.p}:${pr.o}`), w: guide[i] * pr.time })).filter((r) => r.pin || r.w > 1e-9).sort((a, b) => Number(b.pin) - Number(a.pin) || b.w - a.w || a.i - b.i);
  for (const { i } of order) {
    const pr = loose[i];
    if (slots[pr.p] >= cap || !canUse(pr)) continue;
    kept.add(i);
    slots[pr.p]++;
    take(pr);
  }
  const load = new Array<number>(n).fill(0);
  for (const i of kept) load[loose[i].p] += guide[i] * loose[i].time;
  for (let o = 0; o < input.operations.length; o++) {
    if (loose.some((pr, i) => pr.o === o && kept.has(i))) continue;
    const options = loose.map((pr, i) => ({ pr, i })).filter(({ pr }) => pr.o === o && slots[pr.p] < cap && canUse(pr)).sort((a, b) => load[a.pr.p] - load[b.pr.p] || a.i - b.i);
    if (options.length === 0) return null;
    const { pr, i } = options[0];
    kept.add(i);
    slots[pr.p]++;
    take(pr);
    load[pr.p] += pr.time;
  }
  if ([...pinned].some((key) => !loose.some((pr, i) => kept.has(i) && `${pr.p}:${pr.o}` === key))) return null;
  let allowed: StaffPair[] = loose.filter((_, i) => kept.has(i));
  let restricted = solveLp(buildStaffModel(free, allowed, { symmetry: false }).lp, allowed, solver);
  if (!restricted) return null;
  const pinnedX = new Set(loose.filter((pr) => pinned.has(`${pr.p}:${pr.o}`)).map((pr) => pr.x));
  for (let round = 0; round < WIDEN_ROUNDS; round++) {
    const wider = widen(input, loose, allowed, restricted, pinnedX, cap, limit);
    if (!wider) break;
    const next = solveLp(buildStaffModel(free, wider, { symmetry: false }).lp, wider, solver);
    if (!next || cycleOf(n, wider, next) >= cycleOf(n, allowed, restricted) - 1e-9) break;
    allowed = wider;
    restricted = next;
  }
  const shares = new Array<number>(pairs.length).fill(0);
  const index = new Map(pairs.map((pr, i) => [pr.x, i]));
  allowed.forEach((pr, k) => (shares[index.get(pr.x)!] = restricted[k]));
  const holds = Array.from({ length: n }, () => new Set<string>());
  pairs.forEach((pr, i) => {
    if (shares[i] > 0) holds[pr.p].add(input.operations[pr.o].machine);
  });
  return { shares, holds };
}

const WIDEN_ROUNDS = 8;

function cycleOf(n: number, allowed: StaffPair[], shares: number[]): number {
  const load = new Array<number>(n).fill(0);
  allowed.forEach((pr, k) => (load[pr.p] += shares[k] * pr.time));
  return Math.max(...load);
}

/**
 * The next neighbourhood: keep the pairs in use (and pins), then give each person under the cycle, least loaded
 * first, their free slots on the operations of the busiest people, fastest first, within the machines. Any LP
 * solution on the result still keeps the cap and the machine counts. Null when nothing can be added.
 */
function widen(input: StaffLineInput, loose: StaffPair[], allowed: StaffPair[], shares: number[], pinnedX: Set<string>, cap: number, limit: Map<string, number>): StaffPair[] | null {
  const n = input.people.length;
  const load = new Array<number>(n).fill(0);
  allowed.forEach((pr, k) => (load[pr.p] += shares[k] * pr.time));
  const cycle = Math.max(...load);
  const used = allowed.filter((pr, k) => shares[k] > 1e-9 || pinnedX.has(pr.x));
  const slots = new Array<number>(n).fill(0);
  const holders = new Map<string, Set<number>>([...limit.keys()].map((t) => [t, new Set<number>()]));
  for (const pr of used) {
    slots[pr.p]++;
    holders.get(input.operations[pr.o].machine)?.add(pr.p);
  }
  const busy = new Set(allowed.filter((pr, k) => shares[k] > 1e-9 && load[pr.p] >= cycle - 1e-9).map((pr) => pr.o));
  const have = new Set(used.map((pr) => pr.x));
  const added: StaffPair[] = [];
  const order = Array.from({ length: n }, (_, p) => p).sort((a, b) => load[a] - load[b] || a - b);
  for (const p of order) {
    if (load[p] >= cycle - 1e-9) continue;
    const options = loose.filter((pr) => pr.p === p && busy.has(pr.o) && !have.has(pr.x)).sort((a, b) => a.time - b.time || a.o - b.o);
    for (const pr of options) {
      if (slots[p] >= cap) break;
      const type = input.operations[pr.o].machine;
      const h = holders.get(type);
      if (h && !h.has(p) && h.size >= limit.get(type)!) continue;
      h?.add(p);
      slots[p]++;
      have.add(pr.x);
      added.push(pr);
    }
  }
  return added.length ? [...used, ...added] : null;
}

function solveLp(lp: string, pairs: StaffPair[], solver: LineSolver): number[] | null {
  const model = solver.createModel({ format: 'lp', data: lp });
  try {
    model.options.set({ output_flag: false, solver: 'simplex' });
    const { modelStatus } = model.run();
    if (modelStatus !== solver.constants.modelStatus.optimal) return null;
    const col = model.getSolution().colValue;
    return pairs.map((pr) => col[model.getColByName(pr.x)]);
  } finally {
    model.dispose();
  }
}
