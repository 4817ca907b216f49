import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'pattern-import-'));
const run = (args: string[]) => spawnSync('npx', ['tsx', 'server/cli/pattern-import.cli.ts', ...args], { encoding: 'utf8' });

describe('npm run pattern:import', () => {
  it('prints pieces in mm with area and perimeter for an SVG in centimetres', () => {
    const file = join(dir, 'square.svg');
    writeFileSync(file, '<svg width="10cm" height="10cm" viewBox="0 0 10 10"><polygon id="yoke" points="0,0 10,0 10,5 0,5"/></svg>');
    const out = JSON.parse(execFileSync('npx', ['tsx', 'server/cli/pattern-import.cli.ts', '--in', file, '--json'], { encoding: 'utf8' }));
    expect(out.problems).toEqual([]);
    // 10 cm × 5 cm = 100 mm × 50 mm (SVG 1.1 §7.10 units).
    expect(out.pieces[0]).toMatchObject({ name: 'yoke', areaMm2: 5000, perimeterMm: 300 });
  }, 60_000);

  it('exits 1 with one line naming the problem and no stack trace when the units are unknown', () => {
    const file = join(dir, 'nounits.svg');
    writeFileSync(file, '<svg viewBox="0 0 10 10"><polygon points="0,0 10,0 10,5"/></svg>');
    const r = run(['--in', file, '--json']);
    expect(r.status).toBe(1);
    expect(r.stderr.trim().split('\n').filter((l) => !l.startsWith('npm warn'))).toEqual([
      'pattern:import: file: the file does not say its size (width/height with units); give the view box units as mm, cm or in',
    ]);
    const ok = run(['--in', file, '--units', 'in', '--json']);
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).pieces[0].areaMm2).toBeCloseTo(25 * 25.4 * 25.4, 3);
  }, 60_000);
});
