import { describe, expect, it } from 'vitest';
import { polygonArea } from '@shared/geometry/polygon';
import { compensateForShrinkage, shrinkageAreaFactor, shrinkageFactor } from './shrinkage';

describe('shrinkage', () => {
  // Convention: s = (L0 − L1)/L0; compensated length = L/(1 − s) (foralltex.com shrinkage guide; apparel.wiki,
  // ../shared/reference/production-and-costing.md §4 [quoted]). 1000/(1 − 0.03) = 1030.9278… mm, and that piece
  // shrunk by 3 % of its own length is 1000 mm again (computed by hand).
  it('cuts a 1000 mm piece 1000/(1 − 0.03) mm long when the fabric shrinks 3 % lengthwise', () => {
    const cut = 1000 * shrinkageFactor(3);
    expect(cut).toBeCloseTo(1030.927835, 5);
    expect(cut * (1 - 0.03)).toBeCloseTo(1000, 9);
    // The (1 + s) shortcut gives 1030 mm, which shrinks to 999.1 mm: short (computed by hand).
    expect(cut).toBeGreaterThan(1000 * 1.03);
  });

  it('scales along the grain by the lengthwise and across it by the widthwise shrinkage', () => {
    // 1000 × 500 mm rectangle, grain along x; 3 % lengthwise, 5 % widthwise: 1030.93 × 526.32 mm (computed by hand).
    const rect = [{ x: 0, y: 0 }, { x: 1000, y: 0 }, { x: 1000, y: 500 }, { x: 0, y: 500 }];
    const out = compensateForShrinkage(rect, { lengthwisePercent: 3, widthwisePercent: 5 });
    expect(out[2].x).toBeCloseTo(1000 / 0.97, 6);
    expect(out[2].y).toBeCloseTo(500 / 0.95, 6);
    expect(polygonArea(out)).toBeCloseTo(polygonArea(rect) * shrinkageAreaFactor({ lengthwisePercent: 3, widthwisePercent: 5 }), 3);
    expect(polygonArea(out)).toBeCloseTo((1000 / 0.97) * (500 / 0.95), 3);
  });

  it('keeps the outline unchanged with no shrinkage, and an empty outline empty', () => {
    const tri = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 0, y: 7 }];
    expect(compensateForShrinkage(tri, { lengthwisePercent: 0, widthwisePercent: 0 })).toEqual(tri);
    expect(compensateForShrinkage([], { lengthwisePercent: 3, widthwisePercent: 3 })).toEqual([]);
  });

  it('refuses shrinkage below 0 % or at 100 % and above', () => {
    expect(() => shrinkageFactor(-1)).toThrow(RangeError);
    expect(() => shrinkageFactor(100)).toThrow(RangeError);
    expect(() => shrinkageFactor(Number.NaN)).toThrow(RangeError);
  });
});
