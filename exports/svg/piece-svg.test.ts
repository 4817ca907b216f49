import { describe, expect, it } from 'vitest';
import { polygonArea } from '@shared/geometry/polygon';
import { cuttingOutline, demoSizeChart, draftShirtDress, gradeStyle, measurementsForSize } from '@grading';
import { pieceToSvg, svgToPiece } from './piece-svg';

const chart = demoSizeChart();
const pieces = draftShirtDress(measurementsForSize(chart, 'M'));

describe('pieceToSvg', () => {
  it('draws at 1:1 in mm with a matching viewBox', () => {
    const svg = pieceToSvg(pieces[4], { cutting: cuttingOutline });
    // pocket 140 × 160 mm, 10 mm seams, 30 mm top hem, 10 mm margin → 180 × 220 mm
    expect(svg).toContain('width="180mm" height="220mm" viewBox="0 0 180 220"');
    expect(svg).toContain('class="cut"');
    expect(svg).toContain('cut pair');
  });

  it('round-trips the sewing line through svgToPiece', () => {
    const front = pieces[0];
    const back = svgToPiece(pieceToSvg(front, { cutting: cuttingOutline }))!;
    expect(back.id).toBe('front');
    expect(back.outline).toHaveLength(front.outline.length);
    back.outline.forEach((p, i) => {
      expect(p.x).toBeCloseTo(front.outline[i].x, 2);
      expect(p.y).toBeCloseTo(front.outline[i].y, 2);
    });
  });

  it('nests every size of a graded set', () => {
    const style = gradeStyle(pieces, chart, 'M');
    const svg = pieceToSvg(style.graded.front);
    for (const s of chart.sizes) expect(svg).toContain(`data-size="${s}"`);
  });
});

describe('svgToPiece', () => {
  it('scales viewBox units to mm from the root width', () => {
    const p = svgToPiece('<svg width="100mm" height="100mm" viewBox="0 0 1000 1000"><polygon points="0,0 1000,0 1000,500"/></svg>')!;
    expect(polygonArea(p.outline)).toBeCloseTo(2500, 9);
  });
  it('flattens curves and reads relative commands', () => {
    const p = svgToPiece('<svg viewBox="0 0 10 10"><path d="m0 0 h100 v50 C100 80 0 80 0 50 z"/></svg>', { toleranceMm: 0.05 })!;
    expect(p.outline.length).toBeGreaterThan(6);
    // rectangle 100 × 50 plus a Bézier cap of area 2/3·... computed: cubic area = 100 × 30 × 3/5 × ... checked loosely
    expect(polygonArea(p.outline)).toBeGreaterThan(5000);
    expect(polygonArea(p.outline)).toBeLessThan(5000 + 100 * 30);
  });
  it('returns null when there is no shape', () => {
    expect(svgToPiece('<svg></svg>')).toBeNull();
  });
});
