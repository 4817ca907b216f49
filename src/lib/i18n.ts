import i18n from 'i18next';
import { initReactI18next, useTranslation } from 'react-i18next';
import { LANGUAGES, type Language } from '@shared/format/studio-format';
import { en } from '@/locales/en';
import { fr } from '@/locales/fr';

const STORED = 'seamrun.language';

/** The language before anyone signs in: the last one used on this device, else the browser's. */
function deviceLanguage(): Language {
  const stored = typeof localStorage !== 'undefined' ? localStorage.getItem(STORED) : null;
  if (stored && (LANGUAGES as readonly string[]).includes(stored)) return stored as Language;
  const browser = typeof navigator !== 'undefined' ? navigator.language.slice(0, 2) : 'en';
  return (LANGUAGES as readonly string[]).includes(browser) ? (browser as Language) : 'en';
}

// Both dictionaries ship in the entry (a few kB gzipped): a phone that goes offline still has its words.
void i18n.use(initReactI18next).init({
  resources: { en: { translation: en }, fr: { translation: fr } },
  lng: deviceLanguage(),
  fallbackLng: 'en',
  supportedLngs: [...LANGUAGES],
  interpolation: { escapeValue: false },
  returnNull: false,
  initAsync: false,
});

/** Show the app in a language and remember it on this device for the sign-in screen. */
export function applyLanguage(language: Language) {
  if (i18n.language !== language) void i18n.changeLanguage(language);
  try {
    localStorage.setItem(STORED, language);
  } catch {
    // Private mode: the choice lasts for this page only.
  }
  if (typeof document !== 'undefined') document.documentElement.lang = language;
}

export { i18n, useTranslation };
