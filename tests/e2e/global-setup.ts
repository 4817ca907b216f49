import { execSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';

/**
 * Builds the client, then starts the real server (migrations + demo seed) on a free port with a
 * throw-away database. Tests read the URL from the provided context.
 */
/**
 * The browser the tests drive is Debian's Chromium (never a downloaded one). On a fresh machine without it,
 * install it from Debian when this process may (root with apt-get, as `.ci/run` does); otherwise stop with
 * one line saying what to run.
 */
function ensureChromium() {
  const path = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (existsSync(path)) return;
  const root = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!process.env.CHROMIUM_PATH && root && existsSync('/usr/bin/apt-get')) {
    console.log('Chromium is missing: installing it from Debian (apt-get install chromium)…');
    execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', { stdio: 'inherit' });
    if (existsSync(path)) return;
  }
  throw new Error(`Chromium not found at ${path}: run \`sudo apt-get install -y chromium\` (or set CHROMIUM_PATH to a Chromium binary), then npm test again.`);
}

export default async function setup(project: TestProject) {
  ensureChromium();
  if (process.env.E2E_SKIP_BUILD !== 'true') execSync('npx vite build --logLevel warn', { stdio: 'inherit' });
  const dir = mkdtempSync(join(tmpdir(), 'seamrun-e2e-'));
  process.env.SCRYPT_LOG_N = '10';
  const { startServer } = await import('../../server/index');
  const { stop, port } = await startServer({
    PORT: '0',
    HOST: '127.0.0.1',
    NODE_ENV: 'production',
    // Production refuses the built-in secret and seeds the demo studio only when asked.
    SESSION_SECRET: 'e2e-session-secret-not-the-built-in-one',
    SEED_DEMO: 'true',
    // A throw-away database: migrate at start (a real production start runs `npm run db:migrate` first).
    MIGRATE_ON_START: 'true',
    BACKUP_EVERY_HOURS: '0',
    DATABASE_PATH: join(dir, 'e2e.sqlite'),
    LOGIN_RATE_LIMIT: '1000',
    LOGIN_IP_FAILURE_LIMIT: '1000',
    NESTING_SECONDS: '4',
    LOCAL_SMTP_PORT: '0',
    LOCAL_PAYMENTS_PORT: '0',
  });
  project.provide('baseUrl', `http://127.0.0.1:${port}`);
  return async () => {
    await stop();
    rmSync(dir, { recursive: true, force: true });
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}
