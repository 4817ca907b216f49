/**
 * One single-thread nesting run on the main thread, for CPU profiles and speed comparisons:
 *   node --cpu-prof --import tsx tests/bench/nesting/profile-run.ts INSTANCE (SECONDS | iters:N) [SEED]
 * With iters:N the run is deterministic (same marker for the same seed), so two engine versions can be
 * timed on the same work. Prints one JSON line {instance, seed, iterations, ms, cpuMs (this process's CPU time: steadier than
 * the wall clock on a shared machine), itersPerSecond, length,
 * density, valid, maxOverlapRatio}; "valid" is the independent checker, maxOverlapRatio its largest pairwise overlap
 * ÷ the smaller piece's area. An invalid marker prints the checker's errors on stderr and, with DUMP=FILE, is written there.
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { checkLayout, nestPieces, type NestingOptions } from '../../../planning/nesting';
import { datasetDir, instanceToInput, readJsonInstance } from './json-instance';

const [name = 'shapes0', budget = '20', seed = '1'] = process.argv.slice(2);
const input = instanceToInput(readJsonInstance(path.join(datasetDir('json'), `${name}.json`)));
const options: NestingOptions = budget.startsWith('iters:')
  ? { seed: Number(seed), maxIterations: Number(budget.slice(6)) }
  : { seed: Number(seed), timeBudgetMs: Number(budget) * 1000, now: () => performance.now() };
const t0 = performance.now();
const cpu0 = process.cpuUsage();
const r = nestPieces(input, options);
const ms = performance.now() - t0;
const cpu = process.cpuUsage(cpu0);
const cpuMs = Math.round((cpu.user + cpu.system) / 1000);
const check = checkLayout(input, r);
const out = { instance: name, seed: Number(seed), iterations: r.iterations, ms: Math.round(ms), cpuMs, itersPerSecond: Math.round((r.iterations * 1000) / ms), length: r.length, density: r.utilisation, valid: check.valid, maxOverlapRatio: check.maxOverlapRatio };
process.stdout.write(JSON.stringify(out) + '\n');
if (!check.valid) {
  process.stderr.write(check.errors.slice(0, 8).join('\n') + '\n');
  if (process.env.DUMP) writeFileSync(process.env.DUMP, JSON.stringify(r));
}
