import { fmt } from '@/lib/format';

/** A number with exactly `digits` decimals in the studio's number style (`0.690`, `0,690`), as minutes and percents show. */
export const fixed = (value: number, digits: number) =>
  new Intl.NumberFormat(fmt().locale, { minimumFractionDigits: digits, maximumFractionDigits: digits, useGrouping: false }).format(value);
