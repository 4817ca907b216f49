import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const IN = 25.4;

function draft(input: unknown) {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'seamrun-draft-')), 'in.json');
  writeFileSync(file, typeof input === 'string' ? input : JSON.stringify(input));
  const tsx = path.join(root, 'node_modules/.bin/tsx');
  const r = spawnSync(tsx, [path.join(root, 'server/cli/pattern-draft.cli.ts'), '--in', file, '--json'], { cwd: root, encoding: 'utf8' });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

interface OutPiece {
  id: string; name: string; block: string; shape?: string; material: string; copies: number;
  outline: [number, number][]; edges: { name: string; from: number; to: number; allowanceMm: number }[];
}

/** Length of the named edges of an output piece, walked on its outline (wrapping), independent of the core. */
function edgeLength(p: OutPiece, name: string): number {
  const n = p.outline.length;
  let sum = 0;
  for (const e of p.edges.filter((x) => x.name === name)) {
    for (let i = e.from; i !== e.to; i = (i + 1) % n) {
      const [ax, ay] = p.outline[i], [bx, by] = p.outline[(i + 1) % n];
      sum += Math.hypot(bx - ax, by - ay);
    }
  }
  return sum;
}

describe('pattern:draft (README contract)', () => {
  it('prints opened-out pieces for the outside check\'s peplum, circle skirt and straight skirt options', () => {
    const waist = 30 * IN;
    const r = draft({
      measurements: { waist, hip: 40 * IN, 'waist-to-hip': 8 * IN },
      blocks: [
        { block: 'peplum', shape: 'circle', innerEdge: { times: 2, plusMm: 10 * IN }, lengthMm: 150 },
        { block: 'skirt', shape: 'circle', fraction: 0.5, lengthMm: 500, waistEaseMm: 0 },
        { block: 'skirt', shape: 'straight', lengthMm: 600, centreBackOpening: { allowanceMm: 40 } },
      ],
    });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const { pieces } = JSON.parse(r.stdout) as { pieces: OutPiece[] };
    expect(pieces.map((p) => [p.id, p.block, p.shape, p.material, p.copies])).toEqual([
      ['peplum', 'peplum', 'circle', 'self', 1], ['skirt', 'skirt', 'circle', 'self', 1],
      ['skirt-front', 'skirt', 'straight', 'self', 1], ['skirt-back', 'skirt', 'straight', 'self', 2],
    ]);
    for (const p of pieces) {
      expect(Object.keys(p).sort()).toEqual(['block', 'copies', 'edges', 'id', 'material', 'name', 'outline', 'shape']);
      // edges run round the outline in order, each starting where the last ended
      p.edges.forEach((e, i) => expect(e.to).toBe(p.edges[(i + 1) % p.edges.length].from));
      expect(p.edges[0].from).toBe(0);
    }
    const [peplum, circle, front, back] = pieces;
    // the practitioner's 2 × waist + 10 in (issue 16 seed document), measured on the printed outline
    expect(Math.abs(edgeLength(peplum, 'waist') - (2 * waist + 10 * IN))).toBeLessThan(1);
    expect(Math.abs(edgeLength(circle, 'waist') - waist)).toBeLessThan(1);
    // the straight front is on the fold, printed opened out: its waist is half the skirt's
    expect(front.edges.map((e) => e.name)).not.toContain('centre-front');
    expect(back.edges.find((e) => e.name === 'centre-back')!.allowanceMm).toBe(40);
    expect(back.edges.map((e) => e.name)).toEqual(expect.arrayContaining(['waist', 'hem', 'side']));
  }, 60_000);

  it('names the field in one line and exits non-zero on bad input', () => {
    const cases: [unknown, RegExp][] = [
      [{ measurements: { waist: 700 }, blocks: [{ block: 'skirt', shape: 'circle', lengthMm: -5 }] }, /blocks\[0\]\.lengthMm/],
      [{ measurements: { waist: 700 }, blocks: [{ block: 'skirt', shape: 'straight', lengthMm: 600 }] }, /measurements\.hip/],
      [{ measurements: { wasit: 700 }, blocks: [{ block: 'peplum' }] }, /measurements\.wasit/],
      [{ measurements: { waist: 700 }, blocks: [{ block: 'skort' }] }, /blocks\[0\]\.block/],
      ['{"measurements":', /not JSON/],
    ];
    for (const [input, field] of cases) {
      const r = draft(input);
      expect(r.status).not.toBe(0);
      expect(r.stdout).toBe('');
      expect(r.stderr).toMatch(field);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr).not.toMatch(/\n\s+at /);
    }
  }, 120_000);
});
