import { afterEach, describe, expect, it } from 'vitest';
import { DEFAULT_FORMAT_SETTINGS } from '@shared/format/studio-format';
import { setFormatSettings } from '@/lib/format';
import { fabricInputText, quantityText, readFabricInput } from './quantity-text';

// 1 yd = 0.9144 m and 1 in = 25.4 mm exactly (NIST SP 811, Appendix B.8).
describe('fabric lengths typed on the purchasing screens', () => {
  afterEach(() => setFormatSettings(DEFAULT_FORMAT_SETTINGS));

  it('reads a bare number as metres in a metric studio, and a length with its unit as written', () => {
    expect(readFabricInput('30')).toBe(30_000);
    expect(readFabricInput('2,5')).toBe(2_500);
    expect(readFabricInput('1 yd')).toBe(914);
    expect(readFabricInput('')).toBeNull();
    expect(readFabricInput('lots')).toBeNull();
    expect(fabricInputText(12_500)).toBe('12.5');
  });

  it('reads a bare number as yards in an imperial studio and offers the yards to receive', () => {
    setFormatSettings({ ...DEFAULT_FORMAT_SETTINGS, unitSystem: 'imperial' });
    expect(readFabricInput('10')).toBe(9_144);
    expect(readFabricInput('36 in')).toBe(914);
    expect(fabricInputText(9_144)).toBe('10.0');
  });

  it('shows a trim sold by the metre in yards and inches in an imperial studio, and as typed in a metric one', () => {
    expect(quantityText(14, 'm')).toBe('14 m');
    setFormatSettings({ ...DEFAULT_FORMAT_SETTINGS, unitSystem: 'imperial' });
    // 14 m = 15.3105 yd: 15 yd and 0.3105 × 36 = 11.18 in, to the nearest 1/8: 11 1/8".
    expect(quantityText(14, 'm')).toBe('15 yd 11 1/8"');
  });
});
