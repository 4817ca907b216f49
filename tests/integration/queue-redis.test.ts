import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueueEvents } from 'bullmq';
import { afterAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/data-source';
import { MarkerEntity } from '../../server/entities';
import type { MarkerJobInput } from '../../server/modules/markers/marker-input';
import { createRedisMarkerQueue, MARKER_QUEUE_NAME, markerJobId, redisConnection } from '../../server/modules/markers/marker-queue-redis';
import { mm } from '../../shared/units/units';
import { freshDatabaseTarget } from '../fixtures/fresh-database';

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
    await q.close();
    await events.close();
    await queue.stop();
    await ds.destroy();
  }, 120_000);
});
