import { polygonNoFitRings } from './clipper-path';

/** A no-fit polygon flattened for fast point queries. */
export interface Nfp {
  /** x0, y0, x1, y1, … of all rings back to back. */
  coords: Float64Array;
  /** Start index (in points) of each ring, plus a final end marker. */
  ringStarts: Int32Array;
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
  /**
   * Fail-fast surrogate: a G × G grid over the bounding box; each cell is CELL_OUT or CELL_IN when
   * no NFP edge comes near it (then every point of the cell is outside or inside), else CELL_MIXED;
   * CELL_UNKNOWN until first used.
   */
  grid: Uint8Array;
  gridSize: number;
  /** Cells per unit length along x and y. */
  gx: number;
  gy: number;
  /**
   * Per cell, built on first use: the edges that can be nearest to a point of the cell, by increasing
   * distance from the cell to the edge's bounding box, so a nearest-edge search stops at the first edge that
   * cannot beat the best so far. All cells' lists share one growing array, `nearData`, `SEG` numbers per edge
   * (that distance squared, start x, start y, dx, dy, length², end-point index): the hot loop reads one
   * contiguous run instead of following per-cell arrays and end-point indices. `nearAt[k]` is where cell k's
   * run starts (−1 until built), `nearCount[k]` its edges; `nearUsed` the numbers in use.
   */
  nearAt: Int32Array;
  nearCount: Int32Array;
  nearData: Float64Array;
  nearUsed: number;
  /** Start-point index of the edge ending at each point (rings are closed). */
  prev: Int32Array;
  /**
   * Per edge (by end-point index): +1 when the NFP's inside lies to the left of the directed edge,
   * −1 when to the right. Lets a point whose nearest boundary point is inside an edge be classified
   * by one cross product instead of an even-odd scan of every edge.
   */
  side: Int8Array;
}

const CELL_OUT = 0;
const CELL_IN = 1;
const CELL_MIXED = 2;
/** Not classified yet: cells are classified on first use, so fine grids cost nothing unused. */
const CELL_UNKNOWN = 3;

/** What the cache needs to know of a variant: which piece, mirror state and rotation it is. */
export interface VariantKey {
  piece: number;
  mirrored: boolean;
  rotation: number;
}

/** Packed shape of a piece in a mirror state (x → −x first) and rotation (degrees, exact quarter turns). */
export type ShapeOf = (piece: number, mirrored: boolean, rotation: number) => { x: number; y: number }[];

function flatten(rings: { x: number; y: number }[][]): Nfp {
  const total = rings.reduce((s, r) => s + r.length, 0);
  const coords = new Float64Array(total * 2);
  const ringStarts = new Int32Array(rings.length + 1);
  let k = 0;
  rings.forEach((r, ri) => {
    ringStarts[ri] = k;
    for (const p of r) {
      coords[2 * k] = p.x;
      coords[2 * k + 1] = p.y;
      k++;
    }
  });
  ringStarts[rings.length] = k;
  return withBounds(coords, ringStarts);
}

