import { readFileSync, statSync } from 'node:fs';
import { importedPieceJson, readPatternFile, type PatternUnit } from '../../exports/import/index';

/** Largest pattern file read (bytes), the same cap as the upload route. */
const MAX_BYTES = 20 * 1024 * 1024;

function fail(message: string): never {
  process.stderr.write(`pattern:import: ${message}\n`);
  process.exit(1);
}

const argv = process.argv.slice(2);
const arg = (name: string) => {
  const at = argv.indexOf(name);
  return at >= 0 ? argv[at + 1] : undefined;
};
const file = arg('--in');
if (!file) fail('usage: --in FILE [--units mm|cm|in] [--json]');
const units = arg('--units');
if (units !== undefined && !['mm', 'cm', 'in'].includes(units)) fail(`--units must be mm, cm or in, not "${units}"`);
let text: string;
try {
  if (statSync(file).size > MAX_BYTES) fail(`${file} is larger than ${MAX_BYTES / 1024 / 1024} MB`);
  text = readFileSync(file, 'utf8');
} catch (e) {
  fail(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`);
}
const result = readPatternFile(text, { units: units as PatternUnit | undefined });
const out = {
  pieces: result.pieces.map(importedPieceJson),
  problems: result.problems,
  units: result.units,
};
if (result.pieces.length === 0) fail(result.problems[0] ? `${result.problems[0].entity}: ${result.problems[0].reason}` : 'no pieces found');
if (argv.includes('--json')) process.stdout.write(`${JSON.stringify(out)}\n`);
else {
  for (const p of out.pieces) process.stdout.write(`${p.name}${p.size ? ` (${p.size})` : ''}: ${p.outline.length} points, area ${p.areaMm2} mm², perimeter ${p.perimeterMm} mm\n`);
  for (const q of result.problems) process.stdout.write(`not read: ${q.entity}: ${q.reason}\n`);
}
if (result.problems.length) {
  process.stderr.write(`pattern:import: ${result.problems.length} part(s) of the file not read; first: ${result.problems[0].entity}: ${result.problems[0].reason}\n`);
  process.exit(1);
}
