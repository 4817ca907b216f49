import { describe, expect, it } from 'vitest';
import { studioFormat } from '@shared/format/studio-format';
import { enInterval } from './size-chart-grid';

describe('an EN 13402-3 bust interval in the studio’s unit', () => {
  // EN 13402-3 writes its intervals in centimetres; 1 in = 25.4 mm exactly (NIST SP 811, Appendix B):
  // 82 cm = 32.28 in and 86 cm = 33.86 in, to the nearest 1/8 in 32 1/4 and 33 7/8.
  const inches = studioFormat({ unitSystem: 'imperial', currency: 'CAD', language: 'fr', timeZone: 'America/Toronto' });

  it('keeps the standard’s own centimetres in a metric studio', () => {
    expect(enInterval('82–86', 'metric', inches.length)).toBe('82–86');
  });

  it('gives inches to the nearest 1/8 in an imperial studio', () => {
    expect(enInterval('82–86', 'imperial', inches.length)).toBe('32 1/4"–33 7/8"');
  });

  it('leaves a label it cannot read as it is', () => {
    expect(enInterval('size 40', 'imperial', inches.length)).toBe('size 40');
  });
});
