import i18n from 'i18next';
import { initReactI18next, useTranslation } from 'react-i18next';
import { LANGUAGES, type FormatSettings, type Language } from '@shared/format/studio-format';
import { en } from '@/locales/en';

const STORED = 'seamrun.language';

/** The language before anyone signs in: the last one used on this device, else the browser's. */
function deviceLanguage(): Language {
  const stored = typeof localStorage !== 'undefined' ? localStorage.getItem(STORED) : null;
  if (stored && (LANGUAGES as readonly string[]).includes(stored)) return stored as Language;
  const browser = typeof navigator !== 'undefined' ? navigator.language.slice(0, 2) : 'en';
  return (LANGUAGES as readonly string[]).includes(browser) ? (browser as Language) : 'en';
}

// English ships in the entry (it is every screen's fallback); other languages are chunks of their own, fetched
// once and kept by the service worker with the rest of the app, so a phone offline still has its words.
/** A language's words, and how it says a sentence of the shared schemas (which are written in English). */
interface LanguagePack {
  words: typeof en;
  sentence: (english: string, settings: FormatSettings) => string | null;
}

const LOADERS: Record<Exclude<Language, 'en'>, () => Promise<LanguagePack>> = {
  fr: async () => {
    const { fr, sayInFrench } = await import('@/locales/fr');
    return { words: fr, sentence: sayInFrench };
  },
};
const sentences = new Map<Language, LanguagePack['sentence']>();

void i18n.use(initReactI18next).init({
  resources: { en: { translation: structuredClone(en) } }, // i18next merges areas into its bundle: keep en.ts as written
  lng: 'en',
  fallbackLng: 'en',
  supportedLngs: [...LANGUAGES],
  interpolation: { escapeValue: false },
  returnNull: false,
  initAsync: false,
});

const loaded = new Set<Language>(['en']);

/** Makes a language's words available (a no-op for English and for one already loaded). */
export async function loadLanguage(language: Language): Promise<void> {
  if (language === 'en' || loaded.has(language)) return;
  const pack = await LOADERS[language]();
  i18n.addResourceBundle(language, 'translation', structuredClone(pack.words), true, true);
  sentences.set(language, pack.sentence);
  loaded.add(language);
}

/**
 * A refusal in the language on screen: a form check of the shared schemas says it in English (the schemas serve
 * the server too), so it is looked up in the server's own catalogue of sentences; a sentence the server already
 * wrote in the person's language, or one the catalogue does not know, is shown as it is.
 */
export function localSentence(text: string, settings: FormatSettings): string {
  const say = sentences.get(i18n.language as Language);
  return (say && say(text, settings)) ?? text;
}

/** A nested dictionary of words: every leaf a string. */
export type Words = { readonly [key: string]: string | Words };

/** The same keys as an English dictionary, each leaf any string: what another language must give. */
export type SameWords<T> = { readonly [K in keyof T]: T[K] extends string ? string : SameWords<T[K]> };

/** One area's words in every language, French key for key as English (the type checker holds them together). */
export type AreaWords<T extends Words> = { en: T; fr: SameWords<T> };

/**
 * Registers an area's words under `area` in every language. An area's screens call it when their module loads,
 * so the words travel in the area's own chunk rather than in the first load.
 */
export function registerWords<T extends Words>(area: string, words: AreaWords<T>): void {
  for (const language of LANGUAGES) {
    i18n.addResourceBundle(language, 'translation', { [area]: words[language] }, true, true);
  }
}

/** Show the app in a language (once its words are here) and remember it on this device for the sign-in screen. */
export function applyLanguage(language: Language) {
  try {
    localStorage.setItem(STORED, language);
  } catch {
    // Private mode: the choice lasts for this page only.
  }
  if (typeof document !== 'undefined') document.documentElement.lang = language;
  if (i18n.language === language) return;
  void loadLanguage(language).then(() => i18n.changeLanguage(language));
}

const initial = deviceLanguage();
if (initial !== 'en' && typeof document !== 'undefined') applyLanguage(initial);

export { i18n, useTranslation };
