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
  return { coords, ringStarts, minX, maxX, minY, maxY };
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
