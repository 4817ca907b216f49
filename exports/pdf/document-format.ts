/**
 * Text and number formatting shared by the xlsx and pdf builders: dates from ISO strings, money from minor
 * units, lengths from millimetres in the studio's unit system. Pure; reads no clock.
 */
import { MM_PER_YARD } from '@shared/units';
import { isTimeZone, studioFormat, type Language } from '@shared/format/studio-format';
import { currencyDigits, currencyFormatOptions } from '@shared/units/money';
import type { SpreadingMode, UnitSystem } from '../types';

/** Minor-unit digits come from the one ISO 4217 helper in shared/units. */
export { currencyDigits };

/** Minor units → major units as a float for a spreadsheet cell (1250, EUR → 12.5). */
export function minorToMajor(minorUnits: number, digits: number): number {
  return minorUnits / 10 ** digits;
}

/** Money in minor units as locale text, e.g. `€12.50` (en-IE). */
export function formatMoney(minorUnits: number, currency: string, locale: string): string {
  const digits = currencyDigits(currency);
  return new Intl.NumberFormat(locale, currencyFormatOptions(currency, digits)).format(
    minorToMajor(minorUnits, digits),
  );
}

/**
 * A spreadsheet number format for the currency: the locale's symbol on the locale's side, the currency's
 * digits (e.g. `"€"#,##0.00;-"€"#,##0.00`). The separators in the code are the format language's own; the
 * reader's application shows its locale's separators. `digits` overrides the currency's (rates per minute).
 */
export function spreadsheetCurrencyFormat(
  currency: string,
  locale: string,
  digits = currencyDigits(currency),
): string {
  const parts = new Intl.NumberFormat(locale, { style: 'currency', currency }).formatToParts(1);
  const symbolAt = parts.findIndex((p) => p.type === 'currency');
  const numberAt = parts.findIndex((p) => p.type === 'integer');
  const symbol = `"${(parts[symbolAt]?.value ?? currency).replace(/"/g, '')}"`;
  const spaced = parts.some((p) => p.type === 'literal' && /\s/.test(p.value));
  const number = digits > 0 ? `#,##0.${'0'.repeat(digits)}` : '#,##0';
  const gap = spaced ? ' ' : '';
  const positive = symbolAt < numberAt ? `${symbol}${gap}${number}` : `${number}${gap}${symbol}`;
  return `${positive};-${positive}`;
}

/**
 * The calendar date of an ISO 8601 string as locale text (`14 Mar 2026` in en-GB): an instant's date in the
 * studio's time zone (default UTC), a bare `YYYY-MM-DD` as that day. Throws RangeError when the string is not a date.
 */
export function formatDate(iso: string, locale: string, timeZone = 'UTC'): string {
  const dateOnly = /^\d{4}-\d{2}-\d{2}$/.test(iso);
  const time = Date.parse(dateOnly ? `${iso}T00:00:00Z` : iso);
  if (Number.isNaN(time)) throw new RangeError(`not an ISO 8601 date: ${iso}`);
  const zone = dateOnly || !isTimeZone(timeZone) ? 'UTC' : timeZone;
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeZone: zone }).format(time);
}

/** Parses an ISO 8601 string to a Date (for workbook properties). Throws RangeError when invalid. */
export function parseIsoDate(iso: string): Date {
  const time = Date.parse(/^\d{4}-\d{2}-\d{2}$/.test(iso) ? `${iso}T00:00:00Z` : iso);
  if (Number.isNaN(time)) throw new RangeError(`not an ISO 8601 date: ${iso}`);
  return new Date(time);
}

/** Unit name of long lengths (fabric, markers, rolls): `m` or `yd`. */
export function longLengthUnit(system: UnitSystem): 'm' | 'yd' {
  return system === 'metric' ? 'm' : 'yd';
}

/**
 * A long length in metres or yards, rounded to 6 decimals so that e.g. 2743.2 mm is exactly 3 yd in a cell.
 */
export function toLongLength(lengthMm: number, system: UnitSystem): number {
  const value = system === 'metric' ? lengthMm / 1000 : lengthMm / MM_PER_YARD;
  return Number(value.toFixed(6));
}

const lengths = (system: UnitSystem, language: Language = 'en', locale?: string) =>
  studioFormat({ unitSystem: system, currency: 'XXX', language, timeZone: 'UTC', locale: locale ?? language });

/**
 * A long length (fabric, markers, rolls) as text: `6.50 m`, or yards and inches to 1/8 (`7 yd 3 1/2"`,
 * never decimal yards), through the one fabric-length formatter of shared/format.
 */
export function formatLongLength(lengthMm: number, system: UnitSystem, language?: Language, locale?: string): string {
  return lengths(system, language, locale).fabricLength(lengthMm);
}

/** A short length (allowances, widths) as text: `1 cm`/`150 cm`, or inches to 1/8 (`57 1/8"`, never `57.09 in`). */
export function formatShortLength(lengthMm: number, system: UnitSystem, language?: Language, locale?: string): string {
  return system === 'metric'
    ? `${lengths(system, language, locale).number(lengthMm / 10, 1)} cm`
    : lengths(system, language, locale).length(lengthMm);
}

const SPREADING_MODE_LABELS: Record<SpreadingMode, string> = {
  'face-up-one-way': 'Face up, one way',
  'face-up-both-ways': 'Face up, both ways',
  'face-to-face-one-way': 'Face to face, one way',
  'face-to-face-zigzag': 'Face to face, zig-zag',
};

/** The spreading mode in trade words. */
export function spreadingModeLabel(mode: SpreadingMode): string {
  return SPREADING_MODE_LABELS[mode];
}

/** A size ratio as text, e.g. `S×1 M×2 L×1`. */
export function formatRatio(ratio: readonly { size: string; count: number }[]): string {
  return ratio.map((r) => `${r.size}×${r.count}`).join(' ');
}

/** A ply range as text, `1–12` (plies numbered from the bottom of the lay); one ply as `5`. */
export function formatPlyRange(plyFrom: number, plyTo: number): string {
  return plyFrom === plyTo ? `${plyFrom}` : `${plyFrom}–${plyTo}`;
}
