import type { Point } from '@shared/geometry/types';
import { edgePoints, OutlineBuilder, type InternalLine, type Piece } from '../pieces/piece';
import { edgeLength } from '../pieces/piece-measure';
import { polylineSplitAt } from './drafted-piece';
import { DRILL_INSIDE_DART_MM } from './fitted-bodice-block';
import { DEFAULT_SEAM_MM, need, type BodyMeasurements } from './measure-input';
import { draftRectangle } from './rectangle-block';

const IN = 25.4;

/** Options of {@link draftCollarBand} (mm). */
export interface CollarBandOptions {
  /** Finished band height. Default 30 mm (as the demo shirt dress; from memory: 1–1¼ in). */
  heightMm?: number;
  /** Band extension past centre front under the buttonhole. Default 15 mm (the demo's button extension). */
  extensionMm?: number;
  seamMm?: number;
}

/**
 * Collar band for a bodice front and back: half band on the fold at centre back, its neckline edge as long as the
 * half neckline (front + back), then the extension past centre front; the top edge carries a collar notch at the
 * same point. Cut on the fold, two (outer band and facing). Edges: neckline, stand-extension, end, top-extension,
 * collar, centre-back (fold). Landmarks as a rectangle ('bottom-left', 'bottom-notch-0', 'bottom-right', 'top-right',
 * 'top-notch', 'top-left').
 */
export function draftCollarBand(front: Piece, back: Piece, o: CollarBandOptions = {}): Piece {
  const halfNeck = edgeLength(front, ['neckline']) + edgeLength(back, ['neckline']);
  const ext = o.extensionMm ?? 15, h = o.heightMm ?? 30, seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const b = new OutlineBuilder({ x: 0, y: 0 }, 'bottom-left');
  b.edge('neckline', { allowanceMm: seam }).line({ x: halfNeck, y: 0 }, 'bottom-notch-0').notch();
  b.edge('stand-extension', { allowanceMm: seam }).line({ x: halfNeck + ext, y: 0 }, 'bottom-right');
  b.edge('end', { allowanceMm: seam }).line({ x: halfNeck + ext, y: h }, 'top-right');
  b.edge('top-extension', { allowanceMm: seam }).line({ x: halfNeck, y: h }, 'top-notch').notch();
  b.edge('collar', { allowanceMm: seam }).line({ x: 0, y: h }, 'top-left');
  b.edge('centre-back', { allowanceMm: 0, isFold: true }).line({ x: 0, y: 0 });
  const w = halfNeck + ext;
  return {
    id: 'collar-band', name: 'Collar band', role: 'collar-band', ...b.close(),
    grainLine: { from: { x: w * 0.2, y: h / 2 }, to: { x: w * 0.8, y: h / 2 } },
    drillHoles: [], internalLines: [], cut: 'fold', quantity: 2,
  };
}

/** Options of {@link draftCollar} (mm). */
export interface CollarOptions {
  /** Collar width at centre back. Default 2¼ in (from memory, a shirt collar's fall). */
  widthMm?: number;
  /** How far the collar point reaches past the band's collar notch. Default ½ in (from memory). */
  pointMm?: number;
  seamMm?: number;
}

/**
 * Shirt collar sewn to the top of a collar band: half collar on the fold at centre back; its neckline edge is the
 * band's collar edge (centre back to the collar notch), then the end runs out to the point. Cut on the fold, two
 * (upper and under collar). Edges: neckline, end, outer, centre-back (fold).
 */
export function draftCollar(band: Piece, o: CollarOptions = {}): Piece {
  const l = edgeLength(band, ['collar']);
  const w = o.widthMm ?? 2.25 * IN, pt = o.pointMm ?? 0.5 * IN, seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const b = new OutlineBuilder({ x: 0, y: 0 }, 'cb-neck');
  b.edge('neckline', { allowanceMm: seam }).line({ x: l, y: 0 }, 'neck-end').notch();
  b.edge('end', { allowanceMm: seam }).line({ x: l + pt, y: w }, 'point');
  b.edge('outer', { allowanceMm: seam }).line({ x: 0, y: w }, 'cb-outer');
  b.edge('centre-back', { allowanceMm: 0, isFold: true }).line({ x: 0, y: 0 });
  return {
    id: 'collar', name: 'Collar', role: 'collar', ...b.close(),
    grainLine: { from: { x: l * 0.2, y: w / 2 }, to: { x: l * 0.8, y: w / 2 } },
    drillHoles: [], internalLines: [], cut: 'fold', quantity: 2,
  };
}

