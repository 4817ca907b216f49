import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { openDatabase } from '../../server/db/data-source';
import { StudioEntity, StyleEntity, SupplierEntity } from '../../server/entities';
import { createBatchRepository } from '../../server/modules/batches/batch.repository';
import { freshDatabaseTarget } from '../fixtures/fresh-database';

// The StudioNumbers migration on a database that already holds two studios' batches, purchase orders and pay
// periods with interleaved ids, as a shared server's would: each studio's rows are numbered 1, 2, 3… in id
// order (common practice: a backfill keeps the order the rows were made in), on SQLite and on PostgreSQL.

let ds: DataSource;
const ids = { a: 0, b: 0, styleA: 0, styleB: 0, supplierA: 0, supplierB: 0 };
/** Which studio made each row, in the order they were made (so in id order). */
const MADE = ['a', 'b', 'a', 'b', 'b', 'a'] as const;

/** Undo the migrations back to before StudioNumbers (the later ones too, should there be any). */
async function undoStudioNumbers() {
  const ran: { name: string }[] = await ds.query('SELECT "name" FROM "migrations" ORDER BY "id" DESC');
  const count = ran.findIndex((m) => m.name.startsWith('StudioNumbers')) + 1;
  expect(count).toBeGreaterThan(0);
  for (let i = 0; i < count; i += 1) await ds.undoLastMigration({ transaction: 'each' });
}

beforeAll(async () => {
  ds = await openDatabase(await freshDatabaseTarget());
  await undoStudioNumbers();
  const studios = ds.getRepository(StudioEntity);
  ids.a = (await studios.save({ name: 'Studio A', currency: 'KES' })).id;
  ids.b = (await studios.save({ name: 'Studio B', currency: 'EUR' })).id;
  const style = (studioId: number) => ds.getRepository(StyleEntity).save({ studioId, code: 'S-1', name: 'Tee', description: '', sizeRun: ['M'], baseSize: 'M', status: 'approved' });
  ids.styleA = (await style(ids.a)).id;
  ids.styleB = (await style(ids.b)).id;
  const supplier = (studioId: number) => ds.getRepository(SupplierEntity).save({ studioId, name: 'Mill', contact: '', email: 'mill@example.com', leadTimeDays: 7 });
  ids.supplierA = (await supplier(ids.a)).id;
  ids.supplierB = (await supplier(ids.b)).id;
  // Rows as the old schema had them (no number column): plain SQL, values written in, one text for both drivers.
  for (const [i, who] of MADE.entries()) {
    const studioId = ids[who];
    const styleId = who === 'a' ? ids.styleA : ids.styleB;
    const supplierId = who === 'a' ? ids.supplierA : ids.supplierB;
    const day = `2026-10-${String(i + 10).padStart(2, '0')}`;
    await ds.query(`INSERT INTO "batches" ("studioId", "styleId", "quantities", "dueDate") VALUES (${studioId}, ${styleId}, '{"M":10}', '${day}')`);
    await ds.query(`INSERT INTO "purchase_orders" ("studioId", "supplierId", "lines", "deliveryDate") VALUES (${studioId}, ${supplierId}, '[]', '${day}')`);
    await ds.query(`INSERT INTO "pay_periods" ("studioId", "fromDay", "toDay", "approvedBy", "lines") VALUES (${studioId}, '${day}', '${day}', 1, '[]')`);
  }
  await ds.runMigrations({ transaction: 'each' });
}, 120_000);

afterAll(async () => {
  await ds?.destroy();
});

describe('StudioNumbers migration', () => {
  it.each(['batches', 'purchase_orders', 'pay_periods'])('numbers the %s already saved 1, 2, 3… per studio in id order', async (table) => {
    const rows: { id: number; studioId: number; number: number }[] = await ds.query(`SELECT "id", "studioId", "number" FROM "${table}" ORDER BY "id"`);
    const numbersOf = (studioId: number) => rows.filter((r) => Number(r.studioId) === studioId).map((r) => Number(r.number));
    expect(rows).toHaveLength(MADE.length);
    expect(numbersOf(ids.a)).toEqual([1, 2, 3]);
    expect(numbersOf(ids.b)).toEqual([1, 2, 3]);
    // Interleaved: ids a1 < b1 < a2 < b2 < b3 < a3.
    expect(rows.map((r) => Number(r.number))).toEqual([1, 1, 2, 2, 3, 3]);
  });

  it('counts on from the backfilled numbers, and the unique index holds', async () => {
    const batches = createBatchRepository(ds);
    const next = await batches.insert({ studioId: ids.b, styleId: ids.styleB, quantities: { M: 5 }, dueDate: '2026-12-01', notes: '', status: 'planned' });
    expect(next.number).toBe(4);
    const dup = `INSERT INTO "batches" ("studioId", "number", "styleId", "quantities", "dueDate") VALUES (${ids.a}, 1, ${ids.styleA}, '{"M":1}', '2026-12-01')`;
    await expect(ds.query(dup)).rejects.toThrow();
  });
});
