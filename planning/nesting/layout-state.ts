import type { NestModel } from './nest-model';
import { nfpDepth } from './nfp-cache';

/** Positions of every item, enough to rebuild a layout. */
export interface LayoutSnapshot {
  v: Int32Array;
  x: Float64Array;
  y: Float64Array;
}

/**
 * A possibly overlapping layout on a strip of fixed length, with the pairwise penetration depths
 * (`ov`) and the guided-local-search pair weights (`w`) kept as dense n × n tables: n is at most a
 * few hundred copies in a marker, and dense rows keep the inner loop free of allocation.
 */
export class LayoutState {
  readonly n: number;
  length = Infinity;
  readonly v: Int32Array;
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly placed: Uint8Array;
  readonly ov: Float64Array;
  readonly w: Float64Array;
  /** Row sums of `ov`, kept by `place` so the separator's per-sweep totals are O(n), not O(n²). */
  private readonly ovSum: Float64Array;
  /** Overlapping pairs per item: a row sum is reset to exactly 0 when its count reaches 0. */
  private readonly ovCount: Int32Array;
  private readonly bx0: Float64Array;
  private readonly bx1: Float64Array;
  private readonly by0: Float64Array;
  private readonly by1: Float64Array;
  /**
   * Broad phase: the strip cut into a grid of cells (columns along x, rows along y, each about one
   * mean packed-shape box wide and high); `cellBits` holds, per cell, a bitset of the placed items
   * whose packed-shape box reaches into it, so a trial position meets only the items near it.
   * Candidates come out in ascending item order, so sums and early cut-offs are those of a plain
   * scan over all items.
   */
  private readonly words: number;
  private readonly colWidth: number;
  private readonly cols: number;
  private readonly rowHeight: number;
  private readonly rows: number;
  private readonly cellBits: Int32Array;
  private readonly itemC0: Int32Array;
  private readonly itemC1: Int32Array;
  private readonly itemR0: Int32Array;
  private readonly itemR1: Int32Array;
  private readonly query: Int32Array;
  /** Cells `query` was gathered over, and `cellVersion` then (see `gather`). */
  private queryKey = -1;
  private queryVersion = -1;
  /** Bumped whenever an item is registered in or removed from the cells. */
  private cellVersion = 0;
  /** Per item: √area (the size factor of the overlap cost) and ε = 1 % of the packed shape's diameter. */
  private readonly size: Float64Array;
  private readonly eps: Float64Array;

  constructor(readonly model: NestModel) {
    const n = model.items.length;
    this.n = n;
    this.size = new Float64Array(n);
    this.eps = new Float64Array(n);
    model.items.forEach((it, i) => {
      const v = model.variants[it.variants[0]];
      this.size[i] = Math.sqrt(it.area);
      this.eps[i] = 0.01 * Math.hypot(v.sMaxX - v.sMinX, v.sMaxY - v.sMinY);
    });
    this.v = new Int32Array(n);
    this.x = new Float64Array(n);
    this.y = new Float64Array(n);
    this.placed = new Uint8Array(n);
    this.ov = new Float64Array(n * n);
    this.w = new Float64Array(n * n).fill(1);
    this.ovSum = new Float64Array(n);
    this.ovCount = new Int32Array(n);
    this.bx0 = new Float64Array(n);
    this.bx1 = new Float64Array(n);
    this.by0 = new Float64Array(n);
    this.by1 = new Float64Array(n);
    this.words = Math.max(1, Math.ceil(n / 32));
    let sumW = 0, sumH = 0;
    for (const it of model.items) {
      const v = model.variants[it.variants[0]];
      sumW += v.sMaxX - v.sMinX;
      sumH += Math.min(v.sMaxY - v.sMinY, v.sMaxX - v.sMinX);
    }
    this.colWidth = n > 0 ? Math.max(sumW / n, 1e-12) : 1;
    // Any marker the engine builds is shorter than all boxes side by side; positions beyond the last
    // column (or row) fold into it (still correct, only less selective).
    this.cols = Math.min(4096, Math.ceil(sumW / this.colWidth) + 2);
    this.rowHeight = n > 0 ? Math.max(sumH / n, model.width / 64, 1e-12) : model.width || 1;
    this.rows = Math.max(1, Math.min(64, Math.ceil(model.width / this.rowHeight)));
    this.cellBits = new Int32Array(this.cols * this.rows * this.words);
    this.itemC0 = new Int32Array(n).fill(-1);
    this.itemC1 = new Int32Array(n).fill(-1);
    this.itemR0 = new Int32Array(n);
    this.itemR1 = new Int32Array(n);
    this.query = new Int32Array(this.words);
  }

