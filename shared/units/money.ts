import { code as iso4217 } from 'currency-codes';

/**
 * Decimal places of an ISO 4217 currency's minor unit (KES 2, JPY 0, BHD 3, CLF 4), from the ISO 4217
 * list as the currency-codes package ships it. Not from Intl: the runtime's locale tables differ for
 * some currencies (they give IQD, IDR or HUF no decimals, where ISO 4217 gives 3, 2 and 2), and a
 * stored amount must mean the same on every runtime. Codes with no minor unit ("N.A.", e.g. XAU) are 0.
 * Throws RangeError for a code that is not in the list.
 */
export function currencyDigits(currency: string): number {
  const record = iso4217(currency.toUpperCase());
  if (!record) throw new RangeError(`Not an ISO 4217 currency code: ${currency}`);
  return record.digits;
}

/**
 * Intl options that show exactly the currency's ISO 4217 digits (Intl's own digits may differ).
 * `digits` overrides them (e.g. rates per minute with more decimals).
 */
export function currencyFormatOptions(currency: string, digits = currencyDigits(currency)): Intl.NumberFormatOptions {
  return { style: 'currency', currency, minimumFractionDigits: digits, maximumFractionDigits: digits };
}

/** Money from integer minor units, formatted by Intl for the currency and locale with ISO 4217 digits. */
export function formatMinorUnits(minorUnits: number, currency: string, locale = 'en-KE'): string {
  const digits = currencyDigits(currency);
  return new Intl.NumberFormat(locale, currencyFormatOptions(currency, digits)).format(minorUnits / 10 ** digits);
}

/**
 * A typed major-unit amount ("5.50", "1,200") as whole minor units, without floating-point steps;
 * null when the text is not an amount or has more decimals than the currency.
 */
export function parseMajor(text: string, currency: string): number | null {
  const clean = text.replace(/[\s,]/g, '');
  if (!/^\d+(\.\d+)?$/.test(clean)) return null;
  const digits = currencyDigits(currency);
  const [whole, frac = ''] = clean.split('.');
  if (frac.length > digits) return null;
  return Number(whole) * 10 ** digits + Number((frac + '0'.repeat(digits)).slice(0, digits) || '0');
}

/** Minor units as plain major-unit text for an input field ("750" KES → "7.50"). */
export function toMajorText(minorUnits: number, currency: string): string {
  const d = currencyDigits(currency);
  return (minorUnits / 10 ** d).toFixed(d);
}
