import { readFileSync } from 'node:fs';

/** Reads `--in FILE` (JSON) and `--json` from argv; exits with a message on a missing file flag. */
export function readCliInput(argv: string[]): { input: unknown; json: boolean } {
  const at = argv.indexOf('--in');
  if (at < 0 || !argv[at + 1]) {
    process.stderr.write('usage: --in FILE [--json]\n');
    process.exit(2);
  }
  return { input: JSON.parse(readFileSync(argv[at + 1], 'utf8')), json: argv.includes('--json') };
}
