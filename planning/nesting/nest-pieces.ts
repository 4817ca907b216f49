import { mm } from '@shared/units/units';
import { placeBottomLeft } from './bottom-left-fill';
import { LayoutState, type LayoutSnapshot } from './layout-state';
import { buildNestModel, type NestModel } from './nest-model';
import { createRng, rngInt, type Rng } from './random';
import { RunBudget } from './run-budget';
import { COARSE_CONFIG, COMPRESS_CONFIG, EXPLORE_CONFIG, separate } from './separator';
import type { NestingInput, NestingOptions, NestingResult } from './types';

const DEFAULT_MAX_ITERATIONS = 2000;
/**
 * Exploration (Gardeyn, Vanden Berghe & Wauters 2025): the strip is shortened by `step`, the
 * overlaps are removed by guided local search; a failure keeps the infeasible layout in a pool, one of the
 * pool's layouts (biased to the least overlap) is disrupted by swapping two large pieces and separated
 * again at the same length. The step starts coarse (a bottom-left start is far from dense) and halves
 * after each failure until it reaches `EXPLORE_MIN_SHRINK` (0.1 % as in Gardeyn et al. 2025); only there
 * does the pool and its disruption start, and after `EXPLORE_FAILURES` failures the next try starts
 * afresh from the best marker. (Halving after every failure rather than after six: on shirts, 60 s, seed 1,
 * the six-failure ladder spent 2.6–24 s without a shorter marker; halving at once found 9 in that time.)
 */
const INITIAL_SHRINK = 0.02;
const EXPLORE_MIN_SHRINK = 0.001;
const EXPLORE_FAILURES = 6;
/** Share of the budget spent exploring; the rest compresses the best marker (Gardeyn et al. 2025: 80 % / 20 %). */
const EXPLORE_SHARE = 0.8;
/** Compression: shrink steps decaying from 0.05 % to 0.001 % over the phase (Gardeyn et al. 2025). */
const COMPRESS_SHRINK_START = 0.0005;
const COMPRESS_SHRINK_END = 0.00001;
/**
 * A lane takes up a shorter marker from the other lanes' board only in compression (from `EXPLORE_SHARE` of
 * the budget): both cores then compress the best marker found. Paired 60 s two-lane runs (`bench:nesting`,
 * seeds 1, 3, 5, 7 on shirts, 1 and 3 on dagli and shapes1), mean density %: independent lanes 87.81 / 87.61 /
 * 74.41, sharing from the start 87.77 / 87.22 / 73.87 (the lanes lose their diversity), sharing in
 * compression 87.94 / 87.68 / 74.33.
 */
const SHARE_FROM = EXPLORE_SHARE;
/** Standard deviation of |N(0, σ)| picking a pool entry (0 = least overlap, 1 = most). */
const POOL_SIGMA = 0.25;

/**
 * Shorten the strip to `length` by cutting it at a random x and sliding everything right of the cut
 * to the left by the difference (Gardeyn et al. 2025, strip change): the overlaps appear along the cut, spread
 * over the width, instead of piling up at the strip end. Pieces still past the end are pulled in.
 */
export function shortenStrip(layout: LayoutState, length: number, rng: Rng): void {
  const delta = layout.length === Infinity ? layout.usedLength() - length : layout.length - length;
  const cut = rng() * length;
  layout.length = length;
  const { variants } = layout.model;
  for (let i = 0; i < layout.n; i++) {
    const s = variants[layout.v[i]];
    const centre = layout.x[i] + 0.5 * (s.minX + s.maxX);
    const [x0, x1] = layout.xRange(layout.v[i]);
    let x = centre > cut && delta > 0 ? layout.x[i] - delta : layout.x[i];
    x = Math.min(Math.max(x, x0), Math.max(x0, x1));
    if (x !== layout.x[i]) layout.place(i, layout.v[i], x, layout.y[i]);
  }
}

/** Gaussian N(0, 1) by Box–Muller from the seeded generator. */
function gaussian(rng: Rng): number {
  return Math.sqrt(-2 * Math.log(1 - rng())) * Math.cos(2 * Math.PI * rng());
}

