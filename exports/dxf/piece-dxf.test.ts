import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { polygonArea } from '@shared/geometry/polygon';
import { cuttingOutline, demoSizeChart, draftShirtDress, gradeStyle, measurementsForSize } from '@grading';
import { dxfToPieces, pieceToDxf } from './piece-dxf';

const chart = demoSizeChart();
const pieces = draftShirtDress(measurementsForSize(chart, 'M'));

describe('pieceToDxf / dxfToPieces', () => {
  it('writes millimetre units ($INSUNITS 4) that dxf-parser reads', () => {
    const text = pieceToDxf(pieces[0], { cutting: cuttingOutline });
    const parsed = new DxfParser().parseSync(text) as unknown as { header: Record<string, unknown> };
    expect(parsed.header.$INSUNITS).toBe(4);
  });

  it('round-trips outlines, labels, grain and drill holes of all demo pieces', () => {
    const back = dxfToPieces(pieceToDxf(pieces, { cutting: cuttingOutline }));
    expect(back.map((p) => p.id)).toEqual(pieces.map((p) => p.id));
    back.forEach((p, k) => {
      expect(p.cut).toBe(pieces[k].cut);
      expect(p.quantity).toBe(pieces[k].quantity);
      expect(polygonArea(p.outline)).toBeCloseTo(polygonArea(pieces[k].outline), 6);
      expect(p.drillHoles).toHaveLength(pieces[k].drillHoles.length);
    });
  });

  it('writes every size of a graded set in place', () => {
    const style = gradeStyle(pieces, chart, 'M');
    const back = dxfToPieces(pieceToDxf(style.graded.sleeve));
    expect(back).toHaveLength(chart.sizes.length);
  });

  it('returns no pieces for a drawing without sewing lines', () => {
    expect(dxfToPieces(pieceToDxf([]))).toEqual([]);
  });
});
