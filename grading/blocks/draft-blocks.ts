import { edgeLength } from '../pieces/piece-measure';
import type { Piece } from '../pieces/piece';
import { draftBodiceBack, draftBodiceFront } from './bodice-block';
import { piecesPerGarment, unfoldPiece, type DraftedPiece, type PieceMaterial } from './drafted-piece';
import { draftFacing } from './facing-block';
import { draftFittedBodiceBack, draftFittedBodiceFront, type FittedBodiceOptions } from './fitted-bodice-block';
import {
  draftBelt, draftCollar, draftCollarBand, draftInSeamPocket, draftPatchPocket, withPocketPlacement, withSideNotches,
  type BeltOptions, type CollarBandOptions, type CollarOptions, type InSeamPocketOptions, type PatchPocketOptions,
} from './garment-details-block';
import { need, type BodyMeasurements } from './measure-input';
import { draftSetInSleeve, type SetInSleeveOptions } from './set-in-sleeve-block';
import { draftSleeve } from './sleeve-block';
import { draftSkirtShape, type SkirtShapeOptions } from './skirt-shapes-block';
import { draftBodiceFacings, draftPeplum, draftWaistband, type FacingKind, type PeplumOptions, type WaistbandOptions } from './trim-pieces-block';

interface Common {
  /** Material the block's pieces are cut from. Default 'self' (facings: 'self' plus 'interfacing' copies). */
  material?: PieceMaterial;
}

/** Options of the loose dress block: a bodice extended to the hem with an A-line flare, optionally buttoned. */
export interface DressOptions {
  /** Ease on bust, waist and hip girths. Defaults 2 in, 1 in, 2 in (CWU costume text ch. 16). */
  bustEaseMm?: number;
  waistEaseMm?: number;
  hipEaseMm?: number;
  /** Waist to hem. Default the waist-to-knee measurement. */
  lengthMm?: number;
  /** Extra width per quarter at the hem. Default 60 mm (as the demo shirt dress). */
  hemFlareMm?: number;
  /** Button extension past centre front; 0 (default) puts centre front on the fold. */
  buttonExtensionMm?: number;
  seamMm?: number;
  hemMm?: number;
}

/** Options of the shirt sleeve block: a short set-in sleeve whose cap height follows the armhole depth. */
export interface ShirtSleeveOptions {
  /** Cap length minus armhole length. Default 15 mm (common practice for a shirt-dress sleeve). */
  capEaseMm?: number;
  /** Cap height as a share of the armhole depth. Default 0.7 (common practice for a shirt sleeve). */
  capHeightRatio?: number;
  underarmLengthMm?: number;
  hemTaperMm?: number;
  seamMm?: number;
  hemMm?: number;
}

/** Facings of the first bodice: along the neckline, the armhole, or a button front's whole front edge. */
export type FacingOf = FacingKind | 'front-edge';

/** One block of a style and its options; omitted options take their defaults. */
export type BlockSpec =
  | ({ block: 'bodice' } & Common & FittedBodiceOptions)
  | ({ block: 'dress' } & Common & DressOptions)
  | ({ block: 'skirt'; shape?: SkirtShapeOptions['shape'] } & Common & Omit<SkirtShapeOptions, 'shape'>)
  | ({ block: 'sleeve' } & Common & Partial<SetInSleeveOptions>)
  | ({ block: 'shirt-sleeve' } & Common & ShirtSleeveOptions)
  | ({ block: 'peplum' } & Common & PeplumOptions)
  | ({ block: 'facing'; of?: FacingOf; widthMm?: number; interfaced?: boolean } & Common)
  | ({ block: 'waistband' } & Common & WaistbandOptions)
  | ({ block: 'collar-band' } & Common & CollarBandOptions)
  | ({ block: 'collar' } & Common & CollarBandOptions & { collar?: CollarOptions })
  | ({ block: 'pocket'; kind?: 'patch' } & Common & PatchPocketOptions)
  | ({ block: 'pocket'; kind: 'in-seam' } & Common & InSeamPocketOptions)
  | ({ block: 'belt' } & Common & BeltOptions);

