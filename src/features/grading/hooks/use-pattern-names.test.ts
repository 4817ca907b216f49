import { beforeAll, describe, expect, it } from 'vitest';
import { i18n, loadLanguage } from '@/lib/i18n';
import { patternNames } from './use-pattern-names';

beforeAll(async () => {
  await loadLanguage('fr');
});

describe('names of what the grading core drafts', () => {
  it('shows the core’s own names in English, unchanged', () => {
    const n = patternNames(i18n.getFixedT('en'));
    expect(n.piece('Bodice front')).toBe('Bodice front');
    expect(n.piece('Front lining')).toBe('Front lining');
    expect(n.seam('Front facing to front')).toBe('Front facing to front');
    expect(n.seam('Side seam (lining) 2')).toBe('Side seam (lining) 2');
    expect(n.part('notch 2')).toBe('notch 2');
    expect(n.part('hem start')).toBe('hem start');
    expect(n.side('Bodice front', ['side'])).toBe('Bodice front: side');
  });

  it('reads them in French, as a French pattern room names them', () => {
    const n = patternNames(i18n.getFixedT('fr'));
    expect(n.piece('Bodice front')).toBe('Devant de corsage');
    expect(n.piece('Front lining')).toBe('Devant (doublure)');
    expect(n.piece('Sleeve (contrast)')).toBe('Manche (contraste)');
    expect(n.seam('Side seam')).toBe('Couture de côté');
    expect(n.seam('Front facing to front')).toBe('Parementure devant sur devant');
    expect(n.seam('Side seam (lining) 2')).toBe('Couture de côté (doublure) 2');
    expect(n.part('cf-hem')).toBe('ourlet milieu devant');
    expect(n.part('notch 2')).toBe('cran 2');
    expect(n.part('neckline + neck-extension')).toBe('encolure + prolongement d’encolure');
    expect(n.side('Back', ['shoulder'])).toBe('Dos : épaule');
  });

  it('keeps a name the studio typed as typed', () => {
    const n = patternNames(i18n.getFixedT('fr'));
    expect(n.piece('Yoke')).toBe('Yoke');
    expect(n.piece('Tab v1.2')).toBe('Tab v1.2');
    expect(n.seam('Yoke to back')).toBe('Yoke to back');
  });
});
