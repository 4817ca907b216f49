import { checkLayout } from '@planning';
import { runNestingWorker, type NestingRunHandle } from '../../workers/nesting-runner';
import type { MarkerJobInput } from './marker-input';
import type { MarkerRepository } from './marker.repository';
import type { LiveProgress, StoredMarkerResult } from './marker-queue';

export interface MarkerJobHooks {
  /** Grace past the budget before a run counts as overrun. */
  overrunMs?: number;
  /** Worker entry override, for tests. */
  workerEntry?: string;
  onProgress?: (p: LiveProgress) => void;
  /** Receives the run handle so the caller can cancel it. */
  onStart?: (handle: NestingRunHandle) => void;
  /** Called after a marker is stored as done. */
  onDone?: (studioId: number, markerId: number) => Promise<void>;
  /** True when the caller shut down mid-run: the outcome is then not stored (the job resumes later). */
  isStopped?: () => boolean;
}

/**
 * Runs one stored marker job to its end on a worker thread and stores the outcome: the layout (checked by
 * the independent checker), a cancellation, or a failure with its message. Shared by the in-process queue
 * and the Redis worker processes, so both behave the same.
 */
export async function executeMarkerJob(
  markers: MarkerRepository,
  studioId: number,
  id: number,
  job: MarkerJobInput,
  hooks: MarkerJobHooks = {},
): Promise<void> {
  await markers.update(studioId, id, { status: 'running' });
  const started = performance.now();
  const handle = runNestingWorker(job.engine, {
    seed: job.seed,
    timeBudgetMs: job.seconds * 1000,
    overrunMs: hooks.overrunMs ?? Math.max(60_000, job.seconds * 1000),
    entry: hooks.workerEntry,
    onProgress: hooks.onProgress,
  });
  hooks.onStart?.(handle);
  const outcome = await handle.done;
  const elapsedMs = performance.now() - started;
  if (hooks.isStopped?.()) return;
  if (outcome.kind === 'result') {
    const check = checkLayout(job.engine, outcome.result);
    const result: StoredMarkerResult = { ...outcome.result, check: { valid: check.valid, errors: check.errors.slice(0, 10) } };
    await markers.update(studioId, id, {
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
    await markers.update(studioId, id, { status: 'cancelled', elapsedMs, error: 'Cancelled before a marker was found.' });
  } else {
    await markers.update(studioId, id, { status: 'failed', elapsedMs, error: outcome.message });
  }
}
