import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { openDatabase } from '../../server/db/data-source';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { BundleEntity, OperationEntity, WorkLogEntity } from '../../server/entities';
import { loadEnv } from '../../server/env';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { DEMO, DEMO_PASSWORD, signIn, TEST_TODAY } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;

/** The demo studio with a clock the test moves (for the undo window). */
async function buildFloorApp() {
  const ds = await openDatabase(await freshDatabaseTarget());
  await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
  const clock = { t: TEST_TODAY.getTime() + 3 * 3600_000 };
  const env = loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000' });
  const app = createApp({ ds, env, clientDir: '/nonexistent', now: () => new Date(clock.t) });
  return { app, ds, clock };
}

let ctx: Awaited<ReturnType<typeof buildFloorApp>>;
let machinist: Agent, machinist2: Agent, finisher: Agent, owner: Agent, cutter: Agent;
let ops: OperationEntity[];
let key = 0;
const nextKey = () => `test-key-${++key}-${Date.now()}`;
const op = (code: string) => ops.find((o) => o.code === code)!;
const checkOp = () => ops.find((o) => /quality|inspect|check/i.test(o.name))!;

beforeAll(async () => {
  ctx = await buildFloorApp();
  [machinist, machinist2, finisher, owner, cutter] = await Promise.all([
    signIn(ctx.app, DEMO.machinist),
    signIn(ctx.app, 'machinist2@tamarind.example'),
    signIn(ctx.app, DEMO.finisher),
    signIn(ctx.app, DEMO.owner),
    signIn(ctx.app, DEMO.cutter),
  ]);
  ops = await ctx.ds.getRepository(OperationEntity).find({ order: { seq: 'ASC' } });
  const bundles = ctx.ds.getRepository(BundleEntity);
  const extra = Array.from({ length: 20 }, (_, i) =>
    bundles.create({ studioId: 1, batchId: 1, layId: 0, number: 101 + i, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }),
  );
  await bundles.save(extra);
});

/** A bundle of the demo batch with no logs yet. */
async function freshBundle() {
  const logged = new Set((await ctx.ds.getRepository(WorkLogEntity).find()).map((l) => l.bundleId));
  const all = await ctx.ds.getRepository(BundleEntity).find({ order: { number: 'ASC' } });
  const b = all.find((x) => !logged.has(x.id));
  if (!b) throw new Error('no fresh bundle left');
  return b;
}

/** The demo's cutting-room operations OP01 and OP02 logged by the owner, so a sewing operation has its predecessors. */
async function cutReady(b: BundleEntity) {
  for (const code of ['OP01', 'OP02']) await owner.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op(code).id, idempotencyKey: nextKey() });
}

