/**
 * Scheduled online backups with a retention the host sets (BACKUP_EVERY_HOURS, BACKUP_KEEP, BACKUP_DIR).
 * SQLite: better-sqlite3's online backup API (server/db/backup.ts), safe while requests write, each copy
 * checked with `PRAGMA integrity_check`. PostgreSQL: `pg_dump --format=custom` when it is installed;
 * otherwise the schedule says so once and stays off (the host's own PostgreSQL backups then apply).
 *
 * Several web processes may run the schedule on one database: a backup is due when the newest copy is
 * older than the interval, and one process per interval takes it (an exclusive lock file per interval).
 */
import { execFile, spawnSync } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync, readdirSync, renameSync, rmSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { promisify } from 'node:util';
import type { Logger } from 'pino';
import type { Env } from '../env';
import { backupDatabase } from './backup';

const HOUR_MS = 60 * 60 * 1000;
// Scheduled copies only: `npm run db:backup` files (seamrun-<stamp>.sqlite) are never pruned.
const NAME = /^seamrun-scheduled-(\d{8}T\d{6}Z)\.(sqlite|dump)$/;

export interface BackupPlan {
  /** The SQLite file, or a postgres:// URL. */
  database: string;
  dir: string;
  everyMs: number;
  keep: number;
}

/** The plan for this host, or null when backups are off (BACKUP_EVERY_HOURS=0; off by default under tests). */
export function backupPlan(env: Env): BackupPlan | null {
  const hours = env.BACKUP_EVERY_HOURS ?? (env.NODE_ENV === 'test' ? 0 : 24);
  if (!hours) return null;
  // A database held in memory (tests, trials) has no file to copy.
  if (!env.DATABASE_URL && env.DATABASE_PATH === ':memory:') return null;
  const database = env.DATABASE_URL || env.DATABASE_PATH;
  const dir = env.BACKUP_DIR || join(env.DATABASE_URL ? 'data' : dirname(env.DATABASE_PATH), 'backups');
  return { database, dir, everyMs: hours * HOUR_MS, keep: env.BACKUP_KEEP };
}

/** `20261204T061500Z` for a time. */
export const backupStamp = (at: Date) => at.toISOString().replace(/[-:]/g, '').replace(/\..+/, 'Z');
const stampTime = (stamp: string) =>
  Date.parse(`${stamp.slice(0, 4)}-${stamp.slice(4, 6)}-${stamp.slice(6, 8)}T${stamp.slice(9, 11)}:${stamp.slice(11, 13)}:${stamp.slice(13, 15)}Z`);

/** The finished backups in `dir`, newest first. */
export function listBackups(dir: string): { file: string; at: number }[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .map((name) => ({ name, m: NAME.exec(name) }))
    .filter((e): e is { name: string; m: RegExpExecArray } => e.m !== null)
    .map((e) => ({ file: join(dir, e.name), at: stampTime(e.m[1]) }))
    .sort((x, y) => y.at - x.at);
}

/** Delete all but the newest `keep` scheduled backups; the files removed. */
export function pruneBackups(dir: string, keep: number): string[] {
  const removed = listBackups(dir).slice(keep).map((b) => b.file);
  for (const file of removed) rmSync(file, { force: true });
  return removed;
}

export const hasPgDump = () => spawnSync('pg_dump', ['--version'], { stdio: 'ignore' }).status === 0;

/**
 * Take a backup when the newest one is older than the interval and no other process took this
 * interval's; returns the new file, or null when none was due. A failed copy leaves no file behind.
 */
export async function takeBackupIfDue(plan: BackupPlan, now: Date = new Date()): Promise<string | null> {
  const newest = listBackups(plan.dir)[0];
  if (newest && now.getTime() - newest.at < plan.everyMs) return null;
  mkdirSync(plan.dir, { recursive: true });
  const slot = Math.floor(now.getTime() / plan.everyMs);
  const lock = join(plan.dir, `.slot-${slot}.lock`);
  try {
    closeSync(openSync(lock, 'wx'));
  } catch {
    return null; // another process holds this interval's backup
  }
  const postgres = /^postgres(ql)?:\/\//.test(plan.database);
  const file = join(plan.dir, `seamrun-scheduled-${backupStamp(now)}.${postgres ? 'dump' : 'sqlite'}`);
  const partial = `${file}.partial`;
  try {
    if (postgres) {
      await promisify(execFile)('pg_dump', ['--format=custom', '--no-owner', `--file=${partial}`, `--dbname=${plan.database}`]);
    } else {
      await backupDatabase(plan.database, partial);
    }
    renameSync(partial, file);
  } catch (e) {
    rmSync(partial, { force: true });
    throw e;
  }
  for (const name of readdirSync(plan.dir)) {
    if (/^\.slot-\d+\.lock$/.test(name) && name !== `.slot-${slot}.lock`) rmSync(join(plan.dir, name), { force: true });
  }
  pruneBackups(plan.dir, plan.keep);
  return file;
}

/** Look for a due backup at start and then every few minutes; one JSON log line per backup taken. */
export function startBackupSchedule(env: Env, log: Logger, checkEveryMs = 5 * 60 * 1000) {
  const plan = backupPlan(env);
  if (!plan) return { plan, stop: () => undefined };
  if (/^postgres(ql)?:\/\//.test(plan.database) && !hasPgDump()) {
    log.warn({ backups: 'off' }, 'pg_dump is not installed: scheduled backups are off; rely on your PostgreSQL host backups or install the PostgreSQL client tools');
    return { plan: null, stop: () => undefined };
  }
  let running = false;
  const check = async () => {
    if (running) return;
    running = true;
    const started = Date.now();
    try {
      const file = await takeBackupIfDue(plan);
      if (file) log.info({ backup: file, bytes: statSync(file).size, ms: Date.now() - started, keep: plan.keep }, 'backup taken');
    } catch (e) {
      log.error({ err: e }, 'scheduled backup failed');
    } finally {
      running = false;
    }
  };
  void check();
  const timer = setInterval(() => void check(), Math.min(checkEveryMs, plan.everyMs));
  timer.unref();
  return { plan, stop: () => clearInterval(timer) };
}
