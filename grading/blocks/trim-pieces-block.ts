import type { Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { draftCircleRing, type RingCut } from './circle-ring-block';
import { draftFacing } from './facing-block';
import { DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';

const IN = 25.4;

/** Options of {@link draftPeplum} (mm). Inner edge = times × (waist + waistEase) + plusMm. */
export interface PeplumOptions {
  shape?: 'circle';
  /** Default { times: 1, plusMm: 0 }: a flat circle peplum. The practitioner's gathered peplum is { times: 2, plusMm: 10 in }. */
  innerEdge?: { times?: number; plusMm?: number };
  /** Peplum length (radial depth). Default 6 in (from memory). */
  lengthMm?: number;
  /** Ease added to the body waist before multiplying. Default 0, so the inner edge is exactly times × waist + plus. */
  waistEaseMm?: number;
  /** Fraction of a full circle. Default 1. */
  fraction?: number;
  /** One ring opened at centre back (default) or halves / quarters on folds. */
  cut?: RingCut;
  /** Allowance of the centre-back opening of a ring. Default the seam allowance. */
  openingAllowanceMm?: number;
  /** Curved corners: round the hem corners at the opening of a ring with this radius. Default 0 (square). */
  cornerRadiusMm?: number;
  seamMm?: number;
  hemMm?: number;
}

/**
 * Circle peplum or flounce: flat (inner edge = waist) or gathered (inner edge = k × waist + extra, gathered onto
 * the waist seam). Radius r = inner edge / (2π·f), as a circle skirt (sizing-and-grading.md §3.2).
 */
export function draftPeplum(m: BodyMeasurements, o: PeplumOptions = {}): Piece & { innerRadiusMm: number; outerRadiusMm: number } {
  const times = o.innerEdge?.times ?? 1;
  if (!(times > 0)) throw new RangeError('innerEdge.times must be a positive number');
  const inner = times * (need(m, 'waist') + (o.waistEaseMm ?? 0)) + (o.innerEdge?.plusMm ?? 0);
  if (!(inner > 0)) throw new RangeError('innerEdge gives no inner edge length');
  return draftCircleRing({
    id: 'peplum', name: times > 1 ? 'Gathered peplum' : 'Peplum', role: 'peplum', innerEdgeMm: inner,
    depthMm: o.lengthMm ?? 6 * IN, fraction: o.fraction ?? 1, cut: o.cut, openingAllowanceMm: o.openingAllowanceMm, cornerRadiusMm: o.cornerRadiusMm,
    seamMm: o.seamMm, hemMm: o.hemMm,
  });
}

/** Options of {@link draftWaistband} (mm). */
export interface WaistbandOptions {
  /** Finished width. Default 1¼ in (from memory). */
  widthMm?: number;
  /** Overlap past the opening for the fastening. Default 1¼ in (from memory). */
  extensionMm?: number;
  /** Ease on the waist. Default ½ in (CWU ch. 16: skirts ½–¾ in at the waistline). */
  waistEaseMm?: number;
  seamMm?: number;
}

/**
 * Straight waistband cut in one, folded along its length: (waist + ease + extension) long, twice the finished
 * width high, fold line marked inside. Lower-left at the origin. Notches on the waist edge at the side seams and
 * centre front (quarters of waist + ease, starting from the centre-back end). Edges: waist, end, top, end.
 */
export function draftWaistband(m: BodyMeasurements, o: WaistbandOptions = {}): Piece {
  const girth = need(m, 'waist') + (o.waistEaseMm ?? 0.5 * IN);
  const len = girth + (o.extensionMm ?? 1.25 * IN);
  const h = 2 * (o.widthMm ?? 1.25 * IN);
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const b = new OutlineBuilder({ x: 0, y: 0 }, 'cb-end');
  b.edge('waist', { allowanceMm: seam });
  for (const k of [1, 2, 3]) b.line({ x: (k * girth) / 4, y: 0 }, k === 2 ? 'centre-front' : `side-${k}`).notch();
  b.line({ x: girth, y: 0 }, 'cb-overlap').notch().line({ x: len, y: 0 }, 'extension-end');
  b.edge('end', { allowanceMm: seam }).line({ x: len, y: h });
  b.edge('top', { allowanceMm: seam }).line({ x: 0, y: h });
  b.edge('end', { allowanceMm: seam }).line({ x: 0, y: 0 });
  return {
    id: 'waistband', name: 'Waistband', role: 'waistband', ...b.close(),
    grainLine: { from: { x: len * 0.2, y: h / 4 }, to: { x: len * 0.8, y: h / 4 } },
    drillHoles: [], internalLines: [{ kind: 'fold', name: 'fold-line', points: [{ x: 0, y: h / 2 }, { x: len, y: h / 2 }] }],
    cut: 'cut1', quantity: 1,
  };
}

/** Which facings to cut from the bodice. */
export type FacingKind = 'neckline' | 'armhole';

/** Facing widths: neckline 2½ in, armhole 2 in (block-drafting-and-line-planning.md §2.4: 2–2½ in consensus; 1½–2 in at the armhole). */
export const FACING_WIDTH_MM = { neckline: 2.5 * IN, armhole: 2 * IN } as const;

/**
 * Neckline or armhole facings of a drafted bodice front and back: the part of each piece within the facing width
 * of that edge (see draftFacing), so the facing's sewing edge is the bodice's own neckline or armhole. A front on
 * the fold gives a facing on the fold; a back with a centre-back seam gives a pair with that seam.
 */
export function draftBodiceFacings(front: Piece, back: Piece, kind: FacingKind, widthMm = FACING_WIDTH_MM[kind]): Piece[] {
  return [front, back].map((source) => {
    const where = source === front ? 'front' : 'back';
    const isFold = source.edges.some((e) => e.isFold);
    return draftFacing(source, {
      id: `${kind}-facing-${where}`, name: `${kind === 'neckline' ? 'Neck' : 'Armhole'} facing ${where}`, role: `${where}-facing`,
      edges: [kind], widthMm, cut: kind === 'neckline' && isFold ? 'fold' : 'pair',
    });
  });
}
