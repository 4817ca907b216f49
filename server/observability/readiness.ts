import { Queue } from 'bullmq';
import { JOB_QUEUE_NAME } from '../jobs/job-runner';
import { redisConnection } from '../jobs/redis-connection';
import { MARKER_QUEUE_NAME } from '../modules/markers/marker-queue-redis';

export interface ReadinessReport {
  ready: boolean;
  database: { ok: boolean; driver: string; ms: number; error?: string };
  redis?: { ok: boolean; ms: number; error?: string };
  /** Jobs waiting, running and delayed per queue (Redis only; the in-process queue lives with this process). */
  queues?: Record<string, { waiting: number; active: number; delayed: number; failed: number }>;
  jobs: 'in-process' | 'redis';
}

const TIMEOUT_MS = 2_000;

/** Rejects after `ms` so a hung dependency answers "not ready" instead of hanging the probe. */
function within<T>(p: Promise<T>, ms = TIMEOUT_MS): Promise<T> {
  return Promise.race([p, new Promise<T>((_, reject) => setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms).unref())]);
}

/**
 * For a process manager or load balancer: is the database answering, and (with REDIS_URL) Redis and
 * the two job queues? Each check has its own time limit; any failure makes the whole answer not ready.
 */
/** The database as the probe sees it: its driver's name and a trivial query (createApp builds it from the data source). */
export interface DatabaseProbe {
  driver: string;
  ping(): Promise<unknown>;
}

export async function readiness(deps: { database: DatabaseProbe; redisUrl?: string }): Promise<ReadinessReport> {
  const t0 = performance.now();
  let database: ReadinessReport['database'];
  try {
    await within(deps.database.ping());
    database = { ok: true, driver: deps.database.driver, ms: Math.round(performance.now() - t0) };
  } catch (err) {
    database = { ok: false, driver: deps.database.driver, ms: Math.round(performance.now() - t0), error: (err as Error).message };
  }
  if (!deps.redisUrl) return { ready: database.ok, database, jobs: 'in-process' };

  const t1 = performance.now();
  const connection = redisConnection(deps.redisUrl);
  let redis: NonNullable<ReadinessReport['redis']>;
  const queues: NonNullable<ReadinessReport['queues']> = {};
  try {
    await within(connection.ping());
    redis = { ok: true, ms: Math.round(performance.now() - t1) };
    for (const name of [MARKER_QUEUE_NAME, JOB_QUEUE_NAME]) {
      const q = new Queue(name, { connection });
      const c = await within(q.getJobCounts('waiting', 'active', 'delayed', 'failed'));
      queues[name] = { waiting: c.waiting ?? 0, active: c.active ?? 0, delayed: c.delayed ?? 0, failed: c.failed ?? 0 };
    }
  } catch (err) {
    redis = { ok: false, ms: Math.round(performance.now() - t1), error: (err as Error).message };
  } finally {
    connection.disconnect();
  }
  return { ready: database.ok && redis.ok, database, redis, queues, jobs: 'redis' };
}
