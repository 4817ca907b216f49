import type { Point } from '@shared/geometry/types';
import type { InternalLine, Piece } from '../pieces/piece';
import { cubicBezierFlatten } from '@shared/geometry/bezier';
import { OutlineBuilder } from '../pieces/piece';
import { polylineSplitAt } from './drafted-piece';
import { ARMHOLE_NOTCH_BACK_MM, ARMHOLE_NOTCH_FRONT_MM } from './fitted-bodice-block';
import { squaredHemPath } from './hem-shape';
import { DEFAULT_HEM_MM, DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';

/** Drafting options for bodice and dress blocks (mm). */
export interface BodiceOptions {
  /** Ease added to the full bust / waist / hip girth. Defaults 0 (a close block). */
  bustEaseMm?: number;
  waistEaseMm?: number;
  hipEaseMm?: number;
  /** Side bust dart intake on the front (0 = none). Bodice only. */
  bustDartMm?: number;
  /** Extend below the waist to a dress: length from waist to hem and extra width at the hem (A-line flare). */
  dress?: { lengthMm: number; hemFlareMm: number };
  /** Front only: button extension beyond centre front (half the button stand). 0 = cut on the fold at CF. */
  extensionMm?: number;
  seamMm?: number;
  hemMm?: number;
  /** Side-seam share of the waist suppression, at most this much per quarter (the rest goes to the dart). */
  maxSideShapingMm?: number;
}

/** Key drafting points shared by front and back (mm, y up, waist at y = 0, centre line at x = 0). */
interface Frame {
  quarterBust: number;
  sideWaistX: number;
  dartIntake: number;
  underarmY: number;
  neckWidth: number;
  shoulderX: number;
  dartX: number;
}

/** Shoulder drop below the high shoulder point (mm). Common practice (a ~17° shoulder slope over 130 mm). */
export const SHOULDER_DROP_MM = 40;
/** Back neck depth below the high shoulder point (mm). Common practice. */
export const BACK_NECK_DEPTH_MM = 20;
/** A waist dart stops this far short of the bust point. Common practice: "a 3/4 in waist dart stops 1 in short". */
export const DART_SHORT_OF_BUST_POINT_MM = 25.4;
/** The chest line is drawn 2 in above the bust point. Common practice. */
export const CHEST_LINE_ABOVE_BUST_POINT_MM = 50.8;

// Quarter-body drafting rules. The quarter split of girths follows Fasanella's "divide the size increase by four"
// (fashion-incubator.com, web article, sizing-and-grading.md §2.1); neck width = neck/6 + 5 mm and front neck depth
// = neck/6 + 15 mm, shoulder drop and back neck depth are common practice (not checked against a printed block).
function frame(m: BodyMeasurements, o: BodiceOptions): Frame {
  const quarterBust = (need(m, 'bust') + (o.bustEaseMm ?? 0)) / 4;
  const quarterWaist = (need(m, 'waist') + (o.waistEaseMm ?? 0)) / 4;
  const excess = quarterBust - quarterWaist;
  const side = excess > 0 ? Math.min(excess / 2, o.maxSideShapingMm ?? 25) : excess;
  return {
    quarterBust,
    sideWaistX: quarterBust - side,
    dartIntake: Math.max(0, excess - side),
    underarmY: need(m, 'back-waist-length') + BACK_NECK_DEPTH_MM - need(m, 'armhole-depth'),
    neckWidth: need(m, 'neck-base') / 6 + 5,
    shoulderX: need(m, 'shoulder-width') / 2,
    dartX: need(m, 'bust-point-span') / 2,
  };
}

/** Lower bust-dart leg: on the line side waist → underarm, 60 mm below the underarm (common practice). */
function dartLeg(f: Frame): Point {
  const t = (f.underarmY - 60) / f.underarmY;
  return { x: f.sideWaistX + (f.quarterBust - f.sideWaistX) * t, y: f.underarmY - 60 };
}

/**
 * Armhole from underarm up through the across point to the shoulder point (two cubics), split at the armhole notch
 * distances from the underarm (single front, double back; the sleeve cap carries the same, so they match).
 */
function armhole(b: OutlineBuilder, ua: Point, across: Point, sp: Point, hps: Point, notchesMm: readonly number[]): void {
  const lower = cubicBezierFlatten(ua, { x: ua.x - 0.5 * (ua.x - across.x), y: ua.y }, { x: across.x, y: across.y - 0.5 * (across.y - ua.y) }, across, b.toleranceMm);
  const len = Math.hypot(sp.x - hps.x, sp.y - hps.y);
  const u = { x: (sp.x - hps.x) / len, y: (sp.y - hps.y) / len };
  const k = 0.3 * (sp.y - across.y);
  const upper = cubicBezierFlatten(across, { x: across.x, y: across.y + 0.4 * (sp.y - across.y) }, { x: sp.x + u.y * k, y: sp.y - u.x * k }, sp, b.toleranceMm);
  const split = polylineSplitAt([...lower, ...upper.slice(1)], notchesMm);
  const acrossAt = split.points.findIndex((p) => p.x === across.x && p.y === across.y);
  const base = b.points.length - 1;
  split.points.slice(1).forEach((p, i) => b.line(p, i + 1 === acrossAt ? 'across' : i + 2 === split.points.length ? 'shoulder' : undefined));
  for (const i of split.indices) b.notches.push(base + i);
}

/** Dress hem from the current point (centre front or back at hem level) to the side, squared to the flared side seam. */
function dressHem(b: OutlineBuilder, m: BodyMeasurements, dress: NonNullable<BodiceOptions['dress']>, hipEaseMm: number): void {
  const start = b.points[b.points.length - 1];
  const hipX = (need(m, 'hip') + hipEaseMm) / 4;
  const path = squaredHemPath(start, { x: hipX, y: -need(m, 'waist-to-hip') }, { x: hipX + dress.hemFlareMm, y: -dress.lengthMm });
  path.slice(1).forEach((p, i) => b.line(p, i === path.length - 2 ? 'side-hem' : undefined));
}

/** Side seam from the hem (or waist) up to the underarm; dress adds hip and hem points. */
function sideSeam(b: OutlineBuilder, f: Frame, m: BodyMeasurements, o: BodiceOptions, seam: number): void {
  b.edge('side', { allowanceMm: seam });
  if (o.dress) b.line({ x: (need(m, 'hip') + (o.hipEaseMm ?? 0)) / 4, y: -need(m, 'waist-to-hip') }, 'side-hip');
  if (o.dress || o.bustDartMm) b.line({ x: f.sideWaistX, y: 0 }, 'side-waist');
}

function dartLines(f: Frame, apexY: number, o: BodiceOptions, m: BodyMeasurements): { lines: InternalLine[]; drills: Point[] } {
  if (f.dartIntake <= 0) return { lines: [], drills: [] };
  const l = { x: f.dartX - f.dartIntake / 2, y: 0 };
  const r = { x: f.dartX + f.dartIntake / 2, y: 0 };
  const top = { x: f.dartX, y: apexY };
  // Drill holes sit 10 mm inside each dart point (common practice).
  if (!o.dress) return { lines: [{ kind: 'dart', name: 'waist-dart', points: [l, top, r] }], drills: [{ x: f.dartX, y: apexY - 10 }] };
  const bottom = { x: f.dartX, y: -0.6 * need(m, 'waist-to-hip') };
  return {
    lines: [{ kind: 'dart', name: 'waist-dart', points: [top, l, bottom, r, top] }],
    drills: [{ x: f.dartX, y: apexY - 10 }, { x: f.dartX, y: bottom.y + 10 }],
  };
}

/**
 * Front bodice (or dress front) for one size: a quarter-body half front, centre front at x = 0 (on the fold, or
 * with a button extension to x = −extensionMm), waist at y = 0, side seam at x > 0.
 * Width at the underarm = (bust + ease)/4; waist suppression split between side seam and a waist dart at half the
 * bust-point span, the dart stopping 1 in short of the bust point; optional side bust dart.
 * Landmarks: cf-waist|cf-hem, side-hem, side-hip, side-waist, underarm, across, shoulder, hps, cf-neck, cf-neck-ext.
 */
export function draftBodiceFront(m: BodyMeasurements, o: BodiceOptions = {}): Piece {
  const f = frame(m, o);
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const fwl = need(m, 'front-waist-length');
  const ext = o.extensionMm ?? 0;
  const bustDart = o.bustDartMm ?? 0;
  const hps = { x: f.neckWidth, y: fwl };
  const sp = { x: f.shoulderX, y: fwl - SHOULDER_DROP_MM };
  const ua = { x: f.quarterBust, y: f.underarmY + bustDart };
  const across = { x: need(m, 'across-front') / 2, y: (sp.y + ua.y) / 2 };
  const cfNeckY = fwl - (need(m, 'neck-base') / 6 + 15);
  const bottomY = o.dress ? -o.dress.lengthMm : 0;
  const b = new OutlineBuilder({ x: -ext, y: bottomY }, o.dress ? 'cf-hem' : 'cf-waist');
  b.edge(o.dress ? 'hem' : 'waist', { allowanceMm: o.dress ? (o.hemMm ?? DEFAULT_HEM_MM) : seam });
  if (o.dress) dressHem(b, m, o.dress, o.hipEaseMm ?? 0);
  else b.line({ x: f.sideWaistX, y: 0 }, 'side-waist');
  if (bustDart > 0 && !o.dress) {
    // Legs sit on the back's side-seam line; the upper part is that line lifted by the intake, so the sewn
    // front side seam (dart closed) equals the back's.
    const leg = dartLeg(f);
    b.edge('side', { allowanceMm: seam }).line(leg, 'bust-dart-lower').notch();
    b.edge('bust-dart', { allowanceMm: seam }).line({ x: leg.x, y: leg.y + bustDart }, 'bust-dart-upper').notch();
    b.edge('side', { allowanceMm: seam });
  } else sideSeam(b, f, m, o, seam);
  b.line(ua, 'underarm');
  b.edge('armhole', { allowanceMm: seam });
  armhole(b, ua, across, sp, hps, [ARMHOLE_NOTCH_FRONT_MM]);
  b.edge('shoulder', { allowanceMm: seam }).line(hps, 'hps');
  b.edge('neckline', { allowanceMm: seam }).cubic({ x: hps.x, y: hps.y - 0.55 * (hps.y - cfNeckY) }, { x: 0.55 * hps.x, y: cfNeckY }, { x: 0, y: cfNeckY }, 'cf-neck');
  if (ext > 0) b.edge('neck-extension', { allowanceMm: seam }).line({ x: -ext, y: cfNeckY }, 'cf-neck-ext');
  b.edge(ext > 0 ? 'front-edge' : 'cf-fold', { allowanceMm: seam, isFold: ext === 0 }).line({ x: -ext, y: bottomY });
  const bustPoint = { x: f.dartX, y: fwl - need(m, 'bust-point-height') };
  const darts = dartLines(f, bustPoint.y - DART_SHORT_OF_BUST_POINT_MM, o, m);
  const chestY = bustPoint.y + CHEST_LINE_ABOVE_BUST_POINT_MM;
  const lines: InternalLine[] = [...darts.lines, { kind: 'reference', name: 'chest-line', points: [{ x: 0, y: chestY }, { x: across.x, y: chestY }] }];
  if (ext > 0) lines.push({ kind: 'placement', name: 'centre-front', points: [{ x: 0, y: cfNeckY }, { x: 0, y: bottomY }] });
  if (bustDart > 0 && !o.dress) {
    const leg = dartLeg(f);
    lines.push({ kind: 'dart', name: 'bust-dart', points: [leg, { x: bustPoint.x + DART_SHORT_OF_BUST_POINT_MM, y: bustPoint.y }, { x: leg.x, y: leg.y + bustDart }] });
  }
  return {
    id: 'front', name: o.dress ? 'Front' : 'Bodice front', role: 'front', ...b.close(),
    grainLine: { from: { x: f.dartX / 2, y: bottomY + 60 }, to: { x: f.dartX / 2, y: chestY } },
    drillHoles: darts.drills, internalLines: lines, cut: ext > 0 ? 'pair' : 'fold', quantity: 1,
  };
}

/**
 * Back bodice (or dress back): quarter-body half back on the fold at centre back (x = 0), waist at y = 0.
 * High shoulder point at back waist length + 20 mm (back neck depth); same underarm level and shoulder length as
 * the front so the side and shoulder seams match. Landmarks: cb-waist|cb-hem, side-*, underarm, across, shoulder,
 * hps, cb-neck.
 */
export function draftBodiceBack(m: BodyMeasurements, o: BodiceOptions = {}): Piece {
  const f = frame(m, o);
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const cbNeckY = need(m, 'back-waist-length');
  const hps = { x: f.neckWidth, y: cbNeckY + BACK_NECK_DEPTH_MM };
  const sp = { x: f.shoulderX, y: hps.y - SHOULDER_DROP_MM };
  const ua = { x: f.quarterBust, y: f.underarmY };
  const across = { x: need(m, 'across-back') / 2, y: (sp.y + ua.y) / 2 };
  const bottomY = o.dress ? -o.dress.lengthMm : 0;
  const b = new OutlineBuilder({ x: 0, y: bottomY }, o.dress ? 'cb-hem' : 'cb-waist');
  b.edge(o.dress ? 'hem' : 'waist', { allowanceMm: o.dress ? (o.hemMm ?? DEFAULT_HEM_MM) : seam });
  if (o.dress) dressHem(b, m, o.dress, o.hipEaseMm ?? 0);
  else b.line({ x: f.sideWaistX, y: 0 }, 'side-waist');
  sideSeam(b, f, m, { ...o, bustDartMm: 0 }, seam);
  b.line(ua, 'underarm');
  b.edge('armhole', { allowanceMm: seam });
  armhole(b, ua, across, sp, hps, ARMHOLE_NOTCH_BACK_MM);
  b.edge('shoulder', { allowanceMm: seam }).line(hps, 'hps');
  b.edge('neckline', { allowanceMm: seam }).cubic({ x: hps.x, y: hps.y - 0.6 * BACK_NECK_DEPTH_MM }, { x: 0.5 * hps.x, y: cbNeckY }, { x: 0, y: cbNeckY }, 'cb-neck');
  b.edge('cb-fold', { allowanceMm: 0, isFold: true }).line({ x: 0, y: bottomY });
  const darts = dartLines(f, f.underarmY - 30, o, m);
  return {
    id: 'back', name: o.dress ? 'Back' : 'Bodice back', role: 'back', ...b.close(),
    grainLine: { from: { x: f.dartX / 2, y: bottomY + 60 }, to: { x: f.dartX / 2, y: f.underarmY - 40 } },
    drillHoles: darts.drills, internalLines: darts.lines, cut: 'fold', quantity: 1,
  };
}