  private col(x: number): number {
    const c = Math.floor(x / this.colWidth);
    return c < 0 ? 0 : c >= this.cols ? this.cols - 1 : c;
  }

  private row(y: number): number {
    const r = Math.floor(y / this.rowHeight);
    return r < 0 ? 0 : r >= this.rows ? this.rows - 1 : r;
  }

  /**
   * Fill `query` with the items whose cells meet [x0, x1] × [y0, y1]. A query over the same cells as the
   * last one, with no item registered or removed since, keeps `query` as it is: a descent's trial
   * positions mostly stay within the same cells.
   */
  private gather(x0: number, x1: number, y0: number, y1: number): void {
    const c0 = this.col(x0), c1 = this.col(x1), r0 = this.row(y0), r1 = this.row(y1);
    const key = ((c0 * this.cols + c1) * this.rows + r0) * this.rows + r1;
    if (key === this.queryKey && this.queryVersion === this.cellVersion) return;
    this.queryKey = key;
    this.queryVersion = this.cellVersion;
    const W = this.words, q = this.query, bits = this.cellBits, R = this.rows;
    q.fill(0);
    for (let c = c0; c <= c1; c++) {
      for (let r = r0; r <= r1; r++) {
        const o = (c * R + r) * W;
        for (let w = 0; w < W; w++) q[w] |= bits[o + w];
      }
    }
  }

  private register(i: number, on: boolean): void {
    this.cellVersion++;
    const W = this.words, R = this.rows, word = i >>> 5, bit = 1 << (i & 31);
    const r0 = this.itemR0[i], r1 = this.itemR1[i];
    for (let c = this.itemC0[i]; c >= 0 && c <= this.itemC1[i]; c++) {
      for (let r = r0; r <= r1; r++) {
        const o = (c * R + r) * W + word;
        if (on) this.cellBits[o] |= bit;
        else this.cellBits[o] &= ~bit;
      }
    }
  }

  /**
   * Overlap cost of item i (variant vi at xi, yi) with placed item j; 0 when apart or merely touching.
   * The penetration depth d from the no-fit polygon (Imamichi, Yagiura & Nagamochi 2009) is turned into
   * an area-like cost as in Gardeyn, Vanden Berghe & Wauters (2025): sqrt(d² + ε²) × the geometric mean of
   * the two pieces' √area, with ε = 1 % of the larger piece's diameter. The ε floor makes even a sliver
   * of overlap cost something (so it gets resolved), the size factor makes large pieces move apart first.
   */
  pairDepth(i: number, vi: number, xi: number, yi: number, j: number): number {
    const s = this.model.variants[vi];
    if (
      xi + s.sMinX >= this.bx1[j] || xi + s.sMaxX <= this.bx0[j] ||
      yi + s.sMinY >= this.by1[j] || yi + s.sMaxY <= this.by0[j]
    ) return 0;
    const d = nfpDepth(this.model.nfps.get(this.v[j], vi), xi - this.x[j], yi - this.y[j]);
    if (d <= this.model.touchTolerance) return 0;
    const e = Math.max(this.eps[i], this.eps[j]);
    return Math.sqrt(d * d + e * e) * Math.sqrt(this.size[i] * this.size[j]);
  }

  /**
   * Weighted overlap of item i at a trial position; stops early once it exceeds `cutoff`. The hot loop of
   * the search: `pairDepth` written out with its lookups hoisted (the same operations, so the same sums).
   */
  evaluate(i: number, vi: number, xi: number, yi: number, cutoff: number): number {
    const s = this.model.variants[vi];
    const x0 = xi + s.sMinX, x1 = xi + s.sMaxX, y0 = yi + s.sMinY, y1 = yi + s.sMaxY;
    this.gather(x0, x1, y0, y1);
    const { bx0, bx1, by0, by1, x, y, v, eps, size, w, query: q, words } = this;
    const nfps = this.model.nfps, tol = this.model.touchTolerance;
    const epsI = eps[i], sizeI = size[i];
    let sum = 0;
    const row = i * this.n;
    for (let k = 0; k < words; k++) {
      let m = q[k];
      while (m !== 0) {
        const low = m & -m;
        const j = (k << 5) + (31 - Math.clz32(low));
        m ^= low;
        if (j === i || x0 >= bx1[j] || x1 <= bx0[j] || y0 >= by1[j] || y1 <= by0[j]) continue;
        const d = nfpDepth(nfps.get(v[j], vi), xi - x[j], yi - y[j]);
        if (d <= tol) continue;
        const e = Math.max(epsI, eps[j]);
        sum += w[row + j] * (Math.sqrt(d * d + e * e) * Math.sqrt(sizeI * size[j]));
        if (sum > cutoff) return sum;
      }
    }
    return sum;
  }

