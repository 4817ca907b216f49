import { beforeAll, describe, expect, it } from 'vitest';
import highsLoader from 'highs';
import GLPK from 'glpk.js/node';
import { mm, type Millimetres } from '@shared/units';
import { solveCutOrder, type MipSolver } from './solve-cut-order';
import { planCutOrder } from './plan-cut-order';
import type { CutCosts, CutOrderInput, CutOrderPlan } from './cut-order.types';
import { expectCovers } from './cut-order.testing';

let solver: MipSolver;
beforeAll(async () => {
  solver = await highsLoader();
});

const order = (sizes: string[], q: number[]) => Object.fromEntries(sizes.map((s, i) => [s, q[i]]));
const lengths = (sizes: string[], l: number[]): Record<string, Millimetres> => Object.fromEntries(sizes.map((s, i) => [s, mm(l[i])]));
const laysCost = (plan: CutOrderPlan, c: CutCosts, e: number) =>
  plan.lays.reduce((a, l) => a + l.plies * (((c.fabricCostPerMetre ?? 0) * (l.markerLength + e)) / 1000 + (c.plyCost ?? 0)) + (c.layCost ?? 0), 0);


describe('solveCutOrder: the case of issue 18', () => {
  // Issue 18 (recomputed outside the project): S 30 / M 50 / L 20, 1000 / 1100 / 1200 mm, 20 mm end
  // allowance, ≤ 3 garments and ≤ 20 plies: 3 lays with the least fabric, 109,680 mm. By hand: 100
  // garments need ≥ ⌈100 ÷ 3⌉ = 34 plies, so fabric ≥ 30·1000 + 50·1100 + 20·1200 + 34·20 = 109,680 mm,
  // and 34 plies need ≥ ⌈34 ÷ 20⌉ = 2 lays. Two lays of 34 plies cut at most 3·34 = 102 garments, so
  // exactly 100 needs one lay of 3 and one of 2 garments with 2 plies, leaving 32 > 20 plies for the
  // other: no 2-lay plan reaches that fabric, checked again by enumerating every pair of lays below.
  const input: CutOrderInput = {
    sizes: ['S', 'M', 'L'], quantities: { S: 30, M: 50, L: 20 }, garmentLength: lengths(['S', 'M', 'L'], [1000, 1100, 1200]),
    endAllowance: mm(20), maxGarmentsPerMarker: 3, maxPlies: 20,
  };
  it('proves 3 lays at 109,680 mm where the old search gave up with 4 lays', () => {
    const plan = solveCutOrder(input, solver);
    expectCovers(input, plan);
    expect(plan.fabricUsed).toBe(109_680);
    expect(plan.lays).toHaveLength(3);
    expect(plan.method).toBe('exact');
    expect(plan.gap).toBe(0);
    expect(plan.markerLengths).toBe('estimated');
    expect(twoLayPlansAt(input, 109_680)).toBe(0);
    const old = planCutOrder(input);
    expect(old.method).toBe('heuristic'); // the branch and bound this solver replaces
  }, 30_000); // a million search nodes for the old search on a shared machine; not a speed check
});

/** Counts plans of one or two lays cutting exactly the quantities with at most `fabric` mm (independent of the solver). */
function twoLayPlansAt(input: CutOrderInput, fabric: number): number {
  const { sizes, maxPlies: H, maxGarmentsPerMarker: K } = input;
  const e = input.endAllowance ?? 20;
  const ratios: number[][] = [];
  const walk = (i: number, acc: number[], left: number) => {
    if (i === sizes.length) return void (acc.some((v) => v > 0) && ratios.push(acc));
    for (let c = 0; c <= left; c++) walk(i + 1, [...acc, c], left - c);
  };
  walk(0, [], K);
  const lays = ratios.flatMap((r) => Array.from({ length: H }, (_, k) => ({ r, p: k + 1, f: (k + 1) * (r.reduce((a, v, i) => a + v * input.garmentLength![sizes[i]], 0) + e) })));
  const q = sizes.map((s) => input.quantities[s] ?? 0);
  let found = 0;
  for (let a = 0; a < lays.length; a++) {
    for (let b = a; b <= lays.length; b++) {
      const two = b < lays.length ? [lays[a], lays[b]] : [lays[a]];
      const cut = q.map((_, i) => two.reduce((acc, l) => acc + l.p * l.r[i], 0));
      if (cut.every((c, i) => c === q[i]) && two.reduce((acc, l) => acc + l.f, 0) <= fabric) found++;
    }
  }
  return found;
}

