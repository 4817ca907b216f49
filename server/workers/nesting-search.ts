import { markerBoardBuffer, markerItemCount, type NestingInput, type NestingResult } from '@planning';
import { runNestingWorker, type NestingOutcome, type NestingRunHandle } from './nesting-runner';

/** Combined progress of a search: the best length of any lane, iterations summed over lanes. */
export interface NestingSearchProgress {
  bestLength: number;
  elapsedMs: number;
  iteration: number;
  /** Lanes (worker threads) running now. */
  lanes: number;
}

export interface NestingSearchOptions {
  seed: number;
  timeBudgetMs: number;
  overrunMs: number;
  /** Worker threads to start with (≥ 1): lane k searches with seed + k. */
  lanes: number;
  onProgress?: (p: NestingSearchProgress) => void;
  entry?: string;
  /** Clock in ms (tests); default performance.now. */
  now?: () => number;
}

export interface NestingSearchHandle extends NestingRunHandle {
  /** Lanes running now. */
  lanes(): number;
  /**
   * Run on `n` lanes from now on (≥ 1). Fewer: the newest lanes stop early and hand in their best marker,
   * which still competes. More: new lanes (new seeds) start on what is left of the budget.
   */
  setLanes(n: number): void;
}

/** Below this much budget left a new lane is not worth its start-up (the worker's first layout). */
const MIN_LANE_BUDGET_MS = 1500;

/**
 * One marker search on several worker threads: seeded searches of the same input (seeds seed, seed + 1,
 * …) that share their shortest marker through a board in shared memory, the shortest marker kept. Lanes
 * can be given up to another job or taken back while the search runs (`setLanes`), so concurrent jobs
 * share the cores. Resolves once every lane has ended:
 * a result (the shortest; `cancelled` when the whole search was cancelled), else `cancelled`, else the
 * first failure. Never rejects.
 */
export function runNestingSearch(input: NestingInput, opts: NestingSearchOptions): NestingSearchHandle {
  const now = opts.now ?? (() => performance.now());
  const started = now();
  const lanes: { handle: NestingRunHandle; stopped: boolean; best: number; iteration: number }[] = [];
  const outcomes: Promise<{ outcome: NestingOutcome; released: boolean }>[] = [];
  let nextSeed = opts.seed;
  // One board for all lanes: a lane that falls behind, or starts late, carries on from the shortest marker.
  const board = markerBoardBuffer(markerItemCount(input));
  let cancelled = false;
  let settled = false;
  let finish!: (o: NestingOutcome) => void;
  const done = new Promise<NestingOutcome>((resolve) => (finish = resolve));

  const active = () => lanes.filter((l) => !l.stopped);
  const report = (elapsedMs: number) => {
    let bestLength = Infinity, iteration = 0;
    for (const l of lanes) {
      bestLength = Math.min(bestLength, l.best);
      iteration += l.iteration;
    }
    if (bestLength < Infinity) opts.onProgress?.({ bestLength, elapsedMs, iteration, lanes: active().length });
  };

  const startLane = () => {
    const left = opts.timeBudgetMs - (now() - started);
    if (lanes.length > 0 && left < MIN_LANE_BUDGET_MS) return;
    const offset = now() - started;
    const lane = { handle: undefined as unknown as NestingRunHandle, stopped: false, best: Infinity, iteration: 0 };
    lane.handle = runNestingWorker(input, {
      seed: nextSeed++,
      timeBudgetMs: Math.max(1, left),
      overrunMs: opts.overrunMs,
      entry: opts.entry,
      board,
      onProgress: (p) => {
        lane.best = Math.min(lane.best, p.bestLength);
        lane.iteration = p.iteration;
        report(offset + p.elapsedMs);
      },
    });
    lanes.push(lane);
    outcomes.push(lane.handle.done.then((outcome) => ({ outcome, released: lane.stopped && !cancelled })));
  };

  const settle = async () => {
    // Lanes may be added while earlier ones run: wait until no lane is left unfinished.
    let count: number;
    do {
      count = outcomes.length;
      await Promise.all(outcomes);
    } while (outcomes.length !== count);
    const all = await Promise.all(outcomes);
    settled = true;
    finish(pickBest(all, cancelled));
  };

  for (let k = 0; k < Math.max(1, opts.lanes); k++) startLane();
  void settle();

  return {
    done,
    lanes: () => active().length,
    cancel() {
      if (settled || cancelled) return;
      cancelled = true;
      for (const l of lanes) l.handle.cancel();
    },
    setLanes(n: number) {
      if (settled || cancelled) return;
      const want = Math.max(1, Math.floor(n));
      const running = active();
      for (let k = running.length - 1; k >= want; k--) {
        running[k].stopped = true;
        running[k].handle.cancel();
      }
      for (let k = running.length; k < want; k++) startLane();
    },
  };
}

/** The shortest marker over the lanes; a lane given up to another job counts as having run its course. */
function pickBest(all: { outcome: NestingOutcome; released: boolean }[], cancelled: boolean): NestingOutcome {
  let best: NestingResult | undefined;
  let iterations = 0;
  for (const { outcome, released } of all) {
    if (outcome.kind !== 'result') continue;
    iterations += outcome.result.iterations;
    const r = released ? { ...outcome.result, complete: true } : outcome.result;
    if (!best || r.length < best.length) best = r;
  }
  if (best) return { kind: 'result', result: { ...best, iterations }, cancelled };
  if (all.some((a) => a.outcome.kind === 'cancelled')) return { kind: 'cancelled' };
  const failed = all.find((a) => a.outcome.kind === 'failed')?.outcome;
  return failed ?? { kind: 'cancelled' };
}