  /** Put item i at a position and refresh its row and column of depths. */
  place(i: number, vi: number, xi: number, yi: number): void {
    const s = this.model.variants[vi];
    if (this.placed[i]) this.register(i, false);
    this.v[i] = vi;
    this.x[i] = xi;
    this.y[i] = yi;
    this.placed[i] = 1;
    this.bx0[i] = xi + s.sMinX;
    this.bx1[i] = xi + s.sMaxX;
    this.by0[i] = yi + s.sMinY;
    this.by1[i] = yi + s.sMaxY;
    const n = this.n, ov = this.ov, ovSum = this.ovSum, ovCount = this.ovCount;
    for (let j = 0, r = i * n; j < n; j++) {
      const d = ov[r + j];
      if (d !== 0) {
        ov[r + j] = 0;
        ov[j * n + i] = 0;
        ovSum[j] = --ovCount[j] === 0 ? 0 : ovSum[j] - d;
      }
    }
    ovSum[i] = 0;
    ovCount[i] = 0;
    this.gather(this.bx0[i], this.bx1[i], this.by0[i], this.by1[i]);
    const q = this.query;
    for (let w = 0; w < this.words; w++) {
      let m = q[w];
      while (m !== 0) {
        const low = m & -m;
        const j = (w << 5) + (31 - Math.clz32(low));
        m ^= low;
        if (j === i) continue;
        const d = this.pairDepth(i, vi, xi, yi, j);
        if (d !== 0) {
          ov[i * n + j] = d;
          ov[j * n + i] = d;
          ovSum[i] += d;
          ovSum[j] += d;
          ovCount[i]++;
          ovCount[j]++;
        }
      }
    }
    this.itemC0[i] = this.col(this.bx0[i]);
    this.itemC1[i] = this.col(this.bx1[i]);
    this.itemR0[i] = this.row(this.by0[i]);
    this.itemR1[i] = this.row(this.by1[i]);
    this.register(i, true);
  }

  /**
   * Overlap of item i with all others (unweighted). Kept incrementally, so it may carry rounding of
   * the order of 1e-16 × the depths it has seen; an item with no overlapping pair reads exactly 0
   * (its pair count says so, not the sum).
   */
  overlapOf(i: number): number {
    return this.ovSum[i];
  }

  /** Sum of the pairwise depths (unweighted); exactly 0 when no pair overlaps. */
  totalOverlap(): number {
    let s = 0;
    for (let i = 0; i < this.n; i++) s += this.ovSum[i];
    return s / 2;
  }

  collidingItems(): number[] {
    const out: number[] = [];
    for (let i = 0; i < this.n; i++) if (this.ovCount[i] > 0) out.push(i);
    return out;
  }

  /** Used length: the largest x of any true outline. */
  usedLength(): number {
    let l = 0;
    for (let i = 0; i < this.n; i++) l = Math.max(l, this.x[i] + this.model.variants[this.v[i]].maxX);
    return l;
  }

  /** Allowed x range of variant vi's origin on the current strip: [lo, hi] (hi < lo if it cannot fit). */
  xRange(vi: number): [number, number] {
    const s = this.model.variants[vi];
    return [-s.minX, this.length - s.maxX];
  }

  yRange(vi: number): [number, number] {
    const s = this.model.variants[vi];
    return [-s.minY, this.model.width - s.maxY];
  }

  resetWeights(): void {
    this.w.fill(1);
  }

  snapshot(): LayoutSnapshot {
    return { v: this.v.slice(), x: this.x.slice(), y: this.y.slice() };
  }

  /** Rebuild all positions and depths from a snapshot (every item placed). */
  restore(s: LayoutSnapshot): void {
    this.placed.fill(0);
    this.ov.fill(0);
    this.ovSum.fill(0);
    this.ovCount.fill(0);
    this.cellBits.fill(0);
    this.cellVersion++;
    this.itemC0.fill(-1);
    this.itemC1.fill(-1);
    for (let i = 0; i < this.n; i++) this.place(i, s.v[i], s.x[i], s.y[i]);
  }
}
