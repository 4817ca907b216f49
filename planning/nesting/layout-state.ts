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
  private readonly bx0: Float64Array;
  private readonly bx1: Float64Array;
  private readonly by0: Float64Array;
  private readonly by1: Float64Array;

  constructor(readonly model: NestModel) {
    const n = model.items.length;
    this.n = n;
    this.v = new Int32Array(n);
    this.x = new Float64Array(n);
    this.y = new Float64Array(n);
    this.placed = new Uint8Array(n);
    this.ov = new Float64Array(n * n);
    this.w = new Float64Array(n * n).fill(1);
    this.bx0 = new Float64Array(n);
    this.bx1 = new Float64Array(n);
    this.by0 = new Float64Array(n);
    this.by1 = new Float64Array(n);
  }

  /** Depth of item i (variant vi at xi, yi) into placed item j; 0 when apart or merely touching. */
  pairDepth(i: number, vi: number, xi: number, yi: number, j: number): number {
    const s = this.model.variants[vi];
    if (
      xi + s.sMinX >= this.bx1[j] || xi + s.sMaxX <= this.bx0[j] ||
      yi + s.sMinY >= this.by1[j] || yi + s.sMaxY <= this.by0[j]
    ) return 0;
    const d = nfpDepth(this.model.nfps.get(this.v[j], vi), xi - this.x[j], yi - this.y[j]);
    return d > this.model.touchTolerance ? d : 0;
  }

  /** Weighted overlap of item i at a trial position; stops early once it exceeds `cutoff`. */
  evaluate(i: number, vi: number, xi: number, yi: number, cutoff: number): number {
    let sum = 0;
    const row = i * this.n;
    for (let j = 0; j < this.n; j++) {
      if (j === i || !this.placed[j]) continue;
      const d = this.pairDepth(i, vi, xi, yi, j);
      if (d > 0) {
        sum += this.w[row + j] * d;
        if (sum > cutoff) return sum;
      }
    }
    return sum;
  }

  /** Put item i at a position and refresh its row and column of depths. */
  place(i: number, vi: number, xi: number, yi: number): void {
    const s = this.model.variants[vi];
    this.v[i] = vi;
    this.x[i] = xi;
    this.y[i] = yi;
    this.placed[i] = 1;
    this.bx0[i] = xi + s.sMinX;
    this.bx1[i] = xi + s.sMaxX;
    this.by0[i] = yi + s.sMinY;
    this.by1[i] = yi + s.sMaxY;
    const n = this.n;
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      const d = this.placed[j] ? this.pairDepth(i, vi, xi, yi, j) : 0;
      this.ov[i * n + j] = d;
      this.ov[j * n + i] = d;
    }
  }

  overlapOf(i: number): number {
    let s = 0;
    for (let j = 0, r = i * this.n; j < this.n; j++) s += this.ov[r + j];
    return s;
  }

  totalOverlap(): number {
    let s = 0;
    for (let k = 0; k < this.ov.length; k++) s += this.ov[k];
    return s / 2;
  }

  collidingItems(): number[] {
    const out: number[] = [];
    for (let i = 0; i < this.n; i++) if (this.overlapOf(i) > 0) out.push(i);
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
    for (let i = 0; i < this.n; i++) this.place(i, s.v[i], s.x[i], s.y[i]);
  }
}
