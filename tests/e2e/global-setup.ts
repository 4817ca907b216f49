import { execSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';

/**
 * Builds the client, then starts the real server (migrations + demo seed) on a free port with a
 * throw-away database. Tests read the URL from the provided context.
 */
export default async function setup(project: TestProject) {
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
