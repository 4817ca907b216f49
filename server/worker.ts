/**
 * `npm run worker`: a job worker process for many-studio hosts. With REDIS_URL set it consumes the
 * marker (nesting) jobs the API queues in Redis; start as many as you like, on any machine that reaches
 * the same database and Redis. Stops cleanly on SIGTERM.
 */
import 'reflect-metadata';
import { openDatabase } from './db/data-source';
import { loadEnv } from './env';
import { linkMarkerToLays } from './modules/markers/link-lays';
import { startMarkerWorker } from './modules/markers/marker-queue-redis';
import { createMarkerRepository } from './modules/markers/marker.repository';

const env = loadEnv();
if (!env.REDIS_URL) {
  console.error('npm run worker needs REDIS_URL (redis://…); without it the server runs jobs in-process.');
  process.exit(1);
}
const ds = await openDatabase(env.DATABASE_URL || env.DATABASE_PATH);
const worker = startMarkerWorker(env.REDIS_URL, createMarkerRepository(ds), {
  onDone: (studioId, id) => linkMarkerToLays(ds, studioId, id),
  lockDurationMs: Number(process.env.WORKER_LOCK_MS ?? 30_000),
  stalledIntervalMs: Number(process.env.WORKER_STALLED_MS ?? 30_000),
  name: `worker-${process.pid}`,
});
await worker.waitUntilReady();
console.log(JSON.stringify({ worker: `worker-${process.pid}`, queue: 'markers', ready: true }));
const shutdown = async () => {
  await worker.close();
  await ds.destroy();
  process.exit(0);
};
process.on('SIGTERM', shutdown);
process.on('SIGINT', shutdown);
