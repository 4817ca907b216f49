import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units/units';
import { checkLayout, nestPieces, type NestingInput, type NestingPlacement } from '../nesting';
import { mirrorAcrossGrain, prepareMarkerPieces, type MarkerSourcePiece } from './marker-pieces';

// An asymmetric sleeve-like piece drafted with its grain along +y (grainAngle 90°); its head is the vertex (30, 400).
const SLEEVE: MarkerSourcePiece = {
  pieceId: 'sleeve',
  name: 'Sleeve',
  outline: [{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 300 }, { x: 30, y: 400 }, { x: 0, y: 320 }],
  quantity: 2,
  mirrored: true,
  grainAngle: 90,
};

/** Where a placement sends the fabric's lengthwise direction (+x of the piece): the engine's order, mirror then turn. */
function napDirection(p: Pick<NestingPlacement, 'mirrored' | 'rotation'>): number {
  const x = p.mirrored ? -1 : 1;
  return Math.round(x * Math.cos((p.rotation * Math.PI) / 180));
}

describe('prepareMarkerPieces', () => {
  // One-way fabric: "all pieces one direction" (Vilumsone-Nemes, Industrial Cutting of Textile Materials, pp. 20, 228).
  it('keeps both halves of a pair pointing one way along the length on one-way fabric', () => {
    const prepared = prepareMarkerPieces({ M: [SLEEVE] }, { M: 2 }, { isDirectional: true });
    expect(prepared.pieces.map((p) => [p.id, p.quantity, p.mirrored, p.orientations])).toEqual([
      ['M:sleeve', 2, false, [0]],
      ['M:sleeve:pair', 2, false, [0]],
    ]);
    const input: NestingInput = { pieces: prepared.pieces, stripWidth: mm(600), gap: mm(2) };
    const marker = nestPieces(input, { seed: 1, maxIterations: 30 });
    expect(checkLayout(input, marker).errors).toEqual([]);
    expect(marker.placements).toHaveLength(4);
    for (const p of marker.placements) expect(napDirection(p)).toBe(1);
  });

  it('would have flipped the mirrored half along the grain with the engine mirror at 0° (the old preparation)', () => {
    // The earlier input: one mirrored piece, rotations [0] on one-way fabric → the odd copies are x → −x.
    const old: NestingInput = { stripWidth: mm(600), pieces: [{ id: 'M:sleeve', polygon: prepareMarkerPieces({ M: [SLEEVE] }, { M: 1 }, { isDirectional: false }).pieces[0].polygon, quantity: 1, mirrored: true, orientations: [0] }] };
    const marker = nestPieces(old, { seed: 1, maxIterations: 10 });
    expect(marker.placements.map(napDirection).sort()).toEqual([-1, 1]);
  });

  it('mirrors the pair half across the grain line: same place along the length, opposite side (worked by hand)', () => {
    const prepared = prepareMarkerPieces({ M: [SLEEVE] }, { M: 1 }, { isDirectional: true });
    // Turned by −90° so the grain runs along x: (x, y) → (y, −x).
    expect(prepared.pieces[0].polygon).toEqual([{ x: 0, y: 0 }, { x: 0, y: -100 }, { x: 300, y: -100 }, { x: 400, y: -30 }, { x: 320, y: 0 }]);
    // Across the grain: (x, y) → (x, −y), order reversed to keep the winding.
    expect(prepared.pieces[1].polygon).toEqual([{ x: 320, y: 0 }, { x: 400, y: 30 }, { x: 300, y: 100 }, { x: 0, y: 100 }, { x: 0, y: 0 }]);
    expect(mirrorAcrossGrain(mirrorAcrossGrain(prepared.pieces[0].polygon))).toEqual(prepared.pieces[0].polygon);
    expect(prepared.labels['M:sleeve:pair']).toEqual({ size: 'M', name: 'Sleeve', isPairHalf: true });
  });

  it('keeps a pair as one mirrored piece turned 0° or 180° on fabric that may be turned', () => {
    const prepared = prepareMarkerPieces({ M: [SLEEVE], L: [SLEEVE] }, { L: 1, M: 3 }, { isDirectional: false });
    expect(prepared.pieces.map((p) => [p.id, p.quantity, p.mirrored, p.orientations])).toEqual([
      ['L:sleeve', 1, true, [0, 180]],
      ['M:sleeve', 3, true, [0, 180]],
    ]);
  });

  // Shrinkage: compensated dimension = L/(1 − s) (foralltex.com shrinkage guide; apparel.wiki [quoted]).
  it('grows the piece for shrinkage along the grain after turning it, not along the drafted x axis', () => {
    const prepared = prepareMarkerPieces({ M: [SLEEVE] }, { M: 1 }, { isDirectional: false, shrinkage: { lengthwisePercent: 3, widthwisePercent: 5 } });
    const xs = prepared.pieces[0].polygon.map((q) => q.x);
    const ys = prepared.pieces[0].polygon.map((q) => q.y);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(400 / 0.97, 2); // 412.371 mm along the grain
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(100 / 0.95, 2); // 105.263 mm across it
  });

  it('leaves out sizes with no garments and pieces with no copies', () => {
    const none = { ...SLEEVE, pieceId: 'none', quantity: 0, mirrored: false };
    const prepared = prepareMarkerPieces({ M: [SLEEVE, none], S: [SLEEVE] }, { M: 1, S: 0 }, { isDirectional: false });
    expect(prepared.pieces.map((p) => p.id)).toEqual(['M:sleeve']);
  });
});
