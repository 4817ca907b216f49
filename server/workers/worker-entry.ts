import { basename, dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

/** True when this code runs from the production build (dist/server/*.js), not from TypeScript sources. */
export const isBuilt = import.meta.url.endsWith('.js');

/** dist/server/ in the build (shared chunks sit in dist/server/chunks/). */
function builtRoot(): string {
  const here = dirname(fileURLToPath(import.meta.url));
  return basename(here) === 'chunks' ? dirname(here) : here;
}

/** A file of the production build, by its path below dist/server (e.g. `jobs/cpu.worker.js`). */
export function builtServerFile(relative: string): URL {
  return pathToFileURL(join(builtRoot(), relative));
}

/**
 * How to start the worker-thread entry `server/workers/<name>.worker.ts`: in the production build, the
 * compiled `dist/server/workers/<name>.worker.js` directly; from sources (npm start in development,
 * Vitest, the e2e server), the tsx loader, which imports the entry named in `workerData.entry`.
 * `entryOverride` (tests: a crashing or hanging worker) always goes through the loader.
 */
export function workerEntry(name: string, entryOverride?: string): { file: URL; data: <T extends object>(d: T) => T & { entry?: string } } {
  if (isBuilt && !entryOverride) {
    return { file: pathToFileURL(join(builtRoot(), 'workers', `${name}.worker.js`)), data: (d) => d };
  }
  const entry = entryOverride ?? new URL(`./${name}.worker.ts`, import.meta.url).href;
  return { file: new URL('./ts-worker-loader.mjs', import.meta.url), data: (d) => ({ ...d, entry }) };
}
