import type { Highs, Model } from 'highs';
import { mm, type Millimetres } from '@shared/units';
import type { CutCosts, CutOrderInput, CutOrderPlan, Lay } from './cut-order.types';
import { countRatios, enumerateRatios, toSizeRatio, type RatioCandidate } from './ratio-candidates';
import { solveCoveringLp } from './lp-bound';
import { defaultMarkerLength, planCutOrder, validateCutOrder } from './plan-cut-order';
import { DEFAULT_END_ALLOWANCE_PER_PLY_MM } from './spreading-constants';

/** The part of a loaded HiGHS runtime the solve needs; the caller loads it (`await highsLoader()`), the core does no I/O. */
export type MipSolver = Pick<Highs, 'createModel' | 'infinity'>;

/** Default wall-clock budget for one plan, all solver runs together, in seconds. */
export const DEFAULT_CUT_TIME_LIMIT_SECONDS = 5;
/** Above this many candidate ratios, markers are limited to 3 sizes (the plan is then exact only if it meets the full bound). */
export const DEFAULT_MAX_MIP_CANDIDATES = 20_000;
/** Nodes the old branch and bound may spend to hand the solver a starting plan. */
const WARM_START_NODES = 5_000;
/** Share of the time limit the least-fabric pass may use; the fewest-lays pass gets the rest. */
const FABRIC_SHARE = 0.6;
const TOL = 1e-6;
const STATUS_OPTIMAL = 7;

interface Candidates {
  list: RatioCandidate[];
  restricted: boolean;
}

interface MipRun {
  optimal: boolean;
  /** Solver wall-clock seconds (HiGHS's own clock). */
  seconds: number;
  value: number;
  bound: number;
  plies: number[];
  lays: number[];
}

/**
 * Plans lays (marker ratio × plies) as a mixed-integer program solved by HiGHS: every size cut at least
 * its quantity and at most its allowed over-cut more, each lay 1..maxPlies plies of one marker of at most
 * maxGarmentsPerMarker garments whose spread fits the table.
 *
 * Objective. With `costs` (minor units): fabric cost (spread × plies × price per metre) + lay cost per lay
 * + ply cost per ply, so a little fabric buys one lay fewer when that is cheaper. Without: least fabric
 * Σ (marker length + end allowance) × plies, then fewest lays among the least-fabric plans (two solves, the
 * second bounded to the first's fabric).
 *
 * Formulation (chosen after measuring, see `npm run bench:cut`): candidate ratios j are enumerated; P_j =
 * plies spread with ratio j (all its lays together), L_j = lays with ratio j, both integer, with
 * L_j ≤ P_j ≤ maxPlies · L_j. Any such (P_j, L_j) splits into L_j lays of 1..maxPlies plies, so the
 * aggregation loses no plan while keeping one column pair per ratio (the lay-slot formulation with r·p
 * linearised by binary expansion had many more columns and an LP bound too weak to prove anything on
 * 8 sizes). Two rounding cuts make the bound tight: Σ P_j ≥ ⌈Σ q ÷ K⌉ and Σ L_j ≥ ⌈⌈Σ q ÷ K⌉ ÷ H⌉,
 * K = most garments in a candidate, H = maxPlies. The old branch and bound, on a small node budget,
 * gives the solver a starting plan. Up to {@link DEFAULT_MAX_MIP_CANDIDATES} ratios (8 sizes × 6 garments
 * = 3 002) all are enumerated; above, only ratios of ≤ 3 sizes, and the plan is called exact only when
 * it meets a bound valid for all ratios.
 *
 * Returns `method: 'exact'` only when HiGHS proved optimality with zero gap within the time limit,
 * else `'heuristic'` with `gap` = (plan − proven bound) ÷ bound of the objective being optimised (cost;
 * or fabric, and once fabric is proven least, lays). Marker lengths: `input.markers` (measured, only
 * those ratios) or else `markerLength`/`garmentLength` (estimates); never mixed. Empty order → no lays.
 * Throws RangeError on bad counts, a size that does not fit the table alone, or no feasible plan.
 */
