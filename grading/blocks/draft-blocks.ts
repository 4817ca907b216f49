import { edgeLength } from '../pieces/piece-measure';
import type { Piece } from '../pieces/piece';
import { piecesPerGarment, unfoldPiece, type DraftedPiece, type PieceMaterial } from './drafted-piece';
import { draftFittedBodiceBack, draftFittedBodiceFront, type FittedBodiceOptions } from './fitted-bodice-block';
import type { BodyMeasurements } from './measure-input';
import { draftSetInSleeve, type SetInSleeveOptions } from './set-in-sleeve-block';
import { draftSkirtShape, type SkirtShapeOptions } from './skirt-shapes-block';
import { draftBodiceFacings, draftPeplum, draftWaistband, type FacingKind, type PeplumOptions, type WaistbandOptions } from './trim-pieces-block';

interface Common {
  /** Material the block's pieces are cut from. Default 'self' (facings: 'self' plus 'interfacing' copies). */
  material?: PieceMaterial;
}

/** One block of a style and its options; omitted options take their defaults. */
export type BlockSpec =
  | ({ block: 'bodice' } & Common & FittedBodiceOptions)
  | ({ block: 'skirt'; shape?: SkirtShapeOptions['shape'] } & Common & Omit<SkirtShapeOptions, 'shape'>)
  | ({ block: 'sleeve' } & Common & Partial<SetInSleeveOptions>)
  | ({ block: 'peplum' } & Common & PeplumOptions)
  | ({ block: 'facing'; of?: FacingKind; widthMm?: number; interfaced?: boolean } & Common)
  | ({ block: 'waistband' } & Common & WaistbandOptions);

/** The block names {@link draftBlocks} knows. */
export const BLOCK_NAMES = ['bodice', 'skirt', 'sleeve', 'peplum', 'facing', 'waistband'] as const;

/**
 * Draft a style from blocks for one size's body measurements (mm). Blocks are drafted in the order given; the
 * sleeve fits, and the facings follow, the first bodice in the list (or a bodice with default options when there
 * is none). Piece ids are the block's piece ids, suffixed -2, -3… when a block repeats. Pieces come back as
 * drafted (halves on the fold); see {@link openOutPieces} for the cut-and-opened form. Throws RangeError naming a
 * missing measurement or a bad option.
 */
export function draftBlocks(m: BodyMeasurements, specs: readonly BlockSpec[]): DraftedPiece[] {
  const bodiceSpec = specs.find((s): s is Extract<BlockSpec, { block: 'bodice' }> => s.block === 'bodice');
  let bodice: { front: Piece; back: Piece } | undefined;
  const getBodice = () => (bodice ??= { front: draftFittedBodiceFront(m, bodiceSpec ?? {}), back: draftFittedBodiceBack(m, bodiceSpec ?? {}) });
  const out: DraftedPiece[] = [];
  const seen = new Map<string, number>();
  const add = (p: Piece, block: string, material: PieceMaterial, shape?: string) => {
    const n = (seen.get(p.id) ?? 0) + 1;
    seen.set(p.id, n);
    out.push({ ...p, id: n > 1 ? `${p.id}-${n}` : p.id, block, ...(shape ? { shape } : {}), material, copies: piecesPerGarment(p) });
  };
  for (const spec of specs) {
    const material = spec.material ?? 'self';
    if (spec.block === 'bodice') {
      const b = spec === bodiceSpec ? getBodice() : { front: draftFittedBodiceFront(m, spec), back: draftFittedBodiceBack(m, spec) };
      add(b.front, 'bodice', material);
      add(b.back, 'bodice', material);
    } else if (spec.block === 'skirt') {
      const shape = spec.shape ?? 'straight';
      for (const p of draftSkirtShape(m, { ...spec, shape })) add(p, 'skirt', material, shape);
    } else if (spec.block === 'sleeve') {
      const { block: _b, material: _m, ...o } = spec;
      const armhole = (which: 'front' | 'back') => edgeLength(getBodice()[which], ['armhole']);
      const sleeve = draftSetInSleeve(m, { ...o, armholeFrontMm: o.armholeFrontMm ?? armhole('front'), armholeBackMm: o.armholeBackMm ?? armhole('back') });
      const { bicepMm: _bicep, ...piece } = sleeve;
      add(piece, 'sleeve', material, spec.length ?? 'long');
    } else if (spec.block === 'peplum') {
      const { innerRadiusMm: _r, outerRadiusMm: _R, ...piece } = draftPeplum(m, spec);
      add(piece, 'peplum', material, spec.shape ?? 'circle');
    } else if (spec.block === 'facing') {
      const { front, back } = getBodice();
      for (const p of draftBodiceFacings(front, back, spec.of ?? 'neckline', spec.widthMm)) {
        add(p, 'facing', material, spec.of ?? 'neckline');
        if (spec.interfaced ?? true) add({ ...p, id: `${p.id}-interfacing`, name: `${p.name} interfacing` }, 'facing', 'interfacing', spec.of ?? 'neckline');
      }
    } else if (spec.block === 'waistband') add(draftWaistband(m, spec), 'waistband', material);
    else throw new RangeError(`unknown block "${(spec as { block: unknown }).block}" (known: ${BLOCK_NAMES.join(', ')})`);
  }
  return out;
}

/** The pieces as cut and opened out: every piece on a fold is unfolded (its copies stay as counted). */
export function openOutPieces(pieces: readonly DraftedPiece[]): DraftedPiece[] {
  return pieces.map((p) => unfoldPiece(p));
}
