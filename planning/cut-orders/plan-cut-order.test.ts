import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { mm, type Millimetres } from '@shared/units';
import { planCutOrder } from './plan-cut-order';
import { countRatios } from './ratio-candidates';
import { DEFAULT_END_ALLOWANCE_PER_PLY_MM, END_ALLOWANCE_EACH_END_NON_ELASTIC_MM } from './spreading-constants';
import type { CutOrderInput } from './cut-order.types';
import { expectCovers } from './cut-order.testing';

const lengths = (sizes: string[], l = 1000): Record<string, Millimetres> =>
  Object.fromEntries(sizes.map((s) => [s, mm(l)]));
const order = (sizes: string[], q: number[]) => Object.fromEntries(sizes.map((s, i) => [s, q[i]]));
const lbLays = (total: number, k: number, h: number) => Math.ceil(total / (k * h));


describe('planCutOrder: published cut plans', () => {
  // Scribd presentation 575728029 "Cutting plan" (wording after Carr & Latham, ch. 2, from memory) [quoted]:
  // published plans reach the lay lower bound ⌈Σq ÷ (K·H)⌉.
  it('reaches 2 lays for C1 (260 garments, 50 plies, 4 per marker)', () => {
    const sizes = ['10', '12', '14', '16', '18'];
    const input = { sizes, quantities: order(sizes, [40, 90, 80, 25, 25]), maxPlies: 50, maxGarmentsPerMarker: 4, garmentLength: lengths(sizes) };
    const plan = planCutOrder(input);
    expectCovers(input, plan);
    expect(plan.layLowerBound).toBe(lbLays(260, 4, 50));
    expect(plan.lays).toHaveLength(2);
    expect(plan.method).toBe('exact');
  });
  it('reaches 2 lays for C2 (440 garments, 60 plies, 4 per marker)', () => {
    const sizes = ['12', '14', '16', '18'];
    const input = { sizes, quantities: order(sizes, [100, 160, 120, 60]), maxPlies: 60, maxGarmentsPerMarker: 4, garmentLength: lengths(sizes) };
    const plan = planCutOrder(input);
    expectCovers(input, plan);
    expect(plan.lays).toHaveLength(lbLays(440, 4, 60));
  });
  it('reaches 4 lays for C3 (S300 M600 L400, 75 plies, 5 per marker)', () => {
    const sizes = ['S', 'M', 'L'];
    const input = { sizes, quantities: order(sizes, [300, 600, 400]), maxPlies: 75, maxGarmentsPerMarker: 5, garmentLength: lengths(sizes) };
    const plan = planCutOrder(input);
    expectCovers(input, plan);
    expect(plan.lays).toHaveLength(4); // ⌈1300/375⌉ = 4; completion computed in the reference §3.2
    expect(plan.fabricUsed).toBe(plan.lowerBound); // 260 plies of 5 garments: fabric optimal
  });
  // Vilumsone-Nemes, Industrial Cutting of Textile Materials, Table 4.1, p. 33 [quoted]
  it('splits 114 garments at ≤ 30 plies into 30 + 30 + 30 + 24, and 25 into one spread', () => {
    const big = planCutOrder({ sizes: ['A'], quantities: { A: 114 }, maxPlies: 30, maxGarmentsPerMarker: 1, garmentLength: { A: mm(1200) } });
    expect(big.lays.map((l) => l.plies)).toEqual([30, 30, 30, 24]);
    expect(big.lays).toHaveLength(Math.ceil(114 / 30));
    const small = planCutOrder({ sizes: ['A'], quantities: { A: 25 }, maxPlies: 30, maxGarmentsPerMarker: 1, garmentLength: { A: mm(1200) } });
    expect(small.lays.map((l) => l.plies)).toEqual([25]);
  });
  // Jana (2008), StitchWorld, via Apparel Resources [quoted]: 10 / 6 / 3 markers of 3 / 2 / 1 garments from S, M, L
  it('counts candidate markers as C(n+k−1, k) per garment count', () => {
    expect(countRatios(3, 3) - countRatios(3, 2)).toBe(10);
    expect(countRatios(3, 2) - countRatios(3, 1)).toBe(6);
    expect(countRatios(3, 1)).toBe(3);
  });
});

