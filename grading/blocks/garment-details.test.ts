import { describe, expect, it } from 'vitest';
import { polygonSignedArea } from '@shared/geometry/polygon';
import { polygonIsSimple, polylineLength } from '@shared/geometry/polyline';
import { MM_PER_INCH } from '@shared/units/units';
import { presetComposition } from '@shared/schemas/style-composition';
import { cuttingOutline, validateCuttingOutline } from '../pieces/cutting-outline';
import { edgePoints, type Piece } from '../pieces/piece';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize } from '../size-charts/size-chart';
import { draftBlocks, type BlockSpec } from './draft-blocks';
import { draftStyle } from './draft-style';
import { SHIRT_DRESS_BLOCKS } from './shirt-dress';

const IN = MM_PER_INCH;
const M = measurementsForSize(demoSizeChart(), 'M');
const len = (p: Piece, ...names: string[]) => p.edges.filter((e) => names.includes(e.name)).reduce((s, e) => s + polylineLength(edgePoints(p, e)), 0);
const byId = (pieces: Piece[], id: string) => {
  const p = pieces.find((x) => x.id === id);
  if (!p) throw new Error(`no piece ${id}`);
  return p;
};
const valid = (p: Piece) => {
  expect(polygonIsSimple(p.outline), p.id).toBe(true);
  expect(polygonSignedArea(p.outline), p.id).toBeGreaterThan(0);
  expect(validateCuttingOutline(p, cuttingOutline(p)), p.id).toEqual([]);
};

describe('collar band and collar', () => {
  for (const body of [{ block: 'bodice' }, { block: 'dress', buttonExtensionMm: 15 }] as BlockSpec[]) {
    it(`sews the band to the ${body.block}'s half neckline and the collar to the band's top up to its notch`, () => {
      const pieces = draftBlocks(M, [body, { block: 'collar-band' }, { block: 'collar' }]);
      const [front, back] = pieces;
      const band = byId(pieces, 'collar-band'), collar = byId(pieces, 'collar');
      expect(len(band, 'neckline')).toBeCloseTo(len(front, 'neckline') + len(back, 'neckline'), 9);
      expect(len(collar, 'neckline')).toBeCloseTo(len(band, 'collar'), 9);
      // The band's collar notch sits straight above its neckline notch (the centre-front line).
      const [bottom, top] = band.notches.map((i) => band.outline[i]);
      expect(top.x).toBeCloseTo(bottom.x, 9);
      expect([band.cut, band.quantity, collar.cut, collar.quantity]).toEqual(['fold', 2, 'fold', 2]);
      for (const p of [band, collar]) valid(p);
    });
  }
});

describe('pockets', () => {
  it('cuts a patch pocket as a pair and marks it on the front with a drill hole 10 mm inside each top corner', () => {
    const pieces = draftBlocks(M, [{ block: 'pocket', kind: 'patch', fromCentreMm: 120, belowWaistMm: 80 }, { block: 'dress' }]);
    const pocket = byId(pieces, 'pocket'), front = byId(pieces, 'front');
    expect([pocket.cut, pocket.quantity]).toEqual(['pair', 1]);
    const [, tl, tr] = front.internalLines.find((l) => l.name === 'pocket')!.points;
    expect((tl.x + tr.x) / 2).toBeCloseTo(120, 9);
    expect(tl.y).toBeCloseTo(-80, 9);
    expect(front.drillHoles).toEqual(expect.arrayContaining([{ x: tl.x + 10, y: -90 }, { x: tr.x - 10, y: -90 }]));
    expect(pocket.edges.find((e) => e.name === 'top')!.allowanceMm).toBe(30);
    valid(pocket);
  });

  it('notches the front and back side seams at the in-seam pocket opening, 1 in and 7 in below the waist, as on the bag', () => {
    const pieces = draftBlocks(M, [{ block: 'skirt', shape: 'a-line' }, { block: 'pocket', kind: 'in-seam' }]);
    const bag = byId(pieces, 'pocket-bag');
    expect([bag.cut, bag.quantity]).toEqual(['pair', 2]);
    valid(bag);
    const bagNotches = bag.notches.map((i) => bag.outline[i].y);
    expect(bagNotches[0] - bagNotches[1]).toBeCloseTo(6 * IN, 9);
    for (const id of ['skirt-front', 'skirt-back']) {
      const p = byId(pieces, id);
      const side = p.edges.find((e) => e.name === 'side')!;
      const heights = p.notches.filter((i) => i > side.from && i < side.to).map((i) => p.outline[i].y).sort((a, b) => b - a);
      expect(heights, id).toEqual([expect.closeTo(-IN, 9), expect.closeTo(-7 * IN, 9)]);
      valid(p);
    }
    // The same arc length between the notches on front and back: the opening matches when sewn.
    const between = (p: Piece) => {
      const side = p.edges.find((e) => e.name === 'side')!;
      const [a, b] = p.notches.filter((i) => i > side.from && i < side.to);
      return polylineLength(edgePoints(p, { from: a, to: b }));
    };
    expect(between(byId(pieces, 'skirt-front'))).toBeCloseTo(between(byId(pieces, 'skirt-back')), 9);
  });
});

describe('belt', () => {
  it('cuts the belt (waist + ease + 300 mm) long on a fold, as wide as its finished width', () => {
    const belt = byId(draftBlocks(M, [{ block: 'belt', waistEaseMm: 20 }]), 'belt');
    expect(belt.outline[belt.landmarks['bottom-right']].x).toBeCloseTo(M.waist! + 20 + 300, 9);
    expect(belt.outline[belt.landmarks['top-left']].y).toBeCloseTo(35, 9);
    expect(belt.edges.find((e) => e.name === 'bottom')!.isFold).toBe(true);
  });
});

describe('the demo shirt dress as a composition of blocks', () => {
  it('drafts the shirt-dress preset from the same blocks the style page shows (shared preset = grading blocks)', () => {
    expect(presetComposition('shirt-dress').blocks).toEqual(SHIRT_DRESS_BLOCKS);
    const stored = draftStyle(M, { preset: 'shirt-dress', blocks: [] });
    const edited = draftStyle(M, { preset: 'shirt-dress', blocks: presetComposition('shirt-dress').blocks as BlockSpec[] });
    expect(edited).toEqual(stored);
    expect(stored.map((p) => [p.id, p.block])).toEqual([
      ['front', 'dress'], ['back', 'dress'], ['sleeve', 'shirt-sleeve'], ['collar-band', 'collar-band'], ['pocket', 'pocket'],
      ['belt', 'belt'], ['front-facing', 'facing'], ['back-neck-facing', 'facing'],
    ]);
  });

  it('lets an owner change one block of it: a collar on the band and in-seam pockets instead of patch pockets', () => {
    const blocks: BlockSpec[] = [...SHIRT_DRESS_BLOCKS.filter((b) => b.block !== 'pocket'), { block: 'collar' }, { block: 'pocket', kind: 'in-seam' }];
    const pieces = draftStyle(M, { blocks });
    expect(pieces.map((p) => p.id)).toEqual(['front', 'back', 'sleeve', 'collar-band', 'belt', 'front-facing', 'back-neck-facing', 'collar', 'pocket-bag']);
    const front = byId(pieces, 'front');
    expect(front.internalLines.some((l) => l.name === 'pocket')).toBe(false);
    const side = front.edges.find((e) => e.name === 'side')!;
    expect(front.notches.filter((i) => i > side.from && i < side.to)).toHaveLength(2);
  });
});
