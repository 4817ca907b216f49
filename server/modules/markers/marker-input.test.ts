import { describe, expect, it } from 'vitest';
import { ASSUMED_UTILISATION, utilisationForEstimates } from './marker-input';

describe('the utilisation marker-length estimates assume', () => {
  it('is the default (75 %, common practice) when the style has no finished marker on the fabric', () => {
    expect(utilisationForEstimates([])).toEqual({ utilisation: ASSUMED_UTILISATION, markers: 0 });
    expect(utilisationForEstimates([{ lengthMm: null, utilisation: null }, { lengthMm: 0, utilisation: 0.7 }])).toEqual({ utilisation: 0.75, markers: 0 });
  });

  it('weights each marker’s utilisation by its length, so a long marker counts for more than a short one', () => {
    // 2 m at 60 % and 6 m at 70 %: (2 × 0.6 + 6 × 0.7) ÷ 8 = 5.4 ÷ 8 = 0.675 (worked by hand).
    const r = utilisationForEstimates([{ lengthMm: 2000, utilisation: 0.6 }, { lengthMm: 6000, utilisation: 0.7 }]);
    expect(r.markers).toBe(2);
    expect(r.utilisation).toBeCloseTo(0.675, 12);
  });

  it('stays within 40–95 %, whatever one odd marker says', () => {
    expect(utilisationForEstimates([{ lengthMm: 100, utilisation: 3 }]).utilisation).toBe(0.95);
    expect(utilisationForEstimates([{ lengthMm: 100, utilisation: 0.1 }]).utilisation).toBe(0.4);
  });
});
