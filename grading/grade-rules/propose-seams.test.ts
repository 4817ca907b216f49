import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '@shared/units/units';
import type { BlockSpec } from '../blocks/draft-blocks';
import { draftStyle } from '../blocks/draft-style';
import type { BodyMeasurements } from '../blocks/measure-input';
import { draftShirtDress } from '../blocks/shirt-dress';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize } from '../size-charts/size-chart';
import { gradeStyle, SHIRT_DRESS_SEAMS } from './grade-style';
import { proposeSeams, seamProblem } from './propose-seams';
import { checkSeams } from './seam-check';

const IN = MM_PER_INCH;
const chart = demoSizeChart();
const M = measurementsForSize(chart, 'M');
const LINED: BlockSpec[] = [
  { block: 'bodice', neckline: { shape: 'v', depthMm: 7 * IN }, shoulderPads: {}, centreBackOpening: {} },
  { block: 'sleeve', length: 'long' },
  { block: 'peplum', shape: 'circle', innerEdge: { times: 2, plusMm: 10 * IN }, cut: 'ring', material: 'contrast' },
  { block: 'skirt', shape: 'straight', centreBackOpening: {} },
  { block: 'facing', of: 'neckline' },
  { block: 'bodice', neckline: { shape: 'v', depthMm: 7 * IN }, shoulderPads: {}, centreBackOpening: {}, material: 'lining' },
  { block: 'skirt', shape: 'straight', centreBackOpening: {}, material: 'lining' },
];
const redraft = (m: BodyMeasurements) => draftStyle(m, { blocks: LINED });
const pieces = redraft(M);

describe('proposeSeams', () => {
  const seams = proposeSeams(pieces);

  it('proposes the lined dress\'s seams in each material from its blocks (interfacing is fused, not sewn)', () => {
    expect(seams.map((s) => s.name).sort()).toEqual([
      'Neck facing back to bodice back', 'Neck facing front to bodice front', 'Shoulder seam', 'Shoulder seam (lining)',
      'Side seam', 'Side seam (lining)', 'Skirt side seam', 'Skirt side seam (lining)', 'Sleeve cap to armhole', 'Sleeve underarm',
    ]);
    const lining = seams.find((s) => s.name === 'Side seam (lining)')!;
    expect([lining.a[0].pieceId, lining.b[0].pieceId]).toEqual(['bodice-front-2', 'bodice-back-2']);
  });

  it('takes the cap\'s intended ease from the drafted sleeve: 1 in (sfdlearningcenter.com "Sleeve Facts" midpoints 7/16 + 9/16 in)', () => {
    expect(seams.find((s) => s.name === 'Sleeve cap to armhole')!.easeMm).toBeCloseTo(IN, 0);
  });

  it('finds every proposed seam matching in every graded size of the demo chart', () => {
    const { graded } = gradeStyle(pieces, chart, 'M', redraft);
    const checks = checkSeams(graded, seams);
    expect(checks).toHaveLength(seams.length * chart.sizes.length);
    expect(checks.filter((c) => !c.ok)).toEqual([]);
  });

  it('works on any piece names: renamed pieces get the same seams under their new ids', () => {
    const renamed = pieces.map((p) => ({ ...p, id: `x-${p.id}`, name: `X ${p.name}` }));
    const again = proposeSeams(renamed);
    expect(again.map((s) => s.name.replace(/X /gi, ''))).toEqual(seams.map((s) => s.name));
    expect(again.flatMap((s) => [...s.a, ...s.b]).every((side) => side.pieceId.startsWith('x-'))).toBe(true);
  });

  it('proposes for the demo shirt dress the seams its hand-written list names (same pieces and edges, cap ease 15 mm)', () => {
    const proposed = proposeSeams(draftShirtDress(M));
    const sides = (s: { a: unknown; b: unknown }) => JSON.stringify([s.a, s.b]);
    for (const want of SHIRT_DRESS_SEAMS) {
      const got = proposed.find((s) => sides(s) === sides(want) || sides({ a: s.a, b: [{ ...s.b[0], edges: [...s.b[0].edges].reverse() }] }) === sides(want));
      expect(got, want.name).toBeDefined();
      expect(got!.easeMm ?? 0).toBeCloseTo(want.easeMm ?? 0, 0);
    }
  });

  it('flags a seam the owner pairs wrongly, and names a piece or edge that does not exist', () => {
    const { graded } = gradeStyle(pieces, chart, 'M', redraft);
    const wrong = { name: 'Side to shoulder', a: [{ pieceId: 'bodice-front', edges: ['side'] }], b: [{ pieceId: 'bodice-back', edges: ['shoulder'] }], toleranceMm: 1 };
    expect(checkSeams(graded, [wrong]).every((c) => !c.ok)).toBe(true);
    expect(seamProblem({ ...wrong, b: [{ pieceId: 'bodice-back', edges: ['yoke'] }] }, pieces)).toBe('Side to shoulder: Bodice back has no edge "yoke"');
    expect(seamProblem({ ...wrong, b: [{ pieceId: 'yoke', edges: ['side'] }] }, pieces)).toBe('Side to shoulder: there is no piece "yoke"');
    expect(seamProblem(wrong, pieces)).toBeNull();
  });
});
