import { AppError } from '../../errors';
import { FairQueue } from './fair-queue';
import type { NestingRunHandle } from '../../workers/nesting-runner';
import { executeMarkerJob, type LiveProgress, type MarkerDoneHook } from './marker-job';
import type { MarkerJobInput } from './marker-input';
import type { MarkerRepository } from './marker.repository';

export interface MarkerQueueOptions {
  /** Grace past the budget before a run counts as overrun (the engine's first layout is not interruptible). */
  overrunMs?: number;
  /** Worker entry override, for tests. */
  workerEntry?: string;
  /** Called after a marker is stored as done (the cutting area's hook links it to planned lays of that ratio). */
  onDone?: MarkerDoneHook;
  /** Markers one studio may have waiting (not counting the one running); default {@link MAX_QUEUED_PER_STUDIO}. */
  maxQueuedPerStudio?: number;
}

/** Default cap on one studio's waiting markers. */
export const MAX_QUEUED_PER_STUDIO = 5;

/** The 429 a studio gets when it already has its share of markers waiting. */
export const markerQueueFull = (max: number) =>
  new AppError(
    429,
    'rate_limited',
    `Your studio already has ${max} markers waiting to run; wait for one to finish or cancel one, then start this marker again`,
  );

/** What the marker service needs of a queue, in-process or on Redis. */
export interface MarkerQueue {
  /**
   * Takes one of the studio's waiting places before its marker row is stored; throws the 429
   * {@link markerQueueFull} when the studio already has its share waiting. Call the returned function once
   * the marker is enqueued, or when it is not enqueued after all.
   */
  reserve(studioId: number): Promise<() => void>;
  /** Queue a marker row already stored as 'queued'. */
  enqueue(studioId: number, id: number, job: MarkerJobInput): void;
  progress(id: number): LiveProgress | undefined;
  isRunning(id: number): boolean;
  /** Cancel a queued or running job; true when it was running (it stops at its next check). */
  cancel(id: number): boolean;
  /** Resolves when every queued job has finished (tests). */
  idle(): Promise<void>;
  stop(): Promise<void>;
}

/**
 * The marker job queue: one nesting run at a time (the machine has 2 cores and the request thread keeps
 * one), taken from the studios' waiting markers in turn ({@link FairQueue}), each studio holding at most
 * `maxQueuedPerStudio` waiting. Each job runs on a worker thread; progress is kept in memory for
 * GET /api/markers/:id; the finished marker is checked by the independent layout checker and stored.
 */
export function createMarkerQueue(markers: MarkerRepository, opts: MarkerQueueOptions = {}): MarkerQueue & { queuedCount(studioId: number): number } {
  const maxQueued = opts.maxQueuedPerStudio ?? MAX_QUEUED_PER_STUDIO;
  const waiting = new FairQueue<{ id: number; job: MarkerJobInput }>();
  /** Places taken by a caller between its cap check and its enqueue (the marker row is being stored). */
  const reserved = new Map<number, number>();
  const live = new Map<number, LiveProgress>();
  const running = new Map<number, NestingRunHandle>();
  const idleWaiters: (() => void)[] = [];
  /** Jobs queued here and not yet started, so a sweep does not queue them twice in this process. */
  const pending = new Set<number>();
  let busy = false;
  let stopped = false;

  async function run(studioId: number, id: number, job: MarkerJobInput) {
    pending.delete(id);
    if (stopped) return;
    try {
      await executeMarkerJob(markers, studioId, id, job, {
        overrunMs: opts.overrunMs,
        workerEntry: opts.workerEntry,
        onDone: opts.onDone,
        onProgress: (p) => live.set(id, p),
        onStart: (h) => running.set(id, h),
        isStopped: () => stopped,
      });
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      await markers.update(studioId, id, { status: 'failed', error: `The marker job failed: ${message}` }).catch(() => undefined);
    } finally {
      running.delete(id);
      live.delete(id);
    }
  }

  /** Runs waiting jobs one after another, the studios taking turns, until none is left. */
  async function drain() {
    if (busy) return;
    busy = true;
    try {
      for (let next = waiting.shift(); next && !stopped; next = waiting.shift()) {
        const { studioId, item } = next;
        await run(studioId, item.id, item.job).catch(async (err: unknown) => {
          const message = err instanceof Error ? err.message : String(err);
          await markers.update(studioId, item.id, { status: 'failed', error: `The marker job failed: ${message}` }).catch(() => undefined);
        });
      }
    } finally {
      busy = false;
      if (!waiting.size || stopped) idleWaiters.splice(0).forEach((resolve) => resolve());
    }
  }

  const release = (studioId: number) => {
    const n = (reserved.get(studioId) ?? 1) - 1;
    if (n > 0) reserved.set(studioId, n);
    else reserved.delete(studioId);
  };

  return {
    async reserve(studioId: number) {
      if (waiting.countOf(studioId) + (reserved.get(studioId) ?? 0) >= maxQueued) throw markerQueueFull(maxQueued);
      reserved.set(studioId, (reserved.get(studioId) ?? 0) + 1);
      let done = false;
      return () => {
        if (!done) release(studioId);
        done = true;
      };
    },
    /**
     * Queue a marker row stored as 'queued' (or left 'running' by a process that died). Queuing a job
     * this or another process also queued is harmless: the run starts by claiming it, and only one claim wins.
     */
    enqueue(studioId: number, id: number, job: MarkerJobInput) {
      stopped = false;
      if (pending.has(id) || running.has(id)) return;
      pending.add(id);
      waiting.push(studioId, { id, job });
      void drain();
    },
    /** Waiting markers of a studio (not counting a running one). */
    queuedCount: (studioId: number) => waiting.countOf(studioId),
    progress: (id: number) => live.get(id),
    isRunning: (id: number) => running.has(id),
    cancel(id: number): boolean {
      const h = running.get(id);
      if (h) {
        h.cancel();
        return true;
      }
      waiting.remove((w) => w.id === id);
      pending.delete(id);
      return false;
    },
    idle: () => (busy || waiting.size ? new Promise<void>((resolve) => idleWaiters.push(resolve)) : Promise.resolve()),
    async stop() {
      stopped = true;
      waiting.clear();
      pending.clear();
      for (const h of running.values()) h.cancel();
      running.clear();
    },
  };
}
