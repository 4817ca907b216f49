import { describe, expect, it } from 'vitest';
import { frenchTypography, withFrenchTypography } from './french-typography';

// Lexique des règles typographiques en usage à l'Imprimerie nationale: a thin no-break space before the
// high punctuation (; ! ?) and inside « », as French digital typesetting also sets before : and %.
describe('frenchTypography', () => {
  it('sets a narrow no-break space before : ; ! ? % and inside « » where a plain space was typed', () => {
    expect(frenchTypography('Note : 12 % ; vraiment ? « oui » !')).toBe('Note\u202f: 12\u202f%\u202f; vraiment\u202f? «\u202foui\u202f»\u202f!');
  });

  it('leaves a colon with no space before it alone (a time, a ratio, a URL)', () => {
    expect(frenchTypography('11:32 à l’échelle 1:1, https://x')).toBe('11:32 à l’échelle 1:1, https://x');
  });

  it('sets the spaces in every string of a nested dictionary and keeps its shape', () => {
    expect(withFrenchTypography({ a: 'Total :', b: { c: '5 %' }, n: 3 })).toEqual({ a: 'Total\u202f:', b: { c: '5\u202f%' }, n: 3 });
  });
});
