import type { Piece } from '../pieces/piece';
import { draftBlocks, type BlockSpec } from './draft-blocks';
import { piecesPerGarment, type DraftedPiece } from './drafted-piece';
import type { BodyMeasurements } from './measure-input';
import { draftShirtDress } from './shirt-dress';

/** What a style is drafted from: a preset with its own drafting, or an ordered list of blocks. */
export interface StyleDraftSpec {
  preset?: string | null;
  blocks: readonly BlockSpec[];
}

/**
 * A style's base pieces for one size: the shirt-dress preset keeps the demo's drafting (every piece in self
 * fabric); any other composition is drafted from its blocks, pieces of a non-self material named after it
 * ("Bodice front lining", "Gathered peplum (contrast)") so two pieces of one block never share a name. Throws RangeError like {@link draftBlocks}.
 */
export function draftStyle(m: BodyMeasurements, spec: StyleDraftSpec): DraftedPiece[] {
  if (spec.preset === 'shirt-dress') return draftShirtDress(m).map((p) => asDrafted(p, 'shirt-dress'));
  return draftBlocks(m, spec.blocks).map((p) =>
    p.material === 'self' || p.material === 'interfacing' || p.name.toLowerCase().includes(p.material.toLowerCase()) ? p : { ...p, name: p.material === 'lining' ? `${p.name} lining` : `${p.name} (${p.material})` },
  );
}

function asDrafted(p: Piece, block: string): DraftedPiece {
  return { ...p, block, material: 'self', copies: piecesPerGarment(p) };
}
