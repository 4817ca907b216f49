import { describe, expect, it } from 'vitest';
import { loadOpenCvNode } from '@tests/fixtures/opencv-node';
import { polygonArea } from '@shared/geometry/polygon';
import { segmentDistance } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import { homographyApply, homographyFromPoints, homographyInvert, type Homography } from './homography';
import { outlineError } from './outline-error';
import { quadRefineCorners } from './quad-fit';
import { ringSimplify } from './ring-simplify';
import { TraceError, pieceLikelihood, ringRefineToLevel } from './piece-mask';
import { FIELD_RGB, calibrationLayout } from '@shared/calibration/calibration-sheet';

/** OpenCV (an independent library) is the outside check. */
const loadCv = loadOpenCvNode;
const P = (x: number, y: number): Point => ({ x, y });
const sheet = [P(0, 0), P(210, 0), P(210, 297), P(0, 297)];
const photo = [P(312.4, 201.7), P(1420.2, 288.9), P(1510.6, 1840.3), P(190.1, 1702.5)];

describe('homographyFromPoints', () => {
  it('agrees with OpenCV getPerspectiveTransform (an independent library) when given 4 points', async () => {
    const cv = await loadCv();
    const ours = homographyFromPoints(sheet, photo)!;
    const a = cv.matFromArray(4, 1, cv.CV_32FC2, sheet.flatMap((p) => [p.x, p.y]));
    const b = cv.matFromArray(4, 1, cv.CV_32FC2, photo.flatMap((p) => [p.x, p.y]));
    const m = cv.getPerspectiveTransform(a, b);
    const theirs = Array.from(m.data64F) as Homography;
    a.delete(); b.delete(); m.delete();
    for (const q of [P(0, 0), P(105, 148.5), P(37, 250), P(200, 10)]) {
      const u = homographyApply(ours, q), v = homographyApply(theirs, q);
      expect(Math.hypot(u.x - v.x, u.y - v.y)).toBeLessThan(1e-4); // OpenCV takes the points as 32-bit floats
    }
  });

  it('recovers a known perspective from 16 noisy points within the noise, as OpenCV findHomography does', async () => {
    const cv = await loadCv();
    const truth = homographyFromPoints(sheet, photo)!;
    const from: Point[] = [], to: Point[] = [];
    let k = 0;
    for (const x of [10, 70, 140, 200]) for (const y of [10, 100, 200, 287]) {
      from.push(P(x, y));
      const p = homographyApply(truth, P(x, y));
      const e = 0.3 * Math.sin(k++ * 12.9898); // deterministic ±0.3 px "noise"
      to.push(P(p.x + e, p.y - e));
    }
    const ours = homographyFromPoints(from, to)!;
    const a = cv.matFromArray(16, 1, cv.CV_32FC2, from.flatMap((p) => [p.x, p.y]));
    const b = cv.matFromArray(16, 1, cv.CV_32FC2, to.flatMap((p) => [p.x, p.y]));
    const m = cv.findHomography(a, b, 0);
    const theirs = Array.from(m.data64F) as Homography;
    a.delete(); b.delete(); m.delete();
    for (const q of [P(105, 148.5), P(20, 280)]) {
      const u = homographyApply(ours, q), v = homographyApply(theirs, q), t = homographyApply(truth, q);
      expect(Math.hypot(u.x - t.x, u.y - t.y)).toBeLessThan(0.3);
      expect(Math.hypot(u.x - v.x, u.y - v.y)).toBeLessThan(0.05);
    }
  });

  it('inverts to the identity and refuses degenerate input', () => {
    const h = homographyFromPoints(sheet, photo)!;
    const inv = homographyInvert(h)!;
    const p = homographyApply(inv, homographyApply(h, P(33, 44)));
    expect(p.x).toBeCloseTo(33, 9);
    expect(p.y).toBeCloseTo(44, 9);
    expect(homographyFromPoints(sheet.slice(0, 3), photo.slice(0, 3))).toBeNull();
    expect(homographyFromPoints([P(0, 0), P(1, 1), P(2, 2), P(3, 3)], photo)).toBeNull();
  });
});

describe('ringSimplify', () => {
  const circle = Array.from({ length: 400 }, (_, i) => P(50 * Math.cos((i / 400) * 2 * Math.PI), 50 * Math.sin((i / 400) * 2 * Math.PI)));
  const within = (pts: Point[], ring: Point[], tol: number) =>
    pts.every((p) => Math.min(...ring.map((a, i) => segmentDistance(p, a, ring[(i + 1) % ring.length]))) <= tol + 1e-9);

  it('keeps every point within the tolerance of the result (the Douglas–Peucker guarantee) when the start or winding changes', () => {
    for (const ring of [circle, [...circle].reverse(), [...circle.slice(137), ...circle.slice(0, 137)]]) {
      const s = ringSimplify(ring, 0.5);
      expect(s.length).toBeLessThan(60);
      expect(within(ring, s, 0.5)).toBe(true);
    }
  });

  it('keeps a square\'s 4 corners from a densely sampled square, and returns tiny rings as given', () => {
    const sq: Point[] = [];
    for (let i = 0; i < 100; i++) sq.push(P(i, 0));
    for (let i = 0; i < 100; i++) sq.push(P(100, i));
    for (let i = 0; i < 100; i++) sq.push(P(100 - i, 100));
    for (let i = 0; i < 100; i++) sq.push(P(0, 100 - i));
    expect(ringSimplify(sq, 0.5).map((p) => `${p.x},${p.y}`).sort()).toEqual(['0,0', '0,100', '100,0', '100,100']);
    expect(ringSimplify([P(0, 0), P(1, 0), P(0, 1)], 5)).toHaveLength(3);
  });
});

