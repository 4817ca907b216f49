import { describe, expect, it } from 'vitest';
import { mm, MM_PER_YARD } from '@shared/units';
import { costGarment } from './cost-garment';
import { costPerMinute, KEYSTONE_MULTIPLIER, marginPercent, markupPercent, overheadPerMinute, priceFromMargin, priceFromMarkup } from './pricing';
import { roundMinor } from './round-minor';
import { minor } from '@shared/units';

const perYard = (cents: number) => cents / (MM_PER_YARD / 1000); // yard price → metre price
const yards = (y: number) => mm(y * MM_PER_YARD);

describe('costGarment worked examples', () => {
  // Texas Education Agency (2015), CTE "Costing Garments – Student Notes Key" (K1) [quoted]; source rounds per step to cents.
  it('reaches the K1 total cost of $120.74 and $265.63 at × 2.2 (computed)', () => {
    const sheet = costGarment({
      sizes: ['one'],
      quantities: { one: 1 },
      fabrics: [
        { name: 'fabric', pricePerMetre: perYard(799), lengthPerGarment: { one: yards(3) } },
        { name: 'lining', pricePerMetre: perYard(299), lengthPerGarment: { one: yards(3) } },
      ],
      trims: [{ name: 'zipper', quantityPerGarment: 1, unitPrice: 75 }, { name: 'button', quantityPerGarment: 1, unitPrice: 15 }],
      labour: [{ name: 'cutting', minutes: 60, costPerHour: 800 }, { name: 'sewing', minutes: 240, costPerHour: 1200 }],
      overheads: { percentOfPrimeCost: 12 },
      extraCostPercent: [{ name: 'marginal cost of production', percent: 20 }],
      retailMultiplier: 2.2,
    });
    const s = sheet.sizes[0];
    expect(s.lines.map((l) => l.amount)).toEqual([2397, 897, 75, 15, 800, 4800, 1078, 2012]);
    expect(s.materials + s.labour).toBe(8984);
    expect(s.unitCost).toBe(12074);
    expect(s.retail).toBe(26563);
  });
  // onlineclothingstudy.com 2011/02, "Garment CM cost estimation using SAM" (K2) [quoted]
  it('gives CM 13.60 INR at 0.40 INR/min (published) and 12.02 sewing unrounded (computed)', () => {
    const rate = costPerMinute(500000, 26, 8); // paise per minute
    expect(rate).toBeCloseTo(40.064, 3);
    const cm = (r: number) => costGarment({
      sizes: ['x'], quantities: { x: 1 }, fabrics: [], trims: [],
      labour: [{ name: 'sewing', minutes: 15, costPerMinute: r, efficiency: 0.5 }, { name: 'cutting', minutes: 2, costPerMinute: r, efficiency: 0.5 }],
    }).sizes[0];
    expect(cm(40).lines.map((l) => l.amount)).toEqual([1200, 160]);
    expect(cm(40).unitCost).toBe(1360);
    expect(cm(rate).lines[0].amount).toBe(1202);
  });
  // textilecalculation.blogspot.com 2015/07 (K3) [quoted]
  it('gives $0.036 overhead per minute, $0.36 for a 10-minute garment, $4.32 a dozen', () => {
    const rate = overheadPerMinute(56160000, 1000, 10, 26);
    expect(rate).toBeCloseTo(3.6, 12);
    const sheet = costGarment({ sizes: ['x'], quantities: { x: 12 }, fabrics: [], trims: [], labour: [{ name: 'sew', minutes: 10, costPerMinute: 0 }], overheads: { perMinute: rate } });
    expect(sheet.sizes[0].overheads).toBe(36);
    expect(sheet.batch.cost).toBe(432);
  });
  // solutioninn.com question 7532880, bridesmaid dress cost sheet (K4) [quoted]; $8.06 computed
  it('costs 3.25 yd at $2.48/yd as $8.06 and prices wholesale at a 60 % margin on price', () => {
    const sheet = costGarment({
      sizes: ['6', '8', '10', '12', '14'], quantities: { '6': 1, '8': 2, '10': 3, '12': 3, '14': 3 },
      fabrics: [{ name: 'shell', pricePerMetre: perYard(248), lengthPerGarment: Object.fromEntries(['6', '8', '10', '12', '14'].map((s) => [s, mm((39 * MM_PER_YARD) / 12)])) }],
      trims: [{ name: 'button', quantityPerGarment: 1, unitPrice: 35 }, { name: 'duty/shipping', quantityPerGarment: 1, unitPrice: 112 }],
      labour: [{ name: 'marking & grading', pieceRate: 57 }, { name: 'cutting', pieceRate: 35 }, { name: 'construction', pieceRate: 700 }],
      marginPercent: 60,
    });
    const s = sheet.sizes[0];
    expect(s.lines[0].amount).toBe(806);
    expect(s.unitCost).toBe(806 + 35 + 112 + 57 + 35 + 700);
    expect(s.wholesale).toBe(roundMinor(s.unitCost / 0.4));
    expect(sheet.batch.quantity).toBe(12);
  });
  it('adds end allowance share and wastage to the fabric length, per size, and averages by quantity', () => {
    const sheet = costGarment({
      sizes: ['S', 'L'], quantities: { S: 1, L: 3 },
      fabrics: [{ name: 'f', pricePerMetre: 1000, lengthPerGarment: { S: mm(1000), L: mm(1500) }, endAllowanceShare: mm(5), wastagePercent: 3 }],
      trims: [], labour: [],
    });
    expect(sheet.sizes.map((s) => s.unitCost)).toEqual([roundMinor(1.005 * 1.03 * 1000), roundMinor(1.505 * 1.03 * 1000)]);
    expect(sheet.average.unitCost).toBe(roundMinor((1035 + 3 * 1550) / 4));
    expect(sheet.sizes[0].retail).toBe(sheet.sizes[0].wholesale * 2);
  });
});

describe('pricing', () => {
  // Monash Business School marketing dictionary, "Keystone markup" [quoted]: $10 → $20; quia.com FM 5.03: $37.50 → $75.00
  it('applies keystone ×2 by default', () => {
    expect(KEYSTONE_MULTIPLIER).toBe(2);
    expect(roundMinor(1000 * KEYSTONE_MULTIPLIER)).toBe(2000);
    expect(roundMinor(3750 * KEYSTONE_MULTIPLIER)).toBe(7500);
  });
  // fashion2apparel.blogspot.com 2017/04 (K5) [quoted]: cost $60, retail $120 → markup 100 %, margin 50 %
  it('tells markup on cost from margin on price', () => {
    expect(markupPercent(6000, 12000)).toBe(100);
    expect(marginPercent(6000, 12000)).toBe(50);
    expect(priceFromMarkup(minor(6000), 100)).toBe(12000);
    expect(priceFromMargin(minor(6000), 50)).toBe(12000);
    expect(() => priceFromMargin(minor(1), 100)).toThrow(RangeError);
  });
  it('rounds half away from zero once, ignoring binary noise', () => {
    expect(roundMinor(100.5)).toBe(101);
    expect(roundMinor(1.005 * 1000)).toBe(1005);
    expect(roundMinor(-2.5)).toBe(-3);
  });
});
