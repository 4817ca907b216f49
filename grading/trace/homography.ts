import type { Point } from '@shared/geometry/types';
import { linearSolve } from './linear-solve';

/** A plane projective transform as a row-major 3×3 matrix, h[8] = 1: (x, y) → ((h0x+h1y+h2)/w, (h3x+h4y+h5)/w), w = h6x+h7y+h8. */
export type Homography = [number, number, number, number, number, number, number, number, number];

/** Apply `h` to a point. A point mapped to infinity (w = 0) comes back as NaN coordinates. */
export function homographyApply(h: Homography, p: Point): Point {
  const w = h[6] * p.x + h[7] * p.y + h[8];
  return { x: (h[0] * p.x + h[1] * p.y + h[2]) / w, y: (h[3] * p.x + h[4] * p.y + h[5]) / w };
}

/** The inverse transform (adjugate over determinant), scaled so its last entry is 1. Singular `h` → null. */
export function homographyInvert(h: Homography): Homography | null {
  const [a, b, c, d, e, f, g, k, l] = h;
  const A = e * l - f * k, B = -(d * l - f * g), C = d * k - e * g;
  const det = a * A + b * B + c * C;
  if (!Number.isFinite(det) || Math.abs(det) < 1e-15) return null;
  const inv: Homography = [A, -(b * l - c * k), b * f - c * e, B, a * l - c * g, -(a * f - c * d), C, -(a * k - b * g), a * e - b * d];
  const s = inv[8];
  return inv.map((v) => v / (Math.abs(s) > 1e-15 ? s : det)) as Homography;
}

/** Product a·b (apply b first, then a). */
export function homographyMultiply(a: Homography, b: Homography): Homography {
  const out = new Array<number>(9).fill(0);
  for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) for (let k = 0; k < 3; k++) out[r * 3 + c] += a[r * 3 + k] * b[k * 3 + c];
  return out.map((v) => v / out[8]) as Homography;
}

/** Hartley normalisation: centroid to the origin, mean distance √2. */
function normaliser(pts: readonly Point[]): Homography {
  const cx = pts.reduce((s, p) => s + p.x, 0) / pts.length, cy = pts.reduce((s, p) => s + p.y, 0) / pts.length;
  const md = pts.reduce((s, p) => s + Math.hypot(p.x - cx, p.y - cy), 0) / pts.length || 1;
  const s = Math.SQRT2 / md;
  return [s, 0, -s * cx, 0, s, -s * cy, 0, 0, 1];
}

/**
 * The homography taking each `from[i]` to `to[i]`: exact for 4 points, least squares (algebraic error, on
 * Hartley-normalised points) for more. Needs at least 4 pairs with no 3 of the first four collinear;
 * degenerate input (too few pairs, collinear points) → null.
 */
export function homographyFromPoints(from: readonly Point[], to: readonly Point[]): Homography | null {
  if (from.length !== to.length || from.length < 4) return null;
  const tf = normaliser(from), tt = normaliser(to);
  const a = from.map((p) => homographyApply(tf, p)), b = to.map((p) => homographyApply(tt, p));
  const ata = Array.from({ length: 8 }, () => new Array<number>(8).fill(0));
  const atb = new Array<number>(8).fill(0);
  const add = (row: number[], rhs: number) => {
    for (let i = 0; i < 8; i++) {
      atb[i] += row[i] * rhs;
      for (let j = 0; j < 8; j++) ata[i][j] += row[i] * row[j];
    }
  };
  for (let i = 0; i < a.length; i++) {
    const { x, y } = a[i], { x: u, y: v } = b[i];
    add([x, y, 1, 0, 0, 0, -x * u, -y * u], u);
    add([0, 0, 0, x, y, 1, -x * v, -y * v], v);
  }
  const h = linearSolve(ata, atb);
  if (!h || h.some((v) => !Number.isFinite(v))) return null;
  const inv = homographyInvert(tt);
  if (!inv) return null;
  return homographyMultiply(inv, homographyMultiply([...h, 1] as Homography, tf));
}