describe('logging a bundle operation', () => {
  it('logs once, confirms bundle, operation, pieces and pay, and refuses a second log with who logged it', async () => {
    const b = await freshBundle();
    await cutReady(b);
    const first = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op('OP06').id, idempotencyKey: nextKey() });
    expect(first.status).toBe(201);
    expect(first.body.log).toMatchObject({ bundleNumber: b.number, operationCode: 'OP06', pieces: b.pieces, attempt: 0, userName: 'Achieng Mwende' });
    expect(first.body.log.payMinor).toBe(b.pieces * (op('OP06').pieceRateMinor ?? 0));
    expect(first.body.warnings).toEqual([]);
    const second = await machinist2.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op('OP06').id, idempotencyKey: nextKey() });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('conflict');
    expect(second.body.error.message).toContain('Achieng Mwende');
  });

  it('replays the original answer for the same idempotency key and never doubles the log', async () => {
    const b = await freshBundle();
    const body = { bundleNumber: b.number, operationId: op('OP06').id, idempotencyKey: nextKey() };
    const a = await machinist.post('/api/floor/logs').send(body);
    const again = await machinist.post('/api/floor/logs').send(body);
    expect(again.status).toBe(a.status);
    expect(again.body).toEqual(a.body);
    expect(await ctx.ds.getRepository(WorkLogEntity).countBy({ bundleId: b.id })).toBe(1);
  });

  it('warns when predecessors are not done yet but still logs', async () => {
    const b = await freshBundle();
    const res = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op('OP04').id, idempotencyKey: nextKey() });
    expect(res.status).toBe(201);
    expect(res.body.warnings.join(' ')).toMatch(/OP0\d .* is not logged yet/);
  });

  it('gives exactly one log when 40 parallel requests log the same bundle operation', async () => {
    const b = await freshBundle();
    const agents = [machinist, machinist2];
    const results = await Promise.all(
      Array.from({ length: 40 }, (_, i) =>
        agents[i % 2].post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op('OP06').id, idempotencyKey: `parallel-${b.id}-${i}` }),
      ),
    );
    const codes = results.map((r) => r.status);
    expect(codes.filter((c) => c === 201)).toHaveLength(1);
    expect(codes.filter((c) => c === 409)).toHaveLength(39);
    expect(await ctx.ds.getRepository(WorkLogEntity).countBy({ bundleId: b.id, operationId: op('OP06').id })).toBe(1);
  });

  it('reports bad fields by path and answers 404 for a bundle that is not there', async () => {
    const bad = await machinist.post('/api/floor/logs').send({ bundleNumber: 0, operationId: 'x', idempotencyKey: 'short' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['bundleNumber', 'idempotencyKey', 'operationId']);
    const missing = await machinist.post('/api/floor/logs').send({ bundleNumber: 9999, operationId: op('OP01').id, idempotencyKey: nextKey() });
    expect(missing.status).toBe(404);
    expect(missing.body.error.fields.bundleNumber).toBeTruthy();
  });

  it('lets the logger undo within two minutes, not someone else, not later', async () => {
    const b = await freshBundle();
    const res = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op('OP06').id, idempotencyKey: nextKey() });
    expect((await machinist2.delete(`/api/floor/logs/${res.body.log.id}`)).status).toBe(403);
    expect((await machinist.delete(`/api/floor/logs/${res.body.log.id}`)).status).toBe(204);
    const again = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op('OP06').id, idempotencyKey: nextKey() });
    expect(again.status).toBe(201);
    ctx.clock.t += 3 * 60_000;
    const late = await machinist.delete(`/api/floor/logs/${again.body.log.id}`);
    expect(late.status).toBe(409);
  });
});

describe('finishing and rework', () => {
  it('a failed check reopens the operation; the rework attempt is logged but not paid twice', async () => {
    const b = await freshBundle();
    const sew = op('OP06');
    const check = checkOp();
    await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: sew.id, idempotencyKey: nextKey() });
    const noOutcome = await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: check.id, idempotencyKey: nextKey() });
    expect(noOutcome.status).toBe(400);
    expect(noOutcome.body.error.fields.outcome).toBeTruthy();
    const noReason = await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: check.id, idempotencyKey: nextKey(), outcome: 'fail' });
    expect(noReason.body.error.fields).toMatchObject({ defect: 'Say what the defect is', reworkOperationId: 'Pick the operation to send back' });
    expect((await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: check.id, idempotencyKey: nextKey(), outcome: 'pass' })).status).toBe(403);
    const fail = await finisher
      .post('/api/floor/logs')
      .send({ bundleNumber: b.number, operationId: check.id, idempotencyKey: nextKey(), outcome: 'fail', defect: 'Skipped stitches at shoulder', reworkOperationId: sew.id });
    expect(fail.status).toBe(201);
    const bundle = await ctx.ds.getRepository(BundleEntity).findOneByOrFail({ id: b.id });
    expect(bundle.reopened[String(sew.id)]).toBe(1);
    const rework = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: sew.id, idempotencyKey: nextKey() });
    expect(rework.status).toBe(201);
    expect(rework.body.log).toMatchObject({ attempt: 1, payMinor: 0, earnedMinutes: 0 });
    const recheck = await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: check.id, idempotencyKey: nextKey(), outcome: 'pass' });
    expect(recheck.status).toBe(201);
    expect(recheck.body.log.attempt).toBe(1);
  });

  it('looks a bundle up with the finisher’s operations first and the spec points to check', async () => {
    const b = await freshBundle();
    const res = await finisher.get(`/api/floor/bundles/lookup?number=${b.number}`);
    expect(res.status).toBe(200);
    expect(res.body.bundle.operations[0].section).toBe('finishing');
    expect(res.body.bundle.operations.some((o: { isCheck: boolean }) => o.isCheck)).toBe(true);
    expect(JSON.stringify(res.body.bundle)).not.toContain('pieceRate');
  });
});

