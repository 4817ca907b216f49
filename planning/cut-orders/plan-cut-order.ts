import { mm, type Millimetres } from '@shared/units';
import type { CutOrderInput, CutOrderPlan, Lay, SizeRatio } from './cut-order.types';
import { countRatios, enumerateRatios, toSizeRatio, type RatioCandidate } from './ratio-candidates';
import { solveCoveringLp } from './lp-bound';
import { DEFAULT_END_ALLOWANCE_PER_PLY_MM } from './spreading-constants';

interface Step {
  j: number;
  plies: number;
}
interface Best {
  fabric: number;
  lays: number;
  steps: Step[];
}

const TOL = 1e-6;
const DEFAULT_NODE_BUDGET = 1_000_000;
const DEFAULT_MAX_CANDIDATES = 20_000;

/**
 * Plans lays (marker ratio × plies) that cut every size's quantity, at most its allowed over-cut
 * more, minimising fabric Σ (marker length + end allowance) × plies, then the number of lays.
 *
 * Method: candidate ratios (≤ maxGarmentsPerMarker garments, spread ≤ table) → LP relaxation for the
 * lower bound and dual prices → greedy incumbent → depth-first branch and bound over lays (lays in
 * canonical order, residual-demand memo, bounds: dual prices for fabric, ⌈Σd ÷ (K·H)⌉ for lays).
 * Returns `method: 'exact'` when the search finished or met the lower bound, else `'heuristic'`
 * (node budget, abort, or too many candidates for a full enumeration). Assumes the marker length
 * never shrinks when a garment is added. Empty order → no lays. Throws RangeError on non-integer or
 * negative counts, maxPlies/maxGarments < 1, or a size that does not fit the table alone.
 */
export function planCutOrder(input: CutOrderInput): CutOrderPlan {
  const { sizes, maxPlies: H, maxGarmentsPerMarker: K } = input;
  validateCutOrder(input);
  const e = input.endAllowance ?? DEFAULT_END_ALLOWANCE_PER_PLY_MM;
  const lengthOf = input.markerLength ?? defaultMarkerLength(input.garmentLength, sizes);
  const q = sizes.map((s) => input.quantities[s] ?? 0);
  const allow = sizes.map((s, i) => input.overcut?.[s] ?? Math.floor((q[i] * (input.overcutPercent ?? 0)) / 100 + TOL));
  const restricted = countRatios(sizes.length, K) > (input.maxCandidates ?? DEFAULT_MAX_CANDIDATES);
  const cands = enumerateRatios(sizes, K, restricted ? 3 : sizes.length, lengthOf, e, input.maxMarkerLength ?? Infinity);
  sizes.forEach((s, i) => {
    if (q[i] > 0 && !cands.some((c) => c.garments === 1 && c.counts[i] === 1))
      throw new RangeError(`size ${s} does not fit the cutting table alone`);
  });
  const total = q.reduce((a, b) => a + b, 0);
  const kEff = cands.reduce((m, c) => Math.max(m, c.garments), 1);
  const lp = solveCoveringLp(cands.map((c) => c.counts), cands.map((c) => c.spread), q);
  const layLB = (d: number[]): number => Math.ceil(d.reduce((a, b) => a + b, 0) / (kEff * H) - TOL);
  const fabLB = (d: number[]): number => d.reduce((acc, v, i) => acc + v * lp.duals[i], 0);

  const greedy = greedyPlan(cands, q, allow, H);
  let best: Best = greedy;
  let nodes = 0;
  let aborted = false;
  const budget = input.nodeBudget ?? DEFAULT_NODE_BUDGET;
  const memo = new Map<string, { f: number; l: number; j: number; p: number }>();
  const path: Step[] = [];
  const rootDone = (): boolean => best.fabric <= lp.value + TOL * Math.max(1, lp.value) && best.lays <= layLB(q);

  const dfs = (d: number[], u: number[], f: number, lastJ: number, lastP: number): void => {
    if (aborted) return;
    if (++nodes > budget || input.signal?.aborted) {
      aborted = true;
      return;
    }
    if (d.every((v) => v === 0)) {
      if (better(f, path.length, best)) best = { fabric: f, lays: path.length, steps: [...path] };
      return;
    }
    const lbF = f + fabLB(d);
    const lbL = path.length + layLB(d);
    if (lbF > best.fabric + TOL * best.fabric || (lbF > best.fabric - TOL * best.fabric && lbL >= best.lays)) return;
    const key = `${d.join(',')}|${u.join(',')}`;
    const seen = memo.get(key);
    if (seen && f >= seen.f - TOL && path.length >= seen.l && (lastJ > seen.j || (lastJ === seen.j && lastP <= seen.p))) return;
    memo.set(key, { f, l: path.length, j: lastJ, p: lastP });
    for (let j = Math.max(lastJ, 0); j < cands.length; j++) {
      const r = cands[j].counts;
      if (r.some((c, i) => c > 0 && d[i] === 0)) continue;
      let pmax = j === lastJ ? lastP : H;
      r.forEach((c, i) => c > 0 && (pmax = Math.min(pmax, Math.floor(u[i] / c))));
      for (let p = pmax; p >= 1; p--) {
        path.push({ j, plies: p });
        dfs(
          d.map((v, i) => Math.max(0, v - p * r[i])),
          u.map((v, i) => v - p * r[i]),
          f + p * cands[j].spread,
          j,
          p,
        );
        path.pop();
        if (aborted || rootDone()) return;
      }
    }
  };
  if (total > 0 && !rootDone()) dfs(q, q.map((v, i) => v + allow[i]), 0, -1, H);
  return buildPlan(input, cands, best, q, lp.value, layLB(q), aborted || restricted ? 'heuristic' : 'exact', nodes, e);
}

