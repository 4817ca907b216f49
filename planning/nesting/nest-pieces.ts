import { mm } from '@shared/units/units';
import { placeBottomLeft } from './bottom-left-fill';
import { LayoutState, type LayoutSnapshot } from './layout-state';
import { buildNestModel, type NestModel } from './nest-model';
import { createRng, rngInt, type Rng } from './random';
import { RunBudget } from './run-budget';
import { EXPLORE_CONFIG, separate } from './separator';
import type { NestingInput, NestingOptions, NestingResult } from './types';

const DEFAULT_MAX_ITERATIONS = 2000;
/** Strip shortening per step: starts coarse, halves on repeated failure, never below the floor. */
const INITIAL_SHRINK = 0.02;
const MIN_SHRINK = 0.0005;
const COMPRESSION_SHRINK = 0.002;
const ATTEMPTS_PER_LENGTH = 3;

/** Move items that stick out past the new strip end back inside it (creating overlaps). */
function shortenStrip(layout: LayoutState, length: number): void {
  layout.length = length;
  for (let i = 0; i < layout.n; i++) {
    const [x0, x1] = layout.xRange(layout.v[i]);
    if (layout.x[i] > x1) layout.place(i, layout.v[i], Math.max(x0, x1), layout.y[i]);
  }
}

/** Disruption after a failed separation: swap two large items (sparrow's exploration move). */
function swapLargeItems(layout: LayoutState, rng: Rng): void {
  const items = layout.model.items;
  const areas = items.map((it) => it.area).sort((a, b) => a - b);
  const cut = areas[Math.floor(0.75 * (areas.length - 1))];
  const large = items.map((_, i) => i).filter((i) => items[i].area >= cut);
  if (large.length < 2) return;
  const a = large[rngInt(rng, large.length)];
  const others = large.filter((i) => i !== a && items[i].piece !== items[a].piece);
  const pool = others.length ? others : large.filter((i) => i !== a);
  const b = pool[rngInt(rng, pool.length)];
  const pa = { x: layout.x[a], y: layout.y[a] };
  const moveTo = (i: number, x: number, y: number) => {
    const v = layout.v[i];
    const [x0, x1] = layout.xRange(v);
    const [y0, y1] = layout.yRange(v);
    layout.place(i, v, Math.min(Math.max(x, x0), x1), Math.min(Math.max(y, y0), y1));
  };
  moveTo(a, layout.x[b], layout.y[b]);
  moveTo(b, pa.x, pa.y);
}

function minimumLength(model: NestModel): number {
  let lb = model.totalArea / model.width;
  for (const it of model.items) {
    const w = Math.min(...it.variants.map((v) => model.variants[v].maxX - model.variants[v].minX));
    lb = Math.max(lb, w);
  }
  return lb;
}

function toResult(model: NestModel, layout: LayoutState, snap: LayoutSnapshot, input: NestingInput, complete: boolean, iterations: number): NestingResult {
  layout.restore(snap);
  const length = layout.usedLength();
  const placements = model.items.map((it, i) => {
    const v = model.variants[snap.v[i]];
    return { pieceId: input.pieces[it.piece].id, copy: it.copy, rotation: v.rotation, mirrored: v.mirrored, x: mm(snap.x[i]), y: mm(snap.y[i]) };
  });
  return { placements, length: mm(length), utilisation: length > 0 ? model.totalArea / (length * model.width) : 0, complete, iterations };
}

/**
 * Nest pattern pieces on a fabric strip of fixed width, minimising the used length.
 *
 * Method (see ../shared/reference/nesting-benchmarks.md, "How the best methods work"): a bottom-left
 * fill on no-fit polygons gives a first marker; then, like Egeblad et al. (2007), Imamichi et al.
 * (2009) and sparrow (Gardeyn et al. 2025), the strip is repeatedly shortened and the overlaps
 * that creates are removed by guided local search over penetration depths; a failed length is
 * retried after swapping two large pieces, then the step shrinks; the best feasible marker is kept.
 *
 * The constructive start polls the budget and the signal before each piece; when either runs out
 * there, the remaining pieces go into bounding-box columns and the marker (valid, but loose) comes
 * back with complete: false. Pieces with many vertices are packed as simplified shapes that contain
 * them (`options.simplifyTolerance`); placements are always those of the original outlines.
 *
 * Units are those of the input (millimetres); any winding; the result is overlap-free with at least
 * `gap` between pieces (up to a 1e-6 relative safety margin, which only adds clearance). An empty
 * piece list gives length 0. Throws RangeError on degenerate pieces or pieces wider than the strip.
 */
export function nestPieces(input: NestingInput, options: NestingOptions): NestingResult {
  const model = buildNestModel(input, options.simplifyTolerance);
  const maxIterations = options.maxIterations ?? (options.timeBudgetMs !== undefined && options.now ? Infinity : DEFAULT_MAX_ITERATIONS);
  const budget = new RunBudget(maxIterations, options.now, options.timeBudgetMs, options.signal);
  const layout = new LayoutState(model);
  if (model.items.length === 0) return { placements: [], length: mm(0), utilisation: 0, complete: true, iterations: 0 };
  const rng = createRng(options.seed);
  const constructed = placeBottomLeft(layout, () => budget.exhausted());
  let best = layout.snapshot();
  let bestLength = layout.usedLength();
  const report = () => options.onProgress?.({ bestLength: mm(bestLength), elapsedMs: budget.elapsedMs(), iteration: budget.iterations });
  report();
  const floor = minimumLength(model);
  let shrink = INITIAL_SHRINK;
  let lastReport = 0;
  while (constructed && !budget.exhausted()) {
    const step = budget.fraction() > 0.8 ? Math.min(shrink, COMPRESSION_SHRINK) : shrink;
    const target = Math.max(floor, bestLength * (1 - step));
    if (target >= bestLength - 1e-12 * bestLength) break;
    layout.restore(best);
    shortenStrip(layout, target);
    let ok = false;
    for (let attempt = 0; attempt < ATTEMPTS_PER_LENGTH && !ok && !budget.exhausted(); attempt++) {
      if (attempt > 0) swapLargeItems(layout, rng);
      ok = separate(layout, rng, budget, EXPLORE_CONFIG);
    }
    if (ok) {
      best = layout.snapshot();
      bestLength = layout.usedLength();
      report();
    } else {
      shrink = Math.max(MIN_SHRINK, shrink / 2);
    }
    if (budget.iterations - lastReport >= 50) {
      lastReport = budget.iterations;
      report();
    }
  }
  return toResult(model, layout, best, input, constructed && !budget.aborted, budget.iterations);
}
