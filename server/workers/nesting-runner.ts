import { Worker } from 'node:worker_threads';
import type { NestingInput, NestingResult } from '@planning';
import type { NestingWorkerMessage } from './nesting.worker';
import { workerEntry } from './worker-entry';


/** How a run ended: the engine's result (possibly cut short by cancel) or a failure message. */
export type NestingOutcome =
  | { kind: 'result'; result: NestingResult; cancelled: boolean }
  | { kind: 'cancelled' }
  | { kind: 'failed'; message: string };

export interface NestingRunHandle {
  done: Promise<NestingOutcome>;
  cancel(): void;
}

export interface NestingRunOptions {
  seed: number;
  timeBudgetMs: number;
  /** Hard stop after the budget: the worker is terminated and the run fails. */
  overrunMs: number;
  /** After a cancel, wait this long for the best-so-far marker before terminating. */
  cancelGraceMs?: number;
  onProgress?: (p: { bestLength: number; elapsedMs: number; iteration: number }) => void;
  /** Worker entry override (tests use a crashing or hanging worker). */
  entry?: string;
  /** The search's shared marker board (`markerBoardBuffer`), when this run is one lane of several. */
  board?: SharedArrayBuffer;
}

/**
 * Runs one nesting job on a worker thread (server/workers/nesting.worker.ts through the tsx loader), off
 * the request thread. Resolves once: with the result, `cancelled` when stopped before any result, or
 * `failed` when the worker throws, exits early or overruns `timeBudgetMs + overrunMs` (then it is
 * terminated). Never rejects.
 */
export function runNestingWorker(input: NestingInput, opts: NestingRunOptions): NestingRunHandle {
  const start = workerEntry('nesting', opts.entry);
  const worker = new Worker(start.file, {
    workerData: start.data({ input, board: opts.board, options: { seed: opts.seed, timeBudgetMs: opts.timeBudgetMs } }),
  });
  let settled = false;
  let cancelled = false;
  let finish!: (o: NestingOutcome) => void;
  const done = new Promise<NestingOutcome>((resolve) => (finish = resolve));
  const timers: NodeJS.Timeout[] = [];
  const settle = (o: NestingOutcome) => {
    if (settled) return;
    settled = true;
    timers.forEach(clearTimeout);
    void worker.terminate();
    finish(o);
  };
  timers.push(
    setTimeout(
      () => settle({ kind: 'failed', message: `The nesting run overran its ${Math.round(opts.timeBudgetMs / 1000)} s budget and was stopped` }),
      opts.timeBudgetMs + opts.overrunMs,
    ),
  );
  worker.on('message', (m: NestingWorkerMessage) => {
    if (m.type === 'progress') opts.onProgress?.(m);
    else if (m.type === 'result') settle({ kind: 'result', result: m.result, cancelled });
    else if (m.type === 'error') settle({ kind: 'failed', message: `The nesting engine failed: ${m.message}` });
  });
  worker.on('error', (err) => settle({ kind: 'failed', message: `The nesting worker crashed: ${err.message}` }));
  worker.on('exit', (code) => settle(cancelled ? { kind: 'cancelled' } : { kind: 'failed', message: `The nesting worker stopped unexpectedly (exit code ${code})` }));
  return {
    done,
    cancel() {
      if (settled || cancelled) return;
      cancelled = true;
      worker.postMessage({ type: 'cancel' });
      timers.push(setTimeout(() => settle({ kind: 'cancelled' }), opts.cancelGraceMs ?? 3000));
    },
  };
}
