import { describe, expect, it } from 'vitest';
import { efficiencyPercent, exactRateOf, logEarnedMinutes, logPayMinor, logRate } from './floor-math';

describe('floor arithmetic', () => {
  it('gives 41.67 % for 400 pieces of a 0.5 min job in 480 attended minutes', () => {
    // Source: ../shared/reference/production-and-costing.md §2.2 E2, quoting onlineclothingstudy.com 2017/01
    // "Efficiency formula": 400 pieces × 0.5 min = 200 min produced in 480 min → 41.67 %.
    const earned = logEarnedMinutes(400, 0.5, 0);
    expect(earned).toBe(200);
    expect(efficiencyPercent(earned, 480)).toBe(41.67);
  });

  it('gives no efficiency without attended minutes', () => {
    expect(efficiencyPercent(10, 0)).toBeNull();
  });

  it('pays pieces × rate once and nothing for a rework attempt', () => {
    expect(logPayMinor(10, 1200, 0)).toBe(12000);
    expect(logPayMinor(10, 1200, 1)).toBe(0);
    expect(logPayMinor(10, null, 0)).toBe(0);
    expect(logEarnedMinutes(10, 1.2, 2)).toBe(0);
  });

  it('rounds one log of 3 pieces at 0.125 to 0 for the running figure and keeps the exact rate of an old log from its pay', () => {
    // 3 × 0.125 = 0.375 → 0 (half-up rounding of one log; pay lines round their own sum once).
    expect(logPayMinor(3, '0.125', 0)).toBe(0);
    expect(logPayMinor(4, '0.125', 0)).toBe(1);
    expect(logRate({ pieceRate: '', payMinor: 12000, pieces: 10 })).toBe('1200');
    expect(logRate({ pieceRate: '0.125', payMinor: 0, pieces: 3 })).toBe('0.125');
    expect(exactRateOf(0.125)).toEqual({ pieceRate: '0.125', pieceRateMinor: 0 });
    expect(exactRateOf(12.5)).toEqual({ pieceRate: '12.5', pieceRateMinor: 13 });
  });
});
