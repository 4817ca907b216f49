import { useQuery } from '@tanstack/react-query';
import { useLayoutEffect } from 'react';
import { meQueries } from './auth';
import { setFormatSettings } from './format';
import { applyLanguage, i18n } from './i18n';

/**
 * Keeps the words, numbers, units and times to the signed-in person: their own language (else the studio's)
 * and the studio's units, currency and time zone. Reads the cached person without fetching (the sign-in page
 * asks no one), and follows a sign-in, a sign-out or a settings change.
 */
export function LocaleSync() {
  const me = useQuery({ ...meQueries.me(), enabled: false }).data;
  if (me) setFormatSettings({ unitSystem: me.unitSystem, currency: me.currency, language: me.language, timeZone: me.timeZone });
  const language = me?.language;
  useLayoutEffect(() => {
    if (language) applyLanguage(language);
  }, [language]);
  return null;
}

export { i18n };
