import { z } from 'zod';
import { frenchTypography } from '../format/french-typography';
import { studioFormat, type FormatSettings, type Language, type StudioFormat } from '../format/studio-format';
import { MESSAGES_EN, MESSAGES_FR, NOT_FOUND_FR, VALUES_FR, type MessageKey } from './messages';
import { FIELD_LABELS_FR, SCHEMA_MESSAGES_FR } from './validation-words';

/** A server sentence by its key, with what it names; English and French are both written from it. */
export interface Said {
  key: MessageKey;
  params?: Record<string, string | number>;
  /** The English as another part of the code already words it (a core's refusal), instead of the template. */
  english?: string;
}

/** A sentence of {@link MESSAGES_EN} with its parameters. */
export const said = (key: MessageKey, params?: Said['params']): Said => ({ key, params });

const PLACEHOLDER = /\{(\w+)(?:\|([\w:]+))?\}/g;

/** The sentence in English, exactly as the server always wrote it. */
export function english(s: Said): string {
  if (s.english !== undefined) return s.english;
  return MESSAGES_EN[s.key].replace(PLACEHOLDER, (_m, name: string) => String(s.params?.[name] ?? ''));
}

/** What a French sentence needs: the studio's formatters (units, time zone). */
export interface Speaker {
  language: Language;
  format: StudioFormat;
}

/** A speaker of `language` with the studio's settings (metric, UTC when there is no studio). */
export function speaker(settings: Partial<FormatSettings> & { language: Language }): Speaker {
  const full: FormatSettings = { unitSystem: 'metric', currency: 'EUR', timeZone: 'UTC', ...settings };
  return { language: full.language, format: studioFormat(full) };
}

const englishNumber = (text: string) => Number(String(text).replace(/,/g, ''));

function param(value: string | number | undefined, kind: string | undefined, who: Speaker): string {
  const text = String(value ?? '');
  const f = who.format;
  const [k, context] = (kind ?? '').split(':');
  switch (k) {
    case 'value':
      return (context && VALUES_FR[`${context}.${text}`]) ?? VALUES_FR[text] ?? text;
    case 'notFound':
      return NOT_FOUND_FR[text] ?? `${text} introuvable`;
    case 'num':
      return Number.isFinite(englishNumber(text)) ? f.number(englishNumber(text)) : text;
    case 'length':
      return f.length(englishNumber(text));
    case 'small':
      return f.smallLength(englishNumber(text));
    case 'width':
      return f.fabricWidth(englishNumber(text));
    case 'fabric':
      return f.fabricLength(englishNumber(text));
    case 'day':
      return f.date(text);
    case 'time':
      return f.time(text);
    case 'field':
      return fieldLabel(text);
    case 'text':
      return lowerFirst(translate(text, who) ?? text);
    case 'problems':
      return text.replace(/^(\d+) problems?(?:, the first (\d+) listed)?$/, (_m, n: string, first?: string) =>
        `${n} problème${Number(n) > 1 ? 's' : ''}${first ? `, les ${first} premiers cités` : ''}`);
    case 'bytes':
      return text.replace(/\bMB\b/, 'Mo').replace(/\bkB\b/, 'ko').replace(/\bGB\b/, 'Go').replace(/(\d)\.(\d)/, '$1,$2');
    case 'entity':
      // What a pattern-file reader names: `file`, `outline`, `3 HATCH entities`, `block "B" LINE #1A on layer CUT`.
      return text === 'file' ? 'fichier' : text === 'outline' ? 'contour' : text
        .replace(/^(\d+) (\S+) entit(?:y|ies)$/, (_m, n: string, type: string) => `${n} entité${Number(n) > 1 ? 's' : ''} ${type}`)
        .replace(/^block "(.*?)" /, 'bloc \u00ab\u202f$1\u202f\u00bb ')
        .replace(/ on layer (.*)$/, ' sur le calque $1');
    case 'sizes':
      return text.replace(/, size /g, ', taille ');
    default:
      return text;
  }
}

/** A sentence in the speaker's language from its key. */
export function render(s: Said, who: Speaker): string {
  if (who.language === 'en') return english(s);
  return fill(MESSAGES_FR[s.key], s.params ?? {}, who);
}

function fill(template: string, params: Record<string, string | number>, who: Speaker): string {
  // Typography first, on the template alone: a parameter (a code, a path) keeps its own characters.
  return frenchTypography(template).replace(PLACEHOLDER, (_m, name: string, kind?: string) => param(params[name], kind, who));
}

interface Pattern {
  names: string[];
  test: RegExp;
  fr: string;
}

let patterns: { exact: Map<string, string>; withParams: Pattern[] } | undefined;

/** Every English sentence the server and the shared schemas say, as exact strings and as patterns. */
function catalogue() {
  if (patterns) return patterns;
  const exact = new Map<string, string>();
  const withParams: Pattern[] = [];
  const add = (en: string, fr: string) => {
    if (!en.includes('{')) return void exact.set(en, fr);
    const names: string[] = [];
    const source = en
      .split(/(\{\w+\})/)
      .map((part) => {
        const m = /^\{(\w+)\}$/.exec(part);
        if (!m) return part.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
        names.push(m[1]);
        return '(.+?)';
      })
      .join('');
    withParams.push({ names, test: new RegExp(`^${source}$`, 's'), fr });
  };
  for (const key of Object.keys(MESSAGES_EN) as MessageKey[]) add(MESSAGES_EN[key], MESSAGES_FR[key]);
  for (const [en, fr] of Object.entries(SCHEMA_MESSAGES_FR)) add(en, fr);
  // The most specific first: more fixed text means fewer words left to the parameters.
  withParams.sort((a, b) => b.test.source.replace(/\(\.\+\?\)/g, '').length - a.test.source.replace(/\(\.\+\?\)/g, '').length);
  return (patterns = { exact, withParams });
}

