import { draftBlocks, type BlockSpec } from './draft-blocks';
import type { DraftedPiece } from './drafted-piece';
import type { BodyMeasurements } from './measure-input';
import { SHIRT_DRESS_BLOCKS } from './shirt-dress';

/** What a style is drafted from: a preset with its own drafting, or an ordered list of blocks. */
export interface StyleDraftSpec {
  preset?: string | null;
  blocks: readonly BlockSpec[];
}

/**
 * A style's base pieces for one size, drafted from its blocks (the shirt-dress preset stored without blocks takes
 * the demo's {@link SHIRT_DRESS_BLOCKS}), pieces of a non-self material named after it
 * ("Bodice front lining", "Gathered peplum (contrast)") so two pieces of one block never share a name. Throws RangeError like {@link draftBlocks}.
 */
export function draftStyle(m: BodyMeasurements, spec: StyleDraftSpec): DraftedPiece[] {
  const blocks = spec.preset === 'shirt-dress' && spec.blocks.length === 0 ? SHIRT_DRESS_BLOCKS : spec.blocks;
  return draftBlocks(m, blocks).map((p) =>
    p.material === 'self' || p.material === 'interfacing' || p.name.toLowerCase().includes(p.material.toLowerCase()) ? p : { ...p, name: p.material === 'lining' ? `${p.name} lining` : `${p.name} (${p.material})` },
  );
}
