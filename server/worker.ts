/**
 * `npm run worker`: a job worker process for many-studio hosts. With REDIS_URL set it consumes the
 * marker (nesting) jobs and the other long jobs (cut-order solves, exported documents, mail; see
 * server/jobs/handlers.ts) the API queues in Redis; start as many as you like, on any machine that reaches
 * the same database and Redis. Mail goes to SMTP_URL, or to the local outbox of the web process when it
 * runs on the same machine. Stops cleanly on SIGTERM.
 */
import 'reflect-metadata';
import { openDatabase } from './db/data-source';
import { loadEnv, shouldMigrateOnStart } from './env';
import { startJobWorker } from './jobs/job-runner';
import { closeMailTransports } from './modules/mail/mail-job';
import { createCutPlanRepository } from './modules/cutting/cut-plan.repository';
import { startMarkerWorker } from './modules/markers/marker-queue-redis';
import { createMarkerRepository } from './modules/markers/marker.repository';

const env = loadEnv();
if (!env.REDIS_URL) {
  console.error('npm run worker needs REDIS_URL (redis://…); without it the server runs jobs in-process.');
  process.exit(1);
}
const ds = await openDatabase(env.DATABASE_URL || env.DATABASE_PATH, { migrate: shouldMigrateOnStart(env) });
const plans = createCutPlanRepository(ds);
const worker = startMarkerWorker(env.REDIS_URL, createMarkerRepository(ds), {
  // The cutting area's completion hook, as the web process hands it to its queue.
  onDone: (studioId, id) => plans.linkMarkerToLays(studioId, id),
  lockDurationMs: Number(process.env.WORKER_LOCK_MS ?? 30_000),
  stalledIntervalMs: Number(process.env.WORKER_STALLED_MS ?? 30_000),
  name: `worker-${process.pid}`,
});
const jobs = startJobWorker(env.REDIS_URL, {
  name: `worker-${process.pid}`,
  lockDurationMs: Number(process.env.WORKER_LOCK_MS ?? 30_000),
  stalledIntervalMs: Number(process.env.WORKER_STALLED_MS ?? 30_000),
});
await Promise.all([worker.waitUntilReady(), jobs.waitUntilReady()]);
console.log(JSON.stringify({ worker: `worker-${process.pid}`, queues: ['markers', 'jobs'], ready: true }));
const shutdown = async () => {
  await Promise.all([worker.close(), jobs.close()]);
  closeMailTransports();
  await ds.destroy();
  process.exit(0);
};
process.on('SIGTERM', shutdown);
process.on('SIGINT', shutdown);
