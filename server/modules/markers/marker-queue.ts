import PQueue from 'p-queue';
import type { NestingResult } from '@planning';
import type { NestingRunHandle } from '../../workers/nesting-runner';
import { executeMarkerJob } from './marker-job';
import type { MarkerJobInput } from './marker-input';
import type { MarkerRepository } from './marker.repository';

/** What is known about a running job between its progress reports. */
export interface LiveProgress {
  bestLength: number;
  elapsedMs: number;
  iteration: number;
}

/** Stored result of a marker run: the engine's result plus the label of every piece. */
export interface StoredMarkerResult extends NestingResult {
  check: { valid: boolean; errors: string[] };
}

export interface MarkerQueueOptions {
  /** Grace past the budget before a run counts as overrun (the engine's first layout is not interruptible). */
  overrunMs?: number;
  /** Worker entry override, for tests. */
  workerEntry?: string;
  /** Called after a marker is stored as done (the cutting area links it to planned lays of that ratio). */
  onDone?: (studioId: number, markerId: number) => Promise<void>;
}

/**
 * The marker job queue: one nesting run at a time (p-queue, concurrency 1: the machine has 2 cores and
 * the request thread keeps one). Each job runs on a worker thread; progress is kept in memory for
 * GET /api/markers/:id; the finished marker is checked by the independent layout checker and stored.
 */
export function createMarkerQueue(markers: MarkerRepository, opts: MarkerQueueOptions = {}) {
  const queue = new PQueue({ concurrency: 1 });
  const live = new Map<number, LiveProgress>();
  const running = new Map<number, NestingRunHandle>();
  const cancelledBeforeStart = new Set<number>();
  /** Jobs queued here and not yet started, so a sweep does not queue them twice in this process. */
  const pending = new Set<number>();
  let stopped = false;

  async function run(studioId: number, id: number, job: MarkerJobInput) {
    pending.delete(id);
    if (stopped || cancelledBeforeStart.delete(id)) return;
    try {
      await executeMarkerJob(markers, studioId, id, job, {
        overrunMs: opts.overrunMs,
        workerEntry: opts.workerEntry,
        onDone: opts.onDone,
        onProgress: (p) => live.set(id, p),
        onStart: (h) => running.set(id, h),
        isStopped: () => stopped,
      });
    } finally {
      running.delete(id);
      live.delete(id);
    }
  }

  return {
    /**
     * Queue a marker row stored as 'queued' (or left 'running' by a process that died). Queuing a job
     * this or another process also queued is harmless: the run starts by claiming it, and only one claim wins.
     */
    enqueue(studioId: number, id: number, job: MarkerJobInput) {
      stopped = false;
      if (pending.has(id) || running.has(id)) return;
      pending.add(id);
      void queue.add(() =>
        run(studioId, id, job).catch(async (err: unknown) => {
          const message = err instanceof Error ? err.message : String(err);
          await markers.update(studioId, id, { status: 'failed', error: `The marker job failed: ${message}` }).catch(() => undefined);
        }),
      );
    },
    progress: (id: number) => live.get(id),
    isRunning: (id: number) => running.has(id),
    /** Cancel a queued or running job; true when there was one. */
    cancel(id: number): boolean {
      const h = running.get(id);
      if (h) {
        h.cancel();
        return true;
      }
      cancelledBeforeStart.add(id);
      return false;
    },
    /** Resolves when every queued job has finished (tests). */
    idle: () => queue.onIdle(),
    async stop() {
      stopped = true;
      queue.clear();
      pending.clear();
      for (const h of running.values()) h.cancel();
      running.clear();
    },
  };
}

export type MarkerQueue = ReturnType<typeof createMarkerQueue>;
