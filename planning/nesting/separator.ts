import type { LayoutState } from './layout-state';
import { rngInt, rngShuffle, type Rng } from './random';
import type { RunBudget } from './run-budget';

/**
 * Search effort of one separation. Sweeps without improvement and strikes are those of the published
 * separator's defaults (sparrow, JeroenGar/sparrow `src/config.rs`, DEFAULT_SPARROW_CONFIG: exploration
 * 200 sweeps × 3 strikes, compression 100 × 5); on shapes0, shirts, dagli and shapes1 (20 s, seeds 1–2, run in
 * pairs on the same machine) 200 sweeps beat our earlier 50 in 5 of 8 runs, by 0.6 density points on average.
 * Samples per move are the published 50 container-wide + 25 focused, plus our 12 contact samples. A round
 * ("strike") that cut the least overlap by 2 % clears the strikes, as in the published separator: 60 s single-lane
 * runs on shapes0, shirts, dagli and trousers, seeds 1–4, mean density 83.37 % with the reset, 82.69 % without.
 */
export interface SeparatorConfig {
  strikes: number;
  itersWithoutImprovement: number;
  uniformSamples: number;
  focusedSamples: number;
  contactSamples: number;
}

export const EXPLORE_CONFIG: SeparatorConfig = {
  strikes: 3,
  itersWithoutImprovement: 200,
  uniformSamples: 50,
  focusedSamples: 25,
  contactSamples: 12,
};

/**
 * A coarse exploration step (more than 0.1 %, early in a run): one short round, so a step too long for the
 * layout fails fast and the next, halved step is tried.
 */
export const COARSE_CONFIG: SeparatorConfig = { ...EXPLORE_CONFIG, strikes: 1, itersWithoutImprovement: 100 };

/** Compression: more strikes on a layout that is nearly feasible (Gardeyn et al. 2025: 5 strikes). */
export const COMPRESS_CONFIG: SeparatorConfig = {
  strikes: 5,
  itersWithoutImprovement: 100,
  uniformSamples: 50,
  focusedSamples: 25,
  contactSamples: 12,
};

interface Pose {
  v: number;
  x: number;
  y: number;
  e: number;
}

function clamp(v: number, lo: number, hi: number): number {
  return v < lo ? lo : v > hi ? hi : v;
}

/**
 * Coordinate descent schedules (Gardeyn et al. 2025; sparrow `src/consts.rs`): a coarse refinement of
 * every kept sample, steps from 25 % down to 2 % of the piece's smaller side, then a fine one of the best,
 * 1 % down to 0.01 % (the published fine limit is 0.1 %; ours is finer so that jigsaw pieces close exactly: dighe2,
 * 3,000 sweeps, seeds 1–6, reached L = 100 in 3 of 6 runs at 0.1 % and 5 of 6 at 0.01 %). A better step grows ×1.1,
 * a failed one halves.
 */
const COARSE_STEPS: [number, number] = [0.25, 0.02];
const FINE_STEPS: [number, number] = [0.01, 0.0001];
const STEP_GROW = 1.1;
const STEP_CUT = 0.5;
/** Two samples closer than this share of the piece's smaller side count as one (sparrow: 0.05). */
const UNIQUE_SAMPLE = 0.05;

function minSide(layout: LayoutState, v: number): number {
  const s = layout.model.variants[v];
  return Math.min(s.maxX - s.minX, s.maxY - s.minY);
}

/**
 * Adaptive coordinate descent on the weighted overlap from `p` (mutated), along one of four axes
 * (x, y and the two diagonals): both sides are tried, a side no worse is taken (so flat ground is crossed),
 * and the axis changes at random after a step that did not improve.
 */