export function solveCutOrder(input: CutOrderInput, solver: MipSolver): CutOrderPlan {
  const limit = input.timeLimitSeconds ?? DEFAULT_CUT_TIME_LIMIT_SECONDS;
  let spent = 0;
  const left = () => Math.max(0.05, limit - spent);
  const { sizes, maxPlies: H } = input;
  const e = input.endAllowance ?? DEFAULT_END_ALLOWANCE_PER_PLY_MM;
  const q = sizes.map((s) => input.quantities[s] ?? 0);
  const allow = sizes.map((s, i) => input.overcut?.[s] ?? Math.floor((q[i] * (input.overcutPercent ?? 0)) / 100 + TOL));
  const u = q.map((v, i) => v + allow[i]);
  validateCosts(input.costs);
  const cands = candidatesFor(input, e, u);
  const total = q.reduce((a, b) => a + b, 0);
  const base = { sizes, q, e, H, markerLengths: input.markers ? ('measured' as const) : ('estimated' as const) };
  if (total === 0) return emptyPlan(base);
  const kEff = cands.list.reduce((m, c) => Math.max(m, c.garments), 1);
  const pliesLB = Math.ceil(total / kEff - TOL);
  const layLB = Math.ceil(pliesLB / H - TOL);
  const lp = solveCoveringLp(cands.list.map((c) => c.counts), cands.list.map((c) => c.spread), q);
  const start = warmStart(input, cands.list, e, H);
  const model = { cands: cands.list, q, u, H, pliesLB, layLB, start };

  if (input.costs) {
    const price = costPerPly(input.costs, cands.list);
    const run = solveMip(solver, model, price, cands.list.map(() => input.costs!.layCost ?? 0), null, left());
    const globalBound = cands.restricted ? costBound(input.costs, input, e, pliesLB, layLB, q) : run.bound;
    const exact = run.optimal && (!cands.restricted || run.value <= globalBound * (1 + TOL));
    return buildPlan(base, cands.list, run, {
      fabricBound: Math.max(lp.value, 0), layBound: layLB, exact, gap: relGap(run.value, exact ? run.value : globalBound), cost: run.value,
    });
  }
  // Least fabric first, on at most 60 % of the budget so the fewest-lays pass always has time: when the
  // fabric is not proven least, the second pass still finds fewer lays among plans using no more fabric.
  const fabric = solveMip(solver, model, cands.list.map((c) => c.spread), cands.list.map(() => 0), null, Math.max(0.05, limit * FABRIC_SHARE));
  spent += fabric.seconds;
  const fabricBound = Math.max(lp.value, cands.restricted ? 0 : fabric.bound);
  const fabricExact = fabric.optimal && (!cands.restricted || fabric.value <= fabricBound * (1 + TOL));
  const cap = fabric.value + Math.max(TOL, fabric.value * 1e-9);
  const exactCut = exactCutModel(input, model, fabric, e);
  const fewest = exactCut
    ? solveMip(solver, { ...exactCut, start: fabric }, cands.list.map(() => 0), cands.list.map(() => 1), null, left())
    : solveMip(solver, { ...model, start: fabric }, cands.list.map(() => 0), cands.list.map(() => 1), cap, left());
  // The second pass's bound holds only among plans at the first pass's fabric, so it counts only once that fabric is proven least.
  const layBound = fabricExact ? Math.max(layLB, Math.ceil(fewest.bound - TOL)) : layLB;
  const exact = fabricExact && fewest.optimal;
  return buildPlan(base, cands.list, fewest, {
    fabricBound: exact ? Math.min(fabricBound, fabric.value) : fabricBound, layBound,
    exact, gap: fabricExact ? relGap(fewest.lays.reduce((a, b) => a + b, 0), layBound) : relGap(fabric.value, fabricBound),
  });
}

/**
 * With lengths that add up per garment (`garmentLength`), fabric = Σ length × cut + end allowance × plies.
 * When the least-fabric plan cuts exactly the quantities, and one garment of over-cut costs more fabric
 * than the end allowances of every ply it could save, the least-fabric plans are exactly those that cut
 * the quantities with no more plies: the fewest-lays pass then gets those two simple rows instead of one
 * dense fabric row, which the solver handles far better. Null when that does not hold.
 */
