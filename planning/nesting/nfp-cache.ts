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
}

interface ShapeSource {
  shape: { x: number; y: number }[];
}

function flatten(rings: { x: number; y: number }[][]): Nfp {
  const total = rings.reduce((s, r) => s + r.length, 0);
  const coords = new Float64Array(total * 2);
  const ringStarts = new Int32Array(rings.length + 1);
  let k = 0;
  let minX = Infinity, maxX = -Infinity, minY = Infinity, maxY = -Infinity;
  rings.forEach((r, ri) => {
    ringStarts[ri] = k;
    for (const p of r) {
      coords[2 * k] = p.x;
      coords[2 * k + 1] = p.y;
      k++;
      if (p.x < minX) minX = p.x;
      if (p.x > maxX) maxX = p.x;
      if (p.y < minY) minY = p.y;
      if (p.y > maxY) maxY = p.y;
    }
  });
  ringStarts[rings.length] = k;
  return { coords, ringStarts, minX, maxX, minY, maxY };
}

/**
 * Lazily computed NFPs between variant shapes: `get(a, b)` holds the positions of b's origin,
 * relative to a's origin, where the two shapes overlap. Computed on first use and kept.
 */
export class NfpCache {
  private readonly table: (Nfp | undefined)[];
  private readonly count: number;
  constructor(
    private readonly shapes: ShapeSource[],
    private readonly scale: number,
  ) {
    this.count = shapes.length;
    this.table = new Array(this.count * this.count);
  }

  get(a: number, b: number): Nfp {
    const k = a * this.count + b;
    let nfp = this.table[k];
    if (!nfp) {
      nfp = flatten(polygonNoFitRings(this.shapes[a].shape, this.shapes[b].shape, this.scale));
      this.table[k] = nfp;
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
  if (!inside) return 0;
  let best = Infinity;
  for (let r = 0; r < rs.length - 1; r++) {
    const s = rs[r], e = rs[r + 1];
    let ax = c[2 * (e - 1)], ay = c[2 * (e - 1) + 1];
    for (let i = s; i < e; i++) {
      const bx = c[2 * i], by = c[2 * i + 1];
      const dx = bx - ax, dy = by - ay;
      const len2 = dx * dx + dy * dy;
      let t = len2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / len2 : 0;
      t = t < 0 ? 0 : t > 1 ? 1 : t;
      const ex = ax + t * dx - px, ey = ay + t * dy - py;
      const d2 = ex * ex + ey * ey;
      if (d2 < best) best = d2;
      ax = bx;
      ay = by;
    }
  }
  return Math.sqrt(best);
}
