import { readFileSync } from 'node:fs';
import type { z } from 'zod';
import { patternDraftInput } from '@shared/schemas/pattern-draft';
import { draftBlocks, isPointOfMeasure, openOutPieces, type BlockSpec, type BodyMeasurements } from '@grading';

/** A bad input: printed as one line, exit code 1. */
class InputError extends Error {}

const round = (v: number) => Math.round(v * 1000) / 1000;

function fieldPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((s, k) => (typeof k === 'number' ? `${s}[${k}]` : s ? `${s}.${String(k)}` : String(k)), '');
}

function readInput(argv: string[]): { input: unknown; json: boolean } {
  const at = argv.indexOf('--in');
  if (at < 0 || !argv[at + 1]) throw new InputError('usage: npm run pattern:draft -- --in FILE [--json]');
  let text: string;
  try {
    text = readFileSync(argv[at + 1], 'utf8');
  } catch {
    throw new InputError(`--in: cannot read ${argv[at + 1]}`);
  }
  try {
    return { input: JSON.parse(text), json: argv.includes('--json') };
  } catch (e) {
    throw new InputError(`--in: ${argv[at + 1]} is not JSON (${(e as Error).message})`);
  }
}

function parse(input: unknown): z.infer<typeof patternDraftInput> {
  const r = patternDraftInput.safeParse(input);
  if (!r.success) {
    const issue = r.error.issues[0];
    throw new InputError(`${fieldPath(issue.path) || 'input'}: ${issue.message}`);
  }
  for (const key of Object.keys(r.data.measurements)) {
    if (!isPointOfMeasure(key)) throw new InputError(`measurements.${key}: not a known point of measure`);
  }
  return r.data;
}

function main(): void {
  const { input, json } = readInput(process.argv.slice(2));
  const parsed = parse(input);
  let pieces;
  try {
    pieces = openOutPieces(draftBlocks(parsed.measurements as BodyMeasurements, parsed.blocks as BlockSpec[]));
  } catch (e) {
    if (e instanceof RangeError) throw new InputError(e.message);
    throw e;
  }
  const out = {
    pieces: pieces.map((p) => ({
      id: p.id, name: p.name, block: p.block, ...(p.shape ? { shape: p.shape } : {}), material: p.material, copies: p.copies,
      outline: p.outline.map((q) => [round(q.x), round(q.y)]),
      edges: p.edges.map((e) => ({ name: e.name, from: e.from, to: e.to, allowanceMm: round(e.allowanceMm) })),
    })),
  };
  if (json) process.stdout.write(`${JSON.stringify(out)}\n`);
  else for (const p of out.pieces) process.stdout.write(`${p.id}: ${p.name}, ${p.material}, cut ${p.copies}, edges ${p.edges.map((e) => e.name).join(' ')}\n`);
}

try {
  main();
} catch (e) {
  // One line, no stack: the contract for bad input. Anything else is a fault in Seamrun and says so.
  const message = e instanceof InputError ? e.message : `internal error: ${(e as Error).message}`;
  process.stderr.write(`pattern:draft: ${message}\n`);
  process.exitCode = 1;
}
