import { describe, expect, it } from 'vitest';
import { sentenceOf } from './format';

describe('sentenceOf', () => {
  it('drops the field path the API puts before a message and starts the sentence with a capital', () => {
    expect(sentenceOf('operations: the style has no sewing operations to balance')).toBe('The style has no sewing operations to balance');
    expect(sentenceOf('rolls.0.actualPlies: Enter the plies spread')).toBe('Enter the plies spread');
  });

  it('keeps a message that is already a sentence, colons inside it included', () => {
    expect(sentenceOf('This lay is already cut')).toBe('This lay is already cut');
    expect(sentenceOf('No network: bundle 3 is saved on this phone')).toBe('No network: bundle 3 is saved on this phone');
  });
});
