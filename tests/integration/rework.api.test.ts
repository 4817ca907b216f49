import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { BundleEntity, OperationEntity, UserEntity, WorkLogEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent, machinist2: Agent, finisher: Agent;
let ds: Awaited<ReturnType<typeof buildTestApp>>['ds'];
let ops: OperationEntity[];
const key = () => `rework-${randomUUID()}`;
let nextNumber = 9100;

/** A bundle no one has worked on, in the demo batch (ten pieces). */
async function freshBundle() {
  const any = await ds.getRepository(BundleEntity).findOneByOrFail({ studioId: 1, batchId: 1 });
  const { id: _id, createdAt: _at, ...rest } = any;
  const repo = ds.getRepository(BundleEntity);
  return repo.save(repo.create({ ...rest, number: nextNumber++, numberScope: 0, pieces: 10, reopened: {} }));
}

beforeAll(async () => {
  const built = await buildTestApp();
  ds = built.ds;
  [owner, machinist, machinist2, finisher] = await Promise.all([signIn(built.app, DEMO.owner), signIn(built.app, DEMO.machinist), signIn(built.app, 'machinist2@tamarind.example'), signIn(built.app, DEMO.finisher)]);
  ops = await ds.getRepository(OperationEntity).find({ where: { studioId: 1, styleId: 1 }, order: { seq: 'ASC' } });
}, 60_000);

const sewOp = () => ops.find((o) => o.section === 'sewing' && o.predecessors.length === 0) ?? ops.find((o) => o.section === 'sewing')!;
const checkOp = () => ops.find((o) => /quality|inspect|check/i.test(o.name))!;

describe('quality check and rework', () => {
  it('sends a failed bundle back to the machinist who sewed it: only they see it and may redo it, and it is paid once', async () => {
    const b = await freshBundle();
    const sew = sewOp();
    const first = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: sew.id, idempotencyKey: key() });
    expect(first.status).toBe(201);
    const paidOnce = first.body.log.payMinor;
    const fail = await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: checkOp().id, idempotencyKey: key(), outcome: 'fail', defect: 'Open seam at left side', reworkOperationId: sew.id });
    expect(fail.status).toBe(201);
    expect(fail.body.log).toMatchObject({ outcome: 'fail', defect: 'Open seam at left side' });
    const sewer = await ds.getRepository(UserEntity).findOneByOrFail({ email: DEMO.machinist });
    expect(fail.body.warnings.join(' ')).toContain(`Sent back to ${sewer.name}`);

    const mine = (await machinist.get('/api/floor/me/rework')).body.rework;
    expect(mine).toEqual([expect.objectContaining({ bundleNumber: b.number, operationId: sew.id, attempt: 1, defect: 'Open seam at left side' })]);
    expect((await machinist2.get('/api/floor/me/rework')).body.rework).toEqual([]);

    const other = await machinist2.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: sew.id, idempotencyKey: key() });
    expect(other.status).toBe(403);
    expect(other.body.error.fields.operationId).toBe(`Rework for ${sewer.name}`);

    const redo = await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: sew.id, idempotencyKey: key() });
    expect(redo.status).toBe(201);
    expect(redo.body.log).toMatchObject({ attempt: 1, payMinor: 0, earnedMinutes: 0 });
    expect((await machinist.get('/api/floor/me/rework')).body.rework).toEqual([]);

    // The pay lines take the first attempt only: the operation is paid once for this bundle.
    const logs = await ds.getRepository(WorkLogEntity).findBy({ bundleId: b.id, operationId: sew.id });
    expect(logs.map((l) => l.attempt).sort()).toEqual([0, 1]);
    // The app's clock starts at TEST_TODAY (1 Dec 2026), so these logs are made that day.
    const pay = (await owner.get('/api/pay/preview?from=2026-11-01&to=2026-12-01')).body.preview;
    const line = pay.people.find((p: { userId: number }) => p.userId === sewer.id).operations.find((o: { code: string }) => o.code === sew.code);
    const paidLogs = (await ds.getRepository(WorkLogEntity).findBy({ userId: sewer.id, operationId: sew.id })).filter((l) => l.attempt === 0);
    expect(line.pieces).toBe(paidLogs.reduce((a, l) => a + l.pieces, 0));
    expect(paidOnce).toBeGreaterThan(0);
  });

  it('lets the owner redo a rework on behalf of the machinist, and the recheck may be any finisher', async () => {
    const b = await freshBundle();
    const sew = sewOp();
    await machinist.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: sew.id, idempotencyKey: key() });
    await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: checkOp().id, idempotencyKey: key(), outcome: 'fail', defect: 'Puckering', reworkOperationId: sew.id });
    expect((await owner.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: sew.id, idempotencyKey: key() })).status).toBe(201);
    const recheck = await finisher.post('/api/floor/logs').send({ bundleNumber: b.number, operationId: checkOp().id, idempotencyKey: key(), outcome: 'pass' });
    expect(recheck.status).toBe(201);
    expect(recheck.body.log.attempt).toBe(1);
  });
});
