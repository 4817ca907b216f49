import type { MinorUnits } from '@shared/units';
import { roundMinor } from './round-minor';

/**
 * Keystone: retail = 2 × cost (100 % markup on cost = 50 % of retail). Monash Business School
 * marketing dictionary, "Keystone markup"; marketing-dictionary.org citing the AMA Dictionary.
 */
export const KEYSTONE_MULTIPLIER = 2;

/** Price = cost × (1 + markup %), rounded once to a minor unit. */
export function priceFromMarkup(cost: MinorUnits, markupPercent: number): MinorUnits {
  return roundMinor(cost * (1 + markupPercent / 100));
}

/** Price = cost ÷ (1 − margin %) (margin on selling price), rounded once. Throws for margin ≥ 100 %. */
export function priceFromMargin(cost: MinorUnits, marginPercent: number): MinorUnits {
  if (!(marginPercent < 100)) throw new RangeError('margin must be below 100 %');
  return roundMinor(cost / (1 - marginPercent / 100));
}

/** Markup on cost, % = (price − cost) ÷ cost × 100 (fashion2apparel.blogspot.com 2017/04). NaN for cost 0. */
export function markupPercent(cost: number, price: number): number {
  return ((price - cost) / cost) * 100;
}

/** Margin on price, % = (price − cost) ÷ price × 100 (same source). NaN for price 0. */
export function marginPercent(cost: number, price: number): number {
  return ((price - cost) / price) * 100;
}

/**
 * Labour cost per minute at 100 % efficiency = monthly wage ÷ (days × hours × 60), minor units
 * (fractional rate; onlineclothingstudy.com 2011/02, "Garment CM cost estimation using SAM").
 */
export function costPerMinute(monthlyWage: number, daysPerMonth: number, hoursPerDay: number): number {
  return monthlyWage / (daysPerMonth * hoursPerDay * 60);
}

/**
 * Overhead per operator minute = monthly overheads ÷ (operators × hours × days × 60), minor units
 * (fractional rate; textilecalculation.blogspot.com 2015/07).
 */
export function overheadPerMinute(monthlyOverheads: number, operators: number, hoursPerDay: number, daysPerMonth: number): number {
  return monthlyOverheads / (operators * hoursPerDay * daysPerMonth * 60);
}
