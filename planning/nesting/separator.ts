import type { LayoutState } from './layout-state';
import { rngInt, rngShuffle, type Rng } from './random';
import type { RunBudget } from './run-budget';

/**
 * Search effort of one separation. Sweeps without improvement and strikes are those of the published
 * separator's defaults (sparrow, JeroenGar/sparrow `src/config.rs`, DEFAULT_SPARROW_CONFIG: exploration
 * 200 sweeps × 3 strikes, compression 100 × 5); on shapes0, shirts, dagli and shapes1 (20 s, seeds 1–2, run in
 * pairs on the same machine) 200 sweeps beat our earlier 50 in 5 of 8 runs, by 0.6 density points on average.
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
  uniformSamples: 40,
  focusedSamples: 20,
  contactSamples: 12,
};

/** Compression: more strikes on a layout that is nearly feasible (Gardeyn et al. 2025: 5 strikes). */
export const COMPRESS_CONFIG: SeparatorConfig = {
  strikes: 5,
  itersWithoutImprovement: 100,
  uniformSamples: 40,
  focusedSamples: 20,
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

/** Adaptive coordinate descent on the weighted overlap, starting from `p` (mutated). */
function descend(layout: LayoutState, i: number, p: Pose, rng: Rng): void {
  const s = layout.model.variants[p.v];
  const [x0, x1] = layout.xRange(p.v);
  const [y0, y1] = layout.yRange(p.v);
  let sx = 0.1 * (s.maxX - s.minX);
  let sy = 0.1 * (s.maxY - s.minY);
  const minSx = 1e-3 * sx;
  const minSy = 1e-3 * sy;
  for (let k = 0; k < 60 && p.e > 0 && (sx > minSx || sy > minSy); k++) {
    const alongX = sx > minSx && (sy <= minSy || rng() < 0.5);
    const sign = rng() < 0.5 ? 1 : -1;
    let improved = false;
    for (let t = 0; t < 2; t++) {
      const d = t === 0 ? sign : -sign;
      const nx = alongX ? clamp(p.x + d * sx, x0, x1) : p.x;
      const ny = alongX ? p.y : clamp(p.y + d * sy, y0, y1);
      const e = layout.evaluate(i, p.v, nx, ny, p.e);
      if (e < p.e) {
        p.x = nx;
        p.y = ny;
        p.e = e;
        improved = true;
        break;
      }
    }
    if (alongX) sx *= improved ? 1.2 : 0.5;
    else sy *= improved ? 1.2 : 0.5;
  }
}

/**
 * The few best distinct sampled poses, best first (`top[0]` is the best). A sample is scored against the
 * worst kept pose, so once the list is full an evaluation still stops early.
 */
class TopPoses {
  readonly poses: Pose[] = [];
  constructor(readonly k: number, first: Pose) {
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
 * Descents per move, each from one of the best distinct samples (the published separator also refines
 * several of its best samples, not only the best; its count is 3 there, from memory). Measured here, 60 s
 * single-lane runs on shirts and dagli, seeds 1–4 (`tests/bench/nesting/curve-run.ts`): mean density
 * 1 descent 86.95 / 86.71 %, 3 descents 87.43 / 87.24 %, 5 descents 87.70 / 87.36 %, 8 descents (seeds
 * 3–4) 87.33 / 86.97 %; 50 + 25 samples instead of 40 + 20 with 5 descents: 87.13 / 87.26 %.
 */
const DESCENTS = 5;

/** Move item i to the best of sampled positions after descent (never worse than where it is). */
export function moveItem(layout: LayoutState, i: number, rng: Rng, cfg: SeparatorConfig): void {
  const item = layout.model.items[i];
  const cur: Pose = { v: layout.v[i], x: layout.x[i], y: layout.y[i], e: 0 };
  cur.e = layout.evaluate(i, cur.v, cur.x, cur.y, Infinity);
  const top = new TopPoses(DESCENTS, cur);
  const fits = item.variants.every((v) => fitsStrip(layout, v)) ? item.variants : item.variants.filter((v) => fitsStrip(layout, v));
  for (let k = 0; k < cfg.uniformSamples && top.best.e > 0; k++) {
    const v = fits[rngInt(rng, fits.length)];
    const [x0, x1] = layout.xRange(v);
    const [y0, y1] = layout.yRange(v);
    consider(layout, i, top, v, x0 + rng() * (x1 - x0), y0 + rng() * (y1 - y0));
  }
  const s = layout.model.variants[cur.v];
  const fx = 0.5 * (s.maxX - s.minX);
  const fy = 0.5 * (s.maxY - s.minY);
  for (let k = 0; k < cfg.focusedSamples && top.best.e > 0; k++) {
    const v = k % 4 === 3 ? fits[rngInt(rng, fits.length)] : cur.v;
    const [x0, x1] = layout.xRange(v);
    const [y0, y1] = layout.yRange(v);
    consider(layout, i, top, v, clamp(cur.x + (2 * rng() - 1) * fx, x0, x1), clamp(cur.y + (2 * rng() - 1) * fy, y0, y1));
  }
  contactSamples(layout, i, top, fits, rng, cfg.contactSamples);
  let best = top.best;
  for (const p of top.poses) {
    if (best.e === 0) break;
    const q = { ...p };
    descend(layout, i, q, rng);
    if (q.e < best.e) best = q;
  }
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
  for (let strike = 0; strike < cfg.strikes; strike++) {
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
    layout.restore(best);
  }
  return false;
}