/** The block names {@link draftBlocks} knows. */
export const BLOCK_NAMES = ['bodice', 'dress', 'skirt', 'sleeve', 'shirt-sleeve', 'peplum', 'facing', 'waistband', 'collar-band', 'collar', 'pocket', 'belt'] as const;

type Body = { front: Piece; back: Piece };

function draftBody(m: BodyMeasurements, spec: Extract<BlockSpec, { block: 'bodice' | 'dress' }> | undefined): Body {
  if (spec?.block !== 'dress') return { front: draftFittedBodiceFront(m, spec ?? {}), back: draftFittedBodiceBack(m, spec ?? {}) };
  const common = {
    bustEaseMm: spec.bustEaseMm ?? 2 * 25.4, waistEaseMm: spec.waistEaseMm ?? 25.4, hipEaseMm: spec.hipEaseMm ?? 2 * 25.4,
    dress: { lengthMm: spec.lengthMm ?? need(m, 'waist-to-knee'), hemFlareMm: spec.hemFlareMm ?? 60 }, seamMm: spec.seamMm, hemMm: spec.hemMm,
  };
  return { front: draftBodiceFront(m, { ...common, extensionMm: spec.buttonExtensionMm ?? 0 }), back: draftBodiceBack(m, common) };
}

/** Mean vertical distance from shoulder point to underarm over front and back (mm). */
function armholeDepth({ front, back }: Body): number {
  const d = (p: Piece) => p.outline[p.landmarks.shoulder].y - p.outline[p.landmarks.underarm].y;
  return (d(front) + d(back)) / 2;
}

/**
 * Draft a style from blocks for one size's body measurements (mm). Blocks are drafted in the order given; the
 * sleeves fit, and the facings, collar band and collar follow, the first bodice or dress in the list (or a fitted
 * bodice with default options when there is none). A patch pocket marks its placement on the first front (a
 * placement line and drill holes), an in-seam pocket notches the side seams of the first front and back (dress or
 * skirt) of its material at its opening. Piece ids are the block's piece ids, suffixed -2, -3… when a block repeats. Pieces come back as
 * drafted (halves on the fold); see {@link openOutPieces} for the cut-and-opened form. Throws RangeError naming a
 * missing measurement or a bad option.
 */
