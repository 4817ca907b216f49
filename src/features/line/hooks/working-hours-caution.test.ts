import { afterEach, describe, expect, it } from 'vitest';
import { WORKING_HOURS_CAUTION } from '@planning';
import { i18n, loadLanguage } from '@/lib/i18n';
import { workingHoursCaution } from './working-hours-caution';

describe('the working-hours caution', () => {
  afterEach(() => i18n.changeLanguage('en'));

  it('reads in English exactly as planning writes it, so the screens say what the server checks', () => {
    expect(workingHoursCaution(WORKING_HOURS_CAUTION)).toBe(WORKING_HOURS_CAUTION);
  });

  it('reads in French with the same ILO C1 limits (8 h a day, 48 h a week, overtime at 1.25 times)', async () => {
    await loadLanguage('fr');
    await i18n.changeLanguage('fr');
    const fr = workingHoursCaution(WORKING_HOURS_CAUTION);
    expect(fr).toContain('8 heures par jour et 48 heures par semaine');
    expect(fr).toContain('1,25 fois');
    expect(workingHoursCaution('Some other caution')).toBe('Some other caution');
  });
});
