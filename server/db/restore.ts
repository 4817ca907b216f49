/**
 * `npm run db:restore FILE`: replace the database with a backup. Stop the server first; the
 * current database is kept beside it as <name>.before-restore.
 */
import { copyFileSync, existsSync, rmSync } from 'node:fs';
import Database from 'better-sqlite3';
import { loadEnv } from '../env';

export function restoreDatabase(backupFile: string, target: string) {
  const check = new Database(backupFile, { readonly: true, fileMustExist: true });
  try {
    const [row] = check.pragma('integrity_check') as { integrity_check: string }[];
    if (row.integrity_check !== 'ok') throw new Error(`${backupFile} fails its integrity check`);
  } finally {
    check.close();
  }
  if (existsSync(target)) copyFileSync(target, `${target}.before-restore`);
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  const src = new Database(backupFile, { readonly: true });
  return src.backup(target).finally(() => src.close());
}

if (process.argv[1] && import.meta.url.split('?')[0].endsWith(process.argv[1].split('/').pop()!)) {
  const file = process.argv[2];
  if (!file) {
    console.error('Usage: npm run db:restore -- FILE');
    process.exit(1);
  }
  const env = loadEnv();
  await restoreDatabase(file, env.DATABASE_PATH);
  console.log(JSON.stringify({ restored: file, into: env.DATABASE_PATH }));
}
