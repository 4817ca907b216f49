import { format, parseISO } from 'date-fns';

/** Money from integer minor units, formatted by Intl for the currency. */
export function formatMoney(minorUnits: number, currency: string, locale = 'en-KE') {
  const digits = new Intl.NumberFormat(locale, { style: 'currency', currency }).resolvedOptions()
    .maximumFractionDigits ?? 2;
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(minorUnits / 10 ** digits);
}

export const formatDate = (iso: string) => format(parseISO(iso), 'd MMM yyyy');
