import { currencyDigits, currencyFormatOptions } from '../units/money';
import { MM_PER_INCH, MM_PER_YARD } from '../units/units';

/** Languages Seamrun speaks. A studio picks one; each person may pick their own. */
export const LANGUAGES = ['en', 'fr'] as const;
export type Language = (typeof LANGUAGES)[number];

/** The settings every formatter follows, from the studio (and the person's own language, where they set one). */
export interface FormatSettings {
  unitSystem: 'metric' | 'imperial';
  /** ISO 4217 code, e.g. `KES`, `CAD`. */
  currency: string;
  language: Language;
  /** IANA time zone of the studio, e.g. `Africa/Nairobi`, `America/Toronto`. */
  timeZone: string;
  /** A BCP 47 locale to use instead of {@link localeFor}'s (a document's own). */
  locale?: string;
}

/** The settings of a studio that has chosen nothing yet: metric, English, UTC. */
export const DEFAULT_FORMAT_SETTINGS: FormatSettings = { unitSystem: 'metric', currency: 'KES', language: 'en', timeZone: 'UTC' };

/** The country a currency belongs to, for a locale's number and date habits (EUR goes to the language's country). */
const CURRENCY_REGION: Record<string, string> = {
  KES: 'KE', USD: 'US', CAD: 'CA', GBP: 'GB', TZS: 'TZ', UGX: 'UG', INR: 'IN', ZAR: 'ZA', NGN: 'NG', RWF: 'RW',
  XOF: 'SN', XAF: 'CM', MAD: 'MA', TND: 'TN', CHF: 'CH', AUD: 'AU', NZD: 'NZ', GHS: 'GH', ETB: 'ET', BDT: 'BD',
};
const EURO_REGION: Record<Language, string> = { en: 'IE', fr: 'FR' };

/**
 * BCP 47 locale for numbers and dates: the language, in the country of the studio's currency
 * (`fr` + `CAD` → `fr-CA`, `en` + `KES` → `en-KE`); the bare language when the runtime has no such locale.
 */
export function localeFor(language: Language, currency: string): string {
  const region = currency.toUpperCase() === 'EUR' ? EURO_REGION[language] : CURRENCY_REGION[currency.toUpperCase()];
  if (!region) return language;
  const tag = `${language}-${region}`;
  return Intl.DateTimeFormat.supportedLocalesOf([tag]).length > 0 ? tag : language;
}

/** Whether the runtime knows an IANA time zone name (`Europe/Paris` yes, `Mars/Olympus` no). */
export function isTimeZone(zone: string): boolean {
  if (!/^[A-Za-z_]+(?:\/[A-Za-z0-9_+-]+)*$/.test(zone)) return false;
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** A whole number of 1/den inches as `10 1/2`, `3/8`, `0` (fraction reduced). */
function inchText(eighths: number, den: number): string {
  const whole = Math.floor(eighths / den);
  let num = eighths % den;
  let d = den;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    d /= 2;
  }
  const frac = num > 0 ? `${num}/${d}` : '';
  return whole > 0 && frac ? `${whole} ${frac}` : whole > 0 ? `${whole}` : frac || '0';
}

const EIGHTHS = 8;
const YARD_UNIT: Record<Language, string> = { en: 'yd', fr: 'vg' };
/** Inch as a word, where the `"` mark would not read (units of a width or an area): `po` (pouce) in French. */
const INCH_UNIT: Record<Language, string> = { en: 'in', fr: 'po' };
const DATE_ONLY = /^\d{4}-\d{2}-\d{2}$/;

/** The formatters of one studio's settings, one per quantity. Pure: reads no clock. */
export interface StudioFormat {
  readonly settings: FormatSettings;
  /** BCP 47 locale used for numbers and dates. */
  readonly locale: string;
  /** A plain number in the locale (`1 234,5` in French), at most `maxDigits` decimals. */
  number(value: number, maxDigits?: number): string;
  /** A percentage, `12.5 %` / `12,5 %`; a dash for null. */
  percent(value: number | null, digits?: number): string;
  /** A garment length (mm in): centimetres with one decimal, or inches to the nearest 1/8 (`10 1/2"`). */
  length(lengthMm: number): string;
  /** A small length such as a grade or a seam allowance (mm in): millimetres, or inches to 1/8. */
  smallLength(lengthMm: number): string;
  /** A fabric, marker or roll length (mm in): metres with two decimals, or yards and inches (`2 yd 20 1/2"`). */
  fabricLength(lengthMm: number): string;
  /** A fabric width (mm in): whole centimetres, or inches to 1/8 (`57 1/8"`). */
  fabricWidth(lengthMm: number): string;
  /** An area (mm² in): cm² under a square metre, m² above; in² under a square yard, square yards above. */
  area(areaMm2: number): string;
  /** Money from integer minor units with the currency's ISO 4217 digits. */
  money(minorUnits: number): string;
  /** A date in the one date style (`2 Dec 2026`, `2 déc. 2026`); a `YYYY-MM-DD` calendar day is shown as that day. */
  date(value: string | Date): string;
  /** A time of day in the studio's time zone (`11:32`, `11 h 32`). */
  time(value: string | Date): string;
  /** Date and time in the studio's time zone. */
  dateTime(value: string | Date): string;
  /** Unit word of fabric lengths (`m`, `yd`, `vg`) and of widths (`cm`, `in`, `po`). */
  readonly fabricLengthUnit: string;
  readonly fabricWidthUnit: string;
}