describe('solveCutOrder: published cut plans', () => {
  // Scribd presentation 575728029 "Cutting plan" (after Carr & Latham, ch. 2, from memory) [quoted]:
  // the published plans reach the lay lower bound ⌈Σq ÷ (K·H)⌉.
  it('reaches 2 lays for C1 (260 garments, 50 plies, 4 per marker) and proves it', () => {
    const sizes = ['10', '12', '14', '16', '18'];
    const input = { sizes, quantities: order(sizes, [40, 90, 80, 25, 25]), maxPlies: 50, maxGarmentsPerMarker: 4, garmentLength: lengths(sizes, [1000, 1000, 1000, 1000, 1000]) };
    const plan = solveCutOrder(input, solver);
    expectCovers(input, plan);
    expect(plan.lays).toHaveLength(Math.ceil(260 / (4 * 50)));
    expect(plan.method).toBe('exact');
  });
  it('reaches 2 lays for C2 (440 garments, 60 plies, 4 per marker)', () => {
    const sizes = ['12', '14', '16', '18'];
    const input = { sizes, quantities: order(sizes, [100, 160, 120, 60]), maxPlies: 60, maxGarmentsPerMarker: 4, garmentLength: lengths(sizes, [1000, 1000, 1000, 1000]) };
    const plan = solveCutOrder(input, solver);
    expectCovers(input, plan);
    expect(plan.lays).toHaveLength(Math.ceil(440 / (4 * 60)));
    expect(plan.method).toBe('exact');
  });
  it('reaches 4 lays for C3 (S300 M600 L400, 75 plies, 5 per marker) at the fabric bound', () => {
    const sizes = ['S', 'M', 'L'];
    const input = { sizes, quantities: order(sizes, [300, 600, 400]), maxPlies: 75, maxGarmentsPerMarker: 5, garmentLength: lengths(sizes, [1000, 1000, 1000]) };
    const plan = solveCutOrder(input, solver);
    expectCovers(input, plan);
    expect(plan.lays).toHaveLength(4); // ⌈1300 ÷ 375⌉ = 4, reference §3.2
    expect(plan.fabricUsed).toBe(260 * (5000 + 20)); // 260 plies of 5 garments
    expect(plan.method).toBe('exact');
  });
  // Vilumsone-Nemes, Industrial Cutting of Textile Materials, Table 4.1, p. 33 [quoted]
  it('splits 114 garments at ≤ 30 plies into 30 + 30 + 30 + 24', () => {
    const plan = solveCutOrder({ sizes: ['A'], quantities: { A: 114 }, maxPlies: 30, maxGarmentsPerMarker: 1, garmentLength: { A: mm(1200) } }, solver);
    expect(plan.lays.map((l) => l.plies)).toEqual([30, 30, 30, 24]);
  });
});

