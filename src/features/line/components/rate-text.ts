import { currencyDigits } from '@shared/units/money';

/**
 * A typed piece rate in major units ("0.00125", "12.50") as minor units per piece, exact to 6 decimals of a
 * minor unit (a rate of 0.125 minor units is "0.00125" KES); null when it is not an amount or is finer than that.
 * Decimal text is shifted, never multiplied as a float.
 */
export function parseRateMajor(text: string, currency: string): number | null {
  const clean = text.replace(/[\s,]/g, '');
  const m = /^(\d+)(?:\.(\d+))?$/.exec(clean);
  if (!m) return null;
  const d = currencyDigits(currency);
  const frac = m[2] ?? '';
  if (frac.length > d + 6) return null;
  const padded = frac.padEnd(d, '0');
  const minorText = `${m[1]}${padded.slice(0, d)}${padded.length > d ? `.${padded.slice(d)}` : ''}`;
  return Number(minorText);
}

/** Minor units per piece as major-unit text for an input field, keeping a fraction of a minor unit (0.125 KES minor → "0.00125"). */
export function rateToMajorText(minor: number, currency: string): string {
  const d = currencyDigits(currency);
  const [whole, frac = ''] = String(minor).split('.');
  const w = whole.padStart(d + 1, '0');
  const major = `${w.slice(0, w.length - d)}${d ? `.${w.slice(w.length - d)}` : ''}${frac ? `${d ? '' : '.'}${frac}` : ''}`;
  return major.replace(/^0+(?=\d)/, '');
}
