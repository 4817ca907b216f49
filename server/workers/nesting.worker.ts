/**
 * worker_threads entry for one marker-nesting run (thin: the engine is planning/nesting).
 *
 * Start: `new Worker(url, { workerData: { input, options } })`, or without workerData post
 * `{ type: 'start', input, options }`. `options` is NestingOptions minus the functions and the
 * signal (seed, maxIterations, timeBudgetMs). Posts `{ type: 'progress', bestLength, elapsedMs,
 * iteration }` as the engine reports, then `{ type: 'result', result }`, or `{ type: 'error',
 * message }`. Post `{ type: 'cancel' }` to stop early: the engine runs synchronously, so the port
 * is polled between moves (through the clock) and the run returns its best marker, complete: false.
 */
import { parentPort, receiveMessageOnPort, workerData } from 'node:worker_threads';
import { markerItemCount, nestPieces, sharedMarkerBoard, type NestingInput, type NestingOptions } from '../../planning/nesting/index';

export interface NestingJob {
  input: NestingInput;
  options: Pick<NestingOptions, 'seed' | 'maxIterations' | 'timeBudgetMs'>;
  /** The search's shared marker board (`markerBoardBuffer`), when the run is one lane of several. */
  board?: SharedArrayBuffer;
}

export type NestingWorkerMessage =
  | { type: 'progress'; bestLength: number; elapsedMs: number; iteration: number }
  | { type: 'result'; result: ReturnType<typeof nestPieces> }
  | { type: 'error'; message: string };

const POLL_INTERVAL_MS = 50;

function run(job: NestingJob): void {
  const port = parentPort!;
  const controller = new AbortController();
  let lastPoll = 0;
  const now = () => {
    const t = performance.now();
    if (t - lastPoll >= POLL_INTERVAL_MS) {
      lastPoll = t;
      for (let m = receiveMessageOnPort(port); m; m = receiveMessageOnPort(port)) {
        if ((m.message as { type?: string })?.type === 'cancel') controller.abort();
      }
    }
    return t;
  };
  try {
    const result = nestPieces(job.input, {
      ...job.options,
      board: job.board ? sharedMarkerBoard(job.board, markerItemCount(job.input)) : undefined,
      now,
      signal: controller.signal,
      onProgress: (p) => port.postMessage({ type: 'progress', ...p } satisfies NestingWorkerMessage),
    });
    port.postMessage({ type: 'result', result } satisfies NestingWorkerMessage);
  } catch (err) {
    port.postMessage({ type: 'error', message: err instanceof Error ? err.message : String(err) } satisfies NestingWorkerMessage);
  }
}

if (parentPort) {
  const initial = workerData as NestingJob | undefined;
  if (initial?.input) run(initial);
  else
    parentPort.once('message', (m: { type: string } & NestingJob) => {
      if (m.type === 'start') run(m);
    });
}