export function draftBlocks(m: BodyMeasurements, specs: readonly BlockSpec[]): DraftedPiece[] {
  const bodySpec = specs.find((s): s is Extract<BlockSpec, { block: 'bodice' | 'dress' }> => s.block === 'bodice' || s.block === 'dress');
  let body: Body | undefined;
  const getBody = () => (body ??= draftBody(m, bodySpec));
  let band: Piece | undefined;
  const out: DraftedPiece[] = [];
  const seen = new Map<string, number>();
  const add = (p: Piece, block: string, material: PieceMaterial, shape?: string) => {
    const n = (seen.get(p.id) ?? 0) + 1;
    seen.set(p.id, n);
    out.push({ ...p, id: n > 1 ? `${p.id}-${n}` : p.id, block, ...(shape ? { shape } : {}), material, copies: piecesPerGarment(p) });
  };
  const marks: ((pieces: DraftedPiece[]) => void)[] = [];
  for (const spec of specs) {
    const material = spec.material ?? 'self';
    if (spec.block === 'bodice' || spec.block === 'dress') {
      const b = spec === bodySpec ? getBody() : draftBody(m, spec);
      add(b.front, spec.block, material);
      add(b.back, spec.block, material);
    } else if (spec.block === 'skirt') {
      const shape = spec.shape ?? 'straight';
      for (const p of draftSkirtShape(m, { ...spec, shape })) add(p, 'skirt', material, shape);
    } else if (spec.block === 'sleeve') {
      const { block: _b, material: _m, ...o } = spec;
      const armhole = (which: 'front' | 'back') => edgeLength(getBody()[which], ['armhole']);
      const sleeve = draftSetInSleeve(m, { ...o, armholeFrontMm: o.armholeFrontMm ?? armhole('front'), armholeBackMm: o.armholeBackMm ?? armhole('back') });
      const { bicepMm: _bicep, ...piece } = sleeve;
      add(piece, 'sleeve', material, spec.length ?? 'long');
    } else if (spec.block === 'shirt-sleeve') {
      const b = getBody();
      const { bicepMm: _bicep, ...piece } = draftSleeve(m, {
        armholeLengthMm: edgeLength(b.front, ['armhole']) + edgeLength(b.back, ['armhole']), capEaseMm: spec.capEaseMm,
        capHeightMm: (spec.capHeightRatio ?? 0.7) * armholeDepth(b), underarmLengthMm: spec.underarmLengthMm, hemTaperMm: spec.hemTaperMm, seamMm: spec.seamMm, hemMm: spec.hemMm,
      });
      add(piece, 'shirt-sleeve', material);
    } else if (spec.block === 'peplum') {
      const { innerRadiusMm: _r, outerRadiusMm: _R, ...piece } = draftPeplum(m, spec);
      add(piece, 'peplum', material, spec.shape ?? 'circle');
    } else if (spec.block === 'facing') {
      const of = spec.of ?? 'neckline';
      for (const p of facingsOf(getBody(), of, spec.widthMm)) {
        add(p, 'facing', material, of);
        if (spec.interfaced ?? true) add({ ...p, id: `${p.id}-interfacing`, name: `${p.name} interfacing` }, 'facing', 'interfacing', of);
      }
    } else if (spec.block === 'waistband') add(draftWaistband(m, spec), 'waistband', material);
    else if (spec.block === 'collar-band' || spec.block === 'collar') {
      band ??= draftCollarBand(getBody().front, getBody().back, spec);
      if (spec.block === 'collar-band') add(band, 'collar-band', material);
      else add(draftCollar(band, spec.collar), 'collar', material);
    } else if (spec.block === 'pocket' && spec.kind === 'in-seam') {
      add(draftInSeamPocket(spec), 'pocket', material, 'in-seam');
      marks.push((pieces) => {
        for (const role of ['front', 'back', 'skirt-front', 'skirt-back']) {
          const k = pieces.findIndex((p) => p.role === role && p.material === material);
          if (k >= 0) pieces[k] = { ...pieces[k], ...withSideNotches(pieces[k], spec) };
        }
      });
    } else if (spec.block === 'pocket') {
      const pocket = draftPatchPocket(spec);
      add(pocket, 'pocket', material, 'patch');
      marks.push((pieces) => {
        const k = pieces.findIndex((p) => p.role === 'front');
        if (k >= 0) pieces[k] = { ...pieces[k], ...withPocketPlacement(pieces[k], pocket, spec) };
      });
    } else if (spec.block === 'belt') add(draftBelt(m, spec), 'belt', material);
    else throw new RangeError(`unknown block "${(spec as { block: unknown }).block}" (known: ${BLOCK_NAMES.join(', ')})`);
  }
  // Placement marks go on the pieces as listed, whichever order the blocks came in.
  for (const mark of marks) mark(out);
  return out;
}

/** Facings of the body: neckline or armhole (front and back), or a button front's front edge with the back neck. */
function facingsOf(body: Body, of: FacingOf, widthMm?: number): Piece[] {
  if (of !== 'front-edge') return draftBodiceFacings(body.front, body.back, of, widthMm);
  const edges = ['neckline', 'neck-extension', 'front-edge'];
  if (!edges.every((n) => body.front.edges.some((e) => e.name === n))) {
    throw new RangeError('facing: a front-edge facing needs a buttoned front (a dress block with buttonExtensionMm)');
  }
  const w = widthMm ?? 60;
  return [
    draftFacing(body.front, { id: 'front-facing', name: 'Front facing', role: 'front-facing', edges, widthMm: w, cut: 'pair' }),
    draftFacing(body.back, { id: 'back-neck-facing', name: 'Back neck facing', role: 'back-facing', edges: ['neckline'], widthMm: w, cut: body.back.edges.some((e) => e.isFold) ? 'fold' : 'pair' }),
  ];
}

/** The pieces as cut and opened out: every piece on a fold is unfolded (its copies stay as counted). */
export function openOutPieces(pieces: readonly DraftedPiece[]): DraftedPiece[] {
  return pieces.map((p) => unfoldPiece(p));
}
