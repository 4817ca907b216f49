import { describe, expect, it } from 'vitest';
import { dayInZone, isTimeZone, localeFor, studioFormat } from './studio-format';

const imperialFr = studioFormat({ unitSystem: 'imperial', currency: 'CAD', language: 'fr', timeZone: 'America/Toronto' });
const imperialEn = studioFormat({ unitSystem: 'imperial', currency: 'USD', language: 'en', timeZone: 'America/New_York' });
const metricEn = studioFormat({ unitSystem: 'metric', currency: 'KES', language: 'en', timeZone: 'Africa/Nairobi' });

// Conversions: 1 in = 25.4 mm and 1 yd = 0.9144 m exactly (NIST SP 811, 2008, Appendix B.8 / B.9).
describe('lengths', () => {
  it('shows a width as inches to the nearest 1/8 when the studio is imperial (never "57.09 in")', () => {
    // 57.09 in = 1450.086 mm; the nearest eighth is 57 1/8 (0.035 away, against 0.09 for 57).
    expect(imperialEn.fabricWidth(1450.086)).toBe('57 1/8"');
    expect(imperialEn.length(254)).toBe('10"');
    expect(imperialEn.length(266.7)).toBe('10 1/2"'); // 10.5 in × 25.4
    expect(imperialEn.smallLength(3.175)).toBe('1/8"'); // 0.125 in × 25.4
  });

  it('shows fabric in yards and inches when the studio is imperial, never decimal yards', () => {
    expect(imperialEn.fabricLength(914.4)).toBe('1 yd'); // 1 yd = 0.9144 m
    expect(imperialEn.fabricLength(1371.6)).toBe('1 yd 18"'); // 1.5 yd = 1 yd + 18 in
    expect(imperialEn.fabricLength(2743.2 + 12.7)).toBe('3 yd 1/2"'); // 3 yd + 0.5 in
    expect(imperialEn.fabricLength(457.2)).toBe('18"');
    expect(imperialFr.fabricLength(1371.6)).toBe('1 vg 18"'); // verge, the French word for yard
  });

  it('shows metric lengths as cm and fabric as m with the locale decimal sign', () => {
    expect(metricEn.length(254)).toBe('25.4 cm');
    expect(metricEn.fabricLength(1371.6)).toBe('1.37 m');
    expect(metricEn.fabricWidth(1500)).toBe('150 cm');
    expect(studioFormat({ unitSystem: 'metric', currency: 'EUR', language: 'fr', timeZone: 'Europe/Paris' }).fabricLength(1371.6)).toBe('1,37 m');
  });

  it('shows areas in square inches below a square yard and cm² below a square metre', () => {
    expect(imperialEn.area(6451.6)).toBe('10 in²'); // 10 × 645.16 mm²
    expect(imperialFr.area(6451.6)).toBe('10 po²');
    expect(imperialEn.area(836127.36 * 2)).toBe('2.00 yd²'); // 1 yd² = 0.83612736 m²
    expect(metricEn.area(6500)).toBe('65 cm²');
    expect(metricEn.area(2_500_000)).toBe('2.50 m²');
  });

  it('gives a dash when the length is not a number', () => {
    expect(metricEn.length(Number.NaN)).toBe('—');
    expect(imperialEn.fabricLength(Number.POSITIVE_INFINITY)).toBe('—');
  });
});

describe('money', () => {
  it('shows the currency with its ISO 4217 digits in the locale of the studio language', () => {
    // CLDR fr-CA: narrow no-break space grouping, comma decimal, symbol after.
    expect(imperialFr.money(123456)).toBe('1\u00a0234,56\u00a0$');
    expect(metricEn.money(123456)).toBe('Ksh\u00a01,234.56');
  });
});

describe('dates and times', () => {
  it('shows times in the studio time zone, not UTC', () => {
    // IANA tz database: America/Toronto is UTC−5 in December (EST); Africa/Nairobi is UTC+3 all year.
    expect(imperialFr.time('2026-12-02T16:32:57Z')).toBe('11 h 32');
    expect(metricEn.time('2026-12-02T16:32:57Z')).toBe('19:32');
  });

  it('moves the date with the time zone when an instant is near midnight', () => {
    expect(imperialFr.date('2026-12-03T02:00:00Z')).toBe('2 déc. 2026'); // 21:00 on the 2nd in Toronto
    expect(metricEn.date('2026-12-02T22:00:00Z')).toBe('3 Dec 2026'); // 01:00 on the 3rd in Nairobi
  });

  it('shows a calendar day as that day in any time zone', () => {
    expect(imperialFr.date('2026-11-26')).toBe('26 nov. 2026');
    expect(metricEn.date('2026-11-26')).toBe('26 Nov 2026');
  });

  it('gives the studio day of an instant in its zone', () => {
    expect(dayInZone(new Date('2026-12-03T02:00:00Z'), 'America/Toronto')).toBe('2026-12-02');
    expect(dayInZone(new Date('2026-12-03T02:00:00Z'), 'Mars/Olympus')).toBe('2026-12-03');
  });

  it('gives a dash when the date cannot be read', () => {
    expect(metricEn.date('not a date')).toBe('—');
  });
});

describe('settings', () => {
  it('picks the locale from the language and the country of the currency', () => {
    expect(localeFor('fr', 'CAD')).toBe('fr-CA');
    expect(localeFor('en', 'KES')).toBe('en-KE');
    expect(localeFor('fr', 'EUR')).toBe('fr-FR');
    expect(localeFor('en', 'XAU')).toBe('en');
  });

  it('knows IANA zones and refuses made-up ones', () => {
    expect(isTimeZone('Europe/Paris')).toBe(true);
    expect(isTimeZone('UTC')).toBe(true);
    expect(isTimeZone('Mars/Olympus')).toBe(false);
    expect(isTimeZone('')).toBe(false);
  });

  it('writes French numbers with a decimal comma and spaced thousands', () => {
    expect(imperialFr.number(1234.5)).toBe('1\u00a0234,5');
    expect(imperialFr.percent(12.5)).toBe('12,5 %');
  });
});
