import type { Point, Polygon } from '@shared/geometry/types';
import type { CalibrationLayout } from '@shared/calibration/calibration-sheet';
import { linearSolve } from './linear-solve';

/** An RGBA image, 8 bits a channel, rows top to bottom (what a canvas's ImageData and OpenCV's RGBA Mat hold). */
export interface RgbaImage {
  width: number;
  height: number;
  data: Uint8ClampedArray | Uint8Array;
}

/** A one-channel float image. */
export interface FloatImage {
  width: number;
  height: number;
  data: Float32Array;
}

/** Why a photo could not be traced; the screen says it in plain words. */
export type TraceFailure = 'marks_not_found' | 'no_piece' | 'piece_touches_edge';

export class TraceError extends Error {
  constructor(readonly code: TraceFailure, message: string) {
    super(message);
  }
}

/** Where the piece may lie, in pixels of the rectified sheet image. */
export interface PixelRect {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** The field's piece likelihood: 0 on the background, 1 on the piece, 0.5 at the edge. */
export interface PieceLikelihood {
  crop: PixelRect;
  t: FloatImage;
  /** Background and piece colours after evening out the light (white paper = 1). */
  background: [number, number, number];
  piece: [number, number, number];
}

const histogramQuantile = (hist: Uint32Array, total: number, q: number, binWidth: number) => {
  let acc = 0;
  const target = q * total;
  for (let i = 0; i < hist.length; i++) {
    acc += hist[i];
    if (acc >= target) return (i + 0.5) * binWidth;
  }
  return (hist.length - 0.5) * binWidth;
};

/**
 * Light across the sheet, channel by channel: in blocks of about 8 mm of the layout's plain white paper the
 * 80th percentile (text and dust are darker than paper) is taken as the paper's colour there, and a
 * quadratic surface in x and y is fitted to those samples by least squares. Returns a function giving the
 * white level (0–255) of each channel at a pixel. Fewer than 6 blocks → a constant level per channel.
 */
function whiteLevel(img: RgbaImage, pxPerMm: number, layout: CalibrationLayout): (x: number, y: number) => [number, number, number] {
  const samples: { x: number; y: number; c: number[] }[] = [];
  const block = Math.max(4, Math.round(8 * pxPerMm));
  for (const r of layout.white) {
    const x0 = Math.max(0, Math.round(r.x * pxPerMm)), y0 = Math.max(0, Math.round(r.y * pxPerMm));
    const x1 = Math.min(img.width, Math.round((r.x + r.w) * pxPerMm)), y1 = Math.min(img.height, Math.round((r.y + r.h) * pxPerMm));
    for (let by = y0; by < y1; by += block) {
      for (let bx = x0; bx < x1; bx += block) {
        const hists = [new Uint32Array(256), new Uint32Array(256), new Uint32Array(256)];
        let n = 0;
        for (let y = by; y < Math.min(y1, by + block); y++) {
          for (let x = bx; x < Math.min(x1, bx + block); x++) {
            const i = (y * img.width + x) * 4;
            if (img.data[i + 3] === 0) continue;
            hists[0][img.data[i]]++; hists[1][img.data[i + 1]]++; hists[2][img.data[i + 2]]++;
            n++;
          }
        }
        if (n < block * block * 0.5) continue;
        samples.push({ x: (bx + block / 2) / img.width, y: (by + block / 2) / img.height, c: hists.map((h) => histogramQuantile(h, n, 0.8, 1)) });
      }
    }
  }
  if (samples.length < 6) {
    const c = samples.length ? [0, 1, 2].map((k) => samples.reduce((s, p) => s + p.c[k], 0) / samples.length) : [255, 255, 255];
    return () => c as [number, number, number];
  }
  const basis = (x: number, y: number) => [1, x, y, x * x, x * y, y * y];
  const coef = [0, 1, 2].map((k) => {
    const ata = Array.from({ length: 6 }, () => new Array<number>(6).fill(0)), atb = new Array<number>(6).fill(0);
    for (const s of samples) {
      const b = basis(s.x, s.y);
      for (let i = 0; i < 6; i++) { atb[i] += b[i] * s.c[k]; for (let j = 0; j < 6; j++) ata[i][j] += b[i] * b[j]; }
    }
    return linearSolve(ata, atb) ?? [samples.reduce((s, p) => s + p.c[k], 0) / samples.length, 0, 0, 0, 0, 0];
  });
  return (x, y) => {
    const b = basis(x / img.width, y / img.height);
    return coef.map((c) => Math.max(1, c.reduce((s, v, i) => s + v * b[i], 0))) as [number, number, number];
  };
}

const median = (values: Float32Array, n: number) => {
  const a = values.slice(0, n).sort();
  return n ? a[n >> 1] : 0;
};

/**
 * Where the piece is on a rectified photo of a calibration sheet (`img`, `pxPerMm` pixels a millimetre,
 * origin at the sheet's top-left): the light is evened out against the sheet's white paper, the background
 * colour is the median of a band just inside the field's edge (where no piece may lie), the piece colour the
 * median of what differs clearly from it, and each pixel gets t = its position between the two colours
 * (projection on the background→piece line). Halfway (t = 0.5) is where a blurred edge really is.
 * Throws TraceError('no_piece') when nothing in the field differs from the background.
 */
export function pieceLikelihood(img: RgbaImage, pxPerMm: number, layout: CalibrationLayout): PieceLikelihood {
  const f = layout.field;
  const crop = { x: Math.round(f.x * pxPerMm), y: Math.round(f.y * pxPerMm), w: Math.round(f.w * pxPerMm), h: Math.round(f.h * pxPerMm) };
  crop.w = Math.min(crop.w, img.width - crop.x);
  crop.h = Math.min(crop.h, img.height - crop.y);
  const white = whiteLevel(img, pxPerMm, layout);
  const n = crop.w * crop.h;
  const rgb = new Float32Array(n * 3);
  // The white level changes slowly: evaluate it on a coarse grid and hold it across each cell.
  const cell = Math.max(1, Math.round(2 * pxPerMm));
  for (let y = 0; y < crop.h; y++) {
    let level: [number, number, number] = [255, 255, 255];
    for (let x = 0; x < crop.w; x++) {
      if (x % cell === 0) level = white(crop.x + x + cell / 2, crop.y + y);
      const i = ((crop.y + y) * img.width + crop.x + x) * 4, o = (y * crop.w + x) * 3;
      rgb[o] = img.data[i] / level[0]; rgb[o + 1] = img.data[i + 1] / level[1]; rgb[o + 2] = img.data[i + 2] / level[2];
    }
  }
  const inner = Math.max(1, Math.round(1 * pxPerMm)), outer = Math.max(inner + 2, Math.round((layout.clearanceMm - 1) * pxPerMm));
  const ringIdx: number[] = [];
  for (let y = 0; y < crop.h; y++) {
    for (let x = 0; x < crop.w; x++) {
      const e = Math.min(x, y, crop.w - 1 - x, crop.h - 1 - y);
      if (e >= inner && e < outer) ringIdx.push(y * crop.w + x);
    }
  }
  const tmp = new Float32Array(Math.max(ringIdx.length, 1));
  const bg = [0, 1, 2].map((k) => { ringIdx.forEach((p, j) => { tmp[j] = rgb[p * 3 + k]; }); return median(tmp, ringIdx.length); }) as [number, number, number];
  const dist = (o: number) => Math.hypot(rgb[o] - bg[0], rgb[o + 1] - bg[1], rgb[o + 2] - bg[2]);
  ringIdx.forEach((p, j) => { tmp[j] = dist(p * 3); });
  const sigma = 1.4826 * median(tmp, ringIdx.length);
  const cut = Math.max(6 * sigma, 0.12);
  const cand: number[] = [];
  for (let p = 0; p < n; p++) if (dist(p * 3) > cut) cand.push(p);
  if (cand.length < (10 * pxPerMm) ** 2) throw new TraceError('no_piece', 'No piece stands out from the background inside the field');
  const ctmp = new Float32Array(cand.length);
  const piece = [0, 1, 2].map((k) => { cand.forEach((p, j) => { ctmp[j] = rgb[p * 3 + k]; }); return median(ctmp, cand.length); }) as [number, number, number];
  const dx = piece[0] - bg[0], dy = piece[1] - bg[1], dz = piece[2] - bg[2];
  const len2 = dx * dx + dy * dy + dz * dz;
  const t = new Float32Array(n);
  for (let p = 0; p < n; p++) {
    const o = p * 3;
    t[p] = ((rgb[o] - bg[0]) * dx + (rgb[o + 1] - bg[1]) * dy + (rgb[o + 2] - bg[2]) * dz) / len2;
  }
  return { crop, t: { width: crop.w, height: crop.h, data: t }, background: bg, piece };
}

const sample = (f: FloatImage, x: number, y: number) => {
  const x0 = Math.max(0, Math.min(f.width - 2, Math.floor(x))), y0 = Math.max(0, Math.min(f.height - 2, Math.floor(y)));
  const ax = Math.max(0, Math.min(1, x - x0)), ay = Math.max(0, Math.min(1, y - y0));
  const i = y0 * f.width + x0;
  return (f.data[i] * (1 - ax) + f.data[i + 1] * ax) * (1 - ay) + (f.data[i + f.width] * (1 - ax) + f.data[i + f.width + 1] * ax) * ay;
};

/**
 * Move each point of a pixel contour onto the sub-pixel place where `field` crosses `level`, searching
 * ±`reach` pixels along the contour's normal (from the neighbours two points away); a point with no
 * crossing in reach stays. Coordinates are pixel centres of `field`. Rings under 5 points come back as given.
 */
export function ringRefineToLevel(ring: Polygon, field: FloatImage, level = 0.5, reach = 2): Polygon {
  if (ring.length < 5) return [...ring];
  const steps = Math.round(reach / 0.25);
  return ring.map((p, i): Point => {
    const a = ring[(i - 2 + ring.length) % ring.length], b = ring[(i + 2) % ring.length];
    const tx = b.x - a.x, ty = b.y - a.y, len = Math.hypot(tx, ty);
    if (!len) return p;
    const nx = -ty / len, ny = tx / len;
    let best: number | null = null;
    let prevS = -reach, prevV = sample(field, p.x - nx * reach, p.y - ny * reach) - level;
    for (let k = -steps + 1; k <= steps; k++) {
      const s = k * 0.25, v = sample(field, p.x + nx * s, p.y + ny * s) - level;
      if ((prevV <= 0) !== (v <= 0)) {
        const c = prevS + (0.25 * prevV) / (prevV - v);
        if (best === null || Math.abs(c) < Math.abs(best)) best = c;
      }
      prevS = s; prevV = v;
    }
    return best === null ? p : { x: p.x + nx * best, y: p.y + ny * best };
  });
}
