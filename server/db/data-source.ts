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

/** Thrown when the schema is behind the code and this start was told not to migrate. */
export class PendingMigrationsError extends Error {
  constructor(readonly pending: string[]) {
    super(
      `The database needs ${pending.length} migration${pending.length === 1 ? '' : 's'} before this version can start ` +
        `(${pending.join(', ')}). Run \`npm run db:migrate\` with the same configuration, or set MIGRATE_ON_START=true.`,
    );
    this.name = 'PendingMigrationsError';
  }
}

/** Names of the migrations this code has that the database has not run yet. */
export async function pendingMigrations(ds: DataSource): Promise<string[]> {
  const known = ds.migrations.map((m) => m.name ?? m.constructor.name);
  const hasTable = await ds.createQueryRunner().hasTable('migrations');
  if (!hasTable) return known;
  const rows: { name: string }[] = await ds.query('SELECT name FROM migrations');
  const applied = new Set(rows.map((r) => r.name));
  return known.filter((n) => !applied.has(n));
}

/**
 * Open the data source. With `migrate` (the default) bring the schema up to date; without it, stop
 * with PendingMigrationsError when migrations are pending (production starts after `npm run db:migrate`).
 */
export async function openDatabase(target: string, opts: { migrate?: boolean } = {}): Promise<DataSource> {
  const ds = createDataSource(target);
  await ds.initialize();
  if (opts.migrate ?? true) {
    await ds.runMigrations({ transaction: 'each' });
  } else {
    const pending = await pendingMigrations(ds);
    if (pending.length > 0) {
      await ds.destroy();
      throw new PendingMigrationsError(pending);
    }
  }
  return ds;
}

/** A unique-constraint violation on either driver (SQLite SQLITE_CONSTRAINT_*, PostgreSQL 23505). */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; driverError?: { code?: string } };
  const code = String(e?.driverError?.code ?? e?.code ?? '');
  return code.startsWith('SQLITE_CONSTRAINT') || code === '23505';
}
