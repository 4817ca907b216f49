import type { Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { DEFAULT_HEM_MM, DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';

/** Options for {@link draftSkirt} (mm). */
export interface SkirtOptions {
  panel: 'front' | 'back';
  style: 'straight' | 'a-line';
  lengthMm: number;
  /** Extra width per quarter at the hem for an A-line skirt (default 60 mm). */
  hemFlareMm?: number;
  waistEaseMm?: number;
  hipEaseMm?: number;
  seamMm?: number;
  hemMm?: number;
}

/**
 * Straight or A-line skirt panel (quarter body): centre on the fold at x = 0, waist at y = 0, hem at −length.
 * Hip width = (hip + ease)/4 at waist-to-hip depth; the waist excess over (waist + ease)/4 is split between the
 * side seam (up to 20 mm, common practice) and one waist dart (front 90 mm long, back 130 mm; common practice).
 * Landmarks: cf-hem|cb-hem, side-hem, side-hip, side-waist, cf-waist|cb-waist.
 */
export function draftSkirt(m: BodyMeasurements, o: SkirtOptions): Piece {
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const hipX = (need(m, 'hip') + (o.hipEaseMm ?? 0)) / 4;
  const waistQ = (need(m, 'waist') + (o.waistEaseMm ?? 10)) / 4;
  const excess = Math.max(0, hipX - waistQ);
  const side = Math.min(excess / 2, 20);
  const dart = excess - side;
  const hipY = -need(m, 'waist-to-hip');
  const hemX = o.style === 'a-line' ? hipX + (o.hemFlareMm ?? 60) : hipX;
  const c = o.panel === 'front' ? 'cf' : 'cb';
  const b = new OutlineBuilder({ x: 0, y: -o.lengthMm }, `${c}-hem`);
  b.edge('hem', { allowanceMm: o.hemMm ?? DEFAULT_HEM_MM }).line({ x: hemX, y: -o.lengthMm }, 'side-hem');
  b.edge('side', { allowanceMm: seam }).line({ x: hipX, y: hipY }, 'side-hip');
  b.cubic({ x: hipX, y: hipY * 0.5 }, { x: hipX - side * 0.3, y: hipY * 0.15 }, { x: hipX - side, y: 0 }, 'side-waist');
  b.edge('waist', { allowanceMm: seam }).line({ x: 0, y: 0 }, `${c}-waist`);
  b.edge(`${c}-fold`, { allowanceMm: 0, isFold: true }).line({ x: 0, y: -o.lengthMm });
  const dartX = hipX * (o.panel === 'front' ? 0.45 : 0.5);
  const dartLen = o.panel === 'front' ? 90 : 130;
  return {
    id: `skirt-${o.panel}`, name: `Skirt ${o.panel}`, role: `skirt-${o.panel}`, ...b.close(),
    grainLine: { from: { x: hipX / 3, y: -o.lengthMm + 60 }, to: { x: hipX / 3, y: hipY } },
    drillHoles: dart > 0 ? [{ x: dartX, y: -dartLen + 10 }] : [],
    internalLines: dart > 0 ? [{ kind: 'dart', name: 'waist-dart', points: [{ x: dartX - dart / 2, y: 0 }, { x: dartX, y: -dartLen }, { x: dartX + dart / 2, y: 0 }] }] : [],
    cut: 'fold', quantity: 1,
  };
}
