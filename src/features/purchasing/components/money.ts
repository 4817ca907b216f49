/** Money from integer minor units through Intl. */
export function money(minorUnits: number, currency: string, locale = 'en-KE'): string {
  const f = new Intl.NumberFormat(locale, { style: 'currency', currency });
  return f.format(minorUnits / 10 ** (f.resolvedOptions().maximumFractionDigits ?? 2));
}

/** A need or order quantity with its unit; fabric (mm) shown in metres. */
export const quantityText = (q: number, unit: string) => (unit === 'mm' ? `${(q / 1000).toFixed(1)} m` : `${+q.toFixed(3)} ${unit}`);