describe('solveCutOrder: objective, markers and edge cases', () => {
  // One size, 31 garments, 2 per marker, 30 plies, 1 over-cut allowed. By hand: least fabric is 15 plies
  // of A2 + 1 ply of A1 = 15·2020 + 1020 = 31,320 mm in 2 lays; one lay of A2 × 16 (one over-cut) uses
  // 32,320 mm. At 100 per metre the extra metre costs 100, so a lay cost of 500 buys the single lay.
  const base: CutOrderInput = { sizes: ['A'], quantities: { A: 31 }, maxPlies: 30, maxGarmentsPerMarker: 2, garmentLength: { A: mm(1000) }, overcut: { A: 1 }, endAllowance: mm(20) };
  it('keeps the least fabric when no rates are given', () => {
    const plan = solveCutOrder(base, solver);
    expect(plan.fabricUsed).toBe(31_320);
    expect(plan.lays).toHaveLength(2);
  });
  it('spends a metre of fabric to save a lay when the lay costs more', () => {
    const plan = solveCutOrder({ ...base, costs: { fabricCostPerMetre: 100, layCost: 500 } }, solver);
    expect(plan.lays).toEqual([{ ratio: { A: 2 }, plies: 16, markerLength: 2000 }]);
    expect(plan.cost).toBeCloseTo(32.32 * 100 + 500, 6);
    expect(plan.method).toBe('exact');
  });
  it('keeps two lays when the lay costs less than the metre it would save', () => {
    const plan = solveCutOrder({ ...base, costs: { fabricCostPerMetre: 100, layCost: 50 } }, solver);
    expect(plan.fabricUsed).toBe(31_320);
    expect(plan.cost).toBeCloseTo(31.32 * 100 + 2 * 50, 6);
  });
  it('uses only measured markers and says so when markers are given', () => {
    const input: CutOrderInput = {
      sizes: ['S', 'M'], quantities: { S: 20, M: 20 }, maxPlies: 10, maxGarmentsPerMarker: 4,
      markers: [{ ratio: { S: 1, M: 1 }, length: mm(1700) }, { ratio: { S: 2, M: 2 }, length: mm(3300) }, { ratio: { S: 1 }, length: mm(900) }, { ratio: { M: 1 }, length: mm(950) }],
    };
    const plan = solveCutOrder(input, solver);
    expectCovers(input, plan);
    expect(plan.markerLengths).toBe('measured');
    expect(plan.lays).toEqual([{ ratio: { S: 2, M: 2 }, plies: 10, markerLength: 3300 }]);
  });
  it('refuses an order the measured markers cannot cut', () => {
    expect(() => solveCutOrder({ sizes: ['S', 'M'], quantities: { S: 3, M: 1 }, maxPlies: 10, maxGarmentsPerMarker: 2, markers: [{ ratio: { S: 1, M: 1 }, length: mm(1700) }] }, solver)).toThrow(RangeError);
  });
  it('returns no lays for an empty order', () => {
    const plan = solveCutOrder({ sizes: ['S'], quantities: { S: 0 }, maxPlies: 10, maxGarmentsPerMarker: 2, garmentLength: { S: mm(900) } }, solver);
    expect(plan.lays).toEqual([]);
    expect(plan.method).toBe('exact');
  });
  it('reports a positive gap whenever it does not claim exact, on a batch too big to prove in 0.3 s', () => {
    const sizes = ['XXS', 'XS', 'S', 'M', 'L', 'XL', 'XXL', '3XL'];
    const input: CutOrderInput = {
      sizes, quantities: order(sizes, [120, 260, 380, 420, 360, 260, 140, 60]), maxPlies: 40, maxGarmentsPerMarker: 6,
      garmentLength: lengths(sizes, [900, 950, 1000, 1050, 1100, 1150, 1200, 1250]), timeLimitSeconds: 0.3,
    };
    const plan = solveCutOrder(input, solver);
    expectCovers(input, plan);
    if (plan.method === 'exact') expect(plan.gap).toBe(0);
    else expect(plan.gap).toBeGreaterThan(0);
    expect(plan.fabricUsed).toBeGreaterThanOrEqual(plan.lowerBound);
  });
  it('rejects negative rates', () => {
    expect(() => solveCutOrder({ ...base, costs: { layCost: -1 } }, solver)).toThrow(RangeError);
  });
});

