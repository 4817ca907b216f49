/**
 * Rounding as a spreadsheet's ROUND does it, so cached results equal what a recalculating reader shows:
 * half away from zero, after cutting the value to 15 significant digits (binary noise such as
 * 1078.0799999999999 is read as 1078.08).
 */
export function roundHalfAwayFromZero(value: number): number {
  if (!Number.isFinite(value)) throw new RangeError(`cannot round ${value}`);
  const magnitude = Math.round(Number(Math.abs(value).toPrecision(15)));
  return value < 0 ? -magnitude : magnitude;
}
