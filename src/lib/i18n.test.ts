import { beforeAll, describe, expect, it } from 'vitest';
import { en } from '@/locales/en';
import { fr } from '@/locales/fr';
import { auditChanges, auditSentence } from '@/features/audit/lib/audit-sentence';
import { i18n, loadLanguage, localSentence, type AreaWords, type Words } from './i18n';

/** Every area's own words (`src/features/<area>/words.ts`), registered as their modules load. */
const AREAS = import.meta.glob<{ words: AreaWords<Words>; area: string }>('/src/features/*/words.ts', { eager: true });

beforeAll(async () => {
  await loadLanguage('fr');
});

const leaves = (o: object, prefix = ''): [string, string][] =>
  Object.entries(o).flatMap(([k, v]) => (typeof v === 'object' ? leaves(v as object, `${prefix}${k}.`) : [[`${prefix}${k}`, String(v)]]));

describe('the dictionaries', () => {
  it('gives French every English key, each with words and the same placeholders', () => {
    const frLeaves = new Map(leaves(fr));
    for (const [key, text] of leaves(en)) {
      expect(frLeaves.get(key), key).toBeTruthy();
      const holes = (s: string) => [...s.matchAll(/\{\{(\w+)\}\}/g)].map((m) => m[1]).sort();
      expect(holes(frLeaves.get(key)!), key).toEqual(holes(text));
    }
  });
});

describe("the areas' own words", () => {
  const holes = (s: string) => [...s.matchAll(/\{\{(\w+)\}\}/g)].map((m) => m[1]).sort();

  it('gives French every English key of each area, with words and the same placeholders', () => {
    for (const [file, { words }] of Object.entries(AREAS)) {
      const frLeaves = new Map(leaves(words.fr));
      for (const [key, text] of leaves(words.en)) {
        expect(frLeaves.get(key), `${file}: ${key}`).toBeTruthy();
        expect(holes(frLeaves.get(key)!), `${file}: ${key}`).toEqual(holes(text));
      }
    }
  });

  it('registers each area under a name of its own, clear of the main dictionary and of each other', () => {
    const names = Object.values(AREAS).map((m) => m.area);
    expect(new Set(names).size).toBe(names.length);
    for (const name of names) expect(Object.keys(en), name).not.toContain(name);
  });

  it('finds an area\'s words through i18next in both languages', () => {
    for (const { area, words } of Object.values(AREAS)) {
      const [key, text] = leaves(words.en).find(([, v]) => !v.includes('{{'))!;
      expect(i18n.getFixedT('en')(`${area}.${key}`)).toBe(text);
      expect(i18n.getFixedT('fr')(`${area}.${key}`)).toBe(new Map(leaves(words.fr)).get(key));
    }
  });
});

/** The client's source, read as text, to find the dictionary keys it names literally. */
const SOURCES = import.meta.glob<string>(['/src/**/*.{ts,tsx}', '!/src/**/*.test.{ts,tsx}'], { query: '?raw', import: 'default', eager: true });

