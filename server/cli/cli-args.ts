import { readFileSync } from 'node:fs';
import type { ZodType } from 'zod';

/** Prints one line to stderr and exits with code 2 (bad input): never a stack trace. */
export function failInput(message: string): never {
  process.stderr.write(`${message.replace(/\s*\n\s*/g, ' ')}\n`);
  process.exit(2);
}

/** Reads `--in FILE` (JSON) and `--json` from argv; a missing flag, unreadable file or bad JSON exits with one line. */
export function readCliInput(argv: string[]): { input: unknown; json: boolean } {
  const at = argv.indexOf('--in');
  if (at < 0 || !argv[at + 1]) failInput('usage: --in FILE [--json]');
  let text: string;
  try {
    text = readFileSync(argv[at + 1], 'utf8');
  } catch (e) {
    failInput(`--in: cannot read ${argv[at + 1]} (${(e as NodeJS.ErrnoException).code ?? 'error'})`);
  }
  try {
    return { input: JSON.parse(text), json: argv.includes('--json') };
  } catch (e) {
    failInput(`--in: ${argv[at + 1]} is not JSON (${(e as Error).message})`);
  }
}

/** `tasks[0].time` from zod's path. */
function fieldName(path: readonly PropertyKey[]): string {
  return path.map((k, i) => (typeof k === 'number' ? `[${k}]` : `${i ? '.' : ''}${String(k)}`)).join('') || 'input';
}

/** Parses with the schema, or exits with one line naming the first bad field and why. */
export function parseCliInput<T>(schema: ZodType<T>, input: unknown): T {
  const r = schema.safeParse(input);
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  failInput(`${fieldName(issue.path)}: ${issue.message}`);
}

/**
 * Runs the core; a RangeError (the cores' "bad input" error) becomes one line and exit code 2, prefixed with
 * `field` when the core's message does not name one.
 */
export function runCore<T>(fn: () => T, field?: string): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof RangeError) failInput(field ? `${field}: ${e.message}` : e.message);
    throw e;
  }
}
