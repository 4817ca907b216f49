import type { Piece } from '../pieces/piece';
import { draftBlocks, type BlockSpec } from './draft-blocks';
import type { BodyMeasurements } from './measure-input';

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

const s = SHIRT_DRESS_STYLE;

/** The demo shirt dress as a composition of library blocks: a buttoned A-line dress to the knee, short shirt sleeves,
 * a collar band, patch pockets, a self belt and front and back neck facings, all in self fabric. */
export const SHIRT_DRESS_BLOCKS: BlockSpec[] = [
  { block: 'dress', bustEaseMm: s.bustEaseMm, waistEaseMm: s.waistEaseMm, hipEaseMm: s.hipEaseMm, hemFlareMm: s.hemFlareMm, buttonExtensionMm: s.extensionMm },
  { block: 'shirt-sleeve', capEaseMm: s.sleeveCapEaseMm, capHeightRatio: s.capHeightRatio },
  { block: 'collar-band', heightMm: s.collarBandHeightMm, extensionMm: s.extensionMm },
  { block: 'pocket', kind: 'patch', ...s.pocket },
  { block: 'belt', widthMm: s.beltWidthMm, extraMm: s.beltExtraMm, waistEaseMm: s.waistEaseMm },
  { block: 'facing', of: 'front-edge', widthMm: s.facingWidthMm, interfaced: false },
];

/**
 * The demo style's pieces for one size, drafted from {@link SHIRT_DRESS_BLOCKS}: front, back, sleeve, collar band,
 * pocket, belt, front facing, back neck facing. Dress length = waist to knee. Throws RangeError for missing
 * measurements.
 */
export function draftShirtDress(m: BodyMeasurements): Piece[] {
  return draftBlocks(m, SHIRT_DRESS_BLOCKS);
}
