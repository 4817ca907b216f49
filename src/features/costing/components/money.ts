/** Money from integer minor units through Intl, for the sheet's currency and locale. */
export function money(minorUnits: number, currency: string, locale: string): string {
  const f = new Intl.NumberFormat(locale, { style: 'currency', currency });
  const digits = f.resolvedOptions().maximumFractionDigits ?? 2;
  return f.format(minorUnits / 10 ** digits);
}

export function currencyDigits(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** Parses a typed major-unit amount ("5.50", "1,200") to whole minor units; null when it is not one. */
export function parseMajor(text: string, currency: string): number | null {
  const clean = text.replace(/[\s,]/g, '');
  if (!/^\d+(\.\d+)?$/.test(clean)) return null;
  const digits = currencyDigits(currency);
  const [whole, frac = ''] = clean.split('.');
  if (frac.length > digits) return null;
  return Number(whole) * 10 ** digits + Number((frac + '0'.repeat(digits)).slice(0, digits) || '0');
}

export const toMajorText = (minorUnits: number, currency: string) => {
  const d = currencyDigits(currency);
  return (minorUnits / 10 ** d).toFixed(d);
};
