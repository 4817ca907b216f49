import { describe, expect, it } from 'vitest';
import { balanceLine } from './balance-line';
import { balanceLineRpw, rankedPositionalWeights } from './rpw-public';
import type { LineTask } from './line-balancing.types';

/** Builds tasks "1".."n" from times and direct precedences i→j. */
function graph(times: number[], arcs: [number, number][]): LineTask[] {
  return times.map((time, i) => ({
    id: String(i + 1),
    time,
    after: arcs.filter(([, j]) => j === i + 1).map(([p]) => String(p)),
  }));
}

// Scholl (1993), Data of Assembly Line Balancing Problems, TH Darmstadt; SALBP data sets 1993, MERTENS.IN2 /
// JACKSON.IN2 (assembly-line-balancing.de) [quoted]; optima [computed] (reference §2.3, agree with Scholl & Klein 1999).
const MERTENS = graph([1, 5, 4, 3, 5, 6, 5], [[1, 2], [1, 4], [2, 3], [2, 5], [4, 7], [5, 6]]);
const JACKSON = graph([6, 2, 5, 7, 1, 2, 3, 6, 5, 5, 4], [
  [1, 2], [1, 3], [1, 4], [1, 5], [2, 6], [3, 7], [4, 7], [5, 7], [6, 8], [7, 9], [8, 10], [9, 11], [10, 11],
]);
// Shady Magdy, "Assembly line balancing using Rank Positional Weight (RPW)", SlideShare (web article) [quoted]: E7.
const E7 = graph([20, 20, 45, 10, 7, 5, 8, 20, 15, 5, 4, 45, 6], [
  [1, 2], [2, 3], [3, 4], [2, 5], [5, 6], [5, 7], [5, 8], [5, 9], [5, 10],
  [6, 11], [7, 11], [8, 11], [9, 11], [10, 11], [11, 12], [4, 12], [12, 13],
]);

describe('balanceLine SALBP-1 on Scholl (1993) data', () => {
  it.each([[6, 6], [7, 5], [8, 5], [10, 3], [15, 2], [18, 2]])('Mertens c = %i → %i stations', (c, m) => {
    const r = balanceLine({ tasks: MERTENS, cycleTime: c });
    expect(r.count).toBe(m);
    expect(r.method).toBe('exact');
    r.stations.forEach((s) => expect(s.time).toBeLessThanOrEqual(c));
  });
  it.each([[7, 8], [9, 6], [10, 5], [13, 4], [14, 4], [21, 3]])('Jackson c = %i → %i stations', (c, m) => {
    const r = balanceLine({ tasks: JACKSON, cycleTime: c });
    expect(r.count).toBe(m);
    expect(r.method).toBe('exact');
  });
  it('respects precedence in every station sequence', () => {
    const r = balanceLine({ tasks: JACKSON, cycleTime: 10 });
    const stationOf = new Map(r.stations.flatMap((s, i) => s.tasks.map((t) => [t, i] as const)));
    JACKSON.forEach((t) => t.after.forEach((p) => expect(stationOf.get(p)!).toBeLessThanOrEqual(stationOf.get(t.id)!)));
  });
});

describe('balanceLine SALBP-2 (reference §2.3, computed)', () => {
  it.each([[2, 15], [3, 10], [4, 9], [5, 7], [6, 6]])('Mertens m = %i → c = %i', (m, c) => {
    const r = balanceLine({ tasks: MERTENS, stations: m });
    expect(r.cycleTime).toBe(c);
    expect(r.count).toBeLessThanOrEqual(m);
  });
  it.each([[2, 23], [3, 16], [4, 12], [5, 10], [6, 9]])('Jackson m = %i → c = %i', (m, c) => {
    expect(balanceLine({ tasks: JACKSON, stations: m }).cycleTime).toBe(c);
  });
  it('finds c = 54 for the 13-task example on 4 stations (computed; ⌈210/4⌉ = 53 unreachable)', () => {
    expect(balanceLine({ tasks: E7, stations: 4 }).cycleTime).toBe(54);
  });
});

