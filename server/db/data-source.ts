import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { DataSource } from 'typeorm';
import { entities } from '../entities';
import { isPostgres } from '../entities/column-types';
import { migrations } from './migrations';
import { postgresMigrations } from './migrations-postgres';

/** True when `target` is a PostgreSQL URL rather than an SQLite file path. */
export const isPostgresUrl = (target: string) => /^postgres(ql)?:\/\//.test(target);

/**
 * The TypeORM data source. An SQLite path (the default, embedded) gets WAL journal, foreign keys
 * and a busy timeout; a `postgres://` URL switches to PostgreSQL with the same entities and its
 * own migration set generated from them. `synchronize` stays false either way.
 */
export function createDataSource(target: string): DataSource {
  if (isPostgresUrl(target)) {
    if (!isPostgres) throw new Error('Set DATABASE_URL before the server loads so entity column types match PostgreSQL');
    return new DataSource({
      type: 'postgres',
      url: target,
      entities,
      migrations: postgresMigrations,
      synchronize: false,
      migrationsRun: false,
      logging: false,
      extra: { max: 20 },
    });
  }
  if (target !== ':memory:') mkdirSync(dirname(target), { recursive: true });
  return new DataSource({
    type: 'better-sqlite3',
    database: target,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    logging: false,
    prepareDatabase: (db: { pragma: (s: string) => unknown }) => {
      if (target !== ':memory:') db.pragma('journal_mode = WAL');
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
      db.pragma('synchronous = NORMAL');
    },
  });
}

/** Open the data source and bring the schema up to date. */
export async function openDatabase(target: string): Promise<DataSource> {
  const ds = createDataSource(target);
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  return ds;
}

/** A unique-constraint violation on either driver (SQLite SQLITE_CONSTRAINT_*, PostgreSQL 23505). */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; driverError?: { code?: string } };
  const code = String(e?.driverError?.code ?? e?.code ?? '');
  return code.startsWith('SQLITE_CONSTRAINT') || code === '23505';
}
