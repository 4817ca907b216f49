import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { DataSource } from 'typeorm';
import { entities } from '../entities';
import { migrations } from './migrations';

/**
 * The TypeORM data source on better-sqlite3: WAL journal, foreign keys on, a busy timeout.
 * `synchronize` stays false: the schema changes only through migrations.
 */
export function createDataSource(databasePath: string): DataSource {
  if (databasePath !== ':memory:') mkdirSync(dirname(databasePath), { recursive: true });
  return new DataSource({
    type: 'better-sqlite3',
    database: databasePath,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    logging: false,
    prepareDatabase: (db: { pragma: (s: string) => unknown }) => {
      if (databasePath !== ':memory:') db.pragma('journal_mode = WAL');
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
      db.pragma('synchronous = NORMAL');
    },
  });
}

/** Open the data source and bring the schema up to date. */
export async function openDatabase(databasePath: string): Promise<DataSource> {
  const ds = createDataSource(databasePath);
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  return ds;
}