describe('outlineError', () => {
  it('gives 1 mm everywhere one way and √2 mm at the corners the other for a square grown by 1 mm (worked by hand)', () => {
    const truth = [P(0, 0), P(100, 0), P(100, 100), P(0, 100)];
    const grown = [P(-1, -1), P(101, -1), P(101, 101), P(-1, 101)];
    const e = outlineError(grown, truth, 0.25);
    expect(e.worstMm).toBeCloseTo(Math.SQRT2, 6);
    expect(e.meanMm).toBeGreaterThan(1);
    expect(e.meanMm).toBeLessThan(1.01);
    expect(e.areaError).toBeCloseTo((102 * 102 - 100 * 100) / 10000, 9);
    expect(outlineError([...grown].reverse(), truth, 0.25).worstMm).toBeCloseTo(Math.SQRT2, 6);
    expect(outlineError([], truth).meanMm).toBe(Infinity);
  });
});

describe('quadRefineCorners', () => {
  it('finds a turned square\'s exact corners from a contour whose corners are rounded off', () => {
    const c = P(100, 80), a = 0.3, s = 40;
    const corner = (k: number) => { const ang = a + (k * Math.PI) / 2 + Math.PI / 4; return P(c.x + (s / Math.SQRT2) * Math.cos(ang), c.y + (s / Math.SQRT2) * Math.sin(ang)); };
    const exact = [0, 1, 2, 3].map(corner);
    const contour: Point[] = [];
    for (let k = 0; k < 4; k++) {
      const p = exact[k], q = exact[(k + 1) % 4];
      for (let t = 0.1; t < 0.9; t += 0.01) contour.push(P(p.x + (q.x - p.x) * t, p.y + (q.y - p.y) * t));
    }
    const rough = exact.map((p) => P(Math.round(p.x + 1.5), Math.round(p.y - 1)));
    const got = quadRefineCorners(contour, rough);
    got.forEach((p, k) => expect(Math.hypot(p.x - exact[k].x, p.y - exact[k].y)).toBeLessThan(1e-6));
  });
});

describe('ringRefineToLevel', () => {
  it('moves contour points onto the half level of a linear edge ramp (the blurred edge\'s true place)', () => {
    // Field: 0 left of x = 20, 1 right of x = 24, linear between: the 0.5 level is at x = 22 exactly.
    const w = 60, h = 40, data = new Float32Array(w * h);
    for (let y = 0; y < h; y++) for (let x = 0; x < w; x++) data[y * w + x] = Math.max(0, Math.min(1, (x - 20) / 4));
    const ring = [P(23, 10), P(23, 12), P(23, 14), P(23, 16), P(23, 18), P(23, 20)];
    const got = ringRefineToLevel(ring, { width: w, height: h, data });
    for (const p of got.slice(2, 4)) expect(p.x).toBeCloseTo(22, 6);
    expect(polygonArea(got)).toBeGreaterThanOrEqual(0);
  });
});

describe('pieceLikelihood', () => {
  const layout = calibrationLayout('sheet', 'A4');
  const s = 2; // px per mm
  const sheetImage = (piece?: { x: number; y: number; w: number; h: number }) => {
    const w = Math.round(layout.width * s), h = Math.round(layout.height * s), data = new Uint8ClampedArray(w * h * 4);
    const f = layout.field;
    for (let y = 0; y < h; y++) for (let x = 0; x < w; x++) {
      const mx = x / s, my = y / s, i = (y * w + x) * 4;
      // Light falls off from left to right to 70 %: the white paper shows it, the tracer evens it out.
      const k = 1 - 0.3 * (x / w);
      const inField = mx >= f.x && mx < f.x + f.w && my >= f.y && my < f.y + f.h;
      const inPiece = piece && mx >= piece.x && mx < piece.x + piece.w && my >= piece.y && my < piece.y + piece.h;
      const c = inPiece ? [235, 230, 215] : inField ? FIELD_RGB : [245, 245, 240];
      data[i] = c[0] * k; data[i + 1] = c[1] * k; data[i + 2] = c[2] * k; data[i + 3] = 255;
    }
    return { width: w, height: h, data };
  };

  it('puts the piece near 1 and the field near 0 when the light falls off across the sheet', () => {
    const like = pieceLikelihood(sheetImage({ x: 50, y: 60, w: 100, h: 150 }), s, layout);
    const at = (mx: number, my: number) => like.t.data[Math.round((my - layout.field.y) * s) * like.t.width + Math.round((mx - layout.field.x) * s)];
    expect(at(100, 130)).toBeGreaterThan(0.9);
    expect(at(145, 200)).toBeGreaterThan(0.9);
    expect(Math.abs(at(30, 250))).toBeLessThan(0.1);
    expect(Math.abs(at(190, 100))).toBeLessThan(0.1);
  });

  it('says there is no piece when the field is empty', () => {
    expect(() => pieceLikelihood(sheetImage(), s, layout)).toThrow(TraceError);
  });
});