describe('the keys the screens ask for', () => {
  const has = (dict: object, key: string) => {
    const parts = key.split('.');
    const last = parts.pop()!;
    const parent = parts.reduce<Record<string, unknown> | undefined>((o, p) => o?.[p] as Record<string, unknown> | undefined, dict as Record<string, unknown>);
    // A counted word is kept as word_one / word_other (i18next plurals).
    return parent !== undefined && (last in parent || `${last}_one` in parent);
  };

  it('finds every literal key of the main dictionary in English and French', () => {
    const missing: string[] = [];
    for (const [file, text] of Object.entries(SOURCES)) {
      for (const [, key] of text.matchAll(/\bt\(\s*'([a-zA-Z][\w]*\.[\w.]+)'/g)) {
        if (!(key.split('.')[0] in en)) continue; // an area's words, or a key built at run time
        if (!has(en, key) || !has(fr, key)) missing.push(`${file}: ${key}`);
      }
    }
    expect(missing).toEqual([]);
  });

  it('says one of a counted thing in the singular in English', () => {
    const words = [...leaves(en), ...Object.values(AREAS).flatMap(({ area, words: w }) => leaves(w.en).map(([k, v]) => [`${area}.${k}`, v] as [string, string]))];
    const all = new Map(words);
    // "pcs" is the trade's abbreviation for one piece or many; "1 in on 4 Dec" reads the same for one person.
    const alike = new Set(['people.attendance.present_one']);
    const same = words.filter(([k, v]) => k.endsWith('_one') && all.get(k.replace(/_one$/, '_other')) === v && !/\bpcs\b/.test(v) && !alike.has(k)).map(([k]) => k);
    expect(same).toEqual([]);
    const t = i18n.getFixedT('en');
    expect(t('purchasing.needs.made', { count: 1 })).toBe('1 draft purchase order made.');
    expect(t('linePlan.plan.onlyMachinists', { count: 1 })).toBe('only 1 machinist');
  });

  it('gives an imperial studio its figures in inches, never in millimetres or centimetres', () => {
    const metricInImperial = Object.values(AREAS).flatMap(({ area, words: w }) =>
      [...leaves(w.en), ...leaves(w.fr)].filter(([k, v]) => k.split('.').includes('imperial') && /\d\s*(mm|cm)\b/.test(v)).map(([k, v]) => `${area}.${k}: ${v}`),
    );
    expect(metricInImperial).toEqual([]);
  });

  it('gives a metric studio its figures in centimetres, never in inches', () => {
    const inchesInMetric = Object.values(AREAS).flatMap(({ area, words: w }) =>
      [...leaves(w.en), ...leaves(w.fr)].filter(([k, v]) => k.split('.').includes('metric') && /\d\s*(in|po|″|")(\b|$)/.test(v)).map(([k, v]) => `${area}.${k}: ${v}`),
    );
    expect(inchesInMetric).toEqual([]);
  });

  it('names the costing table columns in words, not keys', () => {
    for (const lng of ['en', 'fr']) {
      for (const col of ['size', 'cost', 'wholesale', 'retail']) expect(i18n.getFixedT(lng)(`costingPage.cols.${col}`)).not.toContain('costingPage');
    }
  });
});

describe('plural rules of each language', () => {
  // CLDR plural rules (Unicode CLDR, Language Plural Rules): English "one" is exactly 1; French "one" is 0 and 1.
  it('says 0 pieces and 1 piece in English', () => {
    const t = i18n.getFixedT('en');
    expect(t('common.pieces', { count: 0 })).toBe('0 pieces');
    expect(t('common.pieces', { count: 1 })).toBe('1 piece');
    expect(t('common.pieces', { count: 2 })).toBe('2 pieces');
  });

  it('says 0 pièce, 1 pièce and 2 pièces in French', () => {
    const t = i18n.getFixedT('fr');
    expect(t('common.pieces', { count: 0 })).toBe('0 pièce');
    expect(t('common.pieces', { count: 1 })).toBe('1 pièce');
    expect(t('common.pieces', { count: 2 })).toBe('2 pièces');
    expect(t('floor.waiting', { count: 3 })).toBe('3 saisies attendent le réseau sur ce téléphone.');
  });
});

describe('the audit trail as sentences', () => {
  const entry = {
    id: 1, userName: 'Zawadi Kerubo', action: 'update', entity: 'studio', entityId: 1, record: null, createdAt: '2026-12-02T16:32:57Z',
    before: JSON.stringify({ name: 'Tamarind', unitSystem: 'metric', workingDayHours: 8 }),
    after: JSON.stringify({ name: 'Tamarind', unitSystem: 'imperial', workingDayHours: 8 }),
  };

  it('reads who did what to which record, not raw JSON', () => {
    expect(auditSentence(entry, i18n.getFixedT('en'))).toBe('Zawadi Kerubo changed the studio');
    // A batch goes by its studio's code (the server sends it), never by its database id.
    expect(auditSentence({ ...entry, action: 'create', entity: 'batch', entityId: 4, record: 'B-0001' }, i18n.getFixedT('fr'))).toBe('Zawadi Kerubo a créé la série B-0001');
  });

  it('lists only the fields that changed, in words', () => {
    expect(auditChanges(entry, i18n.getFixedT('en'))).toEqual(['units: metric → imperial']);
    expect(auditChanges({ ...entry, before: '' }, i18n.getFixedT('en'))).toContain('name: Tamarind');
  });

  it('names an action the dictionary does not know in plain words', () => {
    expect(auditSentence({ ...entry, action: 'mark_ready', entity: 'cut_order_line', entityId: 2 }, i18n.getFixedT('en'))).toBe('Zawadi Kerubo mark ready cut order line #2');
  });
});

describe('form checks of the shared schemas in the language on screen', () => {
  const settings = { unitSystem: 'metric', currency: 'EUR', language: 'fr', timeZone: 'UTC' } as const;

  it('says a schema sentence in French once French is on screen, and leaves English as written', async () => {
    await loadLanguage('fr');
    await i18n.changeLanguage('fr');
    expect(localSentence('At least 10 characters', settings)).toBe('Au moins 10 caractères');
    expect(localSentence('Code is required', settings)).toBe('À remplir');
    // A sentence the server already wrote in French, or one nobody catalogued, is shown as it is.
    expect(localSentence('Déjà en français.', settings)).toBe('Déjà en français.');
    await i18n.changeLanguage('en');
    expect(localSentence('At least 10 characters', { ...settings, language: 'en' })).toBe('At least 10 characters');
  });
});
