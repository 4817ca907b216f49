import { beforeAll, describe, expect, it } from 'vitest';
import { BundleEntity, OperationEntity, WorkLogEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;

let ctx: Awaited<ReturnType<typeof buildTestApp>>;
let achieng: Agent, neema: Agent;
let achiengId: number, neemaId: number;
let sewing: OperationEntity;

/** A bundle of the demo batch nobody has logged yet. */
async function freshBundle() {
  const logged = new Set((await ctx.ds.getRepository(WorkLogEntity).find()).map((l) => l.bundleId));
  const b = (await ctx.ds.getRepository(BundleEntity).find({ order: { number: 'ASC' } })).find((x) => !logged.has(x.id));
  if (!b) throw new Error('no fresh bundle left');
  return b;
}

beforeAll(async () => {
  ctx = await buildTestApp();
  [achieng, neema] = await Promise.all([signIn(ctx.app, DEMO.machinist), signIn(ctx.app, 'machinist2@tamarind.example')]);
  achiengId = (await achieng.get('/api/auth/me')).body.user.id;
  neemaId = (await neema.get('/api/auth/me')).body.user.id;
  sewing = (await ctx.ds.getRepository(OperationEntity).find({ order: { seq: 'ASC' } })).find((o) => o.section === 'sewing')!;
  const bundles = ctx.ds.getRepository(BundleEntity);
  await bundles.save(Array.from({ length: 4 }, (_, i) =>
    bundles.create({ studioId: 1, batchId: 1, layId: 0, number: 9001 + i, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }),
  ));
});

describe('a log queued on a shared phone is credited only to its author', () => {
  it('refuses with 409 a log whose key was made for another person and credits nobody, then takes it from its author', async () => {
    const b = await freshBundle();
    // The key the phone made for Achieng's log while she was signed in (u<userId>-…), sent under Neema's session.
    const body = { bundleNumber: b.number, batchId: b.batchId, operationId: sewing.id, idempotencyKey: `u${achiengId}-mq1x-a1b2c3d4e5f6` };
    const neemaBefore = (await neema.get('/api/floor/me/today')).body.bundleOps;
    const wrong = await neema.post('/api/floor/logs').send(body);
    expect(wrong.status).toBe(409);
    expect(wrong.body.error.code).toBe('conflict');
    expect(wrong.body.error.fields.idempotencyKey).toBe('Belongs to another person');
    expect(await ctx.ds.getRepository(WorkLogEntity).findOneBy({ idempotencyKey: body.idempotencyKey })).toBeNull();
    expect((await neema.get('/api/floor/me/today')).body.bundleOps).toBe(neemaBefore);

    const right = await achieng.post('/api/floor/logs').send(body);
    expect(right.status).toBe(201);
    expect(right.body.log.userId).toBe(achiengId);
    const saved = await ctx.ds.getRepository(WorkLogEntity).findOneByOrFail({ idempotencyKey: body.idempotencyKey });
    expect(saved.userId).toBe(achiengId);
  });

  it('refuses with 409 a key first used by another person, even when it carries no author stamp', async () => {
    const b = await freshBundle();
    const body = { bundleNumber: b.number, batchId: b.batchId, operationId: sewing.id, idempotencyKey: `script-key-${b.id}-${Date.now()}` };
    expect((await neema.post('/api/floor/logs').send(body)).status).toBe(201);
    const replayed = await achieng.post('/api/floor/logs').send(body);
    expect(replayed.status).toBe(409);
    expect(replayed.body.error.code).toBe('conflict');
    const logs = await ctx.ds.getRepository(WorkLogEntity).findBy({ idempotencyKey: body.idempotencyKey });
    expect(logs.map((l) => l.userId)).toEqual([neemaId]);
  });
});
