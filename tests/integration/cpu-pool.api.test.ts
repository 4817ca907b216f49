import { beforeAll, describe, expect, it } from 'vitest';
import { BundleEntity, OperationEntity } from '../../server/entities';
import { cpuTasksInFlight } from '../../server/jobs/cpu-pool';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;

// A cut-order solve, document or outline computation runs on the CPU pool's worker threads, so the
// request thread answers floor logs meanwhile. No duration is asserted: the log must simply be answered
// while the solve is still running (on the request thread, the solve would hold every other request).
let app: Awaited<ReturnType<typeof buildTestApp>>;
let owner: Agent, machinist: Agent;
let bundleNumbers: number[];
let operationId: number;

beforeAll(async () => {
  app = await buildTestApp();
  [owner, machinist] = await Promise.all([signIn(app.app, DEMO.owner), signIn(app.app, DEMO.machinist)]);
  const bundles = app.ds.getRepository(BundleEntity);
  const extra = Array.from({ length: 3 }, (_, i) =>
    bundles.create({ studioId: 1, batchId: 1, layId: 0, number: 901 + i, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }),
  );
  bundleNumbers = (await bundles.save(extra)).map((b) => b.number);
  operationId = (await app.ds.getRepository(OperationEntity).find({ where: { section: 'sewing' }, order: { seq: 'ASC' } }))[0].id;
}, 120_000);

const until = async (cond: () => boolean) => {
  while (!cond()) await new Promise((r) => setTimeout(r, 5));
};

describe('CPU work off the request thread', () => {
  it('answers a floor log while a large cut-order solve is still running', async () => {
    // A small plan first starts the pool's thread, so the large solve below is pure computation; one log
    // first warms the floor path the same way.
    expect((await machinist.post('/api/floor/logs').send({ bundleNumber: bundleNumbers[1], operationId, idempotencyKey: `warm-${Date.now()}` })).status).toBe(201);
    const small = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
    expect((await owner.post(`/api/batches/${small.body.batch.id}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3 })).status).toBe(201);

    const large = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 173, S: 389, M: 547, L: 421, XL: 229 }, dueDate: '2027-02-15' });
    expect(large.status).toBe(201);
    let solvedAt = 0;
    const t0 = performance.now();
    const solve = owner
      .post(`/api/batches/${large.body.batch.id}/cut-plan`)
      .send({ fabricId: 1, maxPlies: 40, maxGarmentsPerMarker: 12 })
      .then((r) => ((solvedAt = performance.now()), r));
    await until(() => cpuTasksInFlight() > 0 || solvedAt > 0);

    const log = await machinist.post('/api/floor/logs').send({ bundleNumber: bundleNumbers[0], operationId, idempotencyKey: `cpu-pool-${Date.now()}` });
    const loggedAt = performance.now();
    expect(log.status).toBe(201);
    expect(solvedAt).toBe(0);

    const solved = await solve;
    expect(solved.status).toBe(201);
    expect(solvedAt).toBeGreaterThan(loggedAt);
    console.log(JSON.stringify({ floorLogMs: Math.round(loggedAt - t0), cutOrderSolveMs: Math.round(solvedAt - t0) }));
  }, 180_000);
});
