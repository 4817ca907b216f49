import { randomUUID } from 'node:crypto';
import { availableParallelism } from 'node:os';
import { checkLayout, type NestingResult } from '@planning';
import { polygonArea } from '@shared/geometry/polygon';
import type { MarkerProgressPointDto } from '@shared/schemas/markers';
import { runNestingSearch, type NestingSearchHandle } from '../../workers/nesting-search';
import type { MarkerJobInput } from './marker-input';
import type { MarkerRepository } from './marker.repository';

/** What is known about a running job between its progress reports. */
export interface LiveProgress {
  /** Null until the first layout is built. */
  bestLength: number | null;
  elapsedMs: number;
  iteration: number;
  /** Worker threads the job runs on now. */
  lanes: number;
  /** Best length and density over time, oldest first (at most {@link MAX_PROGRESS_POINTS}). */
  history: MarkerProgressPointDto[];
}

/** Stored result of a marker run: the engine's result, the checker's verdict and the progress over time. */
export interface StoredMarkerResult extends NestingResult {
  check: { valid: boolean; errors: string[] };
  progress?: MarkerProgressPointDto[];
}

/** A progress chart needs no more: past this the history keeps every other point. */
export const MAX_PROGRESS_POINTS = 240;

/** Lanes a marker job takes when it runs alone: both cores of the 2-core machine, never more than there are. */
export const defaultMarkerLanes = () => Math.max(1, Math.min(2, availableParallelism()));

/** Total piece area of an engine input (mm²): copies × outline area, mirrored pieces in pairs. */
function pieceArea(job: MarkerJobInput): number {
  return job.engine.pieces.reduce((s, p) => s + polygonArea(p.polygon) * p.quantity * (p.mirrored ? 2 : 1), 0);
}

/**
 * Records the best length over time: a point whenever the best improves (density = piece area ÷
 * (length × width)), thinned to every other point once there are too many, so a long run keeps its shape.
 */
function progressHistory(job: MarkerJobInput) {
  const area = pieceArea(job);
  const width = job.engine.stripWidth as number;
  const points: MarkerProgressPointDto[] = [];
  const point = (elapsedMs: number, lengthMm: number) => ({ elapsedMs: Math.round(elapsedMs), lengthMm, utilisation: lengthMm > 0 ? area / (lengthMm * width) : 0 });
  return {
    points,
    add(elapsedMs: number, lengthMm: number) {
      const last = points[points.length - 1];
      if (last && lengthMm >= last.lengthMm) return;
      points.push(point(elapsedMs, lengthMm));
      if (points.length > MAX_PROGRESS_POINTS) {
        const kept = points.filter((_, k) => k % 2 === 0 || k === points.length - 1);
        points.splice(0, points.length, ...kept);
      }
    },
    /** The closing point: the final length at the end of the run. */
    close(elapsedMs: number, lengthMm: number) {
      const last = points[points.length - 1];
      if (!last || elapsedMs > last.elapsedMs) points.push(point(elapsedMs, Math.min(lengthMm, last?.lengthMm ?? lengthMm)));
    },
  };
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
  /** Receives the run handle so the caller can cancel it or change its lanes. */
  onStart?: (handle: NestingSearchHandle) => void;
  /** Worker threads to start on (independent seeds, the shortest marker kept); default {@link defaultMarkerLanes}. */
  lanes?: number;
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
 * Runs one stored marker job to its end on `hooks.lanes` worker threads (independent seeds, the shortest
 * marker kept) and stores the outcome: the layout (checked by
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
  const history = progressHistory(job);
  const handle = runNestingSearch(job.engine, {
    seed: job.seed,
    timeBudgetMs: job.seconds * 1000,
    overrunMs: hooks.overrunMs ?? Math.max(60_000, job.seconds * 1000),
    lanes: hooks.lanes ?? defaultMarkerLanes(),
    entry: hooks.workerEntry,
    onProgress: (p) => {
      history.add(p.elapsedMs, p.bestLength);
      hooks.onProgress?.({ bestLength: p.bestLength, elapsedMs: p.elapsedMs, iteration: p.iteration, lanes: p.lanes, history: history.points });
    },
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
    history.close(elapsedMs, outcome.result.length);
    const result: StoredMarkerResult = { ...outcome.result, check: { valid: check.valid, errors: check.errors.slice(0, 10) }, progress: history.points };
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
