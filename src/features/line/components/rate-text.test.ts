import { describe, expect, it } from 'vitest';
import { parseRateMajor, rateToMajorText } from './rate-text';

describe('piece-rate text', () => {
  it('reads 0.00125 KES as 0.125 minor units a piece and writes it back the same', () => {
    // KES has 2 decimals (ISO 4217).
    expect(parseRateMajor('0.00125', 'KES')).toBe(0.125);
    expect(rateToMajorText(0.125, 'KES')).toBe('0.00125');
  });

  it('reads whole and cent amounts as before and refuses finer than a millionth of a minor unit', () => {
    expect(parseRateMajor('12.50', 'KES')).toBe(1250);
    expect(rateToMajorText(1250, 'KES')).toBe('12.50');
    expect(parseRateMajor('3', 'JPY')).toBe(3);
    expect(parseRateMajor('3.5', 'JPY')).toBe(3.5);
    expect(rateToMajorText(3.5, 'JPY')).toBe('3.5');
    expect(parseRateMajor('0.000000001', 'KES')).toBeNull();
    expect(parseRateMajor('abc', 'KES')).toBeNull();
  });
});
