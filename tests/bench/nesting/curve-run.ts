/**
 * One single-lane nesting run on the main thread that also reports how density grew over time, for
 * comparing search settings on equal terms (one run per core, paired seeds):
 *   npx tsx tests/bench/nesting/curve-run.ts INSTANCE [SECONDS=60] [SEED=1]
 * Prints one JSON line {name, seed, iterations, density (%), valid, curve: {"5": %, "10": %, …}}: the best
 * density found by each mark in seconds. With TRACE=1 every shorter marker is also written to stderr
 * ("12.3s 86.40"). "valid" is the independent checker (planning/nesting/checker.ts).
 */
import path from 'node:path';
import { polygonArea } from '@shared/geometry/polygon';
import { checkLayout, nestPieces } from '../../../planning/nesting';
import { datasetDir, instanceToInput, readJsonInstance } from './json-instance';

const [name = 'shirts', seconds = '60', seed = '1'] = process.argv.slice(2);
const inst = readJsonInstance(path.join(datasetDir('json'), `${name}.json`));
const input = instanceToInput(inst);
const area = input.pieces.reduce((s, p) => s + Math.abs(polygonArea(p.polygon)) * p.quantity, 0);
const width = inst.strip_height;
const percent = (length: number) => +((100 * area) / (length * width)).toFixed(2);
const marks = [5, 10, 20, 30, 45, 60, 120, 300, 600].filter((m) => m <= Number(seconds));
const curve: Record<string, number> = {};
let best = Infinity;
const t0 = performance.now();
const r = nestPieces(input, {
  seed: Number(seed),
  timeBudgetMs: Number(seconds) * 1000,
  now: () => performance.now(),
  onProgress: (p) => {
    const t = (performance.now() - t0) / 1000;
    if ((p.bestLength as number) < best && process.env.TRACE) process.stderr.write(`${t.toFixed(1)}s ${percent(p.bestLength as number)}\n`);
    best = Math.min(best, p.bestLength as number);
    for (const m of marks) if (t <= m) curve[m] = percent(best);
  },
});
for (const m of marks) curve[m] ??= +(100 * r.utilisation).toFixed(2);
const valid = checkLayout(input, r).valid;
process.stdout.write(JSON.stringify({ name, seed: Number(seed), iterations: r.iterations, density: +(100 * r.utilisation).toFixed(2), valid, curve }) + '\n');
