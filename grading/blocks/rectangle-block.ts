import type { CutInstruction, Piece } from '../pieces/piece';
import { OutlineBuilder } from '../pieces/piece';
import { DEFAULT_SEAM_MM } from './measure-input';

/** Input for {@link draftRectangle}; all lengths mm. `foldEdge` puts the fold on that edge (cut must be 'fold'). */
export interface RectangleInput {
  id: string;
  name: string;
  role: string;
  widthMm: number;
  heightMm: number;
  cut: CutInstruction;
  quantity?: number;
  allowances?: Partial<Record<'bottom' | 'right' | 'top' | 'left', number>>;
  foldEdge?: 'bottom' | 'left';
  /** Horizontal positions (mm from the left) where the bottom edge is split, each becoming a notched vertex. */
  bottomNotchesMm?: number[];
  /** Names for the bottom edge's parts (one more than bottomNotchesMm). Default 'bottom'. */
  bottomNames?: string[];
}

/**
 * A rectangle (bands, belts, pockets), lower-left at the origin, counter-clockwise, grain line along the width.
 * Landmarks: 'bottom-left', 'bottom-right', 'top-right', 'top-left' and 'bottom-notch-<i>'.
 */
export function draftRectangle(input: RectangleInput): Piece {
  const { widthMm: w, heightMm: h } = input;
  if (!(w > 0 && h > 0)) throw new RangeError('rectangle needs positive width and height');
  const a = (k: 'bottom' | 'right' | 'top' | 'left') => input.allowances?.[k] ?? DEFAULT_SEAM_MM;
  const b = new OutlineBuilder({ x: 0, y: 0 }, 'bottom-left');
  const names = input.bottomNames ?? ['bottom'];
  const cuts = input.bottomNotchesMm ?? [];
  cuts.forEach((x, i) => {
    b.edge(names[i] ?? 'bottom', { allowanceMm: a('bottom'), isFold: input.foldEdge === 'bottom' }).line({ x, y: 0 }, `bottom-notch-${i}`).notch();
  });
  b.edge(names[cuts.length] ?? 'bottom', { allowanceMm: a('bottom'), isFold: input.foldEdge === 'bottom' }).line({ x: w, y: 0 }, 'bottom-right');
  b.edge('right', { allowanceMm: a('right') }).line({ x: w, y: h }, 'top-right');
  b.edge('top', { allowanceMm: a('top') }).line({ x: 0, y: h }, 'top-left');
  b.edge('left', { allowanceMm: a('left'), isFold: input.foldEdge === 'left' }).line({ x: 0, y: 0 });
  return {
    id: input.id, name: input.name, role: input.role, ...b.close(),
    grainLine: { from: { x: w * 0.2, y: h / 2 }, to: { x: w * 0.8, y: h / 2 } },
    drillHoles: [], internalLines: [], cut: input.cut, quantity: input.quantity ?? 1,
  };
}
