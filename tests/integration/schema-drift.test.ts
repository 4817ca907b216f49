import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/data-source';
import { freshDatabaseTarget, isPostgresRun } from '../fixtures/fresh-database';

describe('schema drift', () => {
  it('finds no pending schema change after the migrations run', async () => {
    const ds = await openDatabase(await freshDatabaseTarget());
    const log = await ds.driver.createSchemaBuilder().log();
    await ds.destroy();
    // An entity edited without a migration shows up here: run `npm run db:generate -- Name`.
    expect(log.upQueries.map((q) => q.query)).toEqual([]);
  });

  it.skipIf(isPostgresRun())('runs SQLite with foreign keys on', async () => {
    const ds = await openDatabase(':memory:');
    const [row] = await ds.query('PRAGMA foreign_keys');
    await ds.destroy();
    expect(row.foreign_keys).toBe(1);
  });
});