const toTime = (value: string | Date) => (typeof value === 'string' ? Date.parse(DATE_ONLY.test(value) ? `${value}T00:00:00Z` : value) : value.getTime());

/**
 * One formatter per quantity for a studio's settings. Lengths arrive in millimetres and money in minor units;
 * conversions use the exact 1 in = 25.4 mm and 1 yd = 0.9144 m (NIST SP 811, Appendix B). Non-finite numbers
 * and unreadable dates give a dash. Dates and times are shown in the studio's IANA time zone, never UTC unless
 * the studio is there.
 */
export function studioFormat(settings: FormatSettings): StudioFormat {
  const locale = settings.locale ?? localeFor(settings.language, settings.currency);
  const imperial = settings.unitSystem === 'imperial';
  const zone = isTimeZone(settings.timeZone) ? settings.timeZone : 'UTC';
  const numbers = new Map<number, Intl.NumberFormat>();
  const num = (value: number, maxDigits = 2) => {
    let f = numbers.get(maxDigits);
    if (!f) numbers.set(maxDigits, (f = new Intl.NumberFormat(locale, { maximumFractionDigits: maxDigits })));
    const text = f.format(value);
    return text.replace(/^-(0(?:[.,]0*)?)$/, '$1');
  };
  const fixed = (value: number, digits: number) =>
    new Intl.NumberFormat(locale, { minimumFractionDigits: digits, maximumFractionDigits: digits }).format(value);
  const inches = (lengthMm: number) => {
    const e = Math.round((Math.abs(lengthMm) / MM_PER_INCH) * EIGHTHS);
    return `${lengthMm < 0 && e > 0 ? '-' : ''}${inchText(e, EIGHTHS)}"`;
  };
  const money = new Intl.NumberFormat(locale, currencyFormatOptions(settings.currency));
  const digits = currencyDigits(settings.currency);
  const dates = {
    date: new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeZone: zone }),
    day: new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeZone: 'UTC' }),
    time: new Intl.DateTimeFormat(locale, { timeStyle: 'short', timeZone: zone }),
    dateTime: new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeStyle: 'short', timeZone: zone }),
  };
  const safe = (f: (n: number) => string) => (n: number) => (Number.isFinite(n) ? f(n) : '—');
  const when = (f: Intl.DateTimeFormat) => (value: string | Date) => {
    const t = toTime(value);
    return Number.isNaN(t) ? '—' : f.format(t);
  };
  const yd = YARD_UNIT[settings.language];
  const inch = INCH_UNIT[settings.language];
  return {
    settings,
    locale,
    fabricLengthUnit: imperial ? yd : 'm',
    fabricWidthUnit: imperial ? inch : 'cm',
    number: (value, maxDigits) => (Number.isFinite(value) ? num(value, maxDigits) : '—'),
    percent: (value, d = 1) => (value === null || !Number.isFinite(value) ? '–' : `${fixed(value, d)} %`),
    length: safe((v) => (imperial ? inches(v) : `${num(v / 10, 1)} cm`)),
    smallLength: safe((v) => (imperial ? inches(v) : `${num(v, 1)} mm`)),
    fabricLength: safe((v) => {
      if (!imperial) return `${fixed(v / 1000, 2)} m`;
      const e = Math.round((Math.abs(v) / MM_PER_INCH) * EIGHTHS);
      const perYard = (MM_PER_YARD / MM_PER_INCH) * EIGHTHS;
      const yards = Math.floor(e / perYard);
      const rest = e - yards * perYard;
      const sign = v < 0 && e > 0 ? '-' : '';
      if (yards === 0) return `${sign}${inchText(rest, EIGHTHS)}"`;
      return `${sign}${num(yards, 0)} ${yd}${rest > 0 ? ` ${inchText(rest, EIGHTHS)}"` : ''}`;
    }),
    fabricWidth: safe((v) => (imperial ? inches(v) : `${num(v / 10, 0)} cm`)),
    area: safe((v) => {
      if (!imperial) return v < 1e6 ? `${num(v / 100, 0)} cm²` : `${fixed(v / 1e6, 2)} m²`;
      const sqIn = v / (MM_PER_INCH * MM_PER_INCH);
      return sqIn < 1296 ? `${num(sqIn, 1)} ${inch}²` : `${fixed(sqIn / 1296, 2)} ${yd}²`;
    }),
    money: (minorUnits) => (Number.isFinite(minorUnits) ? money.format(minorUnits / 10 ** digits) : '—'),
    date: (value) => (typeof value === 'string' && DATE_ONLY.test(value) ? when(dates.day)(value) : when(dates.date)(value)),
    time: when(dates.time),
    dateTime: when(dates.dateTime),
  };
}

/** The calendar day (`YYYY-MM-DD`) an instant falls on in a time zone: the studio's "today". */
export function dayInZone(instant: Date, timeZone: string): string {
  const zone = isTimeZone(timeZone) ? timeZone : 'UTC';
  const parts = new Intl.DateTimeFormat('en-CA', { timeZone: zone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(instant);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}`;
}
