import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { createPostgresDatabase, isPostgresRun } from '../fixtures/fresh-database';

/**
 * `npm run db:migrate` (server/db/migrate.ts) as its own step: it migrates whichever database is configured,
 * DATABASE_URL when set, else the SQLite file at DATABASE_PATH (issue 22: it used to open the SQLite file always).
 */
const run = promisify(execFile);
const dir = mkdtempSync(join(tmpdir(), 'seamrun-migrate-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function migrate(env: NodeJS.ProcessEnv) {
  const base = { ...process.env };
  delete base.DATABASE_URL;
  const { stdout } = await run(process.execPath, ['--import', 'tsx', 'server/db/migrate.ts'], {
    env: { ...base, NODE_ENV: 'test', ...env },
    timeout: 120_000,
  });
  return JSON.parse(stdout.trim().split('\n').at(-1)!) as { driver: string; ran: string[]; database: string };
}

describe('npm run db:migrate', () => {
  it.skipIf(isPostgresRun())('migrates the SQLite file at DATABASE_PATH once, and has nothing to run the second time', async () => {
    const file = join(dir, 'studio.sqlite');
    const first = await migrate({ DATABASE_PATH: file });
    expect(first.driver).toBe('better-sqlite3');
    expect(first.ran.length).toBeGreaterThan(10);
    expect(existsSync(file)).toBe(true);
    expect((await migrate({ DATABASE_PATH: file })).ran).toEqual([]);
  }, 240_000);

  it.runIf(isPostgresRun())('migrates the PostgreSQL database of DATABASE_URL and never opens the SQLite file', async () => {
    const url = await createPostgresDatabase(process.env.TEST_DATABASE_URL!, `seamrun_migrate_${Date.now()}`);
    const file = join(dir, 'never.sqlite');
    const first = await migrate({ DATABASE_URL: url, DATABASE_PATH: file });
    expect(first.driver).toBe('postgres');
    expect(first.ran.length).toBeGreaterThan(10);
    expect(first.database).not.toContain(file);
    expect(existsSync(file)).toBe(false);
    expect((await migrate({ DATABASE_URL: url, DATABASE_PATH: file })).ran).toEqual([]);
  }, 240_000);
});