describe('own count and pay only', () => {
  it('shows today’s count and earnings of the signed-in person only', async () => {
    const today = (await machinist2.get('/api/floor/me/today')).body;
    expect(today.logs.every((l: { userName: string }) => l.userName === 'Neema Chebet')).toBe(true);
    expect(today.earningsMinor).toBe(today.logs.reduce((a: number, l: { payMinor: number }) => a + l.payMinor, 0));
  });

  it('keeps progress and other people’s pay from floor roles and the cutter', async () => {
    for (const a of [machinist, finisher, cutter]) expect((await a.get('/api/floor/progress/1')).status).toBe(403);
    expect((await cutter.post('/api/floor/logs').send({ bundleNumber: 1, operationId: 1, idempotencyKey: nextKey() })).status).toBe(403);
    expect((await request(ctx.app).get('/api/floor/me/today')).status).toBe(401);
  });
});

describe('progress for the owner', () => {
  it('shows work per operation and section, bundles by stage and output per day', async () => {
    const res = await owner.get('/api/floor/progress/1');
    expect(res.status).toBe(200);
    const p = res.body.progress;
    const bundles = await ctx.ds.getRepository(BundleEntity).findBy({ batchId: 1 });
    expect(p.totalPieces).toBe(bundles.reduce((a, b) => a + b.pieces, 0));
    expect(p.bundles).toBe(bundles.length);
    expect(p.operations.find((o: { code: string }) => o.code === 'OP01').bundlesDone).toBeGreaterThan(0);
    expect(p.stages.reduce((a: number, s: { bundles: number }) => a + s.bundles, 0)).toBe(p.bundles);
    expect(p.stages.find((s: { stage: string }) => s.stage === 'packed').bundles).toBeGreaterThanOrEqual(1);
    const daily = (await owner.get('/api/floor/progress/1/daily')).body;
    expect(daily.days.reduce((a: number, d: { pieces: number }) => a + d.pieces, 0)).toBe(p.packedPieces);
    expect(p.people.length).toBeGreaterThan(0);
  });
});

describe('what a log may be for', () => {
  it('refuses a machinist a packing operation, and a finisher a sewing one, saving nothing', async () => {
    const b = await freshBundle();
    const packing = ops.find((o) => /bag|pack/i.test(o.name) && o.section === 'finishing')!;
    const res = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: packing.id, idempotencyKey: nextKey() });
    expect(res.status).toBe(403);
    expect(res.body.error.fields.operationId).toBe('Not machinist work');
    expect(res.body.error.message).toContain('finishing work');
    const sewing = await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: op('OP06').id, idempotencyKey: nextKey() });
    expect(sewing.status).toBe(403);
    expect(await ctx.ds.getRepository(WorkLogEntity).countBy({ bundleId: b.id })).toBe(0);
    expect((await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: packing.id, idempotencyKey: nextKey() })).status).toBe(201);
  });

  it('logs nothing on a shipped or cancelled batch', async () => {
    const b = await freshBundle();
    for (const status of ['shipped', 'cancelled']) {
      expect((await owner.patch('/api/batches/1').send({ status })).status).toBe(200);
      const res = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, batchId: 1, operationId: op('OP06').id, idempotencyKey: nextKey() });
      expect(res.status, status).toBe(409);
      expect(res.body.error.message).toContain(`is ${status}`);
      expect(res.body.error.fields.bundleNumber).toBe(`Batch ${status}`);
    }
    expect(await ctx.ds.getRepository(WorkLogEntity).countBy({ bundleId: b.id })).toBe(0);
    expect((await owner.patch('/api/batches/1').send({ status: 'sewing' })).status).toBe(200);
    expect((await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, batchId: 1, operationId: op('OP06').id, idempotencyKey: nextKey() })).status).toBe(201);
  });
});
