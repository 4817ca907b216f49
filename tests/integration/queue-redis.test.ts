import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Queue, QueueEvents } from 'bullmq';
import { afterAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/data-source';
import { MarkerEntity } from '../../server/entities';
import type { MarkerJobInput } from '../../server/modules/markers/marker-input';
import { createRedisMarkerQueue, MARKER_QUEUE_NAME, markerJobId, redisConnection } from '../../server/modules/markers/marker-queue-redis';
import { mm } from '../../shared/units/units';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { createRedisJobRunner, JOB_QUEUE_NAME } from '../../server/jobs/job-runner';
import { binary, buildTestApp, DEMO, signIn } from '../fixtures/test-app';


const redisUrl = process.env.TEST_REDIS_URL;
const dir = mkdtempSync(join(tmpdir(), 'seamrun-queue-'));
const workers: ChildProcess[] = [];
afterAll(() => {
  for (const w of workers) w.kill('SIGKILL');
  rmSync(dir, { recursive: true, force: true });
});

function startWorker(database: string): Promise<ChildProcess> {
  return new Promise((resolve, reject) => {
    const isUrl = database.includes('://');
    const proc = spawn(process.execPath, ['--import', 'tsx', 'server/worker.ts'], {
      env: {
        ...process.env,
        NODE_ENV: 'test',
        REDIS_URL: redisUrl,
        ...(isUrl ? { DATABASE_URL: database } : { DATABASE_PATH: database, DATABASE_URL: '' }),
        WORKER_LOCK_MS: '2000',
        WORKER_STALLED_MS: '1000',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    workers.push(proc);
    let out = '';
    const onData = (d: Buffer) => {
      out += String(d);
      if (out.includes('"ready":true')) resolve(proc);
    };
    proc.stdout!.on('data', onData);
    proc.stderr!.on('data', (d) => (out += String(d)));
    proc.on('exit', (code) => reject(new Error(`worker exited ${code}: ${out}`)));
    setTimeout(() => reject(new Error(`worker did not start: ${out}`)), 60_000);
  });
}

/** A small job of rectangles that takes a few seconds of its budget. */
const job: MarkerJobInput = {
  engine: {
    stripWidth: mm(1000),
    gap: mm(0),
    pieces: [
      { id: 'a', polygon: [{ x: 0, y: 0 }, { x: 300, y: 0 }, { x: 300, y: 200 }, { x: 0, y: 200 }], quantity: 12 },
      { id: 'b', polygon: [{ x: 0, y: 0 }, { x: 250, y: 0 }, { x: 125, y: 180 }], quantity: 10 },
    ],
  },
  seed: 7,
  seconds: 6,
  labels: { a: { size: 'M', name: 'panel' }, b: { size: 'M', name: 'gusset' } },
};

describe.skipIf(!redisUrl)('job queue on Redis with two worker processes', () => {
  it('runs the cut-order solve, the documents and mail on a worker process, with the same answers', async () => {
    const target = process.env.TEST_DATABASE_URL ? await freshDatabaseTarget() : join(dir, 'jobs.sqlite');
    const w = await startWorker(target);
    const jobs = createRedisJobRunner(redisUrl!);
    const { app, ds: appDs } = await buildTestApp({ jobs });
    const owner = await signIn(app, DEMO.owner);

    const b = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
    const planned = await owner.post(`/api/batches/${b.body.batch.id}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3, overcutPercent: 0 });
    expect(planned.status).toBe(201);
    // The same solve in this process gives the same lays (the core is deterministic).
    const local = await buildTestApp();
    const localOwner = await signIn(local.app, DEMO.owner);
    const b2 = await localOwner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
    const plannedHere = await localOwner.post(`/api/batches/${b2.body.batch.id}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3, overcutPercent: 0 });
    const shape = (p: { lays: { ratio: unknown; plies: number }[]; fabricUsedMm: number }) => ({ lays: p.lays.map((l) => [l.ratio, l.plies]), used: p.fabricUsedMm });
    expect(shape(planned.body.cutPlan)).toEqual(shape(plannedHere.body.cutPlan));
    await local.ds.destroy();

    const xlsx = await owner.get(`/api/batches/${b.body.batch.id}/marker-list.xlsx`).buffer(true).parse(binary);
    expect(xlsx.status).toBe(200);
    expect((xlsx.body as Buffer).subarray(0, 2).toString()).toBe('PK');
    const costing = await owner.get('/api/batches/1/costing.xlsx').buffer(true).parse(binary);
    expect(costing.status).toBe(200);
    const made = await owner.post('/api/purchasing/batches/1/orders').send({});
    expect(made.status).toBe(201);
    const po = made.body.orders[0];
    expect((await owner.post(`/api/purchasing/orders/${po.id}/send`)).status).toBe(200);
    // The worker handed the message to this process's local outbox, which filed it.
    const { messages } = (await owner.get('/api/mail/outbox')).body;
    expect(messages.length).toBeGreaterThan(0);

    const q = new Queue(JOB_QUEUE_NAME, { connection: redisConnection(redisUrl!) });
    const done = await q.getJobs(['completed']);
    const ranOnWorker = new Set(done.filter((j) => j.processedBy?.endsWith(String(w.pid))).map((j) => j.name));
    expect(ranOnWorker).toContain('cut-order');
    expect(ranOnWorker).toContain('marker-list.xlsx');
    expect(ranOnWorker).toContain('costing-sheet.xlsx');
    expect(ranOnWorker).toContain('mail');
    expect(ranOnWorker).toContain('purchase-order.xlsx');
    await q.close();
    await jobs.stop();
    await appDs.destroy();
    // Gone before the next test: a closing worker still holding a blocking fetch would take its job.
    await new Promise((r) => {
      w.once('exit', r);
      w.kill('SIGTERM');
    });
  }, 120_000);

  it('retries a job whose worker is killed mid-run and finishes it once', async () => {
    const target = process.env.TEST_DATABASE_URL ? await freshDatabaseTarget() : join(dir, 'queue.sqlite');
    const ds = await openDatabase(target);
    const w1 = await startWorker(target);
    const w2 = await startWorker(target);
    const events = new QueueEvents(MARKER_QUEUE_NAME, { connection: redisConnection(redisUrl!) });
    await events.waitUntilReady();
    const completed: string[] = [];
    const active: string[] = [];
    events.on('completed', ({ jobId }) => completed.push(jobId));
    events.on('active', ({ jobId }) => active.push(jobId));

    const marker = await ds.getRepository(MarkerEntity).save({
      studioId: 1, styleId: 1, ratio: { M: 1 }, widthMm: 1000, inputHash: `queue-test-${Date.now()}`,
      status: 'queued', input: job, result: null, error: '',
    });
    const queue = createRedisMarkerQueue(redisUrl!);
    queue.enqueue(1, marker.id, job);

    // Wait until one worker holds the job, then kill the process that runs it.
    const started = Date.now();
    while (!queue.progress(marker.id) && Date.now() - started < 30_000) await new Promise((r) => setTimeout(r, 100));
    const row = await ds.getRepository(MarkerEntity).findOneByOrFail({ id: marker.id });
    expect(row.status).toBe('running');
    const { Queue } = await import('bullmq');
    const q = new Queue(MARKER_QUEUE_NAME, { connection: redisConnection(redisUrl!) });
    const holder = (await q.getJob(markerJobId(marker.id)))?.processedBy ?? '';
    const victim = holder.endsWith(String(w1.pid)) ? w1 : w2;
    victim.kill('SIGKILL');

    while (!completed.includes(markerJobId(marker.id)) && Date.now() - started < 90_000) {
      await new Promise((r) => setTimeout(r, 200));
    }
    const done = await ds.getRepository(MarkerEntity).findOneByOrFail({ id: marker.id });
    expect(done.status).toBe('done');
    expect(done.utilisation).toBeGreaterThan(0.5);
    expect(completed.filter((id) => id === markerJobId(marker.id))).toHaveLength(1);
    expect(active.filter((id) => id === markerJobId(marker.id)).length).toBeGreaterThanOrEqual(2);

    // Queued again (a resumed or re-run marker): the finished job kept for the same row must not swallow it.
    completed.length = 0;
    await ds.getRepository(MarkerEntity).update({ id: marker.id }, { status: 'queued' });
    queue.enqueue(1, marker.id, { ...job, seconds: 1 });
    const again = Date.now();
    while (!completed.includes(markerJobId(marker.id)) && Date.now() - again < 60_000) await new Promise((r) => setTimeout(r, 200));
    expect(completed).toContain(markerJobId(marker.id));
    await q.close();
    await events.close();
    await queue.stop();
    await ds.destroy();
  }, 120_000);
});