/** A point strictly inside a polygon: the middle of the widest span on the scanline through its mean y. */
function innerPoint(shape: { x: number; y: number }[]): { x: number; y: number } {
  let my = 0;
  for (const p of shape) my += p.y;
  my /= shape.length;
  const xs: number[] = [];
  for (let k = 0, j = shape.length - 1; k < shape.length; j = k++) {
    const a = shape[j], b = shape[k];
    if (a.y > my !== b.y > my) xs.push(a.x + ((my - a.y) * (b.x - a.x)) / (b.y - a.y));
  }
  xs.sort((p, q) => p - q);
  let best = { x: shape[0].x, y: shape[0].y }, span = -1;
  for (let k = 0; k + 1 < xs.length; k += 2) {
    if (xs[k + 1] - xs[k] > span) {
      span = xs[k + 1] - xs[k];
      best = { x: 0.5 * (xs[k] + xs[k + 1]), y: my };
    }
  }
  return best;
}

function insidePolygon(shape: { x: number; y: number }[], px: number, py: number): boolean {
  let inside = false;
  for (let k = 0, j = shape.length - 1; k < shape.length; j = k++) {
    const a = shape[j], b = shape[k];
    if (a.y > py !== b.y > py && px < ((b.x - a.x) * (py - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/**
 * Disruption after a failed separation (Gardeyn et al. 2025, exploration move): swap two large items of
 * different shapes. "Large": the biggest items that together make up `LARGE_SHARE` of the total area.
 * Each goes where the other was (box centre on box centre, taking the other's orientation when it may), and
 * the items that then sit mostly inside it (their inner point covered) move into the room it left.
 */
const LARGE_SHARE = 0.75;
export function swapLargeItems(layout: LayoutState, rng: Rng): void {
  const { items, variants } = layout.model;
  const byArea = items.map((_, i) => i).sort((a, b) => items[b].area - items[a].area);
  const total = items.reduce((t, it) => t + it.area, 0);
  let cum = 0, cut = 0;
  for (const i of byArea) {
    cum += items[i].area;
    if (cum > LARGE_SHARE * total) {
      cut = items[i].area;
      break;
    }
  }
  const large = byArea.filter((i) => items[i].area >= cut);
  if (large.length < 1 || items.length < 2) return;
  const a = large[rngInt(rng, large.length)];
  const differs = large.filter((i) => Math.abs(items[i].area - items[a].area) > 0.01 * items[a].area);
  const pool = differs.length ? differs : items.map((_, i) => i).filter((i) => i !== a);
  const b = pool[rngInt(rng, pool.length)];
  const centre = (i: number, v = layout.v[i]) => {
    const s = variants[v];
    return { x: layout.x[i] + 0.5 * (s.minX + s.maxX), y: layout.y[i] + 0.5 * (s.minY + s.maxY) };
  };
  const moveTo = (i: number, v: number, cx: number, cy: number) => {
    const s = variants[v];
    const [x0, x1] = layout.xRange(v);
    const [y0, y1] = layout.yRange(v);
    const x = cx - 0.5 * (s.minX + s.maxX), y = cy - 0.5 * (s.minY + s.maxY);
    layout.place(i, v, Math.min(Math.max(x, x0), Math.max(x0, x1)), Math.min(Math.max(y, y0), Math.max(y0, y1)));
  };
  /** The variant of item i closest to variant w's orientation. */
  const like = (i: number, w: number) => {
    const t = variants[w];
    return items[i].variants.find((v) => variants[v].rotation === t.rotation && variants[v].mirrored === t.mirrored) ?? layout.v[i];
  };
  const ca = centre(a), cb = centre(b);
  const va = layout.v[a], vb = layout.v[b];
  moveTo(a, like(a, vb), cb.x, cb.y);
  moveTo(b, like(b, va), ca.x, ca.y);
  for (const [m, other, from] of [[a, b, ca], [b, a, cb]] as const) {
    const to = centre(m);
    const shape = variants[layout.v[m]].shape;
    const dx = from.x - to.x, dy = from.y - to.y;
    const mx = layout.x[m], my = layout.y[m];
    const s = variants[layout.v[m]];
    for (let j = 0; j < layout.n; j++) {
      if (j === m || j === other) continue;
      const t = variants[layout.v[j]];
      if (layout.x[j] + t.sMaxX <= mx + s.sMinX || layout.x[j] + t.sMinX >= mx + s.sMaxX || layout.y[j] + t.sMaxY <= my + s.sMinY || layout.y[j] + t.sMinY >= my + s.sMaxY) continue;
      const p = innerPoint(t.shape);
      if (!insidePolygon(shape, layout.x[j] + p.x - mx, layout.y[j] + p.y - my)) continue;
      const c = centre(j);
      moveTo(j, layout.v[j], c.x + dx, c.y + dy);
    }
  }
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
 * fill on no-fit polygons gives a first marker (Oliveira, Gomes & Ferreira 2000). Then, as in Egeblad,
 * Nielsen & Odgaard (2007), Imamichi, Yagiura & Nagamochi (2009) and Gardeyn, Vanden Berghe & Wauters
 * (2025), the strip is repeatedly shortened and the overlaps that creates are removed by guided local
 * search (Voudouris & Tsang's adaptive pair penalties) over NFP penetration depths. Exploration (80 % of
 * the budget, Gardeyn et al. 2025): a failed length keeps its least-overlap layouts in a pool; one of them
 * is disrupted by swapping two large pieces and separated again; after repeated failures the step halves.
 * Compression (the last 20 %): tiny decaying steps from the best marker. The best feasible marker is kept.
 * Every phase switch reads the budget's used share, so a budget in iterations is deterministic.
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
  let lastReport = 0;
  const progress = () => {
    if (budget.iterations - lastReport >= 50) {
      lastReport = budget.iterations;
      report();
    }
  };
  const board = options.board;
  const accept = () => {
    best = layout.snapshot();
    bestLength = layout.usedLength();
    board?.offer(best, bestLength);
    report();
  };
  /** Carry on from another lane's marker when it is shorter (see `MarkerBoard`). */
  const adopt = (): boolean => {
    if (!board || budget.fraction() < SHARE_FROM) return false;
    const got = board.take(bestLength);
    if (!got) return false;
    best = got.snap;
    bestLength = got.length;
    report();
    return true;
  };
  if (constructed) board?.offer(best, bestLength);
  // Exploration.
  let shrink = INITIAL_SHRINK;
  let pool: { snap: LayoutSnapshot; overlap: number }[] = [];
  let failures = 0;
  let target = bestLength;
  while (constructed && !budget.exhausted() && budget.fraction() < EXPLORE_SHARE) {
    if (adopt()) {
      pool = [];
      failures = 0;
    }
    if (pool.length === 0) {
      target = Math.max(floor, bestLength * (1 - shrink));
      if (target >= bestLength - 1e-12 * bestLength) break;
      layout.restore(best);
      layout.length = bestLength;
      shortenStrip(layout, target, rng);
    } else {
      const pick = Math.min(pool.length - 1, Math.floor(Math.min(0.999, Math.abs(gaussian(rng)) * POOL_SIGMA) * pool.length));
      layout.restore(pool[pick].snap);
      swapLargeItems(layout, rng);
    }
    // A coarse step gets one short round (fails fast); the 0.1 % steps get the full separator.
    const ok = separate(layout, rng, budget, shrink > EXPLORE_MIN_SHRINK ? COARSE_CONFIG : EXPLORE_CONFIG);
    if (ok) {
      accept();
      pool = [];
      failures = 0;
    } else if (!budget.exhausted()) {
      if (shrink > EXPLORE_MIN_SHRINK || ++failures >= EXPLORE_FAILURES) {
        // A smaller step (or, at the smallest, a fresh start from the best marker): the pool is not needed.
        shrink = Math.max(EXPLORE_MIN_SHRINK, shrink / 2);
        pool = [];
        failures = 0;
      } else {
        const overlap = layout.totalOverlap();
        const at = pool.findIndex((p) => p.overlap > overlap);
        pool.splice(at < 0 ? pool.length : at, 0, { snap: layout.snapshot(), overlap });
      }
    }
    progress();
  }
  // Compression: small steps from the best marker, each tried once.
  const compressFrom = budget.fraction();
  while (constructed && !budget.exhausted()) {
    adopt();
    const t = compressFrom < 1 ? Math.min(1, (budget.fraction() - compressFrom) / (1 - compressFrom)) : 1;
    const step = COMPRESS_SHRINK_START * (COMPRESS_SHRINK_END / COMPRESS_SHRINK_START) ** t;
    const target = Math.max(floor, bestLength * (1 - step));
    if (target >= bestLength - 1e-12 * bestLength) break;
    layout.restore(best);
    layout.length = bestLength;
    shortenStrip(layout, target, rng);
    if (separate(layout, rng, budget, COMPRESS_CONFIG)) accept();
    progress();
  }
  // Hand in the shortest marker this lane knows of, its own or the board's.
  if (constructed) adopt();
  return toResult(model, layout, best, input, constructed && !budget.aborted, budget.iterations);
}
