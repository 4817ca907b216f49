import { minor, type MinorUnits } from '@shared/units';

/**
 * The one rounding rule of the costing sheet: a line's exact value (a rate × a quantity, in minor
 * units, possibly fractional) is first cleaned of binary round-off at 1e-6 of a minor unit, then
 * rounded half away from zero to a whole minor unit. Applied once per line; totals are integer sums.
 */
export function roundMinor(value: number): MinorUnits {
  if (!Number.isFinite(value)) throw new RangeError(`cannot round ${value} to minor units`);
  const clean = Math.round(value * 1e6) / 1e6;
  return minor(Math.sign(clean) * Math.round(Math.abs(clean)));
}
