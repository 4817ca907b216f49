import { randomUUID } from 'node:crypto';
import { checkLayout, type NestingResult } from '@planning';
import { runNestingWorker, type NestingRunHandle } from '../../workers/nesting-runner';
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

/**
 * Called once a marker is stored as done. The markers area writes only its own table: whoever uses finished
 * markers (the cutting area links them to its planned lays) hands this hook to the queue.
 */
export type MarkerDoneHook = (studioId: number, markerId: number) => Promise<void>;

export interface MarkerJobHooks {
  /** Grace past the budget before a run counts as overrun. */
  overrunMs?: number;
  /** Worker entry override, for tests. */
  workerEntry?: string;
  onProgress?: (p: LiveProgress) => void;
  /** Receives the run handle so the caller can cancel it. */
  onStart?: (handle: NestingRunHandle) => void;
  /** Called after a marker is stored as done. */
  onDone?: MarkerDoneHook;
  /** True when the caller shut down mid-run: the outcome is then not stored (the job resumes later). */
  isStopped?: () => boolean;
  /** How long a claim holds without renewal (renewed every third of it while the run lives). */
  leaseMs?: number;
  /** Claim even a job another holder still leases (the Redis queue's own lock says that holder is gone). */
  takeover?: boolean;
  /** Clock of the lease (epoch ms). */
  nowMs?: () => number;
}

/** Default lease of a marker claim: a process that dies mid-run frees its job this long after its last renewal. */
export const MARKER_LEASE_MS = 15_000;

/**
 * Runs one stored marker job to its end on a worker thread and stores the outcome: the layout (checked by
 * the independent checker), a cancellation, or a failure with its message. Shared by the in-process queue
 * and the Redis worker processes, so both behave the same. Resolves false, without running, when another
 * process holds the job or it is no longer queued.
 */
export async function executeMarkerJob(
  markers: MarkerRepository,
  studioId: number,
  id: number,
  job: MarkerJobInput,
  hooks: MarkerJobHooks = {},
): Promise<boolean> {
  // One process runs a job: the conditional UPDATE lets exactly one claimant through, however many
  // processes queued it (start-up resume, the sweep for jobs of a process that died, a second enqueue).
  const token = randomUUID();
  const nowMs = hooks.nowMs ?? Date.now;
  const leaseMs = hooks.leaseMs ?? MARKER_LEASE_MS;
  if (!(await markers.claim(studioId, id, token, nowMs(), leaseMs, hooks.takeover))) return false;
  const started = performance.now();
  const handle = runNestingWorker(job.engine, {
    seed: job.seed,
    timeBudgetMs: job.seconds * 1000,
    overrunMs: hooks.overrunMs ?? Math.max(60_000, job.seconds * 1000),
    entry: hooks.workerEntry,
    onProgress: hooks.onProgress,
  });
  hooks.onStart?.(handle);
  // Renew the lease while the run lives; a refused renewal means the job was cancelled from another
  // process (or claimed by one after a stall): stop, and let `finish` store only what this claim still may.
  const heartbeat = setInterval(() => {
    void markers.renew(id, token, nowMs() + leaseMs).then((held) => held || handle.cancel(), () => undefined);
  }, Math.max(50, Math.floor(leaseMs / 3)));
  const outcome = await handle.done.finally(() => clearInterval(heartbeat));
  const elapsedMs = performance.now() - started;
  // Shut down mid-run: hand the job back at once rather than when the lease runs out.
  if (hooks.isStopped?.()) {
    await markers.finish(studioId, id, token, { status: 'queued' }).catch(() => undefined);
    return true;
  }
  const store = (patch: Parameters<MarkerRepository['finish']>[3]) => markers.finish(studioId, id, token, patch);
  if (outcome.kind === 'result') {
    const check = checkLayout(job.engine, outcome.result);
    const result: StoredMarkerResult = { ...outcome.result, check: { valid: check.valid, errors: check.errors.slice(0, 10) } };
    await store({
      status: check.valid ? (outcome.cancelled ? 'cancelled' : 'done') : 'failed',
      lengthMm: outcome.result.length,
      utilisation: outcome.result.utilisation,
      elapsedMs,
      result,
      // A run that used up its budget before improving is still a valid marker, only a longer one.
      error: check.valid
        ? outcome.cancelled
          ? 'Stopped early: the best marker so far is kept.'
          : outcome.result.complete
            ? ''
            : 'The time budget ran out early; a longer budget gives a shorter marker.'
        : `The layout checker refused the marker: ${check.errors[0]}`,
    });
    if (check.valid && !outcome.cancelled) await hooks.onDone?.(studioId, id);
  } else if (outcome.kind === 'cancelled') {
    await store({ status: 'cancelled', elapsedMs, error: 'Cancelled before a marker was found.' });
  } else {
    await store({ status: 'failed', elapsedMs, error: outcome.message });
  }
  return true;
}
