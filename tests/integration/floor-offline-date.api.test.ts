import { beforeAll, describe, expect, it } from 'vitest';
import { BundleEntity, OperationEntity, WorkLogEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

let ctx: Awaited<ReturnType<typeof buildTestApp>>;
let achieng: Awaited<ReturnType<typeof signIn>>;
let sewing: OperationEntity;
let next = 9101;

/** A new bundle of the demo batch, so each case logs fresh work. */
async function freshBundle() {
  const bundles = ctx.ds.getRepository(BundleEntity);
  return bundles.save(bundles.create({ studioId: 1, batchId: 1, layId: 0, number: next++, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }));
}

async function logWith(doneAt: string | undefined) {
  const b = await freshBundle();
  const key = `offline-date-${b.number}-${Date.now()}`;
  const before = ctx.now().getTime();
  const res = await achieng.post('/api/floor/logs').send({ bundleNumber: b.number, batchId: b.batchId, operationId: sewing.id, idempotencyKey: key, ...(doneAt ? { doneAt } : {}) });
  const after = ctx.now().getTime();
  expect(res.status).toBe(201);
  const saved = await ctx.ds.getRepository(WorkLogEntity).findOneByOrFail({ idempotencyKey: key });
  return { at: new Date(saved.createdAt).getTime(), before, after };
}

beforeAll(async () => {
  ctx = await buildTestApp();
  achieng = await signIn(ctx.app, DEMO.machinist);
  sewing = (await ctx.ds.getRepository(OperationEntity).find({ order: { seq: 'ASC' } })).find((o) => o.section === 'sewing')!;
});

describe('a log that waited offline keeps the time the work was done', () => {
  it('dates a log sent three hours late at the time the phone queued it', async () => {
    // The app's clock (it starts at TEST_TODAY), not the machine's.
    const doneAt = new Date(ctx.now().getTime() - 3 * 3_600_000);
    doneAt.setMilliseconds(0);
    const { at } = await logWith(doneAt.toISOString());
    expect(at).toBe(doneAt.getTime());
  });

  it('dates on arrival a log with no doneAt, one older than the offline window, and one from a clock running ahead', async () => {
    for (const doneAt of [undefined, new Date(ctx.now().getTime() - 10 * 24 * 3_600_000).toISOString(), new Date(ctx.now().getTime() + 3_600_000).toISOString()]) {
      const { at, before, after } = await logWith(doneAt);
      expect(at).toBeGreaterThanOrEqual(before - 1000);
      expect(at).toBeLessThanOrEqual(after + 1000);
    }
  });

  it('refuses a doneAt that is not a date and time, naming the field, and saves nothing', async () => {
    const b = await freshBundle();
    const key = `offline-date-bad-${b.number}`;
    const res = await achieng.post('/api/floor/logs').send({ bundleNumber: b.number, batchId: b.batchId, operationId: sewing.id, idempotencyKey: key, doneAt: 'yesterday' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields ?? {})).toContain('doneAt');
    expect(await ctx.ds.getRepository(WorkLogEntity).findOneBy({ idempotencyKey: key })).toBeNull();
  });
});
