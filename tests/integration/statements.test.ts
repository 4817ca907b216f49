import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { createStatements } from '../../server/db/statements';
import { AuditEntryEntity, BundleEntity, UserEntity, WorkLogEntity } from '../../server/entities';
import { buildTestApp } from '../fixtures/test-app';

/**
 * The hand-written statements of the hot paths (server/db/statements.ts) must give exactly what TypeORM's
 * own find gives for the same rows, on SQLite and (TEST_DATABASE_URL) PostgreSQL: dates as Date, JSON
 * parsed, booleans as booleans. The oracle is TypeORM's repository API.
 */
describe('hot-path statements', () => {
  let ds: DataSource;
  beforeAll(async () => {
    ({ ds } = await buildTestApp());
  });
  afterAll(async () => {
    await ds.destroy();
  });

  it('hydrate users, bundles and work logs as the find API does', async () => {
    const sql = createStatements(ds);
    const user = await ds.getRepository(UserEntity).findOneByOrFail({ email: 'machinist1@tamarind.example' });
    expect(await sql.first(UserEntity, 'SELECT * FROM "users" WHERE "id" = ?', [user.id])).toEqual(user);

    const bundle = (await ds.getRepository(BundleEntity).find({ order: { id: 'ASC' }, take: 1 }))[0];
    expect(bundle).toBeDefined();
    expect(await sql.first(BundleEntity, 'SELECT * FROM "bundles" WHERE "studioId" = ? AND "id" = ?', [bundle.studioId, bundle.id])).toEqual(bundle);

    const logs = await ds.getRepository(WorkLogEntity).find({ where: { bundleId: bundle.id }, order: { id: 'ASC' } });
    expect(await sql.all(WorkLogEntity, 'SELECT * FROM "work_logs" WHERE "studioId" = ? AND "bundleId" = ? ORDER BY "id" ASC', [bundle.studioId, bundle.id])).toEqual(logs);
  });

  it('inserts with the driver conversions and returns the new id; a unique clash is a QueryFailedError', async () => {
    const sql = createStatements(ds);
    const bundle = (await ds.getRepository(BundleEntity).find({ order: { id: 'DESC' }, take: 1 }))[0];
    const createdAt = new Date('2026-12-01T09:15:30.250Z');
    const row = { studioId: bundle.studioId, bundleId: bundle.id, operationId: 999_999, attempt: 0, userId: 1, pieces: 10, earnedMinutes: 2.5, payMinor: 700, idempotencyKey: 'statements-test-1', outcome: '', defect: '', createdAt };
    const id = await sql.insert(WorkLogEntity, row);
    expect(await ds.getRepository(WorkLogEntity).findOneByOrFail({ id })).toEqual({ ...row, payPeriodId: null, pieceRate: '', id });
    await expect(sql.insert(WorkLogEntity, { ...row, operationId: 999_998 })).rejects.toMatchObject({ name: 'QueryFailedError' });

    const auditId = await sql.insert(AuditEntryEntity, { studioId: 1, userId: 1, userName: 'T', action: 'x', entity: 'y', entityId: null, before: '', after: '' });
    const entry = await ds.getRepository(AuditEntryEntity).findOneByOrFail({ id: auditId });
    expect(entry.createdAt).toBeInstanceOf(Date);
    expect(entry.entityId).toBeNull();
  });
});