function exactCutModel(input: CutOrderInput, m: MipModel, fabric: MipRun, e: number): MipModel | null {
  if (input.markers || input.markerLength || !input.garmentLength) return null;
  const len = input.sizes.map((s) => input.garmentLength![s]);
  const cut = m.q.map((_, i) => fabric.plies.reduce((a, p, j) => a + p * m.cands[j].counts[i], 0));
  if (cut.some((c, i) => c !== m.q[i])) return null;
  const plies = fabric.plies.reduce((a, b) => a + b, 0);
  if (!(Math.min(...len) > e * (plies - m.pliesLB))) return null;
  return { ...m, u: m.q, pliesUB: e > 0 ? plies : undefined };
}

function validateCosts(costs: CutCosts | undefined): void {
  if (!costs) return;
  for (const [k, v] of Object.entries(costs)) if (v !== undefined && !(Number.isFinite(v) && v >= 0)) throw new RangeError(`${k} must be a number ≥ 0`);
}

function candidatesFor(input: CutOrderInput, e: Millimetres, u: number[]): Candidates {
  const { sizes, maxGarmentsPerMarker: K } = input;
  validateCutOrder(input);
  const table = input.maxMarkerLength ?? Infinity;
  const fits = (c: RatioCandidate) => c.counts.every((v, i) => v <= u[i]);
  if (input.markers) {
    const list = input.markers
      .map((m) => {
        const counts = sizes.map((s) => m.ratio[s] ?? 0);
        if (Object.keys(m.ratio).some((s) => !sizes.includes(s))) throw new RangeError('a measured marker holds a size outside the order');
        return { counts, garments: counts.reduce((a, b) => a + b, 0), length: m.length, spread: m.length + e };
      })
      .filter((c) => c.garments >= 1 && c.garments <= K && c.spread <= table && fits(c));
    return { list: dedupe(list), restricted: false };
  }
  const lengthOf = input.markerLength ?? garmentSum(input.garmentLength, sizes);
  const restricted = countRatios(sizes.length, K) > (input.maxCandidates ?? DEFAULT_MAX_MIP_CANDIDATES);
  const all = enumerateRatios(sizes, K, restricted ? 3 : sizes.length, lengthOf, e, table);
  sizes.forEach((s, i) => {
    if (u[i] > 0 && !all.some((c) => c.garments === 1 && c.counts[i] === 1)) throw new RangeError(`size ${s} does not fit the cutting table alone`);
  });
  return { list: all.filter(fits), restricted };
}

/** Keeps the shortest measured marker of each ratio, in the order given. */
function dedupe(list: RatioCandidate[]): RatioCandidate[] {
  const best = new Map<string, RatioCandidate>();
  for (const c of list) {
    const k = c.counts.join(',');
    const prev = best.get(k);
    if (!prev || c.length < prev.length) best.set(k, c);
  }
  return [...best.values()];
}

function costPerPly(costs: CutCosts, cands: RatioCandidate[]): number[] {
  return cands.map((c) => ((costs.fabricCostPerMetre ?? 0) * c.spread) / 1000 + (costs.plyCost ?? 0));
}

/**
 * A cost bound valid for every ratio, for a restricted enumeration: each part at its own least. Fabric
 * with additive lengths is Σ length × cut + end allowance × plies; with other lengths the cheapest spread
 * per garment bounds it.
 */
function costBound(costs: CutCosts, input: CutOrderInput, e: number, pliesLB: number, layLB: number, q: number[]): number {
  const perGarment = input.garmentLength && !input.markerLength ? input.sizes.map((s) => input.garmentLength![s]) : null;
  const fabric = perGarment ? q.reduce((a, v, i) => a + v * perGarment[i], 0) + e * pliesLB : 0;
  return ((costs.fabricCostPerMetre ?? 0) * fabric) / 1000 + (costs.plyCost ?? 0) * pliesLB + (costs.layCost ?? 0) * layLB;
}

function relGap(value: number, bound: number): number {
  if (!(bound > 0)) return value > 0 ? 1 : 0;
  return Math.max(0, (value - bound) / bound);
}

/** The old branch and bound's plan on a small node budget: a feasible start, never the proof. */
function warmStart(input: CutOrderInput, cands: RatioCandidate[], e: number, H: number): { plies: number[]; lays: number[] } | null {
  if (input.markers) return null;
  try {
    const plan = planCutOrder({ ...input, nodeBudget: WARM_START_NODES, signal: undefined, endAllowance: mm(e) });
    const index = new Map(cands.map((c, j) => [c.counts.join(','), j]));
    const plies = cands.map(() => 0);
    const lays = cands.map(() => 0);
    for (const l of plan.lays) {
      const j = index.get(input.sizes.map((s) => l.ratio[s] ?? 0).join(','));
      if (j === undefined || l.plies > H) return null;
      plies[j] += l.plies;
      lays[j] += 1;
    }
    return { plies, lays };
  } catch {
    return null;
  }
}

