import type { Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { draftCircleRing, type RingCut } from './circle-ring-block';
import { squaredHemPath } from './hem-shape';
import { ZIP_ALLOWANCE_MM } from './fitted-bodice-block';
import { DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';

const IN = 25.4;

/** Skirt shapes of the block library. */
export type SkirtShape = 'straight' | 'pencil' | 'a-line' | 'gathered' | 'circle';

/** Options of {@link draftSkirtShape} (mm). Every option has a default. */
export interface SkirtShapeOptions {
  shape: SkirtShape;
  /** Waist to hem. Default the waist-to-knee measurement. */
  lengthMm?: number;
  /** Waist ease. Default ½ in (CWU ch. 16: skirts ½–¾ in at the waist); circle skirts 0 (the bias waist gives). */
  waistEaseMm?: number;
  /** Hip ease. Default 2 in (CWU ch. 16: all garments 2–2¾ in at the hips). */
  hipEaseMm?: number;
  /** Waist dart intake, one dart per panel quarter. Default 2 cm (WikiEducator skirt handout) when the quarter's
   * waist suppression is at least 1½ in, else no dart (somethingsihavemade, "Drafting a Pencil Skirt, Part Two"). */
  waistDartMm?: number;
  /** Centre-back opening with its zip allowance; null = back on the fold. Default 1½ in for straight, pencil and
   * A-line; for gathered and circle skirts the opening is at centre back only when given. */
  centreBackOpening?: { allowanceMm?: number } | null;
  /** Back vent (straight and pencil). Default: pencil 6 × 1½ in, straight none (from memory). */
  vent?: { lengthMm?: number; widthMm?: number } | null;
  /** Pencil: hem narrower than the hip by this much per side. Default 1 in (common practice). */
  hemTaperMm?: number;
  /** A-line: extra width per quarter at the hem. Default 60 mm (as the demo skirt). */
  hemFlareMm?: number;
  /** Gathered: flat waist length ÷ finished waist. Default 2 (calculatorcollection.org: "standard 2×"). */
  fullness?: number;
  /** Circle: fraction of a full circle (1, ¾, ½, ¼…). Default 1. */
  fraction?: number;
  /** Circle: one ring opened at centre back (default), or halves / quarters on folds. */
  cut?: RingCut;
  seamMm?: number;
  hemMm?: number;
}

/** Hem allowance of straight, pencil and A-line skirts: 2 in (American Sewing Guild: A-line or straight skirt 2–3 in). */
export const HEM_STRAIGHT_SKIRT_MM = 2 * IN;

/**
 * Skirt pieces for one size, front then back. Straight, pencil and A-line: quarter-body panels, waist at y = 0,
 * centre at x = 0, hem at −length; hip = (hip + ease)/4 at waist-to-hip depth; the waist suppression (hip − waist
 * after ease, per quarter) goes to one waist dart (front 10 cm, back 12 cm long: WikiEducator) and the side curve.
 * The front is on the fold; the back is on the fold or, with a centre-back opening or a vent, a pair with a
 * 'centre-back' seam of the zip allowance. An A-line hem is squared to the side seam for its last inch, with the
 * side seam as long as the centre below the hip. Gathered: rectangles fullness × (waist + ease) around. Circle: one
 * ring or parts (see draftCircleRing). Throws RangeError naming a missing measurement or bad option.
 */
export function draftSkirtShape(m: BodyMeasurements, o: SkirtShapeOptions): Piece[] {
  const length = o.lengthMm ?? need(m, 'waist-to-knee');
  if (!(length > 0)) throw new RangeError('lengthMm must be a positive number of mm');
  if (o.shape === 'circle') {
    const opening = o.centreBackOpening ?? null;
    return [draftCircleRing({
      id: 'skirt', name: 'Circle skirt', role: 'circle-skirt', innerEdgeMm: need(m, 'waist') + (o.waistEaseMm ?? 0),
      depthMm: length, fraction: o.fraction ?? 1, cut: o.cut, seamMm: o.seamMm, hemMm: o.hemMm,
      openingAllowanceMm: opening ? (opening.allowanceMm ?? ZIP_ALLOWANCE_MM) : undefined,
    })];
  }
  if (o.shape === 'gathered') return gatheredSkirt(m, o, length);
  return [panel(m, o, length, 'front'), panel(m, o, length, 'back')];
}

function panel(m: BodyMeasurements, o: SkirtShapeOptions, length: number, side: 'front' | 'back'): Piece {
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const hipX = (need(m, 'hip') + (o.hipEaseMm ?? 2 * IN)) / 4;
  const waistQ = (need(m, 'waist') + (o.waistEaseMm ?? 0.5 * IN)) / 4;
  const hipY = -need(m, 'waist-to-hip');
  if (length <= -hipY + 1) throw new RangeError('lengthMm must reach below the hip (longer than the waist-to-hip measurement)');
  const excess = hipX - waistQ;
  const dart = o.waistDartMm ?? (excess >= 1.5 * IN ? 20 : 0);
  const sideWaistX = waistQ + dart;
  const isBack = side === 'back';
  const opening = isBack ? (o.centreBackOpening === undefined ? { allowanceMm: ZIP_ALLOWANCE_MM } : o.centreBackOpening) : null;
  const vent = isBack && o.shape !== 'a-line' ? (o.vent === undefined ? (o.shape === 'pencil' ? {} : null) : o.vent) : null;
  const ventW = vent ? (vent.widthMm ?? 1.5 * IN) : 0;
  const ventL = vent ? (vent.lengthMm ?? 6 * IN) : 0;
  const isSeam = Boolean(opening || vent);
  const c = isBack ? 'cb' : 'cf';
  const b = new OutlineBuilder({ x: -ventW, y: -length }, `${c}-hem`);
  b.edge('hem', { allowanceMm: o.hemMm ?? HEM_STRAIGHT_SKIRT_MM });
  hemAndSide(b, o, length, hipX, hipY);
  b.edge('side', { allowanceMm: seam }).line({ x: hipX, y: hipY }, 'side-hip');
  b.cubic({ x: hipX, y: hipY * 0.5 }, { x: hipX - (hipX - sideWaistX) * 0.3, y: hipY * 0.15 }, { x: sideWaistX, y: 0 }, 'side-waist');
  b.edge('waist', { allowanceMm: seam });
  const dartX = waistQ / 2 + 10 + dart / 2;
  if (dart > 0) b.line({ x: dartX + dart / 2, y: 0 }, 'dart-side-leg').notch().line({ x: dartX - dart / 2, y: 0 }, 'dart-centre-leg').notch();
  b.line({ x: 0, y: 0 }, `${c}-waist`);
  const centre = isBack ? 'centre-back' : 'centre-front';
  if (isSeam) {
    b.edge(centre, { allowanceMm: opening ? (opening.allowanceMm ?? ZIP_ALLOWANCE_MM) : seam });
    if (vent) {
      b.line({ x: 0, y: -length + ventL }, 'vent-top').notch();
      b.edge('vent', { allowanceMm: seam }).line({ x: -ventW, y: -length + ventL }).line({ x: -ventW, y: -length });
    } else b.line({ x: 0, y: -length });
  } else b.edge(centre, { allowanceMm: 0, isFold: true }).line({ x: 0, y: -length });
  const dartLen = isBack ? 120 : 100;
  const named = o.shape === 'a-line' ? 'A-line skirt' : o.shape === 'pencil' ? 'Pencil skirt' : 'Straight skirt';
  return {
    id: `skirt-${side}`, name: `${named} ${side}`, role: `skirt-${side}`, ...b.close(),
    grainLine: { from: { x: hipX / 3, y: -length + 60 }, to: { x: hipX / 3, y: hipY } },
    drillHoles: dart > 0 ? [{ x: dartX, y: -dartLen + 10 }] : [],
    internalLines: dart > 0 ? [{ kind: 'dart', name: 'waist-dart', points: [{ x: dartX - dart / 2, y: 0 }, { x: dartX, y: -dartLen }, { x: dartX + dart / 2, y: 0 }] }] : [],
    cut: isSeam ? 'pair' : 'fold', quantity: 1,
  };
}

/** Hem from the centre to the side hem point. A flared hem is squared to the side seam. */
function hemAndSide(b: OutlineBuilder, o: SkirtShapeOptions, length: number, hipX: number, hipY: number): void {
  if (o.shape !== 'a-line') {
    const x = o.shape === 'pencil' ? hipX - (o.hemTaperMm ?? IN) : hipX;
    b.line({ x, y: -length }, 'side-hem');
    return;
  }
  const path = squaredHemPath({ x: 0, y: -length }, { x: hipX, y: hipY }, { x: hipX + (o.hemFlareMm ?? 60), y: -length });
  path.slice(1).forEach((p, i) => b.line(p, i === path.length - 2 ? 'side-hem' : undefined));
}

function gatheredSkirt(m: BodyMeasurements, o: SkirtShapeOptions, length: number): Piece[] {
  const around = (o.fullness ?? 2) * (need(m, 'waist') + (o.waistEaseMm ?? 0.5 * IN));
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const hem = o.hemMm ?? IN;
  const opening = o.centreBackOpening ?? null;
  const rect = (id: string, name: string, centre: string, isFold: boolean, allowance: number): Piece => {
    const w = around / 4;
    const b = new OutlineBuilder({ x: 0, y: -length }, 'centre-hem');
    b.edge('hem', { allowanceMm: hem }).line({ x: w, y: -length }, 'side-hem');
    b.edge('side', { allowanceMm: seam }).line({ x: w, y: 0 }, 'side-waist');
    b.edge('waist', { allowanceMm: seam }).line({ x: 0, y: 0 }, 'centre-waist');
    b.edge(centre, { allowanceMm: isFold ? 0 : allowance, isFold }).line({ x: 0, y: -length });
    return {
      id, name, role: id, ...b.close(), grainLine: { from: { x: w / 2, y: -length + 60 }, to: { x: w / 2, y: -60 } },
      drillHoles: [], internalLines: [], cut: isFold ? 'fold' : 'pair', quantity: 1,
    };
  };
  return [
    rect('skirt-front', 'Gathered skirt front', 'centre-front', true, 0),
    rect('skirt-back', 'Gathered skirt back', 'centre-back', !opening, opening?.allowanceMm ?? ZIP_ALLOWANCE_MM),
  ];
}
