import { describe, expect, it } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const run = (script: string, input: unknown) => {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'seamrun-cli-')), 'in.json');
  writeFileSync(file, JSON.stringify(input));
  const tsx = path.join(root, 'node_modules/.bin/tsx');
  return JSON.parse(execFileSync(tsx, [path.join(root, 'server/cli', script), '--in', file, '--json'], { cwd: root, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] }));
};

/** Runs a CLI expected to refuse its input: exit code, stderr and stdout. */
const refuse = (script: string, input: unknown) => {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'seamrun-cli-')), 'in.json');
  writeFileSync(file, typeof input === 'string' ? input : JSON.stringify(input));
  const tsx = path.join(root, 'node_modules/.bin/tsx');
  const r = spawnSync(tsx, [path.join(root, 'server/cli', script), '--in', file, '--json'], { cwd: root, encoding: 'utf8' });
  return { status: r.status, stderr: r.stderr, stdout: r.stdout };
};

describe('planning CLIs (fixed JSON contracts)', () => {
  // Vilumsone-Nemes, Industrial Cutting of Textile Materials, Table 4.1, p. 33: 114 at ≤ 30 plies → 30+30+30+24
  it('plan:cut prints lays, fabric, bound, over-cut and rolls', () => {
    const out = run('plan-cut.cli.ts', {
      sizes: ['M'], quantities: { M: 114 }, maxPlies: 30, maxGarmentsPerMarker: 1, garmentLength: { M: 1200 },
      rolls: [{ id: 'R1', length: 100000, shadeLot: 'A' }, { id: 'R2', length: 50000, shadeLot: 'A' }],
    });
    expect(out.lays.map((l: { plies: number }) => l.plies)).toEqual([30, 30, 30, 24]);
    expect(out.fabricUsed).toBe(114 * 1220);
    expect(out.lowerBound).toBe(114 * 1220);
    expect(out.overcut).toEqual({ M: 0 });
    expect(out.rolls.reduce((a: number, r: { plies: number }) => a + r.plies, 0)).toBe(114);
  }, 60_000);
  // Issue 18, recomputed outside the project: S 30 / M 50 / L 20 at 1000 / 1100 / 1200 mm, 20 mm ends, ≤ 3
  // garments, ≤ 20 plies → 3 lays, 109,680 mm (34 plies × 20 mm + Σ garments, no 2-lay plan reaches it).
  it('plan:cut proves the least-fabric plan with fewest lays and says "exact"', () => {
    const out = run('plan-cut.cli.ts', {
      sizes: ['S', 'M', 'L'], quantities: { S: 30, M: 50, L: 20 }, maxPlies: 20, maxGarmentsPerMarker: 3, endAllowance: 20,
      garmentLength: { S: 1000, M: 1100, L: 1200 },
    });
    expect(out.fabricUsed).toBe(109_680);
    expect(out.lays).toHaveLength(3);
    expect(out.method).toBe('exact');
    expect(out.gap).toBe(0);
  }, 60_000);
  // By hand: 31 garments, 2 per marker, 1 over-cut allowed (4 %): least fabric is A2 × 15 + A1 × 1 =
  // 31,320 mm in 2 lays; A2 × 16 in one lay uses 32,320 mm. At 100 a metre the extra metre costs 100 < 500
  // for a lay, so the priced plan is one lay costing 3,232 + 500 = 3,732.
  it('plan:cut takes layCost, plyCost and fabricCostPerMetre and buys a lay fewer with a metre of fabric', () => {
    const base = { sizes: ['A'], quantities: { A: 31 }, maxPlies: 30, maxGarmentsPerMarker: 2, overcutPercent: 4, endAllowance: 20, garmentLength: { A: 1000 } };
    const plain = run('plan-cut.cli.ts', base);
    expect(plain.fabricUsed).toBe(31_320);
    expect(plain.lays).toHaveLength(2);
    expect(plain.cost).toBeUndefined();
    const priced = run('plan-cut.cli.ts', { ...base, fabricCostPerMetre: 100, layCost: 500, plyCost: 0 });
    expect(priced.lays).toEqual([{ ratio: { A: 2 }, plies: 16, markerLength: 2000 }]);
    expect(priced.cost).toBe(3_732);
    expect(priced.method).toBe('exact');
  }, 60_000);
  it('plan:cut refuses a negative lay cost, naming the field', () => {
    expect(() => run('plan-cut.cli.ts', { sizes: ['A'], quantities: { A: 3 }, maxPlies: 5, maxGarmentsPerMarker: 1, garmentLength: { A: 900 }, layCost: -5 })).toThrow(/layCost:/);
  }, 60_000);
  // Scholl (1993) JACKSON.IN2: c = 10 → 5 stations; m = 4 → c = 12 (computed, reference §2.3)
  it('plan:balance prints stations for a cycle time and the cycle time for stations', () => {
    const tasks = [6, 2, 5, 7, 1, 2, 3, 6, 5, 5, 4].map((time, i) => ({ id: String(i + 1), time, after: [] as string[] }));
    const arcs = [[1, 2], [1, 3], [1, 4], [1, 5], [2, 6], [3, 7], [4, 7], [5, 7], [6, 8], [7, 9], [8, 10], [9, 11], [10, 11]];
    arcs.forEach(([p, j]) => tasks[j - 1].after.push(String(p)));
    const a = run('plan-balance.cli.ts', { tasks, cycleTime: 10 });
    expect(a.count).toBe(5);
    expect(a.stations).toHaveLength(5);
    expect(a.efficiency).toBe(92);
    const b = run('plan-balance.cli.ts', { tasks, stations: 4 });
    expect(b.cycleTime).toBe(12);
  }, 60_000);

  // Same Scholl (1993) JACKSON.IN2 instance with the ids as numbers: c = 10 → 5 stations
  it('plan:balance accepts numeric task ids and prints them back as numbers', () => {
    const tasks = [6, 2, 5, 7, 1, 2, 3, 6, 5, 5, 4].map((time, i) => ({ id: i + 1, time, after: [] as number[] }));
    const arcs = [[1, 2], [1, 3], [1, 4], [1, 5], [2, 6], [3, 7], [4, 7], [5, 7], [6, 8], [7, 9], [8, 10], [9, 11], [10, 11]];
    arcs.forEach(([p, j]) => tasks[j - 1].after.push(p));
    const out = run('plan-balance.cli.ts', { tasks, cycleTime: 10 });
    expect(out.count).toBe(5);
    expect(out.stations.flat().sort((a: number, b: number) => a - b)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]);
  }, 60_000);

  it('plan:balance answers bad input with one line naming the field and exit code 2', () => {
    const cases: [unknown, string][] = [
      [{ tasks: [{ id: 'a', time: -1 }], cycleTime: 5 }, 'tasks[0].time'],
      [{ tasks: [{ id: 'a', time: 1, after: ['zz'] }], cycleTime: 5 }, 'tasks[0].after[0]'],
      [{ tasks: [{ id: 'a', time: 6 }], cycleTime: 5 }, 'tasks[0].time'],
      [{ tasks: [{ id: 'a', time: 1 }] }, 'cycleTime'],
      [{ tasks: [{ id: 'a', time: 1, after: ['b'] }, { id: 'b', time: 1, after: ['a'] }], cycleTime: 5 }, 'tasks'],
      ['{not json', '--in'],
    ];
    for (const [input, field] of cases) {
      const r = refuse('plan-balance.cli.ts', input);
      expect(r.status).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr.startsWith(`${field}:`)).toBe(true);
      expect(r.stderr).not.toMatch(/\bat .*\.ts:\d+/);
    }
  }, 120_000);

  // Pooling (common practice): with no caps, two able people split 6 minutes of work evenly → 3-minute cycle,
  // 480 ÷ 3 = 160 garments a day; checked from the contract (shares sum to 1, loads within the cycle).
  it('plan:line prints shares that sum to 1 per operation with every load within the cycle', () => {
    const input = {
      operations: [{ id: 'a', minutes: 2, machine: 'lockstitch' }, { id: 'b', minutes: 1, machine: 'overlock' }, { id: 'c', minutes: 3, machine: 'lockstitch' }],
      people: [{ id: 'Ann', efficiency: { lockstitch: 1, overlock: 1 } }, { id: 7, efficiency: { lockstitch: 1 } }],
      minutesPerDay: 480,
    };
    const out = run('plan-line.cli.ts', input);
    expect(Object.keys(out).sort()).toEqual(['assignments', 'cycleMinutes', 'gap', 'garmentsPerDay', 'method']);
    expect(out.method).toBe('exact');
    expect(out.gap).toBe(0);
    expect(out.cycleMinutes).toBeCloseTo(3, 6);
    expect(out.garmentsPerDay).toBeCloseTo(160, 4);
    const minutes: Record<string, number> = { a: 2, b: 1, c: 3 };
    for (const op of ['a', 'b', 'c'])
      expect(out.assignments.filter((x: { operation: string }) => x.operation === op).reduce((s: number, x: { share: number }) => s + x.share, 0)).toBeCloseTo(1, 9);
    for (const person of ['Ann', '7']) {
      const load = out.assignments.filter((x: { person: string }) => x.person === person).reduce((s: number, x: { operation: string; share: number }) => s + x.share * minutes[x.operation], 0);
      expect(load).toBeLessThanOrEqual(out.cycleMinutes + 1e-9);
    }
    expect(out.assignments.some((x: { person: string; operation: string }) => x.person === '7' && x.operation === 'b')).toBe(false);
  }, 60_000);

  it('plan:line answers bad input with one line naming the field and exit code 2', () => {
    const ok = { operations: [{ id: 'a', minutes: 2, machine: 'lockstitch' }], people: [{ id: 'Ann', efficiency: { lockstitch: 1 } }], minutesPerDay: 480 };
    const cases: [unknown, string][] = [
      [{ ...ok, minutesPerDay: 0 }, 'minutesPerDay'],
      [{ ...ok, operations: [{ id: 'a', minutes: 'two', machine: 'lockstitch' }] }, 'operations[0].minutes'],
      [{ ...ok, people: [{ id: 'Ann', efficiency: { overlock: 1 } }] }, 'operations[0].machine'],
      [{ ...ok, machines: { lockstitch: 0 } }, 'operations[0].machine'],
      [{ ...ok, maxOperationsPerPerson: 0 }, 'maxOperationsPerPerson'],
      [{ ...ok, pins: [{ person: 'Bo', operation: 'a' }] }, 'pins[0].person'],
    ];
    for (const [input, field] of cases) {
      const r = refuse('plan-line.cli.ts', input);
      expect(r.status).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr.startsWith(`${field}:`)).toBe(true);
    }
  }, 120_000);
});
