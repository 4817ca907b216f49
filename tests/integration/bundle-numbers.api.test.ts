import { beforeAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/data-source';
import { BundleEntity, OperationEntity, WorkLogEntity } from '../../server/entities';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;

let ctx: Awaited<ReturnType<typeof buildTestApp>>;
let owner: Agent, cutter: Agent, machinist: Agent;
let secondBatch: number;
let secondCode: string;

beforeAll(async () => {
  ctx = await buildTestApp();
  [owner, cutter, machinist] = await Promise.all([signIn(ctx.app, DEMO.owner), signIn(ctx.app, DEMO.cutter), signIn(ctx.app, DEMO.machinist)]);
  const b = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
  secondBatch = b.body.batch.id;
  secondCode = b.body.batch.code;
  expect((await owner.post(`/api/batches/${secondBatch}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3, overcutPercent: 0 })).status).toBe(201);
});

describe('bundle numbers across batches', () => {
  it('numbers a second batch’s bundles on from the studio’s last bundle instead of restarting at 1', async () => {
    const first = (await cutter.get('/api/batches/1/bundles')).body.bundles as { number: number }[];
    expect(first.length).toBeGreaterThan(0);
    const lay = (await cutter.get('/api/lays')).body.lays.find((l: { batchId: number; status: string }) => l.batchId === secondBatch && l.status === 'planned');
    // The cutter enters what was spread and the remnant measured (the plan is never taken as fact).
    const rolls = (lay.rolls as { rollId: number; plies: number; expectedRemnantMm: number }[]).map((r) => ({ rollId: r.rollId, actualPlies: r.plies, actualRemnantMm: r.expectedRemnantMm }));
    const cut = await cutter.post(`/api/lays/${lay.id}/cut`).send({ rolls });
    expect(cut.status).toBe(200);
    const second = (await cutter.get(`/api/batches/${secondBatch}/bundles`)).body.bundles as { number: number }[];
    expect(second.length).toBeGreaterThan(0);
    const firstNumbers = new Set(first.map((b) => b.number));
    expect(second.filter((b) => firstNumbers.has(b.number))).toEqual([]);
    expect(Math.min(...second.map((b) => b.number))).toBe(Math.max(...first.map((b) => b.number)) + 1);
    // A typed number of the second batch opens that batch's bundle.
    const typed = await machinist.get(`/api/floor/bundles/lookup?number=${second[0].number}`);
    expect(typed.status).toBe(200);
    expect(typed.body.bundle.batchId).toBe(secondBatch);
  });

  it('refuses to guess a typed number that two batches share (bundles cut before numbers were studio-wide) and lists both', async () => {
    // A bundle cut under the old per-batch numbering, as the migration keeps it: its number is also batch 1's bundle 1.
    const bundles = ctx.ds.getRepository(BundleEntity);
    await bundles.save(bundles.create({ studioId: 1, batchId: secondBatch, numberScope: secondBatch, layId: 0, number: 1, size: 'S', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }));

    const typed = await machinist.get('/api/floor/bundles/lookup?number=1');
    expect(typed.status).toBe(409);
    expect(typed.body.error.message).toContain('B-0001');
    expect(typed.body.error.message).toContain(secondCode);
    const choices = await machinist.get('/api/floor/bundles?number=1');
    expect(choices.status).toBe(200);
    expect(choices.body.bundles.map((c: { batchId: number }) => c.batchId)).toEqual([1, secondBatch]);

    // Logging by the number alone is refused too, and nothing is logged.
    const op = (await ctx.ds.getRepository(OperationEntity).find({ order: { seq: 'ASC' } })).find((o) => o.section === 'sewing')!;
    const key = `ambiguous-${Date.now()}`;
    const log = await machinist.post('/api/floor/logs').send({ bundleNumber: 1, operationId: op.id, idempotencyKey: key });
    expect(log.status).toBe(409);
    expect(await ctx.ds.getRepository(WorkLogEntity).findOneBy({ idempotencyKey: key })).toBeNull();

    // With its batch (typed with it, or scanned from the ticket's QR code) the number is one bundle.
    const scanned = await machinist.get(`/api/floor/bundles/lookup?number=1&batchId=${secondBatch}`);
    expect(scanned.status).toBe(200);
    expect(scanned.body.bundle).toMatchObject({ batchId: secondBatch, number: 1, size: 'S' });
  });

  it('keeps a bundle number unique in the studio in the database for bundles numbered studio-wide', async () => {
    const bundles = ctx.ds.getRepository(BundleEntity);
    await expect(
      // Batch 1's bundle 2 exists; another batch may not take its number.
      bundles.save(bundles.create({ studioId: 1, batchId: secondBatch + 1, layId: 0, number: 2, size: 'S', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} })),
    ).rejects.toThrow();
  });
});

describe('the migration to studio-wide bundle numbers', () => {
  it('keeps the printed numbers of bundles cut before it and scopes only the shared ones to their batch', async () => {
    const ds = await openDatabase(await freshDatabaseTarget());
    const isMine = async () => ((await ds.query('SELECT "name" FROM "migrations"')) as { name: string }[]).some((m) => m.name.startsWith('FloorSignInAndBundleNumbers'));
    while (await isMine()) await ds.undoLastMigration({ transaction: 'each' });
    // Two batches numbered the old way (each from 1) and a third whose numbers no other batch uses.
    const rows: [number, number][] = [[1, 1], [1, 2], [2, 1], [2, 2], [2, 3], [3, 7]];
    for (const [batchId, number] of rows) {
      await ds.query(
        `INSERT INTO "bundles" ("studioId", "batchId", "layId", "number", "size", "shadeLot", "plyFrom", "plyTo", "pieces", "reopened") VALUES (1, ${batchId}, 0, ${number}, 'M', 'A', 1, 10, 10, '{}')`,
      );
    }
    await ds.runMigrations({ transaction: 'each' });
    const after = await ds.getRepository(BundleEntity).find({ order: { batchId: 'ASC', number: 'ASC' } });
    expect(after.map((b) => [b.batchId, b.number, b.numberScope])).toEqual([
      [1, 1, 1], [1, 2, 1], [2, 1, 2], [2, 2, 2], [2, 3, 0], [3, 7, 0],
    ]);
    await ds.destroy();
  });
});