function descend(layout: LayoutState, i: number, p: Pose, rng: Rng, steps: [number, number]): void {
  const [x0, x1] = layout.xRange(p.v);
  const [y0, y1] = layout.yRange(p.v);
  const side = minSide(layout, p.v);
  let sx = steps[0] * side;
  let sy = sx;
  const limit = steps[1] * side;
  let axis = rngInt(rng, 4);
  const growD = Math.sqrt(STEP_GROW), cutD = Math.sqrt(STEP_CUT);
  for (let k = 0; k < 200 && p.e > 0 && (sx >= limit || sy >= limit); k++) {
    const dx = axis === 1 ? 0 : sx;
    const dy = axis === 0 ? 0 : axis === 3 ? -sy : sy;
    const ax = clamp(p.x + dx, x0, x1), ay = clamp(p.y + dy, y0, y1);
    const bx = clamp(p.x - dx, x0, x1), by = clamp(p.y - dy, y0, y1);
    const ea = layout.evaluate(i, p.v, ax, ay, p.e);
    const eb = layout.evaluate(i, p.v, bx, by, Math.min(p.e, ea));
    const better = Math.min(ea, eb) < p.e;
    if (ea <= p.e || eb <= p.e) {
      if (eb < ea) {
        p.x = bx;
        p.y = by;
        p.e = eb;
      } else {
        p.x = ax;
        p.y = ay;
        p.e = ea;
      }
    }
    if (axis === 0) sx *= better ? STEP_GROW : STEP_CUT;
    else if (axis === 1) sy *= better ? STEP_GROW : STEP_CUT;
    else {
      sx *= better ? growD : cutD;
      sy *= better ? growD : cutD;
    }
    if (!better) axis = rngInt(rng, 4);
  }
}

/**
 * The few best distinct sampled poses, best first (`top[0]` is the best). A sample is scored against the
 * worst kept pose, so once the list is full an evaluation still stops early. A sample within
 * `UNIQUE_SAMPLE` of the piece's smaller side of a kept pose (same variant) replaces it only when better.
 */
class TopPoses {
  readonly poses: Pose[] = [];
  constructor(readonly k: number, first: Pose, private readonly near: number) {
    this.poses.push({ ...first });
  }

  get best(): Pose {
    return this.poses[0];
  }

  get cutoff(): number {
    return this.poses.length < this.k ? Infinity : this.poses[this.poses.length - 1].e;
  }

  offer(v: number, x: number, y: number, e: number): void {
    const ps = this.poses;
    for (let k = 0; k < ps.length; k++) {
      const q = ps[k];
      if (q.v === v && Math.abs(q.x - x) < this.near && Math.abs(q.y - y) < this.near) {
        if (e >= q.e) return;
        ps.splice(k, 1);
        break;
      }
    }
    if (ps.length === this.k && e >= ps[ps.length - 1].e) return;
    let at = ps.length;
    while (at > 0 && ps[at - 1].e > e) at--;
    ps.splice(at, 0, { v, x, y, e });
    if (ps.length > this.k) ps.pop();
  }
}

function consider(layout: LayoutState, i: number, top: TopPoses, v: number, x: number, y: number): void {
  const cut = top.cutoff;
  const e = layout.evaluate(i, v, x, y, cut);
  if (e < cut) top.offer(v, x, y, e);
}

function fitsStrip(layout: LayoutState, v: number): boolean {
  const s = layout.model.variants[v];
  return layout.length - s.maxX >= -s.minX;
}

/**
 * Coarse descents per move, each from one of the best distinct samples, then one fine descent of the best
 * (the published separator's 3 + 1). Against our earlier 5 fine descents of 60 steps at most, x and y only,
 * 60 s single-lane runs on shapes0, shirts, dagli and trousers, seeds 1–4 (`tests/bench/nesting/profile-run.ts`):
 * mean density 82.97 % before, 83.19 % with these descents, the strike reset and the wider disruption; sweeps per
 * second rose by about 1.5× on each instance.
 */
const DESCENTS = 3;

