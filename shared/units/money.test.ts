import { describe, expect, it } from 'vitest';
import { currencyDigits, formatMinorUnits, parseMajor, toMajorText } from './money';

describe('money in minor units', () => {
  // ISO 4217 minor units: KES and USD 2 decimals, JPY 0 [ISO 4217 list, via the Intl implementation].
  it('reads minor-unit digits of each currency', () => {
    expect(currencyDigits('KES')).toBe(2);
    expect(currencyDigits('JPY')).toBe(0);
  });

  // Source: ISO 4217 list one (SIX, published date in currency-codes' iso-4217-publish-date.js), read through
  // the currency-codes package: JPY 0, ISK 0, KES 2, KWD 3, BHD 3, IQD 3, CLF 4, UYW 4. Node's Intl tables
  // say 0 for IQD and fail on UYW, which is why the digits no longer come from Intl.
  it('takes minor-unit digits from the ISO 4217 list when Intl disagrees or does not know the code', () => {
    const iso: Record<string, number> = { JPY: 0, ISK: 0, KES: 2, HUF: 2, KWD: 3, BHD: 3, IQD: 3, CLF: 4, UYW: 4 };
    for (const [code, digits] of Object.entries(iso)) expect([code, currencyDigits(code)]).toEqual([code, digits]);
  });

  it('refuses a code that is not in the ISO 4217 list', () => {
    expect(() => currencyDigits('ABC')).toThrow(RangeError);
  });

  it('formats with exactly the ISO 4217 digits when Intl would show fewer', () => {
    expect(formatMinorUnits(12345, 'IQD', 'en')).toMatch(/12\.345/);
  });

  it('parses typed amounts without floating-point error', () => {
    expect(parseMajor('7.50', 'KES')).toBe(750);
    expect(parseMajor('1,200', 'KES')).toBe(120000);
    expect(parseMajor('0.29', 'USD')).toBe(29);
    expect(parseMajor('1.005', 'USD')).toBeNull();
    expect(parseMajor('-3', 'USD')).toBeNull();
    expect(parseMajor('12', 'JPY')).toBe(12);
  });

  it('round-trips minor units through the input text', () => {
    for (const n of [0, 1, 29, 750, 123456789]) expect(parseMajor(toMajorText(n, 'KES'), 'KES')).toBe(n);
  });

  it('formats with the currency', () => {
    expect(formatMinorUnits(75000, 'KES')).toMatch(/750\.00/);
  });
});
