import { edgeLength } from '../pieces/piece-measure';
import type { Piece } from '../pieces/piece';
import { draftBodiceBack, draftBodiceFront } from './bodice-block';
import { draftFacing } from './facing-block';
import { need, type BodyMeasurements } from './measure-input';
import { draftRectangle } from './rectangle-block';
import { draftSleeve } from './sleeve-block';

/** Style constants of the demo shirt dress (mm). Ease values follow the CWU costume text, ch. 16 ("Ease in
 * Clothing": bodices 1 1/2–2 in at the bust, dresses 3/4–1 in at the waist, 2–2 3/4 in at the hip), raised for a
 * loose shirt dress (common practice). */
export const SHIRT_DRESS_STYLE = {
  bustEaseMm: 100,
  waistEaseMm: 120,
  hipEaseMm: 90,
  hemFlareMm: 60,
  extensionMm: 15,
  sleeveCapEaseMm: 15,
  capHeightRatio: 0.7,
  collarBandHeightMm: 30,
  facingWidthMm: 60,
  pocket: { widthMm: 140, heightMm: 160, hemMm: 30, fromCentreMm: 115, belowWaistMm: 90 },
  beltWidthMm: 35,
  beltExtraMm: 300,
} as const;

/**
 * The demo style's pieces for one size: an A-line shirt dress with short set-in sleeves, button front, patch
 * pockets and a self belt. Returns, in order: front, back, sleeve, collar band, pocket, belt, front facing,
 * back neck facing. Dress length = waist to knee. Throws RangeError for missing measurements.
 */
export function draftShirtDress(m: BodyMeasurements): Piece[] {
  const s = SHIRT_DRESS_STYLE;
  const dress = { lengthMm: need(m, 'waist-to-knee'), hemFlareMm: s.hemFlareMm };
  const common = { bustEaseMm: s.bustEaseMm, waistEaseMm: s.waistEaseMm, hipEaseMm: s.hipEaseMm, dress };
  const front = draftBodiceFront(m, { ...common, extensionMm: s.extensionMm, pocketPlacement: s.pocket });
  const back = draftBodiceBack(m, common);
  const sleeve = draftSleeve(m, {
    armholeLengthMm: edgeLength(front, ['armhole']) + edgeLength(back, ['armhole']),
    capEaseMm: s.sleeveCapEaseMm,
    capHeightMm: s.capHeightRatio * armholeDepth(front, back),
  });
  const { bicepMm: _b, ...sleevePiece } = sleeve;
  const halfNeck = edgeLength(front, ['neckline']) + edgeLength(back, ['neckline']);
  const collarBand = draftRectangle({
    id: 'collar-band', name: 'Collar band', role: 'collar-band', widthMm: halfNeck + s.extensionMm,
    heightMm: s.collarBandHeightMm, cut: 'fold', quantity: 2, foldEdge: 'left',
    bottomNotchesMm: [halfNeck], bottomNames: ['neckline', 'stand-extension'],
  });
  const pocket = draftRectangle({
    id: 'pocket', name: 'Patch pocket', role: 'pocket', widthMm: s.pocket.widthMm, heightMm: s.pocket.heightMm,
    cut: 'pair', allowances: { top: s.pocket.hemMm },
  });
  const belt = draftRectangle({
    id: 'belt', name: 'Belt', role: 'belt', widthMm: need(m, 'waist') + s.waistEaseMm + s.beltExtraMm,
    heightMm: s.beltWidthMm, cut: 'fold', foldEdge: 'bottom',
  });
  const frontFacing = draftFacing(front, { id: 'front-facing', name: 'Front facing', role: 'front-facing', edges: ['neckline', 'neck-extension', 'front-edge'], widthMm: s.facingWidthMm, cut: 'pair' });
  const backFacing = draftFacing(back, { id: 'back-neck-facing', name: 'Back neck facing', role: 'back-facing', edges: ['neckline'], widthMm: s.facingWidthMm, cut: 'fold' });
  return [front, back, sleevePiece, collarBand, pocket, belt, frontFacing, backFacing];
}

/** Mean vertical distance from shoulder point to underarm over front and back (mm). */
function armholeDepth(front: Piece, back: Piece): number {
  const d = (p: Piece) => p.outline[p.landmarks.shoulder].y - p.outline[p.landmarks.underarm].y;
  return (d(front) + d(back)) / 2;
}
