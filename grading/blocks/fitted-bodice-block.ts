import { cubicBezierFlatten } from '@shared/geometry/bezier';
import type { Point } from '@shared/geometry/types';
import type { InternalLine, Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { polylineSplitAt } from './drafted-piece';
import { DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';

const IN = 25.4;

/** Front neckline shapes; depths are measured down centre front from the high-shoulder level. */
export type FrontNeckline =
  | { shape: 'round'; widthMm?: number; depthMm?: number }
  | { shape: 'v'; depthMm?: number; widthMm?: number }
  | { shape: 'square'; depthMm?: number; widthMm?: number }
  | { shape: 'boat'; widthMm?: number; depthMm?: number };

/** Drafting options of the fitted bodice (mm). Every option has a default. */
export interface FittedBodiceOptions {
  /** Ease on the full bust girth. Default 2 in (CWU costume text ch. 16: bodices 1½–2 in at the bust). */
  bustEaseMm?: number;
  /** Ease on the waist girth. Default 1 in (CWU ch. 16: dresses ¾–1 in at the waist). */
  waistEaseMm?: number;
  /** Waist dart intake per dart. Default: half of (bust − waist)/4 after ease, the side seam taking at most 25 mm. */
  waistDartMm?: number;
  /** Side bust dart intake on the front: 0 = none (default); 'from-lengths' = front waist length − back waist length. */
  bustDartMm?: number | 'from-lengths';
  /** Front neckline. Default round, 3 × 3 in. */
  neckline?: FrontNeckline;
  /** Back neckline: 'standard' (¾ in deep at centre back) or 'high' (¼ in). Default standard. */
  backNeckline?: 'standard' | 'high';
  /** Shoulder pads: drops the shoulder slope by the pad thickness and adds 1 in to the shoulder width. */
  shoulderPads?: { thicknessMm?: number; extraWidthMm?: number } | false;
  /** Back only: a centre-back opening with this seam (zip) allowance; absent or null = centre back on the fold. */
  centreBackOpening?: { allowanceMm?: number } | null;
  seamMm?: number;
}

/** Start neckline 3 in wide and 3 in deep (common practice, stated in the seed document). */
export const ROUND_NECK_START_MM = 3 * IN;
/** Default V-neck depth below the high shoulder point: 7 in (the seed document's example). */
export const V_NECK_DEPTH_MM = 7 * IN;
/** Centre-back zip allowance default: 1.5 in (common practice: 1.5–2 in). */
export const ZIP_ALLOWANCE_MM = 1.5 * IN;
/** Shoulder pads add 1 in to the shoulder width (practitioner's rule, common practice). */
export const SHOULDER_PAD_EXTRA_WIDTH_MM = IN;
/** Default shoulder pad thickness: ½ in (from memory). */
export const SHOULDER_PAD_THICKNESS_MM = 0.5 * IN;
/** Shoulder drop below the high shoulder point (mm). Common practice (as the shirt-dress bodice). */
export const FITTED_SHOULDER_DROP_MM = 40;
/** A waist dart stops 1 in short of the bust point (practitioner's rule, common practice). */
export const FITTED_DART_SHORT_MM = IN;
/** The chest line sits 2 in above the bust-point level (common practice). */
export const FITTED_CHEST_LINE_MM = 2 * IN;
/** Front armhole notch (single), along the armhole from the underarm: 3 in (from memory). */
export const ARMHOLE_NOTCH_FRONT_MM = 3 * IN;
/** Back armhole notches (double), along the armhole from the underarm: 3½ and 3¾ in (from memory). */
export const ARMHOLE_NOTCH_BACK_MM = [3.5 * IN, 3.75 * IN] as const;
/** Drill holes sit 10 mm inside a dart point so the sewn dart hides them (common practice). */
export const DRILL_INSIDE_DART_MM = 10;

const BACK_NECK_DEPTH = { standard: 0.75 * IN, high: 0.25 * IN } as const;

/** Points shared by front and back: both pieces use the same underarm level and shoulder line. */
interface BodiceFrame {
  quarterBust: number;
  sideWaistX: number;
  dartIntake: number;
  dartX: number;
  underarmY: number;
  shoulderX: number;
  drop: number;
  neckWidth: number;
}

function bodiceFrame(m: BodyMeasurements, o: FittedBodiceOptions): BodiceFrame {
  const quarterBust = (need(m, 'bust') + (o.bustEaseMm ?? 2 * IN)) / 4;
  const quarterWaist = (need(m, 'waist') + (o.waistEaseMm ?? IN)) / 4;
  const excess = quarterBust - quarterWaist;
  const dartIntake = o.waistDartMm ?? Math.max(0, excess - Math.min(excess / 2, 25));
  const pads = o.shoulderPads || null;
  return {
    quarterBust,
    sideWaistX: quarterWaist + dartIntake,
    dartIntake,
    dartX: need(m, 'bust-point-span') / 2,
    underarmY: need(m, 'back-waist-length') + BACK_NECK_DEPTH.standard - need(m, 'armhole-depth'),
    shoulderX: need(m, 'shoulder-width') / 2 + (pads ? (pads.extraWidthMm ?? SHOULDER_PAD_EXTRA_WIDTH_MM) : 0),
    drop: FITTED_SHOULDER_DROP_MM - (pads ? (pads.thicknessMm ?? SHOULDER_PAD_THICKNESS_MM) : 0),
    neckWidth: neckWidthOf(o.neckline),
  };
}

function neckWidthOf(n: FrontNeckline | undefined): number {
  if (n?.widthMm !== undefined) return n.widthMm;
  return n?.shape === 'boat' ? ROUND_NECK_START_MM + 1.5 * IN : ROUND_NECK_START_MM;
}

/** Point on the shoulder line (base neck point → shoulder point) at horizontal distance x from the centre. */
function onShoulder(f: BodiceFrame, hpsY: number, x: number): Point {
  const t = (x - ROUND_NECK_START_MM) / (f.shoulderX - ROUND_NECK_START_MM);
  return { x, y: hpsY - f.drop * t };
}

/** Armhole polyline underarm → across → shoulder point, split at the notch distances. */
function armholePath(ua: Point, across: Point, sp: Point, notchesMm: readonly number[]): { points: Point[]; notches: number[] } {
  const lower = cubicBezierFlatten(ua, { x: ua.x - 0.5 * (ua.x - across.x), y: ua.y }, { x: across.x, y: across.y - 0.5 * (across.y - ua.y) }, across);
  const upper = cubicBezierFlatten(across, { x: across.x, y: across.y + 0.4 * (sp.y - across.y) }, { x: across.x + 0.15 * (sp.x - across.x), y: sp.y - 0.1 * (sp.y - across.y) }, sp);
  const split = polylineSplitAt([...lower, ...upper.slice(1)], notchesMm);
  return { points: split.points, notches: split.indices };
}

/** Add the armhole and shoulder, ending at the neck point. */
function armholeAndShoulder(b: OutlineBuilder, seam: number, ua: Point, across: Point, sp: Point, neckPoint: Point, notchesMm: readonly number[]): void {
  const arm = armholePath(ua, across, sp, notchesMm);
  const base = b.points.length - 1;
  b.edge('armhole', { allowanceMm: seam });
  arm.points.slice(1).forEach((p, i) => b.line(p, i === arm.points.length - 2 ? 'shoulder' : undefined));
  for (const k of arm.notches) b.notches.push(base + k);
  b.edge('shoulder', { allowanceMm: seam }).line(neckPoint, 'hps');
}

/** Waist from the centre to the side, with a notched vertex at each leg of the waist dart. */
function waistWithDart(b: OutlineBuilder, f: BodiceFrame): void {
  if (f.dartIntake > 0) {
    b.line({ x: f.dartX - f.dartIntake / 2, y: 0 }, 'dart-centre-leg').notch();
    b.line({ x: f.dartX + f.dartIntake / 2, y: 0 }, 'dart-side-leg').notch();
  }
  b.line({ x: f.sideWaistX, y: 0 }, 'side-waist');
}

function towards(a: Point, b: Point, d: number): Point {
  const l = Math.hypot(b.x - a.x, b.y - a.y);
  return { x: a.x + ((b.x - a.x) / l) * d, y: a.y + ((b.y - a.y) / l) * d };
}

function waistDart(f: BodiceFrame, apexY: number): { lines: InternalLine[]; drills: Point[] } {
  if (f.dartIntake <= 0) return { lines: [], drills: [] };
  const legs = [{ x: f.dartX - f.dartIntake / 2, y: 0 }, { x: f.dartX, y: apexY }, { x: f.dartX + f.dartIntake / 2, y: 0 }];
  return { lines: [{ kind: 'dart', name: 'waist-dart', points: legs }], drills: [{ x: f.dartX, y: apexY - DRILL_INSIDE_DART_MM }] };
}

/** The front neckline from the neck point to centre front; returns the centre-front neck height. */
function frontNeckline(b: OutlineBuilder, seam: number, hpsY: number, n: FrontNeckline): number {
  const np = b.points[b.points.length - 1];
  b.edge('neckline', { allowanceMm: seam });
  if (n.shape === 'v') {
    const y = hpsY - (n.depthMm ?? V_NECK_DEPTH_MM);
    b.line({ x: 0, y }, 'cf-neck');
    return y;
  }
  if (n.shape === 'square') {
    const y = hpsY - (n.depthMm ?? 5 * IN);
    b.line({ x: np.x, y }, 'square-corner').line({ x: 0, y }, 'cf-neck');
    return y;
  }
  const y = hpsY - (n.depthMm ?? (n.shape === 'boat' ? IN : ROUND_NECK_START_MM));
  // Leaves the neck point square to centre front's level and arrives at centre front horizontally, so the
  // opened-out neckline has no point at centre front.
  b.cubic({ x: np.x, y: np.y - 0.55 * (np.y - y) }, { x: 0.55 * np.x, y }, { x: 0, y }, 'cf-neck');
  return y;
}

/**
 * Fitted bodice front for one size: half front, centre front on the fold at x = 0, waist at y = 0, side seam at
 * x > 0, mm, counter-clockwise. Width at the underarm = (bust + ease)/4; the waist (waist + ease)/4 plus a waist dart
 * at half the bust-point span whose point stops 1 in short of the bust point; optional side bust dart; shoulder
 * from half the shoulder measurement (pads: +1 in, slope dropped by the pad); chest line 2 in above the bust point.
 * Edges: waist, side (bust-dart), armhole, shoulder, neckline, centre-front (fold). Notches at dart legs and the
 * armhole (single). Drill holes inside each dart point. Throws RangeError naming a missing measurement.
 */
export function draftFittedBodiceFront(m: BodyMeasurements, o: FittedBodiceOptions = {}): Piece {
  const f = bodiceFrame(m, o);
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const hpsY = need(m, 'front-waist-length');
  const bustDart = o.bustDartMm === 'from-lengths' ? Math.max(0, hpsY - need(m, 'back-waist-length')) : (o.bustDartMm ?? 0);
  const bp = { x: f.dartX, y: hpsY - need(m, 'bust-point-height') };
  const ua = { x: f.quarterBust, y: f.underarmY + bustDart };
  const sp = onShoulder(f, hpsY, f.shoulderX);
  const across = { x: need(m, 'across-front') / 2, y: (sp.y + ua.y) / 2 };
  const b = new OutlineBuilder({ x: 0, y: 0 }, 'cf-waist');
  b.edge('waist', { allowanceMm: seam });
  waistWithDart(b, f);
  const lines: InternalLine[] = [];
  const drills: Point[] = [];
  b.edge('side', { allowanceMm: seam });
  if (bustDart > 0) {
    const t = (f.underarmY - 60) / f.underarmY;
    const leg = { x: f.sideWaistX + (f.quarterBust - f.sideWaistX) * t, y: f.underarmY - 60 };
    const apex = { x: bp.x + FITTED_DART_SHORT_MM, y: bp.y };
    b.line(leg, 'bust-dart-lower').notch();
    b.edge('bust-dart', { allowanceMm: seam }).line({ x: leg.x, y: leg.y + bustDart }, 'bust-dart-upper').notch();
    b.edge('side', { allowanceMm: seam });
    lines.push({ kind: 'dart', name: 'bust-dart', points: [leg, apex, { x: leg.x, y: leg.y + bustDart }] });
    drills.push(towards(apex, { x: leg.x, y: leg.y + bustDart / 2 }, DRILL_INSIDE_DART_MM));
  }
  b.line(ua, 'underarm');
  armholeAndShoulder(b, seam, ua, across, sp, onShoulder(f, hpsY, f.neckWidth), [ARMHOLE_NOTCH_FRONT_MM]);
  const cfNeckY = frontNeckline(b, seam, hpsY, o.neckline ?? { shape: 'round' });
  b.edge('centre-front', { allowanceMm: 0, isFold: true }).line({ x: 0, y: 0 });
  const dart = waistDart(f, bp.y - FITTED_DART_SHORT_MM);
  const chestY = bp.y + FITTED_CHEST_LINE_MM;
  lines.unshift(...dart.lines, { kind: 'reference', name: 'chest-line', points: [{ x: 0, y: chestY }, { x: across.x, y: chestY }] });
  lines.push({ kind: 'reference', name: 'bust-line', points: [{ x: 0, y: bp.y }, { x: bp.x, y: bp.y }] });
  return {
    id: 'bodice-front', name: 'Bodice front', role: 'front', ...b.close(),
    grainLine: { from: { x: f.dartX / 2, y: 40 }, to: { x: f.dartX / 2, y: Math.min(chestY, cfNeckY - 20) } },
    drillHoles: [...dart.drills, ...drills], internalLines: lines, cut: 'fold', quantity: 1,
  };
}

/**
 * Fitted bodice back: half back, centre back on the fold (or a centre-back seam with a zip allowance, cut as a
 * pair), waist at y = 0. High shoulder point ¾ in above the nape (standard) with the same neck width, underarm
 * level and shoulder line as the front, so shoulder and side seams match. Waist dart in line with the front's,
 * its point 30 mm below the underarm level (common practice). Double armhole notch.
 * Edges: waist, side, armhole, shoulder, neckline, centre-back (seam or fold).
 */
export function draftFittedBodiceBack(m: BodyMeasurements, o: FittedBodiceOptions = {}): Piece {
  const f = bodiceFrame(m, o);
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const hpsY = need(m, 'back-waist-length') + BACK_NECK_DEPTH.standard;
  const cbNeckY = hpsY - BACK_NECK_DEPTH[o.backNeckline ?? 'standard'];
  const ua = { x: f.quarterBust, y: f.underarmY };
  const sp = onShoulder(f, hpsY, f.shoulderX);
  const across = { x: need(m, 'across-back') / 2, y: (sp.y + ua.y) / 2 };
  const opening = o.centreBackOpening ?? null;
  const b = new OutlineBuilder({ x: 0, y: 0 }, 'cb-waist');
  b.edge('waist', { allowanceMm: seam });
  waistWithDart(b, f);
  b.edge('side', { allowanceMm: seam }).line(ua, 'underarm');
  const np = onShoulder(f, hpsY, f.neckWidth);
  armholeAndShoulder(b, seam, ua, across, sp, np, ARMHOLE_NOTCH_BACK_MM);
  b.edge('neckline', { allowanceMm: seam }).cubic({ x: np.x, y: np.y - 0.6 * (np.y - cbNeckY) }, { x: 0.5 * np.x, y: cbNeckY }, { x: 0, y: cbNeckY }, 'cb-neck');
  b.edge('centre-back', opening ? { allowanceMm: opening.allowanceMm ?? ZIP_ALLOWANCE_MM } : { allowanceMm: 0, isFold: true }).line({ x: 0, y: 0 });
  const dart = waistDart(f, f.underarmY - 30);
  return {
    id: 'bodice-back', name: 'Bodice back', role: 'back', ...b.close(),
    grainLine: { from: { x: f.dartX / 2, y: 40 }, to: { x: f.dartX / 2, y: f.underarmY - 40 } },
    drillHoles: dart.drills, internalLines: dart.lines, cut: opening ? 'pair' : 'fold', quantity: 1,
  };
}