/**
 * Independent brute force: every multiset of lays (ratio, plies), in canonical order, that cuts between
 * the quantity and its over-cut limit. Returns the best (fabric, lays) lexicographically, or with costs
 * the least cost. Written here on purpose, sharing no code with the solver.
 */
function bruteForce(input: CutOrderInput, costs: CutCosts | null): { fabric: number; lays: number } | { cost: number } {
  const { sizes, maxPlies: H, maxGarmentsPerMarker: K } = input;
  const e = input.endAllowance ?? 20;
  const q = sizes.map((s) => input.quantities[s] ?? 0);
  const u = q.map((v, i) => v + (input.overcut?.[sizes[i]] ?? Math.floor((v * (input.overcutPercent ?? 0)) / 100 + 1e-9)));
  const ratios: number[][] = [];
  const walk = (i: number, acc: number[], left: number) => {
    if (i === sizes.length) return void (acc.some((v) => v > 0) && ratios.push(acc));
    for (let c = 0; c <= left; c++) walk(i + 1, [...acc, c], left - c);
  };
  walk(0, [], K);
  const spread = ratios.map((r) => r.reduce((a, v, i) => a + v * input.garmentLength![sizes[i]], 0) + e);
  let best = { fabric: Infinity, lays: Infinity, cost: Infinity };
  const go = (cut: number[], from: number, fromP: number, fabric: number, lays: number, cost: number) => {
    if (cut.every((c, i) => c >= q[i])) {
      if (costs ? cost < best.cost - 1e-9 : fabric < best.fabric || (fabric === best.fabric && lays < best.lays)) best = { fabric, lays, cost };
      return;
    }
    for (let j = from; j < ratios.length; j++) {
      for (let p = j === from ? fromP : 1; p <= H; p++) {
        const next = cut.map((c, i) => c + p * ratios[j][i]);
        if (next.some((c, i) => c > u[i])) break;
        const c = p * (((costs?.fabricCostPerMetre ?? 0) * spread[j]) / 1000 + (costs?.plyCost ?? 0)) + (costs?.layCost ?? 0);
        go(next, j, p, fabric + p * spread[j], lays + 1, cost + c);
      }
    }
  };
  go(q.map(() => 0), 0, 1, 0, 0, 0);
  return costs ? { cost: best.cost } : { fabric: best.fabric, lays: best.lays };
}

/** Small seeded generator (mulberry32) so the random cases are the same on every run. */
function rng(seed: number) {
  let a = seed >>> 0;
  return (lo: number, hi: number) => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    const r = ((t ^ (t >>> 14)) >>> 0) / 4294967296;
    return lo + Math.floor(r * (hi - lo + 1));
  };
}

describe('solveCutOrder: agrees with an independent brute force on small random cases', () => {
  const rand = rng(18_2026);
  const cases = Array.from({ length: 24 }, (_, k) => {
    const n = rand(1, 3);
    const sizes = ['S', 'M', 'L'].slice(0, n);
    const input: CutOrderInput = {
      sizes, quantities: order(sizes, sizes.map(() => rand(0, 7))), garmentLength: lengths(sizes, sizes.map(() => rand(5, 14) * 100)),
      maxGarmentsPerMarker: rand(1, 3), maxPlies: rand(1, 4), overcutPercent: [0, 0, 20, 50][rand(0, 3)], endAllowance: mm(rand(0, 3) * 10),
    };
    const costs = k % 2 === 1 ? { fabricCostPerMetre: rand(0, 400), layCost: rand(0, 600), plyCost: rand(0, 50) } : null;
    return { input, costs };
  });
  it.each(cases.map((c, i) => [i, c] as const))('finds the brute-force optimum in case %i', (_, { input, costs }) => {
    const plan = solveCutOrder({ ...input, ...(costs ? { costs } : {}) }, solver);
    const truth = bruteForce(input, costs);
    const allowed = Object.fromEntries(input.sizes.map((s) => [s, Math.floor(((input.quantities[s] ?? 0) * (input.overcutPercent ?? 0)) / 100 + 1e-9)]));
    expectCovers(input, plan, allowed);
    expect(plan.method).toBe('exact');
    if ('cost' in truth) expect(laysCost(plan, costs!, input.endAllowance ?? 20)).toBeCloseTo(truth.cost, 6);
    else expect({ fabric: plan.fabricUsed, lays: plan.lays.length }).toEqual(truth);
  });
});

