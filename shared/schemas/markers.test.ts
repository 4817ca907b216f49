import { describe, expect, it } from 'vitest';
import { ratioText } from './markers';

describe('a size ratio as text', () => {
  it('keeps a numeric size run readable: each size times its count, as the printed marker list writes it', () => {
    expect(ratioText({ '10': 1, '12': 2, '16': 1 }, ['8', '10', '12', '14', '16'])).toBe('10×1 · 12×2 · 16×1');
  });

  it('lists letter sizes in the order given and leaves out sizes not in the marker', () => {
    expect(ratioText({ M: 2, XS: 1, L: 0 }, ['XS', 'S', 'M', 'L'])).toBe('XS×1 · M×2');
    expect(ratioText({})).toBe('');
  });
});
