import { describe, expect, it } from 'vitest';
import { putCompositionInput } from '@shared/schemas/style-composition';
import { blockOptionField, readBlockOption } from './block-option-text';

describe('a block option typed on the style page', () => {
  it('reads a bare number as cm in a metric studio and as inches in an imperial one', () => {
    expect(readBlockOption('5', 'length', 'metric')).toEqual({ value: 50, isBad: false });
    // 1 in = 25.4 mm exactly (NIST SP 811, Appendix B.8).
    expect(readBlockOption('2', 'length', 'imperial')).toEqual({ value: 50.8, isBad: false });
    expect(readBlockOption('1,5', 'number', 'metric')).toEqual({ value: 1.5, isBad: false });
  });

  it('keeps the default for an empty box and calls text that is not a number bad instead of dropping it', () => {
    expect(readBlockOption('  ', 'length', 'metric')).toEqual({ value: undefined, isBad: false });
    expect(readBlockOption('lots', 'length', 'metric')).toEqual({ value: undefined, isBad: true });
    expect(readBlockOption('two', 'number', 'metric')).toEqual({ value: undefined, isBad: true });
  });

  it('names the field the server refuses, so its error can sit beside the box', () => {
    const parsed = putCompositionInput.safeParse({ composition: { preset: null, blocks: [{ block: 'bodice', seamMm: -10 }] }, materialFabrics: {} });
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.map((i) => i.path.join('.'))).toContain(blockOptionField(0, 'seamMm'));
  });
});
