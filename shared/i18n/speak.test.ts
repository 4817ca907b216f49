import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { MESSAGES_EN, MESSAGES_FR, NOT_FOUND_FR, type MessageKey } from './messages';
import { english, fieldLabel, issueMessage, render, said, speaker, translate } from './speak';
import { FIELD_LABELS_FR } from './validation-words';

const fr = speaker({ language: 'fr', unitSystem: 'imperial', currency: 'CAD', timeZone: 'America/Toronto' });
const en = speaker({ language: 'en' });
const names = (template: string) => [...template.matchAll(/\{(\w+)(?:\|[\w:]+)?\}/g)].map((m) => m[1]);
/** Parameters only a sentence written with its key carries (raw millimetres beside the English figure). */
const KEY_ONLY_PARAMS = new Set(['remainingMm']);

/** Every file under a folder, tests left out. */
function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sources(path);
    return /\.ts$/.test(name) && !/\.test\.ts$|\.testing\.ts$/.test(name) ? [path] : [];
  });
}

/** A literal with its `${…}` parts given a sample value, as the server would write it. */
const sample = (literal: string) =>
  literal
    .replace(/^\$\{[^}]*\}:/, 'name:')
    .replace(/(?<=\p{L})\$\{[^}]*\}/gu, 's')
    .replace(/\$\{[^}]*\}/g, '7');
/** A literal that is only a field and a sentence made elsewhere (`file: ${m}`): its words are checked where they are made. */
const madeElsewhere = (literal: string) => /^(?:[\w.]+|\$\{[^}]*\}): \$\{[^}]*\}$/.test(literal) || /^\$\{[^}]*\}$/.test(literal);