interface MipModel {
  cands: RatioCandidate[];
  q: number[];
  u: number[];
  H: number;
  pliesLB: number;
  /** Most plies in all, when the plan must not use more. */
  pliesUB?: number;
  layLB: number;
  start: { plies: number[]; lays: number[] } | null;
}

/**
 * One HiGHS run. Columns: P_0..P_{N−1} (plies per ratio), L_0..L_{N−1} (lays per ratio). Rows: one per
 * size (quantity..quantity + over-cut), P_j − H·L_j ≤ 0, P_j − L_j ≥ 0, the two rounding cuts, and, when
 * `fabricCap` is given, Σ spread_j P_j ≤ fabricCap.
 */
function solveMip(solver: MipSolver, m: MipModel, plyCost: number[], layCost: number[], fabricCap: number | null, seconds: number): MipRun {
  const { cands, q, u, H } = m;
  const n = q.length;
  const N = cands.length;
  const inf = solver.infinity;
  const rowsLower: number[] = [...q, ...cands.map(() => -inf), ...cands.map(() => 0), m.pliesLB, m.layLB];
  const rowsUpper: number[] = [...u, ...cands.map(() => 0), ...cands.map(() => inf), m.pliesUB ?? inf, inf];
  const capRow = fabricCap === null ? -1 : rowsLower.length;
  if (fabricCap !== null) {
    rowsLower.push(-inf);
    rowsUpper.push(fabricCap);
  }
  const starts = [0];
  const indices: number[] = [];
  const values: number[] = [];
  cands.forEach((c, j) => {
    c.counts.forEach((v, i) => {
      if (v > 0) {
        indices.push(i);
        values.push(v);
      }
    });
    indices.push(n + j, n + N + j, n + 2 * N);
    values.push(1, 1, 1);
    if (capRow >= 0) {
      indices.push(capRow);
      values.push(c.spread);
    }
    starts.push(indices.length);
  });
  cands.forEach((_, j) => {
    indices.push(n + j, n + N + j, n + 2 * N + 1);
    values.push(-H, -1, 1);
    starts.push(indices.length);
  });
  const ub = cands.map((c) => c.counts.reduce((b, v, i) => (v > 0 ? Math.min(b, Math.floor(u[i] / v)) : b), Infinity));
  const numRows = rowsLower.length;
  const model: Model = solver.createModel();
  try {
    model.passModel({
      numCols: 2 * N, numRows, colCost: [...plyCost, ...layCost], colLower: new Array<number>(2 * N).fill(0), colUpper: [...ub, ...ub],
      rowLower: rowsLower, rowUpper: rowsUpper, matrix: { format: 'csc', numRows, numCols: 2 * N, starts, indices, values },
      integrality: new Array<0 | 1>(2 * N).fill(1),
    });
    model.options.set({ time_limit: seconds, mip_rel_gap: 0, mip_abs_gap: 1e-6, output_flag: false, random_seed: 0 });
    if (m.start) model.setSolution({ colValue: [...m.start.plies, ...m.start.lays] });
    const status = model.run().modelStatus;
    const x = status === 8 ? null : model.getSolution().colValue;
    const plies = cands.map((_, j) => Math.round(x?.[j] ?? NaN));
    const lays = cands.map((_, j) => Math.round(x?.[N + j] ?? NaN));
    if (!x || !feasible(m, plies, lays, fabricCap)) {
      if (status === 8) throw new RangeError('no feasible plan: check quantities, over-cut and markers');
      if (!m.start) throw new RangeError('no plan found within the time limit');
      return { optimal: false, seconds: model.getRunTime(), value: objective(m.start, plyCost, layCost), bound: boundOf(model), ...m.start };
    }
    return { optimal: status === STATUS_OPTIMAL, seconds: model.getRunTime(), value: objective({ plies, lays }, plyCost, layCost), bound: boundOf(model), plies, lays };
  } finally {
    model.dispose();
  }
}

