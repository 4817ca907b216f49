/** Decimal places of an ISO 4217 currency's minor unit (KES 2, JPY 0), from Intl. */
export function currencyDigits(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** Money from integer minor units, formatted by Intl for the currency and locale. */
export function formatMinorUnits(minorUnits: number, currency: string, locale = 'en-KE'): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(minorUnits / 10 ** currencyDigits(currency));
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
