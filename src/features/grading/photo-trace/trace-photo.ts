/**
 * Trace a paper pattern piece from a phone photo of a Seamrun calibration sheet, with OpenCV (opencv.js,
 * WebAssembly). Runs in the browser's trace worker and in Node for the tests and the benchmark; the caller
 * hands in the loaded `cv` module. The pure steps (homography, colour model, sub-pixel edges, simplifying)
 * are in grading/trace.
 *
 * 1. Marks: adaptive threshold, contour tree; a ring mark is a convex quadrilateral with a quadrilateral
 *    hole holding one dot (two on the origin mark).
 * 2. Perspective: corners of each mark's outer square and hole, sharpened by line fits, averaged into the
 *    half-way square (bias-free under blur), 16 points → least-squares homography sheet mm → photo px.
 * 3. The sheet is resampled top-down at a fixed pixels-per-mm; light evened out against the white paper;
 *    each field pixel gets its likelihood of being the piece (grading/trace `pieceLikelihood`).
 * 4. Outline: the largest region above one half, holes filled, its contour moved to the sub-pixel half
 *    level, simplified within the tolerance, in mm on the sheet (origin top-left, y down).
 */
import type * as OpenCv from '@techstark/opencv-js';
import {
  TRACE_SIMPLIFY_TOLERANCE_MM, TraceError, homographyApply, homographyFromPoints, homographyInvert,
  pieceLikelihood, quadRefineCorners, ringRefineToLevel, ringSimplify,
  type Homography, type RgbaImage,
} from '@grading';
import { calibrationLayout, type CalibrationKind, type CalibrationLayout, type CalibrationPaper, type RingMark } from '@shared/calibration/calibration-sheet';
import type { Point } from '@shared/geometry/types';

export type Cv = typeof OpenCv;

export interface TracePhotoOptions {
  kind: CalibrationKind;
  paper: CalibrationPaper;
  /** Largest distance between the traced outline and the simplified one (mm). */
  toleranceMm?: number;
  /** Cap on the top-down image's pixels (memory in a phone's browser). */
  maxRectifiedPixels?: number;
}

/** One found mark: its corner and its half-way square's corners in the photo (px), in the sheet's order. */
interface FoundMark {
  corner: number;
  centre: Point;
  outer: Point[];
  hole: Point[];
}

export interface PhotoTrace {
  /** The piece's outline in mm on the sheet (origin top-left, y down), simplified within `toleranceMm`. */
  outline: Point[];
  toleranceMm: number;
  /** Sheet mm → photo px. */
  sheetToPhoto: Homography;
  /** Root-mean-square distance (mm, on the sheet) between where the marks' corners are and where the fitted perspective puts them. */
  markResidualMm: number;
  pxPerMm: number;
  /** The top-down view of the field (the area the piece lies on), `pxPerMm` pixels a mm, and where it sits on the sheet (mm). */
  view: RgbaImage;
  viewOrigin: Point;
}

const pts = (m: OpenCv.Mat): Point[] => {
  const out: Point[] = [];
  const d = m.data32S;
  for (let i = 0; i < m.rows; i++) out.push({ x: d[i * 2], y: d[i * 2 + 1] });
  return out;
};

function quadOf(cv: Cv, contour: OpenCv.Mat): Point[] | null {
  const approx = new cv.Mat();
  try {
    cv.approxPolyDP(contour, approx, 0.06 * cv.arcLength(contour, true), true);
    if (approx.rows !== 4 || !cv.isContourConvex(approx)) return null;
    return pts(approx);
  } finally {
    approx.delete();
  }
}