describe('ranked positional weight', () => {
  it('reproduces the weights and the 4 stations of the 13-task worked example (Magdy, SlideShare) at c = 55', () => {
    const w = rankedPositionalWeights(E7);
    expect(E7.map((t) => w[t.id])).toEqual([210, 190, 106, 61, 115, 60, 63, 75, 70, 60, 55, 51, 6]);
    const st = balanceLineRpw({ tasks: E7, cycleTime: 55 });
    expect(st).toEqual([['1', '2', '5', '7'], ['3', '4'], ['8', '9', '6', '10', '11'], ['12', '13']]);
    const r = balanceLine({ tasks: E7, cycleTime: 55 });
    expect(r.count).toBe(4);
    expect(r.efficiency).toBeCloseTo(95.45, 2); // 210 / (4 · 55), computed
  });
  it('reproduces the Jackson and Mertens weights (reference §2.3, computed)', () => {
    const wj = rankedPositionalWeights(JACKSON);
    expect(JACKSON.map((t) => wj[t.id])).toEqual([46, 19, 17, 19, 13, 17, 12, 15, 9, 9, 4]);
    const wm = rankedPositionalWeights(MERTENS);
    expect(MERTENS.map((t) => wm[t.id])).toEqual([29, 20, 4, 8, 11, 6, 5]);
  });
  it('is not optimal on Jackson at c = 10: RPW 6 stations, exact 5', () => {
    const rpw = balanceLineRpw({ tasks: JACKSON, cycleTime: 10 });
    expect(rpw).toEqual([['1', '2', '6'], ['4', '5'], ['3', '7'], ['8'], ['9', '10'], ['11']]);
    expect(balanceLine({ tasks: JACKSON, cycleTime: 10 }).count).toBe(5);
  });
  it('labels the RPW plan when the node budget is too small to search', () => {
    const r = balanceLine({ tasks: JACKSON, cycleTime: 10, nodeBudget: 1 });
    expect(r.method).toBe('rpw');
    expect(r.count).toBe(6);
  });
});

describe('balance measures and side constraints', () => {
  // Scribd document 218871754, "Rpw Method" [quoted]: Σt 14.5, 4 stations, max station 4.6 → 78.8 %.
  it('computes balance efficiency from the largest station time (E8 arithmetic)', () => {
    const tasks = [3.4, 4.6, 3.5, 3.0].map((time, i) => ({ id: `s${i}`, time, after: [] }));
    const r = balanceLine({ tasks, cycleTime: 4.6 });
    expect(r.count).toBe(4);
    expect(r.efficiencyAtBottleneck).toBeCloseTo(78.8, 1);
    expect(r.bottleneck).toBe(r.stations.findIndex((s) => Math.abs(s.time - 4.6) < 1e-9));
  });
  it('handles decimal SAMs exactly', () => {
    const tasks = [0.219, 0.42, 0.799, 0.501].map((time, i) => ({ id: `o${i}`, time, after: i ? [`o${i - 1}`] : [] }));
    const r = balanceLine({ tasks, cycleTime: 0.8 });
    expect(r.count).toBe(3);
    expect(r.stations.reduce((a, s) => a + s.time, 0)).toBeCloseTo(1.939, 9);
  });
  it('keeps one machine type per station', () => {
    const tasks: LineTask[] = [
      { id: 'a', time: 1, after: [], machine: 'lockstitch' },
      { id: 'b', time: 1, after: [], machine: 'overlock' },
      { id: 'c', time: 1, after: [], machine: 'lockstitch' },
    ];
    const r = balanceLine({ tasks, cycleTime: 3 });
    expect(r.count).toBe(2);
    expect(balanceLine({ tasks, cycleTime: 3, oneMachinePerStation: false }).count).toBe(1);
  });
  it('limits skills per station', () => {
    const tasks: LineTask[] = ['x', 'y', 'z'].map((skill, i) => ({ id: String(i), time: 1, after: [], skill }));
    expect(balanceLine({ tasks, cycleTime: 10, maxSkillsPerStation: 2 }).count).toBe(2);
  });
  it('returns no stations for no tasks and rejects a task above the cycle time or a cycle', () => {
    expect(balanceLine({ tasks: [], cycleTime: 5 }).count).toBe(0);
    expect(() => balanceLine({ tasks: [{ id: 'a', time: 6, after: [] }], cycleTime: 5 })).toThrow(RangeError);
    expect(() => balanceLine({ tasks: [{ id: 'a', time: 1, after: ['b'] }, { id: 'b', time: 1, after: ['a'] }], cycleTime: 5 })).toThrow(RangeError);
  });
});
