import { describe, expect, it } from 'vitest';
import { fabricCostMinor, priceIn, pricePerMetreMinor, type FabricPrice } from './fabric-price';
import { MM_PER_YARD } from './units';

describe('fabric prices as quoted', () => {
  // 1 yd = 0.9144 m exactly (NBS Circular 572, Addendum, 1960; international yard and pound, 1959):
  // 2 yd at 4 000 minor units a yard is 8 000 exactly, by the definition of the price.
  it('costs 2 yards at 4,000 a yard at exactly 8,000 when the price is kept per yard', () => {
    const quoted: FabricPrice = { amountMinor: 4000, per: 'yard' };
    const stored = JSON.parse(JSON.stringify(quoted)) as FabricPrice; // what a column pair round-trips
    expect(stored).toEqual({ amountMinor: 4000, per: 'yard' });
    expect(fabricCostMinor(2 * MM_PER_YARD, stored)).toBe(8000);
  });

  // The old path stored round(4000 ÷ 0.9144) = 4 374 a metre; 1.8288 m × 4 374 = 7 998.97 → 7 999 (computed by hand).
  it('shows why a per-metre rate rounded to the minor unit cannot be stored instead', () => {
    const perMetreRounded = Math.round(4000 / 0.9144);
    expect(perMetreRounded).toBe(4374);
    expect(fabricCostMinor(2 * MM_PER_YARD, { amountMinor: perMetreRounded, per: 'metre' })).toBe(7999);
  });

  it('round-trips whole yards and metres at many prices without a lost minor unit', () => {
    for (let amount = 1; amount <= 5000; amount += 7) {
      for (let yards = 1; yards <= 60; yards += 3) {
        // Definition: n yards at p a yard cost n × p (NBS Circular 572).
        expect(fabricCostMinor(yards * MM_PER_YARD, { amountMinor: amount, per: 'yard' })).toBe(yards * amount);
        expect(fabricCostMinor(yards * 1000, { amountMinor: amount, per: 'metre' })).toBe(yards * amount);
      }
    }
  });

  it('rounds half up once at the end (0.5 m at 3 a metre is 1.5 → 2)', () => {
    expect(fabricCostMinor(500, { amountMinor: 3, per: 'metre' })).toBe(2);
    expect(fabricCostMinor(0, { amountMinor: 3, per: 'yard' })).toBe(0);
  });

  it('converts a yard price to a metre rate for weighing only (4 000 ÷ 0.9144)', () => {
    expect(pricePerMetreMinor({ amountMinor: 4000, per: 'yard' })).toBeCloseTo(4000 / 0.9144, 9);
    expect(priceIn({ amountMinor: 4000, per: 'yard' }, 'yard')).toBe(4000);
    expect(priceIn({ amountMinor: 1000, per: 'metre' }, 'yard')).toBeCloseTo(914.4, 9);
  });

  it('refuses a negative length and a fractional price', () => {
    expect(() => fabricCostMinor(-1, { amountMinor: 1, per: 'metre' })).toThrow(RangeError);
    expect(() => fabricCostMinor(1, { amountMinor: 1.5, per: 'metre' })).toThrow(RangeError);
  });
});
