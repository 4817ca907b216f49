/**
 * `npm run db:backup [FILE]`: a consistent copy of the live database through SQLite's online
 * backup API, safe while the server writes. Default file: data/backups/seamrun-<UTC stamp>.sqlite.
 */
import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import Database from 'better-sqlite3';
import { loadEnv } from '../env';

export async function backupDatabase(source: string, target: string): Promise<string> {
  mkdirSync(dirname(target), { recursive: true });
  const db = new Database(source, { readonly: true, fileMustExist: true });
  try {
    // After the first cycle, copy every remaining page in one step: a writer on another connection restarts a
    // backup that yields between small steps, and a busy floor would keep restarting it.
    await db.backup(target, { progress: () => 1_000_000 });
  } finally {
    db.close();
  }
  // The copy carries the live file's WAL mode; a backup is one self-contained file (no -wal/-shm beside it).
  const copy = new Database(target);
  try {
    copy.pragma('journal_mode = DELETE');
    const [row] = copy.pragma('integrity_check') as { integrity_check: string }[];
    if (row.integrity_check !== 'ok') throw new Error(`backup failed its integrity check: ${row.integrity_check}`);
  } finally {
    copy.close();
  }
  return target;
}

if (process.argv[1] && import.meta.url.split('?')[0].endsWith(process.argv[1].split('/').pop()!)) {
  const env = loadEnv();
  const stamp = new Date().toISOString().replace(/[-:]/g, '').replace(/\..+/, 'Z');
  const target = process.argv[2] ?? join(dirname(env.DATABASE_PATH), 'backups', `seamrun-${stamp}.sqlite`);
  await backupDatabase(env.DATABASE_PATH, target);
  console.log(JSON.stringify({ backup: target }));
}