describe('solveCutOrder: agrees with GLPK on medium cases', () => {
  // Independent solver (GLPK via glpk.js) on a different formulation: n[j,p] = lays of ratio j with
  // exactly p plies, so no aggregation or rounding cut is shared with the HiGHS model.
  const sizes = ['S', 'M', 'L', 'XL'];
  const medium: { input: CutOrderInput; costs: CutCosts }[] = [
    { input: { sizes, quantities: order(sizes, [13, 22, 17, 8]), garmentLength: lengths(sizes, [900, 1000, 1100, 1200]), maxGarmentsPerMarker: 3, maxPlies: 8, overcutPercent: 10, endAllowance: mm(20) }, costs: { fabricCostPerMetre: 350, layCost: 900, plyCost: 15 } },
    { input: { sizes, quantities: order(sizes, [9, 25, 14, 5]), garmentLength: lengths(sizes, [800, 950, 1050, 1150]), maxGarmentsPerMarker: 3, maxPlies: 6, endAllowance: mm(20) }, costs: { fabricCostPerMetre: 500, layCost: 2000, plyCost: 0 } },
  ];
  it.each(medium.map((c, i) => [i, c] as const))('matches the GLPK optimum in medium case %i', async (_, { input, costs }) => {
    const glpk = await GLPK();
    const e = input.endAllowance ?? 20;
    const q = sizes.map((s) => input.quantities[s]);
    const u = q.map((v) => v + Math.floor((v * (input.overcutPercent ?? 0)) / 100 + 1e-9));
    const ratios: number[][] = [];
    const walk = (i: number, acc: number[], left: number) => (i === sizes.length ? void (acc.some((v) => v > 0) && ratios.push(acc)) : [...Array(left + 1).keys()].forEach((c) => walk(i + 1, [...acc, c], left - c)));
    walk(0, [], input.maxGarmentsPerMarker);
    const vars: { name: string; j: number; p: number; cost: number }[] = [];
    ratios.forEach((r, j) => {
      const spread = r.reduce((a, v, i) => a + v * input.garmentLength![sizes[i]], 0) + e;
      for (let p = 1; p <= input.maxPlies; p++) vars.push({ name: `n_${j}_${p}`, j, p, cost: p * ((costs.fabricCostPerMetre! * spread) / 1000 + costs.plyCost!) + costs.layCost! });
    });
    const result = glpk.solve({
      name: 'cut', objective: { direction: glpk.GLP_MIN, name: 'cost', vars: vars.map((v) => ({ name: v.name, coef: v.cost })) },
      subjectTo: sizes.map((s, i) => ({ name: `size_${s}`, vars: vars.filter((v) => ratios[v.j][i] > 0).map((v) => ({ name: v.name, coef: v.p * ratios[v.j][i] })), bnds: { type: q[i] === u[i] ? glpk.GLP_FX : glpk.GLP_DB, lb: q[i], ub: u[i] } })),
      generals: vars.map((v) => v.name),
    }, { msglev: glpk.GLP_MSG_OFF });
    expect(result.result.status).toBe(glpk.GLP_OPT);
    const plan = solveCutOrder({ ...input, costs }, solver);
    expect(plan.method).toBe('exact');
    expect(plan.cost).toBeCloseTo(result.result.z, 4);
  }, 30_000); // two solvers on a shared machine; not a speed check
});
