/**
 * `npm run build` (second half): compile the server's entry points with esbuild into dist/server, so a
 * production install runs plain `node` with production dependencies only (no tsx, no Vite at run time).
 * npm packages stay external (installed by `npm ci --omit=dev`); our own code, tsconfig path aliases
 * and TypeORM's legacy decorators (experimentalDecorators) are compiled in. Column types are explicit
 * everywhere, so no decorator metadata is needed.
 */
import { rmSync } from 'node:fs';
import { build } from 'esbuild';

/** Every process or worker-thread entry that production starts. */
export const SERVER_ENTRIES = [
  'server/start.ts',
  'server/worker.ts',
  'server/db/migrate.ts',
  'server/db/backup.ts',
  'server/db/restore.ts',
  'server/workers/nesting.worker.ts',
  'server/jobs/cpu.worker.ts',
];

rmSync('dist/server', { recursive: true, force: true });
const result = await build({
  entryPoints: SERVER_ENTRIES,
  outdir: 'dist/server',
  outbase: 'server',
  bundle: true,
  splitting: true,
  chunkNames: 'chunks/[name]-[hash]',
  format: 'esm',
  platform: 'node',
  target: 'node20',
  packages: 'external',
  sourcemap: true,
  tsconfig: 'tsconfig.json',
  logLevel: 'warning',
  metafile: true,
});
const outputs = Object.keys(result.metafile.outputs).filter((f) => f.endsWith('.js'));
console.log(JSON.stringify({ server: 'dist/server', entries: SERVER_ENTRIES.length, files: outputs.length }));
