import { MM_PER_YARD } from './units';

/** The length a supplier quotes a fabric price per. */
export type PriceUnit = 'metre' | 'yard';

/** A fabric price exactly as the supplier quotes it: whole minor units per metre or per yard. */
export interface FabricPrice {
  amountMinor: number;
  per: PriceUnit;
}

/** Tenths of a millimetre in one metre and in one yard: both whole, so length ratios stay exact. */
const TENTHS_MM_PER: Record<PriceUnit, number> = { metre: 10_000, yard: Math.round(MM_PER_YARD * 10) };

/**
 * Cost of `lengthMm` of fabric at a quoted price, in whole minor units, rounded half up once at the end.
 * Exact for lengths on a 0.1 mm grid (every yard and inch length is: 1 yd = 914.4 mm, 1 in = 25.4 mm,
 * NBS Circular 572 Addendum, 1960), so 2 yd at 4 000 a yard is 8 000, not 7 999 through a per-metre
 * rate rounded to the minor unit. The arithmetic is on integers (BigInt), never a float rate.
 * Throws RangeError on a negative or non-finite length, or a price that is not a whole non-negative amount.
 */
export function fabricCostMinor(lengthMm: number, price: FabricPrice): number {
  if (!Number.isFinite(lengthMm) || lengthMm < 0) throw new RangeError(`length must be a non-negative number of mm, got ${lengthMm}`);
  if (!Number.isSafeInteger(price.amountMinor) || price.amountMinor < 0) throw new RangeError(`price must be whole minor units, got ${price.amountMinor}`);
  const tenths = BigInt(Math.round(lengthMm * 10));
  const per = BigInt(TENTHS_MM_PER[price.per]);
  const numerator = tenths * BigInt(price.amountMinor);
  // Half up: ⌊(2n + d) ÷ 2d⌋.
  return Number((2n * numerator + per) / (2n * per));
}

/**
 * The quoted price as a (possibly fractional) rate per metre, minor units, for places that weigh fabric
 * against other costs (the cut-order objective). Totals shown to people use {@link fabricCostMinor}.
 */
export function pricePerMetreMinor(price: FabricPrice): number {
  return price.per === 'metre' ? price.amountMinor : (price.amountMinor * 10_000) / TENTHS_MM_PER.yard;
}

/** The price in another unit, as a fractional minor-unit amount (display only; never stored). */
export function priceIn(price: FabricPrice, per: PriceUnit): number {
  if (price.per === per) return price.amountMinor;
  return (price.amountMinor * TENTHS_MM_PER[per]) / TENTHS_MM_PER[price.per];
}
