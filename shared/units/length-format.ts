import { MM_PER_INCH, MM_PER_YARD, mm, type Millimetres } from './units';

/** Display system for lengths. Inside Seamrun every length is millimetres; this only affects text. */
export type UnitSystem = 'metric' | 'imperial';

/** Options for {@link formatLength}. */
export interface FormatLengthOptions {
  /** Metric unit shown (default 'cm'). */
  metricUnit?: 'mm' | 'cm';
  /** Metric decimals (default 1 for cm, 0 for mm). Trailing zeros are dropped. */
  decimals?: number;
  /** Imperial fraction denominator, a power of two (default 8, i.e. to the nearest 1/8 in). */
  denominator?: number;
}

/**
 * Format a length for display.
 * Imperial: whole inches plus a reduced fraction, rounded to the nearest 1/denominator in, e.g. `10 1/2"`,
 * `-3/8"`, `0"`. Metric: `25.4 cm` or `254 mm`. Conversion uses the exact 1 in = 25.4 mm (NBS 1959).
 * Non-finite input gives `'—'`.
 */
export function formatLength(length: Millimetres | number, system: UnitSystem, options: FormatLengthOptions = {}): string {
  if (!Number.isFinite(length)) return '—';
  if (system === 'metric') {
    const unit = options.metricUnit ?? 'cm';
    const value = unit === 'cm' ? length / 10 : length;
    const decimals = options.decimals ?? (unit === 'cm' ? 1 : 0);
    const text = Number(value.toFixed(decimals)).toString();
    return `${text === '-0' ? '0' : text} ${unit}`;
  }
  const den = options.denominator ?? 8;
  const sixteenths = Math.round((Math.abs(length) / MM_PER_INCH) * den);
  const whole = Math.floor(sixteenths / den);
  let num = sixteenths % den;
  let d = den;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    d /= 2;
  }
  const sign = length < 0 && sixteenths > 0 ? '-' : '';
  const frac = num > 0 ? `${num}/${d}` : '';
  const body = whole > 0 && frac ? `${whole} ${frac}` : whole > 0 ? `${whole}` : frac || '0';
  return `${sign}${body}"`;
}

const UNIT_MM: Record<string, number> = {
  mm: 1,
  cm: 10,
  m: 1000,
  in: MM_PER_INCH,
  '"': MM_PER_INCH,
  inch: MM_PER_INCH,
  inches: MM_PER_INCH,
  ft: MM_PER_INCH * 12,
  "'": MM_PER_INCH * 12,
  yd: MM_PER_YARD,
  yds: MM_PER_YARD,
  yard: MM_PER_YARD,
  yards: MM_PER_YARD,
  // French: pouce (inch) and verge (yard), as the studio's French screens write them.
  po: MM_PER_INCH,
  vg: MM_PER_YARD,
};

/** The single-character fractions a keyboard or phone may give (Unicode vulgar fractions). */
const VULGAR_FRACTIONS: Record<string, string> = { '½': '1/2', '¼': '1/4', '¾': '3/4', '⅛': '1/8', '⅜': '3/8', '⅝': '5/8', '⅞': '7/8' };

const NUMBER = String.raw`(?:\d+(?:\.\d*)?|\.\d+)`;
const LENGTH_RE = new RegExp(
  String.raw`^([+-])?\s*(?:(${NUMBER})(?:\s+|-)(\d+)\s*/\s*(\d+)|(\d+)\s*/\s*(\d+)|(${NUMBER}))\s*([a-z"']*)$`,
  'i',
);

/**
 * Parse a typed length into millimetres.
 * Accepts decimals (`25.4 cm`, `254mm`, `1.5 yd`), mixed fractions (`10 1/2"`, `10-1/2 in`) and bare fractions
 * (`3/8`). A number with no unit is read as cm in the metric system and inches in the imperial one. Decimal
 * commas are accepted (`25,4 cm`). Returns `null` for empty, malformed or unknown-unit text, or a zero denominator.
 */
export function parseLength(text: string, system: UnitSystem): Millimetres | null {
  const cleaned = text
    .trim()
    .replace(/(\d),(\d)/g, '$1.$2')
    .replace(/″/g, '"')
    .replace(/′/g, "'")
    // A fraction typed as one character (40½, 2¾ yd) reads as the mixed fraction it is (40 1/2).
    .replace(/(\d*)\s*([½¼¾⅛⅜⅝⅞])/g, (_m, whole: string, f: string) => `${whole ? `${whole} ` : ''}${VULGAR_FRACTIONS[f]}`);
  const m = LENGTH_RE.exec(cleaned);
  if (!m) return null;
  const [, sign, mixWhole, mixNum, mixDen, fracNum, fracDen, dec, unitRaw] = m;
  let value: number;
  if (mixWhole !== undefined) {
    if (Number(mixDen) === 0) return null;
    value = Number(mixWhole) + Number(mixNum) / Number(mixDen);
  } else if (fracNum !== undefined) {
    if (Number(fracDen) === 0) return null;
    value = Number(fracNum) / Number(fracDen);
  } else {
    value = Number(dec);
  }
  const unit = unitRaw.toLowerCase() || (system === 'metric' ? 'cm' : 'in');
  const factor = UNIT_MM[unit];
  if (factor === undefined || !Number.isFinite(value)) return null;
  return mm((sign === '-' ? -1 : 1) * value * factor);
}

/**
 * A typed fabric length (a roll, an order line) in millimetres: a bare number, fraction or mixed fraction
 * (`30`, `12,5`, `40 1/2`, `40½`) is in the studio's long unit, metres or yards; a unit may be given (`2.5 yd`,
 * `90 in`, `2,5 m`). Null when it is not a length.
 */
export function parseLongLength(text: string, system: UnitSystem): Millimetres | null {
  const t = text.trim();
  if (!t) return null;
  const bare = /^[\d.,\s/½¼¾⅛⅜⅝⅞]+$/.test(t);
  return parseLength(bare ? `${t} ${system === 'imperial' ? 'yd' : 'm'}` : t, system);
}
