/**
 * `npm start`: build the client when missing or stale, then migrate, seed and serve.
 */
import { execSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
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
if (stale && process.env.SKIP_BUILD !== 'true') {
  console.log('Building the client…');
  execSync('npx vite build', { stdio: 'inherit' });
}
const { port, env, seeded } = await startServer();
printBanner(port, env, seeded);