function boundOf(model: Model): number {
  const b = Number(model.info.get('mip_dual_bound'));
  return Number.isFinite(b) ? b : 0;
}

function objective(x: { plies: number[]; lays: number[] }, plyCost: number[], layCost: number[]): number {
  return x.plies.reduce((a, p, j) => a + p * plyCost[j] + x.lays[j] * layCost[j], 0);
}

/** Checks a rounded solver answer against the plan's own rules, so a tolerance slip never reaches the cutter. */
function feasible(m: MipModel, plies: number[], lays: number[], fabricCap: number | null): boolean {
  if (plies.some((p, j) => !(p >= 0) || !(lays[j] >= 0) || p > m.H * lays[j] || p < lays[j])) return false;
  const cut = m.q.map((_, i) => plies.reduce((a, p, j) => a + p * m.cands[j].counts[i], 0));
  if (cut.some((c, i) => c < m.q[i] || c > m.u[i])) return false;
  if (m.pliesUB !== undefined && plies.reduce((a, p) => a + p, 0) > m.pliesUB) return false;
  return fabricCap === null || plies.reduce((a, p, j) => a + p * m.cands[j].spread, 0) <= fabricCap + TOL;
}

interface PlanBase {
  sizes: string[];
  q: number[];
  e: Millimetres;
  H: number;
  markerLengths: 'measured' | 'estimated';
}

function buildPlan(
  base: PlanBase,
  cands: RatioCandidate[],
  run: { plies: number[]; lays: number[] },
  proof: { fabricBound: number; layBound: number; exact: boolean; gap: number; cost?: number },
): CutOrderPlan {
  const { sizes, q, e } = base;
  const lays: Lay[] = [];
  cands.forEach((c, j) => splitPlies(run.plies[j], run.lays[j], base.H).forEach((p) =>
    lays.push({ ratio: toSizeRatio(sizes, c.counts), plies: p, markerLength: mm(c.length) }),
  ));
  const order = new Map(cands.map((c, j) => [c.counts.join(','), j]));
  const idx = (l: Lay) => order.get(sizes.map((s) => l.ratio[s] ?? 0).join(','))!;
  lays.sort((a, b) => b.plies - a.plies || idx(a) - idx(b));
  const cut: Record<string, number> = {};
  const overcut: Record<string, number> = {};
  sizes.forEach((s, i) => {
    cut[s] = lays.reduce((a, l) => a + (l.ratio[s] ?? 0) * l.plies, 0);
    overcut[s] = cut[s] - q[i];
  });
  const fabricUsed = lays.reduce((a, l) => a + l.plies * (l.markerLength + e), 0);
  const lb = Math.min(fabricUsed, Math.floor(proof.fabricBound * 1000 + 1e-3) / 1000);
  return {
    lays, fabricUsed: mm(fabricUsed), lowerBound: mm(proof.exact && proof.cost === undefined ? fabricUsed : lb),
    gap: proof.exact ? 0 : proof.gap, layLowerBound: Math.min(proof.layBound, lays.length), overcut, cut,
    method: proof.exact ? 'exact' : 'heuristic', nodes: 0, endAllowance: e, markerLengths: base.markerLengths,
    ...(proof.cost === undefined ? {} : { cost: proof.cost }),
  };
}

/** P plies over L lays of 1..H plies: full lays first, the rest in the last (114 over 4 at 30: 30, 30, 30, 24). */
function splitPlies(P: number, L: number, H: number): number[] {
  const out: number[] = [];
  let rest = P;
  for (let k = L; k >= 1; k--) {
    const p = Math.min(H, rest - (k - 1));
    out.push(p);
    rest -= p;
  }
  return out;
}

function emptyPlan(base: PlanBase): CutOrderPlan {
  const zero = Object.fromEntries(base.sizes.map((s) => [s, 0]));
  return {
    lays: [], fabricUsed: mm(0), lowerBound: mm(0), gap: 0, layLowerBound: 0, overcut: zero, cut: { ...zero },
    method: 'exact', nodes: 0, endAllowance: base.e, markerLengths: base.markerLengths,
  };
}

const garmentSum = (garmentLength: Record<string, Millimetres> | undefined, sizes: string[]) =>
  defaultMarkerLength(garmentLength, sizes, 'give garmentLength, markers or a markerLength callback');
