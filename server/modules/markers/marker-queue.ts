import { AppError } from '../../errors';
import { FairQueue } from './fair-queue';
import type { NestingSearchHandle } from '../../workers/nesting-search';
import { defaultMarkerLanes, executeMarkerJob, type LiveProgress, type MarkerDoneHook } from './marker-job';
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
  /**
   * Worker threads all marker runs share (default {@link defaultMarkerLanes}: both cores). One job alone
   * takes them all; when another starts, they are split between the running jobs.
   */
  cores?: number;
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
 * The marker job queue: markers are taken from the studios' waiting markers in turn ({@link FairQueue}),
 * each studio holding at most `maxQueuedPerStudio` waiting. Runs share `cores` worker threads: a job running
 * alone searches on all of them (independent seeds, the shortest marker kept); when a second job starts,
 * the first gives up a thread to it, and a job left alone takes the freed threads back. As many jobs run
 * at once as there are cores. Progress is kept in memory for GET /api/markers/:id; the finished marker is
 * checked by the independent layout checker and stored.
 */
export function createMarkerQueue(markers: MarkerRepository, opts: MarkerQueueOptions = {}): MarkerQueue & { queuedCount(studioId: number): number } {
  const maxQueued = opts.maxQueuedPerStudio ?? MAX_QUEUED_PER_STUDIO;
  const waiting = new FairQueue<{ id: number; job: MarkerJobInput }>();
  /** Places taken by a caller between its cap check and its enqueue (the marker row is being stored). */
  const reserved = new Map<number, number>();
  const live = new Map<number, LiveProgress>();
  const running = new Map<number, NestingSearchHandle>();
  const cores = Math.max(1, Math.floor(opts.cores ?? defaultMarkerLanes()));
  /** Jobs started and not yet finished (a job is counted before its worker handle exists). */
  let active = 0;
  const idleWaiters: (() => void)[] = [];
  /** Jobs queued here and not yet started, so a sweep does not queue them twice in this process. */
  const pending = new Set<number>();
  let stopped = false;

  /** Split the cores between the running jobs: the earliest-started get the remainder. */
  function rebalance() {
    const handles = [...running.values()];
    handles.forEach((h, k) => h.setLanes(Math.floor(cores / handles.length) + (k < cores % handles.length ? 1 : 0)));
  }

  async function run(studioId: number, id: number, job: MarkerJobInput) {
    pending.delete(id);
    if (stopped) return;
    // Lanes to start with: an equal share of the cores among the jobs running once this one starts.
    const lanes = Math.max(1, Math.floor(cores / active));
    try {
      await executeMarkerJob(markers, studioId, id, job, {
        overrunMs: opts.overrunMs,
        workerEntry: opts.workerEntry,
        onDone: opts.onDone,
        lanes,
        onProgress: (p) => live.set(id, p),
        onStart: (h) => {
          running.set(id, h);
          live.set(id, { bestLength: null, elapsedMs: 0, iteration: 0, lanes: h.lanes(), history: [] });
          rebalance();
        },
        isStopped: () => stopped,
      });
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      await markers.update(studioId, id, { status: 'failed', error: `The marker job failed: ${message}` }).catch(() => undefined);
    } finally {
      running.delete(id);
      live.delete(id);
      rebalance();
    }
  }

  /** Starts waiting jobs, the studios taking turns, while fewer than `cores` run. */
  function drain() {
    while (!stopped && active < cores && waiting.size) {
      const next = waiting.shift();
      if (!next) break;
      active++;
      const { studioId, item } = next;
      void run(studioId, item.id, item.job)
        .catch(async (err: unknown) => {
          const message = err instanceof Error ? err.message : String(err);
          await markers.update(studioId, item.id, { status: 'failed', error: `The marker job failed: ${message}` }).catch(() => undefined);
        })
        .finally(() => {
          active--;
          drain();
          if ((active === 0 && !waiting.size) || stopped) idleWaiters.splice(0).forEach((resolve) => resolve());
        });
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
      drain();
    },
    /** Waiting markers of a studio (not counting a running one). */
    queuedCount: (studioId: number) => waiting.countOf(studioId),
    progress(id: number) {
      const p = live.get(id);
      const h = running.get(id);
      // Lanes change between progress reports when jobs start or end: read them from the run itself.
      return p && h ? { ...p, lanes: h.lanes() } : p;
    },
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
    idle: () => (active || waiting.size ? new Promise<void>((resolve) => idleWaiters.push(resolve)) : Promise.resolve()),
    async stop() {
      stopped = true;
      waiting.clear();
      pending.clear();
      for (const h of running.values()) h.cancel();
      running.clear();
    },
  };
}