function better(f: number, l: number, best: Best): boolean {
  if (f < best.fabric - TOL * best.fabric) return true;
  return f <= best.fabric + TOL * best.fabric && l < best.lays;
}

/** Greedy incumbent: repeatedly the lay covering the most outstanding garments, then least fabric per garment. */
function greedyPlan(cands: RatioCandidate[], q: number[], allow: number[], H: number): Best {
  const d = [...q];
  const u = q.map((v, i) => v + allow[i]);
  const steps: Step[] = [];
  let fabric = 0;
  while (d.some((v) => v > 0)) {
    let pick: { j: number; p: number; covered: number; perGarment: number } | null = null;
    cands.forEach((c, j) => {
      if (c.counts.some((k, i) => k > 0 && d[i] === 0)) return;
      let p = H;
      c.counts.forEach((k, i) => k > 0 && (p = Math.min(p, Math.floor(u[i] / k))));
      if (p < 1) return;
      const covered = c.counts.reduce((acc, k, i) => acc + Math.min(k * p, d[i]), 0);
      const perGarment = (c.spread * p) / covered;
      if (!pick || covered > pick.covered || (covered === pick.covered && perGarment < pick.perGarment - TOL))
        pick = { j, p, covered, perGarment };
    });
    if (!pick) throw new RangeError('no feasible lay: check quantities and over-cut');
    const { j, p } = pick as { j: number; p: number };
    cands[j].counts.forEach((k, i) => {
      d[i] = Math.max(0, d[i] - k * p);
      u[i] -= k * p;
    });
    steps.push({ j, plies: p });
    fabric += p * cands[j].spread;
  }
  return { fabric, lays: steps.length, steps };
}

function buildPlan(
  input: CutOrderInput,
  cands: RatioCandidate[],
  best: Best,
  q: number[],
  lowerBound: number,
  layLowerBound: number,
  method: 'exact' | 'heuristic',
  nodes: number,
  e: Millimetres,
): CutOrderPlan {
  const { sizes } = input;
  const sorted = [...best.steps].sort((a, b) => b.plies - a.plies || a.j - b.j);
  const lays: Lay[] = sorted.map((s) => ({
    ratio: toSizeRatio(sizes, cands[s.j].counts),
    plies: s.plies,
    markerLength: mm(cands[s.j].length),
  }));
  const cut: Record<string, number> = {};
  const overcut: Record<string, number> = {};
  sizes.forEach((s, i) => {
    cut[s] = best.steps.reduce((acc, st) => acc + cands[st.j].counts[i] * st.plies, 0);
    overcut[s] = cut[s] - q[i];
  });
  // The dual bound carries ~1e-9 relative round-off: snap it to the plan when equal within tolerance.
  const near = Math.abs(best.fabric - lowerBound) <= TOL * Math.max(1, best.fabric);
  const lb = near ? best.fabric : Math.min(best.fabric, Math.floor(lowerBound * 1000 + 1e-3) / 1000);
  return {
    lays,
    fabricUsed: mm(best.fabric),
    lowerBound: mm(lb),
    gap: lb > 0 ? (best.fabric - lb) / lb : 0,
    layLowerBound,
    overcut,
    cut,
    method,
    nodes,
    endAllowance: e,
  };
}

/** Marker length of a ratio as the sum of its garments' lengths (checked for every size of the run). */
export function defaultMarkerLength(garmentLength: Record<string, Millimetres> | undefined, sizes: string[], missing = 'give garmentLength or a markerLength callback') {
  if (!garmentLength) throw new RangeError(missing);
  sizes.forEach((s) => {
    if (!(garmentLength[s] > 0)) throw new RangeError(`garmentLength missing for size ${s}`);
  });
  return (ratio: SizeRatio): Millimetres => mm(Object.entries(ratio).reduce((acc, [s, n]) => acc + n * garmentLength[s], 0));
}

/** RangeError for an order the cores cannot take (plies, garments per marker, sizes, quantities, over-cut). */
export function validateCutOrder(input: CutOrderInput): void {
  const isCount = (v: number) => Number.isInteger(v) && v >= 0;
  if (!(Number.isInteger(input.maxPlies) && input.maxPlies >= 1)) throw new RangeError('maxPlies must be an integer ≥ 1');
  if (!(Number.isInteger(input.maxGarmentsPerMarker) && input.maxGarmentsPerMarker >= 1))
    throw new RangeError('maxGarmentsPerMarker must be an integer ≥ 1');
  if (new Set(input.sizes).size !== input.sizes.length) throw new RangeError('sizes must be distinct');
  input.sizes.forEach((s) => {
    if (!isCount(input.quantities[s] ?? 0)) throw new RangeError(`quantity for ${s} must be a non-negative integer`);
    if (input.overcut && !isCount(input.overcut[s] ?? 0)) throw new RangeError(`overcut for ${s} must be a non-negative integer`);
  });
}
