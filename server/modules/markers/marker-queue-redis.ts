import { Queue, QueueEvents, Worker, type Job } from 'bullmq';
import { Redis } from 'ioredis';
import type { NestingRunHandle } from '../../workers/nesting-runner';
import type { MarkerJobInput } from './marker-input';
import { executeMarkerJob, type LiveProgress } from './marker-job';
import { MAX_QUEUED_PER_STUDIO, markerQueueFull, type MarkerQueue, type MarkerQueueOptions } from './marker-queue';
import type { MarkerRepository } from './marker.repository';

/** BullMQ queue name of marker (nesting) jobs. */
export const MARKER_QUEUE_NAME = 'seamrun-markers';
const cancelKey = (id: number) => `seamrun:markers:cancel:${id}`;
/** BullMQ refuses integer job ids; one job per marker row. */
export const markerJobId = (id: number) => `marker-${id}`;
const markerIdOf = (jobId: string) => Number(jobId.replace('marker-', ''));

interface MarkerJobData {
  studioId: number;
  id: number;
  job: MarkerJobInput;
}

export const redisConnection = (url: string) => new Redis(url, { maxRetriesPerRequest: null });

/**
 * The marker queue on Redis (BullMQ): the API process only enqueues, reads progress events and asks for
 * cancellation; worker processes (`npm run worker`, any number, on any machine) run the jobs. A job whose
 * worker dies is found stalled when its lock expires and runs again on another worker. Same interface as
 * the in-process queue, so the API behaves the same with or without REDIS_URL.
 */
export function createRedisMarkerQueue(redisUrl: string, opts: Pick<MarkerQueueOptions, 'maxQueuedPerStudio'> = {}): MarkerQueue {
  const maxQueued = opts.maxQueuedPerStudio ?? MAX_QUEUED_PER_STUDIO;
  const connection = redisConnection(redisUrl);
  const queue = new Queue<MarkerJobData>(MARKER_QUEUE_NAME, { connection });
  const events = new QueueEvents(MARKER_QUEUE_NAME, { connection: redisConnection(redisUrl) });
  const live = new Map<number, LiveProgress>();
  events.on('progress', ({ jobId, data }) => live.set(markerIdOf(jobId), data as unknown as LiveProgress));
  const forget = ({ jobId }: { jobId: string }) => live.delete(markerIdOf(jobId));
  events.on('completed', forget);
  events.on('failed', forget);
  const reserved = new Map<number, number>();
  /** Waiting marker jobs of one studio (a few per studio at most, so reading them is cheap). */
  const waitingOf = async (studioId: number) =>
    (await queue.getJobs(['waiting', 'prioritized', 'delayed'])).filter((j) => j?.data.studioId === studioId).length;
  return {
    async reserve(studioId) {
      reserved.set(studioId, (reserved.get(studioId) ?? 0) + 1);
      const release = () => {
        const n = (reserved.get(studioId) ?? 1) - 1;
        if (n > 0) reserved.set(studioId, n);
        else reserved.delete(studioId);
      };
      if ((await waitingOf(studioId)) + (reserved.get(studioId) ?? 0) > maxQueued) {
        release();
        throw markerQueueFull(maxQueued);
      }
      let done = false;
      return () => {
        if (!done) release();
        done = true;
      };
    },
    enqueue(studioId, id, job) {
      void (async () => {
        // A finished run of the same marker row, kept for inspection, would make BullMQ ignore this one.
        const previous = await queue.getJob(markerJobId(id));
        if (previous && ((await previous.isCompleted()) || (await previous.isFailed()))) await previous.remove();
        // The studio's n-th waiting job gets priority n (1 runs first), so studios take turns as in the
        // in-process queue: one studio's many markers wait behind another's first one.
        await queue.add('marker', { studioId, id, job }, {
          jobId: markerJobId(id),
          priority: Math.min(1 + (await waitingOf(studioId)), 2_097_152),
          removeOnComplete: 1000,
          removeOnFail: 1000,
          attempts: 3,
          backoff: { type: 'fixed', delay: 1000 },
        });
      })().catch((e: unknown) => console.error(`Could not queue marker ${id}: ${e instanceof Error ? e.message : String(e)}`));
    },
    progress: (id) => live.get(id),
    isRunning: (id) => live.has(id),
    cancel(id) {
      void connection.set(cancelKey(id), '1', 'EX', 3600);
      void queue.getJob(markerJobId(id)).then((j) => j?.isWaiting().then((w) => (w ? j.remove() : undefined)));
      return live.has(id);
    },
    async idle() {
      for (;;) {
        const c = await queue.getJobCounts('waiting', 'active', 'delayed');
        if (c.waiting + c.active + c.delayed === 0) return;
        await new Promise((r) => setTimeout(r, 200));
      }
    },
    async stop() {
      await events.close();
      await queue.close();
      connection.disconnect();
    },
  };
}

export interface MarkerWorkerOptions extends Pick<MarkerQueueOptions, 'overrunMs' | 'workerEntry' | 'onDone'> {
  /** A stalled job (its worker died) is retried once its lock expires; lower in tests. */
  lockDurationMs?: number;
  stalledIntervalMs?: number;
  name?: string;
}

/** A worker process's consumer of marker jobs: one at a time, progress published, cancel honoured. */
export function startMarkerWorker(redisUrl: string, markers: MarkerRepository, opts: MarkerWorkerOptions = {}) {
  const connection = redisConnection(redisUrl);
  const worker = new Worker<MarkerJobData>(
    MARKER_QUEUE_NAME,
    async (job: Job<MarkerJobData>) => {
      const { studioId, id } = job.data;
      let handle: NestingRunHandle | undefined;
      const poll = setInterval(() => {
        void connection.get(cancelKey(id)).then((v) => v && handle?.cancel());
      }, 500);
      try {
        await executeMarkerJob(markers, studioId, id, job.data.job, {
          overrunMs: opts.overrunMs,
          workerEntry: opts.workerEntry,
          onDone: opts.onDone,
          onProgress: (p) => void job.updateProgress(p as unknown as object),
          onStart: (h) => (handle = h),
          // BullMQ's job lock already makes this worker the only holder; a stalled job's row still
          // shows the dead worker's claim, which this one takes over.
          takeover: true,
        });
      } finally {
        clearInterval(poll);
      }
    },
    {
      connection,
      concurrency: 1,
      name: opts.name,
      lockDuration: opts.lockDurationMs ?? 30_000,
      stalledInterval: opts.stalledIntervalMs ?? 30_000,
      maxStalledCount: 2,
    },
  );
  return worker;
}
