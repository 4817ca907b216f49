/**
 * Piece rates kept exactly, as millionths of a minor unit (bigint): a rate of 0.125 minor units per piece is
 * 125 000 millionths, never a float. Rates travel and are stored as canonical decimal strings ("0.125").
 */

/** Most decimal places a rate may have, in minor units (6: millionths of a cent). */
export const RATE_DECIMALS = 6;
/** Millionths in one minor unit. */
export const RATE_SCALE = 1_000_000n;

/**
 * A rate in millionths of a minor unit from its decimal text or number (e.g. "0.125", 12, "12.5"). Null for a
 * negative value, more than {@link RATE_DECIMALS} decimals, exponent notation, or anything not a number.
 */
export function rateMillionths(rate: string | number): bigint | null {
  const text = typeof rate === 'number' ? (Number.isFinite(rate) ? String(rate) : '') : rate.trim();
  const m = /^(\d{1,15})(?:\.(\d{1,6}))?$/.exec(text);
  if (!m) return null;
  return BigInt(m[1]) * RATE_SCALE + BigInt((m[2] ?? '').padEnd(RATE_DECIMALS, '0'));
}

/** The canonical decimal text of a rate in millionths: no trailing zeros ("0.125", "12"). */
export function formatRate(millionths: bigint): string {
  const whole = millionths / RATE_SCALE;
  const frac = (millionths % RATE_SCALE).toString().padStart(RATE_DECIMALS, '0').replace(/0+$/, '');
  return frac ? `${whole}.${frac}` : `${whole}`;
}

/**
 * num ÷ den rounded to the nearest whole number, halves rounded up (away from zero: every pay amount is ≥ 0).
 * The one rounding rule of pay: applied once per pay line, never per log. Throws RangeError for den ≤ 0 or num < 0.
 */
export function roundHalfUp(num: bigint, den: bigint): bigint {
  if (den <= 0n || num < 0n) throw new RangeError('roundHalfUp takes num ≥ 0 and den > 0');
  return (2n * num + den) / (2n * den);
}

/** An operation's exact piece rate as decimal text ("0.125"); '' without one. Rows from before exact rates use the whole minor units. */
export function operationRate(op: { pieceRate?: string | null; pieceRateMinor: number | null }): string {
  if (op.pieceRate) return op.pieceRate;
  return op.pieceRateMinor == null ? '' : String(op.pieceRateMinor);
}

/** The exact rate of a rate typed as a number (at most 6 decimals) as canonical text, and its whole minor units (half up). */
export function exactRateOf(value: number): { pieceRate: string; pieceRateMinor: number } | null {
  const r = rateMillionths(value);
  if (r == null) return null;
  return { pieceRate: formatRate(r), pieceRateMinor: Number(roundHalfUp(r, RATE_SCALE)) };
}