/** Ring marks in a grey photo at one adaptive-threshold block size. */
function marksAt(cv: Cv, gray: OpenCv.Mat, block: number): FoundMark[] {
  const bin = new cv.Mat(), contours = new cv.MatVector(), hier = new cv.Mat();
  try {
    cv.adaptiveThreshold(gray, bin, 255, cv.ADAPTIVE_THRESH_MEAN_C, cv.THRESH_BINARY_INV, block, 15);
    cv.findContours(bin, contours, hier, cv.RETR_TREE, cv.CHAIN_APPROX_NONE);
    const hd = hier.data32S;
    const h = (i: number, k: number) => hd[i * 4 + k];
    const found: (FoundMark & { area: number })[] = [];
    for (let i = 0; i < contours.size(); i++) {
      const c = contours.get(i);
      const area = cv.contourArea(c);
      if (area < 150 || h(i, 2) < 0) { c.delete(); continue; }
      const outer = quadOf(cv, c);
      if (!outer) { c.delete(); continue; }
      // The hole: the largest child; it must be a quadrilateral about a third of the square's area.
      let hole = -1, holeArea = 0;
      for (let k = h(i, 2); k >= 0; k = h(k, 0)) {
        const ck = contours.get(k); const a = cv.contourArea(ck); ck.delete();
        if (a > holeArea) { holeArea = a; hole = k; }
      }
      const ratio = holeArea / area;
      if (hole < 0 || ratio < 0.15 || ratio > 0.55) { c.delete(); continue; }
      const hc = contours.get(hole);
      const holeQuad = quadOf(cv, hc);
      if (!holeQuad) { c.delete(); hc.delete(); continue; }
      let dots = 0;
      for (let k = h(hole, 2); k >= 0; k = h(k, 0)) {
        const ck = contours.get(k); const a = cv.contourArea(ck); ck.delete();
        if (a > 0.015 * area && a < 0.25 * area) dots++;
      }
      if (dots === 1 || dots === 2) {
        const outerPts = quadRefineCorners(pts(c), outer), holePts = quadRefineCorners(pts(hc), holeQuad);
        const centre = { x: outerPts.reduce((s, p) => s + p.x, 0) / 4, y: outerPts.reduce((s, p) => s + p.y, 0) / 4 };
        found.push({ corner: dots === 2 ? 0 : -1, centre, outer: outerPts, hole: holePts, area });
      }
      c.delete(); hc.delete();
    }
    const origin = found.filter((m) => m.corner === 0);
    if (origin.length !== 1) return [];
    const others = found.filter((m) => m.corner !== 0).sort((a, b) => Math.abs(a.area - origin[0].area) - Math.abs(b.area - origin[0].area)).slice(0, 3);
    if (others.length !== 3) return [];
    const four = [origin[0], ...others];
    const cx = four.reduce((s, m) => s + m.centre.x, 0) / 4, cy = four.reduce((s, m) => s + m.centre.y, 0) / 4;
    const ang = (m: FoundMark) => Math.atan2(m.centre.y - cy, m.centre.x - cx);
    const a0 = ang(origin[0]);
    // Clockwise as seen (angles grow clockwise with y down), starting at the origin mark.
    const ordered = [...four].sort((a, b) => ((ang(a) - a0 + 4 * Math.PI) % (2 * Math.PI)) - ((ang(b) - a0 + 4 * Math.PI) % (2 * Math.PI)));
    return ordered.map((m, k) => ({ corner: k, centre: m.centre, outer: m.outer, hole: m.hole }));
  } finally {
    bin.delete(); contours.delete(); hier.delete();
  }
}

const markCorners = (m: RingMark, side: number): Point[] => [
  { x: m.cx - side / 2, y: m.cy - side / 2 }, { x: m.cx + side / 2, y: m.cy - side / 2 },
  { x: m.cx + side / 2, y: m.cy + side / 2 }, { x: m.cx - side / 2, y: m.cy + side / 2 },
];

/** The perspective from the four marks: sheet mm → photo px, and its fit residual (mm). */
function fitPerspective(found: FoundMark[], layout: CalibrationLayout): { h: Homography; residualMm: number } {
  const h0 = homographyFromPoints(layout.marks.map((m) => ({ x: m.cx, y: m.cy })), found.map((m) => m.centre));
  if (!h0) throw new TraceError('marks_not_found', 'The four corner marks do not form a sheet');
  const sheet: Point[] = [], photo: Point[] = [];
  for (const m of layout.marks) {
    const f = found[m.corner];
    for (const s of markCorners(m, m.midMm)) {
      const guess = homographyApply(h0, s);
      const near = (q: Point[]) => q.reduce((b, p) => (Math.hypot(p.x - guess.x, p.y - guess.y) < Math.hypot(b.x - guess.x, b.y - guess.y) ? p : b));
      const o = near(f.outer), i = near(f.hole);
      sheet.push(s);
      photo.push({ x: (o.x + i.x) / 2, y: (o.y + i.y) / 2 });
    }
  }
  const h = homographyFromPoints(sheet, photo);
  const inv = h && homographyInvert(h);
  if (!h || !inv) throw new TraceError('marks_not_found', 'The four corner marks do not form a sheet');
  const residualMm = Math.sqrt(photo.reduce((s, p, k) => { const q = homographyApply(inv, p); return s + (q.x - sheet[k].x) ** 2 + (q.y - sheet[k].y) ** 2; }, 0) / photo.length);
  return { h, residualMm };
}

/** Find the four ring marks, trying a few threshold block sizes (the marks' size in the photo is not known). */
function findMarks(cv: Cv, gray: OpenCv.Mat): FoundMark[] {
  const side = Math.min(gray.rows, gray.cols);
  for (const div of [10, 6, 16, 24]) {
    const block = Math.max(15, Math.round(side / div) | 1);
    const found = marksAt(cv, gray, block);
    if (found.length === 4) return found;
  }
  throw new TraceError('marks_not_found', 'The four corner marks of the sheet were not all found');
}

/**
 * Trace the piece on a photo (RGBA) of a calibration sheet. Throws TraceError with `marks_not_found`,
 * `no_piece` or `piece_touches_edge`. Deterministic for the same pixels and options.
 */
