import { describe, expect, it } from 'vitest';
import { segmentDistance } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import { mm, MM_PER_INCH } from '@shared/units/units';
import { draftStyle } from '../blocks/draft-style';
import type { BlockSpec } from '../blocks/draft-blocks';
import type { BodyMeasurements } from '../blocks/measure-input';
import type { Piece } from '../pieces/piece';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize, type PointOfMeasure, type SizeChart } from '../size-charts/size-chart';
import { gradeStyle } from './grade-style';
import { draftRectangle } from '../blocks/rectangle-block';
import { gradePiece } from './grade-piece';
import { proposeGradeRules } from './propose-grade-rules';
import { proposeRulesFromRedraft } from './propose-from-redraft';

const IN = MM_PER_INCH;

// ASTM D5585-11e1, Table 1 (inch-pound), sizes 6, 8, 10, 12, 14 [quoted in ../shared/reference/sizing-and-grading.md
// §1.1]. The excerpt has girths only, so the length and width rows are the demo chart's XS–XL (Seamrun's own values).
const ASTM_SIZES = ['6', '8', '10', '12', '14'];
const ASTM_IN: Partial<Record<PointOfMeasure, number[]>> = {
  bust: [35.25, 36.25, 37.25, 38.75, 40.375],
  waist: [27, 28, 29, 30.75, 32.5], // waist girth, curvy
  'waist-straight': [28.5, 29.5, 30.5, 32.25, 34],
  'neck-base': [14.25, 14.625, 14.875, 15.125, 15.5],
  'under-bust': [29, 30, 31, 32.5, 34],
  'upper-chest': [35, 35.875, 36.75, 38, 39.25],
  'mid-neck': [13.375, 13.625, 13.875, 14.25, 14.625],
  'shoulder-girth': [39.75, 40.5, 41.25, 42, 43],
};
function astmChart(): SizeChart {
  const demo = demoSizeChart();
  const values: SizeChart['values'] = { ...demo.values };
  for (const [k, v] of Object.entries(ASTM_IN) as [PointOfMeasure, number[]][]) values[k] = v.map((x) => mm(x * IN));
  return { name: 'ASTM D5585-11e1 Table 1 girths, sizes 6–14', sizes: ASTM_SIZES, values };
}

const chart = astmChart();
const BASE = '10';
// The lined fitted dress's self blocks: fitted bodice (waist darts, V neck, zip), long sleeve, gathered peplum,
// straight skirt, neck facings.
const BLOCKS: BlockSpec[] = [
  { block: 'bodice', neckline: { shape: 'v', depthMm: 7 * IN }, shoulderPads: {}, centreBackOpening: {} },
  { block: 'sleeve', length: 'long' },
  { block: 'peplum', shape: 'circle', innerEdge: { times: 2, plusMm: 10 * IN }, cut: 'ring', material: 'contrast' },
  { block: 'skirt', shape: 'straight', centreBackOpening: {} },
  { block: 'facing', of: 'neckline' },
];
const redraft = (m: BodyMeasurements) => draftStyle(m, { blocks: BLOCKS });
const pieces = redraft(measurementsForSize(chart, BASE));
const style = gradeStyle(pieces, chart, BASE, redraft);

const at = (p: Piece, name: string) => p.outline[p.landmarks[name]];
/** Finished waist of a half bodice piece: waist edge from the centre to the side, less the dart between its legs. */
const finishedWaist = (p: Piece) => at(p, 'side-waist').x - at(p, 'cf-waist' in p.landmarks ? 'cf-waist' : 'cb-waist').x - (at(p, 'dart-side-leg').x - at(p, 'dart-centre-leg').x);
const dartIntake = (p: Piece) => at(p, 'dart-side-leg').x - at(p, 'dart-centre-leg').x;
const dist = (a: Point, b: Point) => Math.hypot(a.x - b.x, a.y - b.y);
/** Distance from p to the nearest point of a closed outline. */
const toOutline = (ring: Point[], p: Point) => Math.min(...ring.map((a, i) => segmentDistance(p, a, ring[(i + 1) % ring.length])));