/** Where a patch pocket sits on the front (mm): its centre's distance from centre front, its top's below the waist. */
export interface PocketPlacement {
  fromCentreMm: number;
  belowWaistMm: number;
}

/** Options of {@link draftPatchPocket} (mm). */
export interface PatchPocketOptions extends Partial<PocketPlacement> {
  /** Default 140 × 160 mm (the demo shirt dress). */
  widthMm?: number;
  heightMm?: number;
  /** Turned-down top hem. Default 30 mm. */
  hemMm?: number;
  seamMm?: number;
}

/** Patch pocket: a rectangle with its hem at the top, cut as a pair. Landmarks as a rectangle. */
export function draftPatchPocket(o: PatchPocketOptions = {}): Piece {
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  return draftRectangle({
    id: 'pocket', name: 'Patch pocket', role: 'pocket', widthMm: o.widthMm ?? 140, heightMm: o.heightMm ?? 160,
    cut: 'pair', allowances: { top: o.hemMm ?? 30, bottom: seam, left: seam, right: seam },
  });
}

/**
 * The front with a patch pocket's placement: a placement line (the pocket's sides and top) and a drill hole 10 mm
 * inside each top corner, where the sewn pocket hides it (common practice, as at dart points). Default placement:
 * centre 115 mm from centre front, top 90 mm below the waist (the demo shirt dress).
 */
export function withPocketPlacement(front: Piece, pocket: Piece, o: Partial<PocketPlacement> = {}): Piece {
  const w = pocket.outline[pocket.landmarks['bottom-right']].x, h = pocket.outline[pocket.landmarks['top-left']].y;
  const c = o.fromCentreMm ?? 115, top = -(o.belowWaistMm ?? 90), bottom = top - h;
  const l = c - w / 2, r = c + w / 2;
  const line: InternalLine = { kind: 'placement', name: 'pocket', points: [{ x: l, y: bottom }, { x: l, y: top }, { x: r, y: top }, { x: r, y: bottom }] };
  const drills: Point[] = [{ x: l + DRILL_INSIDE_DART_MM, y: top - DRILL_INSIDE_DART_MM }, { x: r - DRILL_INSIDE_DART_MM, y: top - DRILL_INSIDE_DART_MM }];
  return { ...front, internalLines: [...front.internalLines, line], drillHoles: [...front.drillHoles, ...drills] };
}

/** Options of {@link draftInSeamPocket} (mm). */
export interface InSeamPocketOptions {
  /** Opening top below the waist. Default 1 in (from memory). */
  belowWaistMm?: number;
  /** Opening length. Default 6 in (from memory: 5½–6½ in for a hand). */
  openingMm?: number;
  /** Bag depth below the opening and width from the side seam. Defaults 2 in and 7 in (from memory). */
  depthBelowMm?: number;
  widthMm?: number;
  seamMm?: number;
}

/**
 * In-seam pocket bag: its straight edge lies along the side seam (notched at the opening's ends, as the side seams
 * are), the bag curves out and back. Cut as two pairs (a bag on the front and one on the back of each side).
 * Edges: side, bag. Landmarks: 'top', 'opening-top', 'opening-bottom', 'bottom', 'out'.
 */
export function draftInSeamPocket(o: InSeamPocketOptions = {}): Piece {
  const top = o.belowWaistMm ?? IN, open = o.openingMm ?? 6 * IN, below = o.depthBelowMm ?? 2 * IN, w = o.widthMm ?? 7 * IN;
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  const above = Math.min(IN, top);
  const len = above + open + below;
  // The side edge runs down (y from 0 to −len) at x = 0; the bag lies at x > 0 so the outline is counter-clockwise.
  const b = new OutlineBuilder({ x: 0, y: 0 }, 'top');
  b.edge('side', { allowanceMm: seam }).line({ x: 0, y: -above }, 'opening-top').notch().line({ x: 0, y: -above - open }, 'opening-bottom').notch().line({ x: 0, y: -len }, 'bottom');
  b.edge('bag', { allowanceMm: seam }).cubic({ x: 0.6 * w, y: -len - 0.15 * len }, { x: w, y: -0.75 * len }, { x: w, y: -0.45 * len }, 'out');
  b.cubic({ x: w, y: -0.15 * len }, { x: 0.5 * w, y: 0 }, { x: 0, y: 0 });
  return {
    id: 'pocket-bag', name: 'Pocket bag', role: 'pocket-bag', ...b.close(),
    grainLine: { from: { x: w / 3, y: -0.8 * len }, to: { x: w / 3, y: -0.2 * len } },
    drillHoles: [], internalLines: [], cut: 'pair', quantity: 2,
  };
}

