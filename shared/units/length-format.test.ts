import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { formatLength, parseLength, parseLongLength } from './length-format';
import { MM_PER_INCH, MM_PER_YARD, inchesToMm, mmToYards } from './units';

// Outside oracle: js-quantities 1.8 defines <inch> = 0.0254 m and <yard> = 0.9144 m exactly
// (sizing-and-grading.md §5, package source); NBS Circular 572 Addendum (1960): 1 yd = 0.9144 m, 1 in = 25.4 mm.
describe('exact conversions', () => {
  it('matches js-quantities for inch and yard', () => {
    expect(MM_PER_INCH).toBe(Qty('1 in').to('mm').scalar);
    expect(MM_PER_YARD).toBe(Qty('1 yd').to('mm').scalar);
    expect(inchesToMm(88 / 2.54 / 10)).toBeCloseTo(88, 12);
  });

  it('reproduces the exact fraction fixtures (sizing-and-grading.md §3.1, computed from 1 in = 25.4 mm)', () => {
    const fixtures: [string, number, string][] = [
      ['1/8"', 3.175, '0.125 in'], ['1/4"', 6.35, '0.25 in'], ['3/8"', 9.525, '0.375 in'],
      ['1/2"', 12.7, '0.5 in'], ['5/8"', 15.875, '0.625 in'], ['3/4"', 19.05, '0.75 in'],
      ['1"', 25.4, '1 in'], ['1 1/2"', 38.1, '1.5 in'], ['2"', 50.8, '2 in'], ['1 yd', 914.4, '1 yd'],
    ];
    for (const [text, expected, qtyText] of fixtures) {
      expect(parseLength(text, 'imperial')).toBeCloseTo(expected, 10);
      expect(parseLength(text, 'imperial')).toBeCloseTo(Qty(qtyText).to('mm').scalar, 10);
    }
    expect(mmToYards(1000)).toBeCloseTo(1.0936133, 7);
  });

  it('reads a fraction typed as one character as the mixed fraction (1 yd = 0.9144 m, NBS Circular 572)', () => {
    expect(parseLength('40½ yd', 'imperial')).toBeCloseTo(Qty('40.5 yd').to('mm').scalar, 9);
    expect(parseLength('40 ½ yd', 'imperial')).toBeCloseTo(Qty('40.5 yd').to('mm').scalar, 9);
    expect(parseLength('¾"', 'imperial')).toBeCloseTo(Qty('0.75 in').to('mm').scalar, 9);
    expect(parseLength('10⅜ in', 'imperial')).toBeCloseTo(Qty('10.375 in').to('mm').scalar, 9);
    expect(parseLength('40 1/2 yd', 'imperial')).toBeCloseTo(Qty('40.5 yd').to('mm').scalar, 9);
  });

  it('reads a typed roll length in the long unit: metres, or yards with fractions (1 yd = 0.9144 m)', () => {
    expect(parseLongLength('49,8', 'metric')).toBeCloseTo(49_800, 9);
    expect(parseLongLength('40 1/2', 'imperial')).toBeCloseTo(Qty('40.5 yd').to('mm').scalar, 9);
    expect(parseLongLength('40½', 'imperial')).toBeCloseTo(Qty('40.5 yd').to('mm').scalar, 9);
    expect(parseLongLength('90 in', 'imperial')).toBeCloseTo(Qty('90 in').to('mm').scalar, 9);
    expect(parseLongLength('forty', 'imperial')).toBeNull();
    expect(parseLongLength('  ', 'metric')).toBeNull();
  });

  it('agrees with js-quantities on 88 cm in inches (EN 13402 "88" bust, BSI 2002)', () => {
    const ours = (parseLength('88 cm', 'metric') as number) / MM_PER_INCH;
    expect(ours).toBeCloseTo(Qty('88 cm').to('in').scalar, 12);
  });
});

describe('formatLength', () => {
  it('shows eighths of an inch reduced', () => {
    expect(formatLength(inchesToMm(10.5), 'imperial')).toBe('10 1/2"');
    expect(formatLength(inchesToMm(37.25), 'imperial')).toBe('37 1/4"');
    expect(formatLength(inchesToMm(0.375), 'imperial')).toBe('3/8"');
    expect(formatLength(inchesToMm(-1.125), 'imperial')).toBe('-1 1/8"');
    expect(formatLength(0, 'imperial')).toBe('0"');
  });

  it('rounds to the nearest eighth when the value is between marks', () => {
    expect(formatLength(16, 'imperial')).toBe('5/8"'); // 16 mm = 0.63 in
    expect(formatLength(inchesToMm(9.99), 'imperial')).toBe('10"');
  });

  it('shows metric in cm or mm', () => {
    expect(formatLength(254, 'metric')).toBe('25.4 cm');
    expect(formatLength(880, 'metric')).toBe('88 cm');
    expect(formatLength(12.7, 'metric', { metricUnit: 'mm', decimals: 1 })).toBe('12.7 mm');
    expect(formatLength(Number.NaN, 'metric')).toBe('—');
  });

  it('round-trips every eighth through parse', () => {
    for (let e = 0; e <= 400; e++) {
      const text = formatLength((e / 8) * MM_PER_INCH, 'imperial');
      expect(parseLength(text, 'imperial')).toBeCloseTo((e / 8) * MM_PER_INCH, 9);
    }
  });
});

describe('parseLength', () => {
  it('reads units and defaults', () => {
    expect(parseLength('25.4', 'metric')).toBeCloseTo(254, 10);
    expect(parseLength('254mm', 'metric')).toBe(254);
    expect(parseLength('10-1/2 in', 'imperial')).toBeCloseTo(266.7, 10);
    expect(parseLength('25,4 cm', 'metric')).toBeCloseTo(254, 10);
    expect(parseLength('1.5 m', 'imperial')).toBe(1500);
  });

  it('reads the French unit words when a French screen asks for verges and pouces', () => {
    // 1 yd = 914.4 mm and 1 in = 25.4 mm exactly (NIST SP 811, Appendix B.8).
    expect(parseLength('1,5 vg', 'imperial')).toBeCloseTo(1371.6, 10);
    expect(parseLength('54 1/2 po', 'imperial')).toBeCloseTo(1384.3, 10);
  });

  it('rejects malformed text', () => {
    for (const bad of ['', 'abc', '1/0', '3 furlongs', '1 2 3']) expect(parseLength(bad, 'metric')).toBeNull();
  });
});