describe('the server dictionary', () => {
  it('has French for every English sentence, with no parameter French does not get', () => {
    for (const key of Object.keys(MESSAGES_EN) as MessageKey[]) {
      expect(MESSAGES_FR[key], key).toBeTruthy();
      expect(MESSAGES_FR[key], key).not.toBe(MESSAGES_EN[key]);
      for (const name of names(MESSAGES_FR[key])) expect([...names(MESSAGES_EN[key]), ...KEY_ONLY_PARAMS], `${key}: {${name}}`).toContain(name);
    }
  });

  it('sets the narrow no-break space of French typography before : ; ! ? % and never a plain one', () => {
    for (const key of Object.keys(MESSAGES_EN) as MessageKey[]) {
      const text = render(said(key, { what: 'Batch', n: 3 }), fr);
      expect(text, key).not.toMatch(/ [:;!?%]/);
    }
    expect(render(said('lockedOut'), fr)).toBe('Trop d’essais manqués\u202f; réessayez dans 15 minutes');
  });

  it('writes English byte for byte as the server always did', () => {
    expect(english(said('markerQueueFull', { max: 5 }))).toBe(
      'Your studio already has 5 markers waiting to run; wait for one to finish or cancel one, then start this marker again',
    );
    expect(translate('supplierId: no such supplier', en)).toBe('supplierId: no such supplier');
  });

  it('knows every sentence the server refuses with, by its English wording', () => {
    const unknown: string[] = [];
    const call = /(?:badRequest|conflict|forbidden|unauthenticated|notFound|new AppError\(\s*\d+,\s*'\w+',)\(?\s*((?:'[^']*'|`[^`]*`|"[^"]*"))/g;
    for (const file of sources('server')) {
      for (const m of readFileSync(file, 'utf8').matchAll(call)) {
        if (/(?:errors|speak)\.ts$/.test(file) || madeElsewhere(m[1].slice(1, -1))) continue;
        const text = sample(m[1].slice(1, -1));
        if (/^notFound/.test(m[0])) {
          if (!(text in NOT_FOUND_FR)) unknown.push(`${file}: notFound('${text}')`);
        } else if (translate(text, fr) === null) unknown.push(`${file}: ${text}`);
      }
    }
    expect(unknown).toEqual([]);
  });

  it('knows every sentence the shared schemas say when they refuse a value', () => {
    const unknown: string[] = [];
    const message = /(?:error|message): ?('[^']*'|`[^`]*`)|\.(?:min|max|int|positive|nonnegative|regex|length|email|gte|lte|gt|lt|multipleOf)\([^)]*?('[^']+'|`[^`]+`)\s*\)/g;
    for (const file of sources('shared/schemas')) {
      for (const m of readFileSync(file, 'utf8').matchAll(message)) {
        const text = sample((m[1] ?? m[2]).slice(1, -1));
        if (translate(text, fr) === null) unknown.push(`${file}: ${text}`);
      }
    }
    expect(unknown).toEqual([]);
  });

  it('names every field of the shared schemas in French', async () => {
    const keys = new Set<string>();
    const seen = new Set<unknown>();
    const walk = (schema: unknown) => {
      const def = (schema as { _zod?: { def?: Record<string, unknown> } })?._zod?.def;
      if (!def || seen.has(schema)) return;
      seen.add(schema);
      if (def.type === 'object') {
        for (const [k, v] of Object.entries(def.shape as object)) {
          keys.add(k);
          walk(v);
        }
      }
      for (const k of ['innerType', 'in', 'out', 'element', 'left', 'right', 'schema', 'valueType', 'keyType']) walk(def[k]);
      for (const o of [...((def.options as unknown[]) ?? []), ...((def.items as unknown[]) ?? [])]) walk(o);
    };
    for (const file of sources('shared/schemas')) for (const v of Object.values(await import(`../../${file}`))) if (v instanceof z.ZodType) walk(v);
    expect(keys.size).toBeGreaterThan(100);
    expect([...keys].filter((k) => !(k in FIELD_LABELS_FR))).toEqual([]);
  });
});

describe('a French answer', () => {
  it('gives a remnant and a roll width in yards and inches for an imperial studio', () => {
    // 1 yd = 914.4 mm and 1 in = 25.4 mm exactly (NIST SP 811, Appendix B): 2743.2 mm = 3 yd; 1524 mm = 60".
    expect(render(said('remnantTooLong', { label: 'R-1', remaining: '2.74', remainingMm: 2743.2 }), fr)).toBe(
      'Le rouleau R-1 n’avait plus que 3 vg\u202f; le reste ne peut pas être plus long',
    );
    expect(render(said('rollTooNarrow', { label: 'R-2', width: 1397, marker: 1524 }), fr)).toContain('laize de 55"');
  });

  it('tells the time of an earlier log in the studio’s zone, not in UTC', () => {
    const text = render(said('alreadyLogged', { number: 12, operation: 'S1 Join shoulders', who: 'Amina', at: '2026-12-02T16:32:00Z' }), fr);
    // Toronto is UTC−5 in December (IANA tz database, America/Toronto).
    expect(text).toBe('Paquet 12 · S1 Join shoulders\u202f: déjà enregistré par Amina à 11 h 32');
  });

  it('names the field in French before what is wrong with it', () => {
    expect(translate('supplierId: no such supplier', fr)).toBe('Fournisseur\u202f: fournisseur inconnu');
    expect(translate('Batch not found', fr)).toBe('Série introuvable');
    expect(translate('Batch B-0003 is shipped; nothing more is logged on it', fr)).toBe('La série B-0003 est expédiée\u202f; plus rien n’y est enregistré');
    expect(translate('Your studio already has 5 markers waiting to run; wait for one to finish or cancel one, then start this marker again', fr)).toBe(
      'Votre atelier a déjà 5 placements en attente\u202f; attendez qu’un placement se termine ou annulez-en un, puis relancez celui-ci',
    );
    expect(translate('This marker is cancelled; only a queued or running marker can be cancelled', fr)).toMatch(/^Ce placement est annulé\u202f;/);
    expect(fieldLabel('lines.2.quantity')).toBe('Quantité (n° 3)');
    expect(fieldLabel('ratio.M')).toBe('Répartition des tailles (M)');
  });

  it('says zod’s own checks in French, and a schema’s own words in French', () => {
    const schema = z.object({ name: z.string().min(1, 'Name is required').max(5), qty: z.number().int() });
    const input = { name: 'too long', qty: undefined };
    const issues = schema.safeParse(input).error!.issues;
    expect(issues.map((i) => issueMessage(i, input, fr))).toEqual(['Au plus 5 caractères', 'À remplir']);
    const empty = { name: '', qty: 1.5 };
    expect(schema.safeParse(empty).error!.issues.map((i) => issueMessage(i, empty, fr))).toEqual(['À remplir', 'Doit être un nombre entier']);
  });
});

describe('the costing sheet notes', () => {
  it('says the server\'s costing notes in French, with the figures they carry', () => {
    const fr = speaker({ language: 'fr' });
    expect(translate('No operation list yet: labour uses an estimated 45 standard minutes.', fr)).toBe('Pas encore de gamme d’opérations\u202f: la main-d’œuvre compte 45 minutes standard estimées.');
    expect(translate('Enter a labour cost per minute in the settings.', fr)).toBe('Saisissez un coût de la minute de main-d’œuvre dans les réglages.');
  });
});

describe('the pay page notes', () => {
  it('says the test-payments note in French', () => {
    expect(translate('Test payments: no money moves.', speaker({ language: 'fr' }))).toBe('Paiements d’essai\u202f: aucun argent ne circule.');
  });
});

/**
 * The string literals `pick` finds in each file (its first group), each as the server would write it (`text`,
 * or null to leave it out), that have no French: a reader may not report a problem the dictionary lacks.
 */
function untranslated(files: string[], pick: RegExp, text: (literal: string) => string | null): string[] {
  const unknown: string[] = [];
  for (const file of files) {
    const literals = [...readFileSync(file, 'utf8').matchAll(pick)].map((m) => m[1].slice(1, -1));
    expect(literals.length, file).toBeGreaterThan(0);
    for (const literal of literals) {
      const said = text(literal);
      if (said !== null && translate(said, fr) === null) unknown.push(`${file}: ${literal}`);
    }
  }
  return unknown;
}

describe('the problems found reading an imported table', () => {
  const TABLE_READERS = ['grading/size-charts/size-chart-table.ts', 'server/modules/line/operations-sheet.ts', 'server/modules/cutting/packing-list.ts'];

  it('knows every problem the size-chart, operations-sheet and packing-list readers report', () => {
    // A reader's own library error (`${(err as Error).message}`) is not ours to word.
    expect(untranslated(TABLE_READERS, /(?:message: |bad\([^,]+, )('[^']*'|`[^`]*`)/g, (literal) => (/\$\{\(err/.test(literal) ? null : sample(literal)))).toEqual([]);
  });

  it('says a bad cell of a size chart in French, inside the sentence that refuses the file', () => {
    const text = 'row 4, column 3: not a length: "abc" (2 problems; nothing imported)';
    expect(translate(text, fr)).toBe('ligne 4, colonne 3\u202f: pas une longueur\u202f: «\u202fabc\u202f» (2 problèmes\u202f; rien n’est importé)');
    expect(translate('expected 5 values, got 3', fr)).toBe('5 valeurs attendues, 3 trouvées');
    expect(translate(text, en)).toBe(text);
  });
});

describe('the problems found reading a pattern file', () => {
  const PATTERN_READERS = ['exports/import/dxf-pattern.ts', 'exports/import/svg-pattern.ts'];

  it('knows every problem the DXF and SVG readers report', () => {
    // The entity label (`LINE #1A on layer CUT`) is not a sentence: the `entity` kind words it (test below).
    // A type name or an SVG tag built into a sentence is sampled as a word, not as a number.
    const pick = /(?:reason: |new Error\(|return )('[^']*'|`[^`]*`)/g;
    expect(untranslated(PATTERN_READERS, pick, (literal) => (literal.startsWith('${where}') ? null : sample(literal.replace(/\$\{(?:e\.type|type|tag|cmd)\}/g, 'LINE'))))).toEqual([]);
  });

  it('says an open outline in French, naming the entity and the layer, inside the sentence that refuses the file', () => {
    // The sentence server/modules/grading/pattern-import.ts writes for the first problem of a DXF.
    const text = 'LWPOLYLINE #2F on layer CUT: outline does not close: its ends are 1.25 mm apart, near x = 10.0 mm, y = 20.5 mm (2 problems; nothing imported)';
    expect(translate(text, fr)).toBe('LWPOLYLINE #2F sur le calque CUT\u202f: le contour ne se ferme pas\u202f: ses extrémités sont à 1,25 mm l’une de l’autre, près de x = 10 mm, y = 20,5 mm (2 problèmes\u202f; rien n’est importé)');
    expect(translate('3 HATCH entities: HATCH entities are not read (1 problem; nothing imported)', fr)).toBe('3 entités HATCH\u202f: les entités HATCH ne sont pas lues (1 problème\u202f; rien n’est importé)');
    expect(translate(text, en)).toBe(text);
  });
});

describe('the costing sheet notes on other materials', () => {
  // The exact sentences server/modules/costing/costing.service.ts writes; each must have its French.
  it('says each in French', () => {
    for (const note of [
      'Usiku viscose lining: estimated from the cut area of the pieces of lining at 75 % utilisation, until it has its own marker.',
      "Usiku viscose lining: estimated from the cut area of the pieces of lining at 53 % utilisation, that of the style's marker on it.",
      "Usiku viscose lining: estimated from the cut area of the pieces of lining and facing at 61 % utilisation, that of the style's 3 markers on it.",
      'Usiku viscose lining: from its own cut plan for this batch, wastage included.',
    ]) {
      const said = translate(note, fr);
      expect(said, note).not.toBeNull();
      expect(said).toMatch(/^Usiku viscose lining\u202f: /);
    }
  });
});
