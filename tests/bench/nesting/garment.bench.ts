/**
 * Real-garment marker benchmark on the fixtures of tests/bench/nesting/fixtures (written by
 * garment-fixtures.ts): the demo shirt dress at 1450 mm, gap 2 mm, as the product nests it (one run,
 * seed 1, the product's time budget). Prints one JSON line per fixture:
 * {ratio, pieces, seconds, length, utilisation, valid, complete, iterations}; `seconds` is the wall clock
 * of nestPieces, `valid` the independent checker (planning/nesting/checker.ts).
 *
 *   npx tsx tests/bench/nesting/garment.bench.ts [--seconds 20] [--seed 1] [--only XS1]
 *
 * Not a timed test; it never runs inside npm test.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { checkLayout, nestPieces, type NestingInput } from '../../../planning/nesting';
import { FIXTURE_DIR } from './garment-fixtures';

const argv = process.argv.slice(2);
const arg = (k: string, d: string) => (argv.includes(k) ? argv[argv.indexOf(k) + 1] : d);
const seconds = Number(arg('--seconds', '20'));
const seed = Number(arg('--seed', '1'));
const only = arg('--only', '');

for (const f of readdirSync(FIXTURE_DIR).filter((n) => n.endsWith('.json') && n.includes(only)).sort()) {
  const { ratio, input } = JSON.parse(readFileSync(path.join(FIXTURE_DIR, f), 'utf8')) as { ratio: Record<string, number>; input: NestingInput };
  const pieces = input.pieces.reduce((s, p) => s + (p.mirrored ? 2 : 1) * p.quantity, 0);
  const t0 = performance.now();
  const r = nestPieces(input, { seed, timeBudgetMs: seconds * 1000, now: () => performance.now() });
  const elapsed = (performance.now() - t0) / 1000;
  const check = checkLayout(input, r);
  const out = { ratio, pieces, seconds: Number(elapsed.toFixed(2)), length: Number(r.length.toFixed(1)), utilisation: Number(r.utilisation.toFixed(4)), valid: check.valid, complete: r.complete, iterations: r.iterations };
  process.stdout.write(JSON.stringify(out) + '\n');
  if (!check.valid) process.stderr.write(check.errors.slice(0, 5).join('\n') + '\n');
}
