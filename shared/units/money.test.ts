import { describe, expect, it } from 'vitest';
import { currencyDigits, formatMinorUnits, parseMajor, toMajorText } from './money';

describe('money in minor units', () => {
  // ISO 4217 minor units: KES and USD 2 decimals, JPY 0 [ISO 4217 list, via the Intl implementation].
  it('reads minor-unit digits of each currency', () => {
    expect(currencyDigits('KES')).toBe(2);
    expect(currencyDigits('JPY')).toBe(0);
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