export function tracePhoto(cv: Cv, image: RgbaImage, options: TracePhotoOptions): PhotoTrace {
  const layout = calibrationLayout(options.kind, options.paper);
  const toleranceMm = options.toleranceMm ?? TRACE_SIMPLIFY_TOLERANCE_MM;
  const src = cv.matFromImageData({ data: image.data as Uint8ClampedArray, width: image.width, height: image.height } as ImageData);
  const gray = new cv.Mat();
  const mats: OpenCv.Mat[] = [src, gray];
  try {
    cv.cvtColor(src, gray, cv.COLOR_RGBA2GRAY);
    const found = findMarks(cv, gray);
    const { h, residualMm } = fitPerspective(found, layout);
    // Resample at about 1.5× the photo's own resolution on the sheet (at least 2, at most 6 px a mm).
    const a = layout.marks[0], b = layout.marks[2];
    const photoPxPerMm = Math.hypot(found[2].centre.x - found[0].centre.x, found[2].centre.y - found[0].centre.y) / Math.hypot(b.cx - a.cx, b.cy - a.cy);
    const cap = options.maxRectifiedPixels ?? 8e6;
    const pxPerMm = Math.min(6, Math.max(2, Math.round(photoPxPerMm * 1.5 * 2) / 2), Math.sqrt(cap / (layout.width * layout.height)));
    const w = Math.round(layout.width * pxPerMm), hgt = Math.round(layout.height * pxPerMm);
    // Top-down pixel (i, j) is sheet mm (i, j) / pxPerMm: photo = h · scale⁻¹ · pixel (the warp's inverse map).
    const m = [h[0] / pxPerMm, h[1] / pxPerMm, h[2], h[3] / pxPerMm, h[4] / pxPerMm, h[5], h[6] / pxPerMm, h[7] / pxPerMm, h[8]];
    const map = cv.matFromArray(3, 3, cv.CV_64F, m); mats.push(map);
    const top = new cv.Mat(); mats.push(top);
    cv.warpPerspective(src, top, map, new cv.Size(w, hgt), cv.INTER_LINEAR | cv.WARP_INVERSE_MAP, cv.BORDER_CONSTANT, new cv.Scalar(0, 0, 0, 0));
    const topData = top.data;
    const topImage: RgbaImage = { width: w, height: hgt, data: topData };
    const like = pieceLikelihood(topImage, pxPerMm, layout);
    const { crop } = like;
    const tMat = cv.matFromArray(crop.h, crop.w, cv.CV_32F, like.t.data); mats.push(tMat);
    const smooth = new cv.Mat(); mats.push(smooth);
    cv.GaussianBlur(tMat, smooth, new cv.Size(0, 0), Math.max(0.7, 0.15 * pxPerMm));
    const mask = new cv.Mat(); mats.push(mask);
    cv.threshold(smooth, mask, 0.5, 255, cv.THRESH_BINARY);
    const mask8 = new cv.Mat(); mats.push(mask8);
    mask.convertTo(mask8, cv.CV_8U);
    const k = Math.max(3, Math.round(0.6 * pxPerMm) | 1);
    const kernel = cv.getStructuringElement(cv.MORPH_ELLIPSE, new cv.Size(k, k)); mats.push(kernel);
    cv.morphologyEx(mask8, mask8, cv.MORPH_OPEN, kernel);
    cv.morphologyEx(mask8, mask8, cv.MORPH_CLOSE, kernel);
    const contours = new cv.MatVector(), hier = new cv.Mat(); mats.push(hier);
    let ring: Point[] = [];
    try {
      cv.findContours(mask8, contours, hier, cv.RETR_EXTERNAL, cv.CHAIN_APPROX_NONE);
      let best = -1, bestArea = 0;
      for (let i = 0; i < contours.size(); i++) {
        const c = contours.get(i); const area = cv.contourArea(c); c.delete();
        if (area > bestArea) { bestArea = area; best = i; }
      }
      if (best < 0 || bestArea < (10 * pxPerMm) ** 2) throw new TraceError('no_piece', 'No piece stands out from the background inside the field');
      const c = contours.get(best); ring = pts(c); c.delete();
    } finally {
      contours.delete();
    }
    const edge = Math.max(1, Math.round(0.5 * pxPerMm));
    if (ring.some((p) => p.x < edge || p.y < edge || p.x > crop.w - 1 - edge || p.y > crop.h - 1 - edge)) {
      throw new TraceError('piece_touches_edge', 'The piece reaches the edge of the field: move it inside, clear of the edge');
    }
    const smoothField = { width: crop.w, height: crop.h, data: smooth.data32F };
    const refined = ringRefineToLevel(ring, smoothField, 0.5, 2);
    const simple = ringSimplify(refined, toleranceMm * pxPerMm);
    const outline = simple.map((p) => ({ x: (p.x + crop.x) / pxPerMm, y: (p.y + crop.y) / pxPerMm }));
    const view = new Uint8ClampedArray(crop.w * crop.h * 4);
    for (let y = 0; y < crop.h; y++) view.set(topData.subarray(((crop.y + y) * w + crop.x) * 4, ((crop.y + y) * w + crop.x + crop.w) * 4), y * crop.w * 4);
    return { outline, toleranceMm, sheetToPhoto: h, markResidualMm: residualMm, pxPerMm, view: { width: crop.w, height: crop.h, data: view }, viewOrigin: { x: crop.x / pxPerMm, y: crop.y / pxPerMm } };
  } finally {
    for (const m of mats) m.delete();
  }
}