describe('graded against redrafted, on ASTM D5585-11e1 Table 1 girths', () => {
  it('grades the fitted bodice\'s finished waist to the table\'s waist + 1 in ease in every size (front and back halves, × 2)', () => {
    expect(style.issues).toEqual([]);
    ASTM_SIZES.forEach((size, i) => {
      const f = style.graded['bodice-front'].bySize[size], b = style.graded['bodice-back'].bySize[size];
      // ASTM D5585-11e1 Table 1: waist girth, curvy [quoted]; 1 in waist ease (CWU costume text ch. 16, ¾–1 in).
      expect(2 * (finishedWaist(f) + finishedWaist(b)), size).toBeCloseTo(ASTM_IN.waist![i] * IN + IN, 6);
    });
  });

  it('grows the waist dart intake with the bust − waist difference between sizes (side seam taking its 25 mm)', () => {
    ASTM_SIZES.forEach((size, i) => {
      // The block's rule: per quarter, (bust + 2 in − waist − 1 in)/4 of suppression, 25 mm of it at the side seam.
      const expected = ((ASTM_IN.bust![i] - ASTM_IN.waist![i]) * IN + IN) / 4 - 25;
      expect(dartIntake(style.graded['bodice-front'].bySize[size]), size).toBeCloseTo(expected, 6);
      expect(dartIntake(style.graded['bodice-back'].bySize[size]), size).toBeCloseTo(expected, 6);
    });
    // Table 1 bust − waist: 8¼ in for sizes 6–10, 8 in at 12, 7⅞ in at 14, so the dart narrows by ¼ in ÷ 4 then ⅛ in ÷ 4.
    const d = (s: string) => dartIntake(style.graded['bodice-front'].bySize[s]);
    expect(d('12') - d('10')).toBeCloseTo(-IN / 16, 6);
    expect(d('14') - d('12')).toBeCloseTo(-IN / 32, 6);
  });

  it('puts every landmark, notch, dart point and drill hole where the block redrafted from that size\'s measurements puts it', () => {
    for (const size of ASTM_SIZES) {
      const drafted = new Map(redraft(measurementsForSize(chart, size)).map((p) => [p.id, p]));
      for (const [id, g] of Object.entries(style.graded)) {
        const d = drafted.get(id)!, p = g.bySize[size];
        for (const [name, i] of Object.entries(d.landmarks)) expect(dist(p.outline[p.landmarks[name]], d.outline[i]), `${id} ${size} ${name}`).toBeLessThan(1e-6);
        p.notches.forEach((k, j) => expect(dist(p.outline[k], d.outline[d.notches[j]]), `${id} ${size} notch ${j}`).toBeLessThan(1e-6));
        p.drillHoles.forEach((h, j) => expect(dist(h, d.drillHoles[j]), `${id} ${size} drill ${j}`).toBeLessThan(1e-6));
        p.internalLines.forEach((l, k) => l.points.forEach((q, j) => expect(dist(q, d.internalLines[k].points[j]), `${id} ${size} ${l.name}`).toBeLessThan(1e-6)));
      }
    }
  });

  it('keeps every graded outline point on the redrafted outline, within 0.01 mm (curve points graded at their arc-length fraction)', () => {
    let worst = 0;
    for (const size of ASTM_SIZES) {
      const drafted = new Map(redraft(measurementsForSize(chart, size)).map((p) => [p.id, p]));
      for (const [id, g] of Object.entries(style.graded)) {
        const ring = drafted.get(id)!.outline;
        for (const q of g.bySize[size].outline) worst = Math.max(worst, toOutline(ring, q));
      }
    }
    expect(worst).toBeLessThan(0.01);
  });

  it('leaves out a piece the redraft does not give, so the caller can fall back to its own rules', () => {
    const rules = proposeRulesFromRedraft([...pieces, { ...pieces[0], id: 'imported' }], chart, BASE, redraft);
    expect(rules.imported).toBeUndefined();
    expect(Object.keys(rules)).toEqual(pieces.map((p) => p.id));
  });
});

describe('pieces no block drafted (an imported file)', () => {
  it('grades in proportion to the chart: across by the ASTM bust ratio, up by the back waist length ratio, every point ruled', () => {
    const piece = { ...draftRectangle({ id: 'yoke', name: 'Yoke', role: 'imported', widthMm: 200, heightMm: 300, cut: 'pair' }), drillHoles: [{ x: 100, y: 150 }] };
    const rules = proposeGradeRules(piece, chart, BASE);
    expect(rules.filter((r) => r.target.kind === 'vertex')).toHaveLength(piece.outline.length);
    const graded = gradePiece(piece, rules, chart.sizes, BASE);
    const bwl = chart.values['back-waist-length']!;
    ASTM_SIZES.forEach((size, i) => {
      const p = graded.bySize[size];
      const at = (name: string) => p.outline[p.landmarks[name]];
      // ASTM D5585-11e1 Table 1 bust girth [quoted]: width scales by bust(size) / bust(10).
      expect(at('bottom-right').x - at('bottom-left').x, size).toBeCloseTo((200 * ASTM_IN.bust![i]) / ASTM_IN.bust![2], 9);
      expect(at('top-left').y - at('bottom-left').y, size).toBeCloseTo((300 * bwl[i]) / bwl[2], 9);
      expect(p.drillHoles[0].x).toBeCloseTo((100 * ASTM_IN.bust![i]) / ASTM_IN.bust![2], 9);
    });
  });

  it('keeps a pocket the same in every size', () => {
    const pocket = draftRectangle({ id: 'pocket', name: 'Pocket', role: 'pocket', widthMm: 140, heightMm: 160, cut: 'pair' });
    expect(proposeGradeRules(pocket, chart, BASE)).toEqual([]);
  });
});