describe('planCutOrder: constants, bounds and options', () => {
  it('defaults the end allowance to 2 × 1 cm (Vilumsone-Nemes §4.2.3, p. 31, non-elastic)', () => {
    expect(END_ALLOWANCE_EACH_END_NON_ELASTIC_MM).toBe(10);
    expect(DEFAULT_END_ALLOWANCE_PER_PLY_MM).toBe(20);
    const plan = planCutOrder({ sizes: ['A'], quantities: { A: 10 }, maxPlies: 10, maxGarmentsPerMarker: 1, garmentLength: { A: mm(1000) } });
    expect(plan.fabricUsed).toBe(10 * (1000 + 20));
  });
  it('keeps spreads within the table length', () => {
    const sizes = ['S', 'M', 'L'];
    const input = { sizes, quantities: order(sizes, [20, 40, 20]), maxPlies: 20, maxGarmentsPerMarker: 6, garmentLength: { S: mm(900), M: mm(1000), L: mm(1100) }, maxMarkerLength: mm(3100) };
    const plan = planCutOrder(input);
    expectCovers(input, plan);
    plan.lays.forEach((l) => expect(Object.values(l.ratio).reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(3));
  });
  it('uses an allowed over-cut when it saves a lay and reports it', () => {
    // 31 of one size at 30 plies: exact needs 2 lays; 2 garments in a marker with 1 over-cut: 16 plies, 1 lay.
    const plan = planCutOrder({ sizes: ['A'], quantities: { A: 31 }, maxPlies: 30, maxGarmentsPerMarker: 2, garmentLength: { A: mm(1000) }, overcut: { A: 1 }, endAllowance: mm(20) });
    expect(plan.cut.A).toBeLessThanOrEqual(32);
    expect(plan.overcut.A).toBe(plan.cut.A - 31);
  });
  it('takes the marker length from a callback (nesting engine)', () => {
    const calls: string[] = [];
    const plan = planCutOrder({
      sizes: ['S', 'M'], quantities: { S: 10, M: 10 }, maxPlies: 10, maxGarmentsPerMarker: 2,
      markerLength: (r) => { calls.push(JSON.stringify(r)); return mm(Object.values(r).reduce((a, b) => a + b, 0) === 2 ? 1800 : 1000); },
    });
    expect(calls.length).toBeGreaterThan(0);
    expect(plan.lays).toEqual([{ ratio: { S: 1, M: 1 }, plies: 10, markerLength: 1800 }]);
  });
  it('returns no lays for an empty order', () => {
    const plan = planCutOrder({ sizes: ['S'], quantities: { S: 0 }, maxPlies: 10, maxGarmentsPerMarker: 2, garmentLength: { S: mm(900) } });
    expect(plan.lays).toEqual([]);
    expect(plan.fabricUsed).toBe(0);
  });
  it('labels a plan heuristic when the node budget runs out, with a valid gap', () => {
    const sizes = ['S', 'M', 'L', 'XL'];
    const input = { sizes, quantities: order(sizes, [37, 81, 64, 23]), maxPlies: 30, maxGarmentsPerMarker: 4, garmentLength: lengths(sizes), nodeBudget: 100 };
    const plan = planCutOrder(input);
    expectCovers(input, plan);
    expect(plan.method).toBe('heuristic');
    expect(plan.gap).toBeGreaterThanOrEqual(0);
    expect(plan.fabricUsed).toBeGreaterThanOrEqual(plan.lowerBound);
  });
  it('rejects a size that does not fit the table alone', () => {
    expect(() => planCutOrder({ sizes: ['S'], quantities: { S: 1 }, maxPlies: 1, maxGarmentsPerMarker: 1, garmentLength: { S: mm(3000) }, maxMarkerLength: mm(2000) })).toThrow(RangeError);
  });
});

describe('planCutOrder: properties (fast-check)', () => {
  it('covers the quantities, respects plies, markers and table, and stays above the lower bound', () => {
    const sizes = ['S', 'M', 'L'];
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 0, max: 60 }), { minLength: 3, maxLength: 3 }),
        fc.integer({ min: 1, max: 25 }),
        fc.integer({ min: 1, max: 4 }),
        fc.array(fc.integer({ min: 500, max: 1500 }), { minLength: 3, maxLength: 3 }),
        fc.integer({ min: 0, max: 10 }),
        (q, maxPlies, k, len, over) => {
          const garmentLength = Object.fromEntries(sizes.map((s, i) => [s, mm(len[i])]));
          const input: CutOrderInput = { sizes, quantities: order(sizes, q), maxPlies, maxGarmentsPerMarker: k, garmentLength, overcutPercent: over, maxMarkerLength: mm(4000), nodeBudget: 3000 };
          const plan = planCutOrder(input);
          const allowed = Object.fromEntries(sizes.map((s, i) => [s, Math.floor((q[i] * over) / 100 + 1e-6)]));
          expectCovers(input, plan, allowed);
          expect(plan.fabricUsed + 1e-6).toBeGreaterThanOrEqual(plan.lowerBound);
          expect(plan.lays.length).toBeGreaterThanOrEqual(plan.layLowerBound);
        },
      ),
      { numRuns: 60, seed: 20240501 },
    );
  });
});
