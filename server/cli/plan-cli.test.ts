import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const run = (script: string, input: unknown) => {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'seamrun-cli-')), 'in.json');
  writeFileSync(file, JSON.stringify(input));
  const tsx = path.join(root, 'node_modules/.bin/tsx');
  return JSON.parse(execFileSync(tsx, [path.join(root, 'server/cli', script), '--in', file, '--json'], { cwd: root, encoding: 'utf8' }));
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
});