const upperFirst = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
/** After a colon French goes on in lower case, unless the word is a code or a name in capitals. */
export const lowerFirst = (s: string) => (/^[A-ZÀ-Ý][a-zà-ÿ’ ]/.test(s) ? s.charAt(0).toLowerCase() + s.slice(1) : s);

/**
 * The French of a sentence the server wrote in English: a sentence of the catalogue, a field named before
 * its problem (`supplierId: no such supplier`), or null when the sentence is not known. English stays as is.
 */
export function translate(text: string, who: Speaker): string | null {
  if (who.language === 'en') return text;
  const { exact, withParams } = catalogue();
  const direct = exact.get(text) ?? exact.get(upperFirst(text));
  if (direct !== undefined) return frenchTypography(direct);
  for (const p of withParams) {
    const m = p.test.exec(text) ?? p.test.exec(upperFirst(text));
    if (m) return fill(p.fr, Object.fromEntries(p.names.map((n, i) => [n, m[i + 1]])), who);
  }
  const prefixed = /^([A-Za-z][\w-]*(?:\.[\w-]+)*): (.+)$/s.exec(text);
  if (prefixed && isFieldPath(prefixed[1])) {
    const rest = translate(upperFirst(prefixed[2]), who);
    if (rest !== null) return `${fieldLabel(prefixed[1])}\u202f: ${lowerFirst(rest)}`;
  }
  return null;
}

const isFieldPath = (path: string) => path.split('.').some((segment) => segment in FIELD_LABELS_FR);

/**
 * A field's name in French from its path: `lines.2.quantity` → `Quantité (ligne 3)`, `ratio.M` → `Répartition des tailles (M)`.
 * A path with no known name keeps its last segment.
 */
export function fieldLabel(path: string): string {
  const segments = path.split('.');
  let named = -1;
  for (let i = segments.length - 1; i >= 0; i--) {
    if (!/^\d+$/.test(segments[i]) && segments[i] in FIELD_LABELS_FR) {
      named = i;
      break;
    }
  }
  if (named < 0) return segments[segments.length - 1];
  const label = FIELD_LABELS_FR[segments[named]];
  const rows = segments.filter((s, i) => i !== named && /^\d+$/.test(s)).map((s) => `n° ${Number(s) + 1}`);
  const keys = segments.slice(named + 1).filter((s) => !/^\d+$/.test(s) && !(s in FIELD_LABELS_FR));
  const detail = [...rows, ...keys];
  return detail.length ? `${label} (${detail.join(', ')})` : label;
}

const TYPES_FR: Record<string, string> = {
  string: 'un texte', number: 'un nombre', int: 'un nombre entier', boolean: 'oui ou non', array: 'une liste',
  object: 'un ensemble de champs', date: 'une date', bigint: 'un nombre entier',
};

/** A French sentence for one of zod's own checks (one a schema gave no words of its own). */
function zodFrench(issue: z.core.$ZodIssue, input: unknown, who: Speaker): string {
  const n = (v: number | bigint) => who.format.number(Number(v));
  switch (issue.code) {
    case 'invalid_type':
      if (input === undefined || input === null || input === '') return 'À remplir';
      return `Doit être ${TYPES_FR[issue.expected] ?? issue.expected}`;
    case 'too_small':
      if (issue.origin === 'string') return Number(issue.minimum) <= 1 ? 'À remplir' : `Au moins ${n(issue.minimum)} caractères`;
      if (issue.origin === 'array' || issue.origin === 'set') return `Au moins ${n(issue.minimum)} élément${Number(issue.minimum) > 1 ? 's' : ''}`;
      return issue.inclusive ? `Au moins ${n(issue.minimum)}` : `Doit être plus que ${n(issue.minimum)}`;
    case 'too_big':
      if (issue.origin === 'string') return `Au plus ${n(issue.maximum)} caractères`;
      if (issue.origin === 'array' || issue.origin === 'set') return `Au plus ${n(issue.maximum)} éléments`;
      return issue.inclusive ? `Au plus ${n(issue.maximum)}` : `Doit être moins que ${n(issue.maximum)}`;
    case 'invalid_value':
      return `Choisissez parmi\u202f: ${issue.values.map((v) => String(v)).join(', ')}`;
    case 'invalid_format':
      return issue.format === 'email' ? 'Saisissez un e-mail valable' : 'Forme non valable';
    case 'not_multiple_of':
      return `Doit être un multiple de ${n(Number(issue.divisor))}`;
    case 'unrecognized_keys':
      return `Champ${issue.keys.length > 1 ? 's' : ''} inconnu${issue.keys.length > 1 ? 's' : ''}\u202f: ${issue.keys.join(', ')}`;
    default: {
      // zod's own French (z.locales.fr) for the rarer checks, given the input it judged.
      const message = z.locales.fr().localeError({ ...issue, input } as never);
      return typeof message === 'string' ? message : (message?.message ?? 'Valeur non valable');
    }
  }
}

const valueAt = (root: unknown, path: PropertyKey[]) =>
  path.reduce<unknown>((v, k) => (v && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[k] : undefined), root);

/**
 * One refused value in the speaker's language: the schema's own sentence in French when it wrote one,
 * else a French sentence for zod's check.
 */
export function issueMessage(issue: z.core.$ZodIssue, input: unknown, who: Speaker): string {
  if (who.language === 'en') return issue.message;
  return translate(issue.message, who) ?? zodFrench(issue, valueAt(input, issue.path), who);
}
