/**
 * `npm start`: build the client when missing or stale, then migrate, seed and serve.
 */
import { execSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { PendingMigrationsError } from './db/data-source';
import { printBanner, startServer } from './index';

function newest(dir: string): number {
  let t = 0;
  for (const name of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, name.name);
    t = Math.max(t, name.isDirectory() ? newest(p) : statSync(p).mtimeMs);
  }
  return t;
}

const built = 'dist/client/index.html';
const stale =
  !existsSync(built) ||
  Math.max(newest('src'), newest('shared'), statSync('index.html').mtimeMs) > statSync(built).mtimeMs;
// A production start serves what `npm run build` made and never builds (Vite is a development tool).
if (stale && process.env.SKIP_BUILD !== 'true' && process.env.NODE_ENV !== 'production') {
  console.log('Building the client…');
  execSync('npx vite build', { stdio: 'inherit' });
}
try {
  const { port, env, seeded } = await startServer();
  printBanner(port, env, seeded);
} catch (err) {
  if (!(err instanceof PendingMigrationsError)) throw err;
  console.error(err.message);
  process.exit(1);
}