function withBounds(coords: Float64Array, ringStarts: Int32Array): Nfp {
  let minX = Infinity, maxX = -Infinity, minY = Infinity, maxY = -Infinity;
  for (let k = 0; k < coords.length; k += 2) {
    const x = coords[k], y = coords[k + 1];
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  // Cells per side: about √(vertices), 8 to 16. A coarser grid has longer near-edge lists, but they are
  // sorted by lower bound and the search stops early; a finer one builds many more cells, each once, for
  // an O(edges) scan. Timed on equal work (`profile-run.ts … iters:12000`, seed 1, same markers):
  // 4√m up to 64 cells took shirts 17.0–21.7 s, trousers 20.8 s; √m up to 16 took 14.2 s and 14.9 s
  // (2√m up to 32: 14.2 s and 16.9 s); the demo's 6-garment self markers (1,500 iterations) 26.6 / 34.0 s
  // against 24.4 / 29.0 s.
  const gridSize = Math.max(8, Math.min(16, Math.ceil(Math.sqrt(coords.length / 2))));
  const gx = gridSize / (maxX - minX || 1);
  const gy = gridSize / (maxY - minY || 1);
  const prev = new Int32Array(coords.length / 2);
  for (let r = 0; r < ringStarts.length - 1; r++) {
    for (let i = ringStarts[r]; i < ringStarts[r + 1]; i++) prev[i] = i === ringStarts[r] ? ringStarts[r + 1] - 1 : i - 1;
  }
  const nfp: Nfp = {
    coords, ringStarts, minX, maxX, minY, maxY, grid: new Uint8Array(gridSize * gridSize).fill(CELL_UNKNOWN), gridSize, gx, gy,
    nearAt: new Int32Array(gridSize * gridSize).fill(-1), nearCount: new Int32Array(gridSize * gridSize), nearData: new Float64Array(0), nearUsed: 0, prev, side: new Int8Array(prev.length),
  };
  classifyCells(nfp);
  ringSides(nfp);
  return nfp;
}

/**
 * Which side of each ring is inside, decided once per ring by the even-odd rule at a point just off
 * the middle of its longest edge (Clipper's orientation convention is not relied on: mirrored copies
 * reverse it). Rings of a union do not cross, so one edge decides the whole ring.
 */
function ringSides(nfp: Nfp): void {
  const { coords: c, ringStarts: rs, prev, side } = nfp;
  for (let r = 0; r < rs.length - 1; r++) {
    let best = -1, bestLen = 0;
    for (let i = rs[r]; i < rs[r + 1]; i++) {
      const a = prev[i];
      const len = Math.hypot(c[2 * i] - c[2 * a], c[2 * i + 1] - c[2 * a + 1]);
      if (len > bestLen) {
        bestLen = len;
        best = i;
      }
    }
    if (best < 0) continue;
    const a = prev[best];
    const dx = (c[2 * best] - c[2 * a]) / bestLen, dy = (c[2 * best + 1] - c[2 * a + 1]) / bestLen;
    const off = 1e-6 * bestLen;
    const mx = 0.5 * (c[2 * best] + c[2 * a]) - dy * off, my = 0.5 * (c[2 * best + 1] + c[2 * a + 1]) + dx * off;
    const s = insideEvenOdd(nfp, mx, my) ? 1 : -1;
    for (let i = rs[r]; i < rs[r + 1]; i++) side[i] = s;
  }
}

function cellIndex(v: number, lo: number, g: number, size: number): number {
  const c = Math.floor((v - lo) * g);
  return c < 0 ? 0 : c >= size ? size - 1 : c;
}

/** Marks every cell an edge comes within eps of as mixed (row by row, conservatively). */
function classifyCells(nfp: Nfp): void {
  const { coords: c, ringStarts: rs, grid, gridSize: G, gx, gy, minX, minY } = nfp;
  const eps = 1e-9 * Math.max(nfp.maxX - nfp.minX, nfp.maxY - nfp.minY, 1e-300);
  for (let r = 0; r < rs.length - 1; r++) {
    const s = rs[r], e = rs[r + 1];
    let ax = c[2 * (e - 1)], ay = c[2 * (e - 1) + 1];
    for (let i = s; i < e; i++) {
      const bx = c[2 * i], by = c[2 * i + 1];
      const cy0 = cellIndex(Math.min(ay, by) - eps, minY, gy, G), cy1 = cellIndex(Math.max(ay, by) + eps, minY, gy, G);
      for (let cy = cy0; cy <= cy1; cy++) {
        // The part of the edge inside this row's band (grown by eps), then the cells it spans.
        let xa = Math.min(ax, bx), xb = Math.max(ax, bx);
        if (ay !== by) {
          const lo = minY + cy / gy - eps, hi = minY + (cy + 1) / gy + eps;
          const t0 = Math.min(1, Math.max(0, (lo - ay) / (by - ay))), t1 = Math.min(1, Math.max(0, (hi - ay) / (by - ay)));
          const u = ax + (bx - ax) * t0, v = ax + (bx - ax) * t1;
          xa = Math.max(xa, Math.min(u, v));
          xb = Math.min(xb, Math.max(u, v));
        }
        const cx1 = cellIndex(xb + eps, minX, gx, G);
        for (let cx = cellIndex(xa - eps, minX, gx, G); cx <= cx1; cx++) grid[cy * G + cx] = CELL_MIXED;
      }
      ax = bx;
      ay = by;
    }
  }
}

/** Classify a cell no edge comes near by its centre (the whole cell is on the same side). */
function classifyCell(nfp: Nfp, k: number): number {
  const G = nfp.gridSize;
  const cx = k % G, cy = (k - cx) / G;
  const cell = insideEvenOdd(nfp, nfp.minX + (cx + 0.5) / nfp.gx, nfp.minY + (cy + 0.5) / nfp.gy) ? CELL_IN : CELL_OUT;
  nfp.grid[k] = cell;
  return cell;
}

function segmentDist2(c: Float64Array, a: number, b: number, px: number, py: number): number {
  const ax = c[2 * a], ay = c[2 * a + 1];
  const dx = c[2 * b] - ax, dy = c[2 * b + 1] - ay;
  const len2 = dx * dx + dy * dy;
  let t = len2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / len2 : 0;
  t = t < 0 ? 0 : t > 1 ? 1 : t;
  const ex = ax + t * dx - px, ey = ay + t * dy - py;
  return ex * ex + ey * ey;
}

/**
 * Edges that may be nearest to some point of cell k. The distance to a segment is convex, so its
 * largest value over the cell is at a corner: U = min over edges of that corner maximum bounds the
 * nearest distance of every point in the cell; an edge whose bounding box is farther than U from
 * the cell can never be nearest. A small slack covers points rounded into the cell. Kept sorted by that
 * bounding-box distance, so a search can stop early. Returns where its run starts in `nearData`.
 */
function nearEdges(nfp: Nfp, k: number): number {
  const { coords: c, prev, gridSize: G, gx, gy } = nfp;
  const slack = 1e-9 * Math.max(nfp.maxX - nfp.minX, nfp.maxY - nfp.minY);
  const cx = k % G, cy = (k - cx) / G;
  const x0 = nfp.minX + cx / gx - slack, x1 = nfp.minX + (cx + 1) / gx + slack;
  const y0 = nfp.minY + cy / gy - slack, y1 = nfp.minY + (cy + 1) / gy + slack;
  const m = prev.length;
  let u2 = Infinity;
  for (let i = 0; i < m; i++) {
    const a = prev[i];
    const far = Math.max(segmentDist2(c, a, i, x0, y0), segmentDist2(c, a, i, x1, y0), segmentDist2(c, a, i, x0, y1), segmentDist2(c, a, i, x1, y1));
    if (far < u2) u2 = far;
  }
  const u = Math.sqrt(u2) + slack;
  if (scratchEdges.length < m) {
    scratchEdges = new Int32Array(2 * m);
    scratchLb2 = new Float64Array(2 * m);
  }
  const edges = scratchEdges, lb2 = scratchLb2;
  let count = 0;
  for (let i = 0; i < m; i++) {
    const a = prev[i];
    const ex0 = Math.min(c[2 * a], c[2 * i]), ex1 = Math.max(c[2 * a], c[2 * i]);
    const ey0 = Math.min(c[2 * a + 1], c[2 * i + 1]), ey1 = Math.max(c[2 * a + 1], c[2 * i + 1]);
    const dx = ex0 > x1 ? ex0 - x1 : x0 > ex1 ? x0 - ex1 : 0;
    const dy = ey0 > y1 ? ey0 - y1 : y0 > ey1 ? y0 - ey1 : 0;
    if (dx * dx + dy * dy <= u * u) {
      edges[count] = i;
      lb2[count++] = dx * dx + dy * dy;
    }
  }
  const order = new Int32Array(count);
  for (let e = 0; e < count; e++) order[e] = e;
  order.sort((p, q) => lb2[p] - lb2[q] || edges[p] - edges[q]);
  const at = nfp.nearUsed;
  if (at + count * SEG > nfp.nearData.length) {
    const grown = new Float64Array(Math.max(2 * nfp.nearData.length, at + count * SEG, 64 * SEG));
    grown.set(nfp.nearData.subarray(0, at));
    nfp.nearData = grown;
  }
  const seg = nfp.nearData;
  for (let e = 0; e < count; e++) {
    const i = edges[order[e]], a = prev[i];
    const ax = c[2 * a], ay = c[2 * a + 1], dx = c[2 * i] - ax, dy = c[2 * i + 1] - ay;
    const o = at + e * SEG;
    seg[o] = lb2[order[e]];
    seg[o + 1] = ax;
    seg[o + 2] = ay;
    seg[o + 3] = dx;
    seg[o + 4] = dy;
    seg[o + 5] = dx * dx + dy * dy;
    seg[o + 6] = i;
  }
  nfp.nearAt[k] = at;
  nfp.nearCount[k] = count;
  nfp.nearUsed = at + count * SEG;
  return at;
}

/** Numbers per packed edge in `Nfp.nearData`. */
const SEG = 7;

/** Scratch buffers of `nearEdges` (one thread runs one search at a time). */
let scratchEdges = new Int32Array(256);
let scratchLb2 = new Float64Array(256);

function insideEvenOdd(nfp: Nfp, px: number, py: number): boolean {
  const c = nfp.coords;
  const rs = nfp.ringStarts;
  let inside = false;
  for (let r = 0; r < rs.length - 1; r++) {
    const s = rs[r], e = rs[r + 1];
    let ax = c[2 * (e - 1)], ay = c[2 * (e - 1) + 1];
    for (let i = s; i < e; i++) {
      const bx = c[2 * i], by = c[2 * i + 1];
      if (ay > py !== by > py && px < ((bx - ax) * (py - ay)) / (by - ay) + ax) inside = !inside;
      ax = bx;
      ay = by;
    }
  }
  return inside;
}

const normalise = (deg: number) => ((deg % 360) + 360) % 360;

/**
 * p ↦ Rot(rotation) · Mirror^mirrored · (sign · p), applied to every NFP vertex (quarter turns exact).
 * Orthogonal maps commute with Minkowski sums and negation, so this carries an NFP to the NFP of
 * the transformed pair.
 */
function transformNfp(src: Nfp, mirrored: boolean, rotation: number, sign: 1 | -1): Nfp {
  const q = normalise(rotation);
  const r = (rotation * Math.PI) / 180;
  const cos = q === 0 ? 1 : q === 90 ? 0 : q === 180 ? -1 : q === 270 ? 0 : Math.cos(r);
  const sin = q === 0 ? 0 : q === 90 ? 1 : q === 180 ? 0 : q === 270 ? -1 : Math.sin(r);
  const c = src.coords;
  const out = new Float64Array(c.length);
  for (let k = 0; k < c.length; k += 2) {
    const x = (mirrored ? -c[k] : c[k]) * sign, y = c[k + 1] * sign;
    out[k] = x * cos - y * sin;
    out[k + 1] = x * sin + y * cos;
  }
  return withBounds(out, src.ringStarts);
}

/**
 * Lazily computed NFPs between variant shapes: `get(a, b)` holds the positions of b's origin,
 * relative to a's origin, where the two shapes overlap. Computed on first use and kept.
 * Only one NFP per piece pair, relative mirror state and relative rotation is ever computed by
 * Clipper: NFP(T·A, T·B) = T·NFP(A, B) for a mirror/rotation T, and NFP(B, A) = −NFP(A, B); every
 * copy of a piece shares its variants, so copies share NFPs too.
 */
export class NfpCache {
  private readonly table: (Nfp | undefined)[];
  private readonly count: number;
  private readonly canonical = new Map<string, Nfp>();
  /** Clipper NFP computations so far (diagnostics). */
  computed = 0;
  constructor(
    private readonly variants: VariantKey[],
    private readonly shapeOf: ShapeOf,
    private readonly scale: number,
  ) {
    this.count = variants.length;
    this.table = new Array(this.count * this.count);
  }

  get(a: number, b: number): Nfp {
    const k = a * this.count + b;
    let nfp = this.table[k];
    if (!nfp) {
      nfp = this.derive(this.variants[a], this.variants[b]);
      this.table[k] = nfp;
    }
    return nfp;
  }

  /** NFP(A, B) = T_A · NFP(base A, T_A⁻¹ · B), with the lower piece index first. */
  private derive(a: VariantKey, b: VariantKey): Nfp {
    if (a.piece > b.piece) return transformNfp(this.derive(b, a), false, 0, -1);
    // T_A⁻¹ · B = Mirror^ma · Rot(φb − θa) · Mirror^mb · base B = Rot(±(φb − θa)) · Mirror^(ma⊕mb) · base B.
    const mirrored = a.mirrored !== b.mirrored;
    const rotation = normalise(a.mirrored ? a.rotation - b.rotation : b.rotation - a.rotation);
    const base = this.base(a.piece, b.piece, mirrored, rotation);
    return a.mirrored || a.rotation !== 0 ? transformNfp(base, a.mirrored, a.rotation, 1) : base;
  }

  private base(pa: number, pb: number, mirrored: boolean, rotation: number): Nfp {
    const key = `${pa}|${pb}|${mirrored ? 1 : 0}|${rotation}`;
    let nfp = this.canonical.get(key);
    if (!nfp) {
      nfp = flatten(polygonNoFitRings(this.shapeOf(pa, false, 0), this.shapeOf(pb, mirrored, rotation), this.scale));
      this.canonical.set(key, nfp);
      this.computed++;
    }
    return nfp;
  }
}

/**
 * Penetration depth of point (px, py) into the NFP: the distance to the nearest NFP edge when the
 * point is inside (even-odd over all rings), else 0. This is the shortest translation separating
 * the two shapes, the overlap measure of Imamichi et al. (2009) and Umetani et al. (2009).
 */
export function nfpDepth(nfp: Nfp, px: number, py: number): number {
  if (px <= nfp.minX || px >= nfp.maxX || py <= nfp.minY || py >= nfp.maxY) return 0;
  const G = nfp.gridSize;
  const k = cellIndex(py, nfp.minY, nfp.gy, G) * G + cellIndex(px, nfp.minX, nfp.gx, G);
  let cell = nfp.grid[k];
  if (cell === CELL_UNKNOWN) cell = classifyCell(nfp, k);
  if (cell === CELL_OUT) return 0;
  let at = nfp.nearAt[k];
  if (at < 0) at = nearEdges(nfp, k);
  const seg = nfp.nearData;
  const end = at + nfp.nearCount[k] * SEG;
  let best = Infinity;
  let bestAt = -1;
  // segmentDist2 on the packed edge, operation for operation (the same rounding, so the same markers).
  for (let o = at; o < end && seg[o] < best; o += SEG) {
    const ax = seg[o + 1], ay = seg[o + 2], dx = seg[o + 3], dy = seg[o + 4], len2 = seg[o + 5];
    let t = len2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / len2 : 0;
    t = t < 0 ? 0 : t > 1 ? 1 : t;
    const ex = ax + t * dx - px, ey = ay + t * dy - py;
    const d2 = ex * ex + ey * ey;
    if (d2 < best) {
      best = d2;
      bestAt = o;
    }
  }
  if (cell === CELL_MIXED && !insideNear(nfp, seg[bestAt + 6], px, py)) return 0;
  return Math.sqrt(best);
}

/**
 * Inside test from the nearest edge: when the nearest boundary point lies strictly inside that edge,
 * the segment from the point to it crosses no boundary, so the point is on the edge's inside side.
 * A nearest point at a vertex (where rings may touch) falls back to the even-odd scan.
 */
function insideNear(nfp: Nfp, i: number, px: number, py: number): boolean {
  const c = nfp.coords;
  const a = nfp.prev[i];
  const ax = c[2 * a], ay = c[2 * a + 1];
  const dx = c[2 * i] - ax, dy = c[2 * i + 1] - ay;
  const dot = (px - ax) * dx + (py - ay) * dy;
  const len2 = dx * dx + dy * dy;
  if (dot <= 0 || dot >= len2) return insideEvenOdd(nfp, px, py);
  const cross = dx * (py - ay) - dy * (px - ax);
  return nfp.side[i] * cross > 0;
}
