import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { loadEnv } from '../env';
import { backupPlan, backupStamp, pruneBackups, takeBackupIfDue } from './backup-schedule';

const HOUR = 60 * 60 * 1000;
const dirs: string[] = [];
const tempDir = () => {
  const d = mkdtempSync(join(tmpdir(), 'seamrun-backup-'));
  dirs.push(d);
  return d;
};
afterEach(() => {
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

function sqliteFile(dir: string) {
  const file = join(dir, 'live.sqlite');
  const db = new Database(file);
  db.pragma('journal_mode = WAL'); // as the server opens it
  db.exec('CREATE TABLE t (x integer); INSERT INTO t VALUES (1), (2), (3);');
  db.close();
  return file;
}

describe('scheduled backups', () => {
  it('keeps the newest BACKUP_KEEP scheduled copies and never a manual one when pruning', () => {
    const dir = tempDir();
    const stamps = ['20261201T000000Z', '20261202T000000Z', '20261203T000000Z', '20261204T000000Z'];
    for (const s of stamps) writeFileSync(join(dir, `seamrun-scheduled-${s}.sqlite`), '');
    writeFileSync(join(dir, 'seamrun-20261101T000000Z.sqlite'), ''); // from `npm run db:backup`
    const removed = pruneBackups(dir, 2);
    expect(removed.map((f) => f.split('/').pop())).toEqual(['seamrun-scheduled-20261202T000000Z.sqlite', 'seamrun-scheduled-20261201T000000Z.sqlite']);
    expect(readdirSync(dir).sort()).toEqual([
      'seamrun-20261101T000000Z.sqlite',
      'seamrun-scheduled-20261203T000000Z.sqlite',
      'seamrun-scheduled-20261204T000000Z.sqlite',
    ]);
  });

  it('takes a copy only when the newest is older than the interval, and one per interval when two processes ask', async () => {
    const dir = tempDir();
    const plan = { database: sqliteFile(dir), dir: join(dir, 'backups'), everyMs: 6 * HOUR, keep: 3 };
    const t0 = new Date('2026-12-04T06:00:00Z');
    const [first, second] = await Promise.all([takeBackupIfDue(plan, t0), takeBackupIfDue(plan, t0)]);
    expect([first, second].filter(Boolean)).toEqual([join(plan.dir, `seamrun-scheduled-${backupStamp(t0)}.sqlite`)]);
    expect(await takeBackupIfDue(plan, new Date(t0.getTime() + 5 * HOUR))).toBeNull();
    const later = await takeBackupIfDue(plan, new Date(t0.getTime() + 6 * HOUR));
    expect(later).not.toBeNull();
    const copy = new Database(later!, { readonly: true });
    expect(copy.prepare('SELECT count(*) AS n FROM t').get()).toEqual({ n: 3 });
    copy.close();
    for (let i = 2; i <= 5; i++) await takeBackupIfDue(plan, new Date(t0.getTime() + i * 6 * HOUR));
    expect(readdirSync(plan.dir).filter((f) => f.endsWith('.sqlite'))).toHaveLength(3);
    expect(readdirSync(plan.dir).filter((f) => f.endsWith('.lock'))).toHaveLength(1);
    expect(existsSync(`${later}.partial`)).toBe(false);
    expect(readdirSync(plan.dir).filter((f) => /-(wal|shm)$/.test(f))).toEqual([]);
  });

  it('is on every 24 hours by default and off under tests unless BACKUP_EVERY_HOURS says so', () => {
    expect(backupPlan(loadEnv({ NODE_ENV: 'production', SESSION_SECRET: 'a-long-random-production-secret', DATABASE_PATH: '/srv/seamrun/db.sqlite' }))).toEqual({
      database: '/srv/seamrun/db.sqlite', dir: '/srv/seamrun/backups', everyMs: 24 * HOUR, keep: 14,
    });
    expect(backupPlan(loadEnv({ NODE_ENV: 'test' }))).toBeNull();
    expect(backupPlan(loadEnv({ NODE_ENV: 'production', SESSION_SECRET: 'a-long-random-production-secret', DATABASE_PATH: ':memory:' }))).toBeNull();
    expect(backupPlan(loadEnv({ NODE_ENV: 'production', SESSION_SECRET: 'a-long-random-production-secret', BACKUP_EVERY_HOURS: '0' }))).toBeNull();
    expect(backupPlan(loadEnv({ NODE_ENV: 'test', BACKUP_EVERY_HOURS: '6', BACKUP_KEEP: '30', BACKUP_DIR: '/mnt/b' }))).toMatchObject({
      dir: '/mnt/b', everyMs: 6 * HOUR, keep: 30,
    });
  });
});