/** Move item i to the best of sampled positions after descent (never worse than where it is). */
export function moveItem(layout: LayoutState, i: number, rng: Rng, cfg: SeparatorConfig): void {
  const item = layout.model.items[i];
  const cur: Pose = { v: layout.v[i], x: layout.x[i], y: layout.y[i], e: 0 };
  cur.e = layout.evaluate(i, cur.v, cur.x, cur.y, Infinity);
  const top = new TopPoses(DESCENTS, cur, UNIQUE_SAMPLE * minSide(layout, cur.v));
  const fits = item.variants.every((v) => fitsStrip(layout, v)) ? item.variants : item.variants.filter((v) => fitsStrip(layout, v));
  const s = layout.model.variants[cur.v];
  const fx = 0.5 * (s.maxX - s.minX);
  const fy = 0.5 * (s.maxY - s.minY);
  for (let k = 0; k < cfg.focusedSamples && top.best.e > 0; k++) {
    const v = k % 4 === 3 ? fits[rngInt(rng, fits.length)] : cur.v;
    const [x0, x1] = layout.xRange(v);
    const [y0, y1] = layout.yRange(v);
    consider(layout, i, top, v, clamp(cur.x + (2 * rng() - 1) * fx, x0, x1), clamp(cur.y + (2 * rng() - 1) * fy, y0, y1));
  }
  for (let k = 0; k < cfg.uniformSamples && top.best.e > 0; k++) {
    const v = fits[rngInt(rng, fits.length)];
    const [x0, x1] = layout.xRange(v);
    const [y0, y1] = layout.yRange(v);
    consider(layout, i, top, v, x0 + rng() * (x1 - x0), y0 + rng() * (y1 - y0));
  }
  contactSamples(layout, i, top, fits, rng, cfg.contactSamples);
  for (const p of top.poses.slice()) {
    if (top.best.e === 0) break;
    const q = { ...p };
    descend(layout, i, q, rng, COARSE_STEPS);
    top.offer(q.v, q.x, q.y, q.e);
  }
  const best = { ...top.best };
  if (best.e > 0) descend(layout, i, best, rng, FINE_STEPS);
  if (best.e < cur.e) layout.place(i, best.v, best.x, best.y);
}

/** Positions touching a current collider: vertices of its NFP, which are exact contacts. */
function contactSamples(layout: LayoutState, i: number, top: TopPoses, fits: number[], rng: Rng, count: number): void {
  const n = layout.n;
  const colliders: number[] = [];
  for (let j = 0; j < n; j++) if (layout.ov[i * n + j] > 0) colliders.push(j);
  if (colliders.length === 0) return;
  for (let k = 0; k < count && top.best.e > 0; k++) {
    const j = colliders[rngInt(rng, colliders.length)];
    const v = fits[rngInt(rng, fits.length)];
    const nfp = layout.model.nfps.get(layout.v[j], v);
    const m = nfp.coords.length / 2;
    const q = rngInt(rng, m);
    const x = nfp.coords[2 * q] + layout.x[j];
    const y = nfp.coords[2 * q + 1] + layout.y[j];
    const [x0, x1] = layout.xRange(v);
    const [y0, y1] = layout.yRange(v);
    if (x < x0 || x > x1 || y < y0 || y > y1) continue;
    consider(layout, i, top, v, x, y);
  }
}

/** Guided local search: raise the weight of pairs that still overlap, let the others decay. */
function updateWeights(layout: LayoutState): void {
  const { ov, w } = layout;
  let maxOv = 0;
  for (let k = 0; k < ov.length; k++) if (ov[k] > maxOv) maxOv = ov[k];
  for (let k = 0; k < ov.length; k++) {
    if (ov[k] > 0) w[k] *= 1.2 + (0.8 * ov[k]) / maxOv;
    else if (w[k] > 1) w[k] = Math.max(1, w[k] * 0.95);
  }
}

/**
 * Try to remove every overlap at the layout's current length by guided local search: sweep the
 * overlapping items, move each to its least weighted-overlap position, update pair weights, and
 * restart from the best sweep after `itersWithoutImprovement` sweeps without progress ("strikes").
 * Returns true with an overlap-free layout, or false with the least-overlap layout found.
 */
export function separate(layout: LayoutState, rng: Rng, budget: RunBudget, cfg: SeparatorConfig): boolean {
  layout.resetWeights();
  let bestOv = layout.totalOverlap();
  if (bestOv === 0) return true;
  let best = layout.snapshot();
  for (let strike = 0; strike < cfg.strikes; ) {
    const initial = layout.totalOverlap();
    let stale = 0;
    while (stale < cfg.itersWithoutImprovement) {
      if (budget.exhausted()) {
        layout.restore(best);
        return false;
      }
      for (const i of rngShuffle(rng, layout.collidingItems())) {
        if (layout.overlapOf(i) > 0) moveItem(layout, i, rng, cfg);
      }
      budget.iterations++;
      const total = layout.totalOverlap();
      if (total === 0) return true;
      if (total < bestOv * 0.98) {
        bestOv = total;
        best = layout.snapshot();
        stale = 0;
      } else {
        if (total < bestOv) {
          bestOv = total;
          best = layout.snapshot();
        }
        stale++;
      }
      updateWeights(layout);
    }
    // A strike is a round without a real gain; a round that cut the overlap by 2 % clears them (sparrow).
    if (bestOv < 0.98 * initial) strike = 0;
    else strike++;
    layout.restore(best);
  }
  return false;
}