/**
 * The piece with notches on its side seam where it crosses the heights of an in-seam pocket's opening (y = −top and
 * y = −top − opening; the waist is at y = 0 on every block). Returns the piece unchanged when it has no single side
 * edge spanning those heights. Indices of later vertices, edges, landmarks and notches are shifted.
 */
export function withSideNotches(piece: Piece, o: InSeamPocketOptions = {}): Piece {
  const top = o.belowWaistMm ?? IN, open = o.openingMm ?? 6 * IN;
  const sides = piece.edges.filter((e) => e.name === 'side' && e.from < e.to);
  for (const e of sides) {
    const pts = edgePoints(piece, e);
    const at = [-top, -top - open].map((y) => lengthAtHeight(pts, y));
    if (at.some((d) => d === null)) continue;
    return insertNotches(piece, e.from, e.to, pts, at as number[]);
  }
  return piece;
}

/** Arc length from a polyline's start to where it first crosses height y, or null. */
function lengthAtHeight(pts: readonly Point[], y: number): number | null {
  let run = 0;
  for (let i = 1; i < pts.length; i++) {
    const a = pts[i - 1], b = pts[i];
    const seg = Math.hypot(b.x - a.x, b.y - a.y);
    if ((a.y - y) * (b.y - y) <= 0 && a.y !== b.y) return run + (seg * (y - a.y)) / (b.y - a.y);
    run += seg;
  }
  return null;
}

function insertNotches(piece: Piece, from: number, to: number, pts: Point[], lengths: number[]): Piece {
  const split = polylineSplitAt(pts, lengths);
  const added = split.points.length - pts.length;
  const inner = new Map<number, number>();
  let j = 0;
  split.points.forEach((p, m) => {
    if (j < pts.length && p.x === pts[j].x && p.y === pts[j].y) inner.set(from + j++, from + m);
  });
  const map = (i: number) => (i < from ? i : i > to ? i + added : inner.get(i)!);
  const outline = [...piece.outline.slice(0, from), ...split.points, ...piece.outline.slice(to + 1)];
  return {
    ...piece,
    outline,
    edges: piece.edges.map((e) => ({ ...e, from: map(e.from), to: map(e.to) })),
    landmarks: Object.fromEntries(Object.entries(piece.landmarks).map(([k, i]) => [k, map(i)])),
    notches: [...piece.notches.map(map), ...split.indices.map((k) => from + k)].sort((a, b) => a - b),
  };
}

/** Options of {@link draftBelt} (mm). */
export interface BeltOptions {
  /** Finished belt width. Default 35 mm (the demo shirt dress). */
  widthMm?: number;
  /** Length past the waist for the overlap and tie. Default 300 mm (the demo shirt dress). */
  extraMm?: number;
  /** Ease on the body waist. Default 1 in (CWU ch. 16: dresses ¾–1 in at the waist). */
  waistEaseMm?: number;
  seamMm?: number;
}

/**
 * Self belt cut in one, folded along its length: (waist + ease + extra) long, as high as the finished width with the
 * fold at the bottom edge. Lower-left at the origin; landmarks as a rectangle.
 */
export function draftBelt(m: BodyMeasurements, o: BeltOptions = {}): Piece {
  const seam = o.seamMm ?? DEFAULT_SEAM_MM;
  return draftRectangle({
    id: 'belt', name: 'Belt', role: 'belt', widthMm: need(m, 'waist') + (o.waistEaseMm ?? IN) + (o.extraMm ?? 300),
    heightMm: o.widthMm ?? 35, cut: 'fold', foldEdge: 'bottom', allowances: { top: seam, left: seam, right: seam },
  });
}
