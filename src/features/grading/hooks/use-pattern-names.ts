import type { TFunction } from 'i18next';
import { useMemo } from 'react';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

/** Names of what the grading core drafts, read in the studio's language. English shows the core's own names. */
export interface PatternNames {
  /** A piece's name (`Bodice front`, `Front lining`, `Sleeve (contrast)`); a name the studio typed stays as typed. */
  piece(name: string): string;
  /** A seam's name (`Side seam`, `Front facing to front`, `Side seam (lining) 2`). */
  seam(name: string): string;
  /** An edge or a grade point (`side`, `cf-hem`, `notch 2`, `hem start`); several edges joined by ` + `. */
  part(name: string): string;
  /** One side of a seam: `Front: side + hem`. */
  side(piece: string, edges: readonly string[]): string;
}


/** The names in the language of `t` (a key with a dot or a colon in it is never looked up). */
export function patternNames(t: TFunction): PatternNames {
  const look = (section: string, name: string) => (/[.:]/.test(name) ? null : t(`${area}.core.${section}.${name}`, { defaultValue: '' }) || null);
  const material = (name: string) => look('materials', name) ?? name;
  const piece = (name: string): string => {
    const direct = look('pieces', name);
    if (direct) return direct;
    let m = /^(.+) (lining|interfacing)$/.exec(name);
    if (m && look('pieces', m[1])) return t(`${area}.core.patterns.${m[2]}`, { piece: piece(m[1]) });
    m = /^(.+) \(([^)]+)\)$/.exec(name);
    if (m && look('pieces', m[1])) return `${piece(m[1])} (${material(m[2])})`;
    return name;
  };
  const seam = (name: string): string => {
    let m = /^(.+) (\d+)$/.exec(name);
    if (m) return `${seam(m[1])} ${m[2]}`;
    m = /^(.+) \(([^)]+)\)$/.exec(name);
    if (m) return `${seam(m[1])} (${material(m[2])})`;
    const direct = look('seams', name);
    if (direct) return direct;
    m = /^(.+) to (.+)$/.exec(name);
    if (m && look('pieces', m[1])) {
      // The core writes the second piece in lower case: "Front facing to bodice front".
      const mate = m[2].charAt(0).toUpperCase() + m[2].slice(1);
      const b = look('pieces', mate);
      return t(`${area}.core.patterns.onto`, { a: piece(m[1]), b: b ? b.charAt(0).toLowerCase() + b.slice(1) : m[2] });
    }
    return name;
  };
  const part = (name: string): string => {
    if (name.includes(' + ')) return name.split(' + ').map(part).join(' + ');
    const direct = look('parts', name);
    if (direct) return direct;
    let m = /^notch (\d+)$/.exec(name);
    if (m) return t(`${area}.core.patterns.notch`, { n: m[1] });
    m = /^(.+) start$/.exec(name);
    if (m) return t(`${area}.core.patterns.start`, { part: part(m[1]) });
    return name;
  };
  return { piece, seam, part, side: (p, edges) => t(`${area}.side`, { piece: piece(p), edges: edges.map(part).join(' + ') }) };
}

/** {@link patternNames} in the person's language, for a component. */
export function usePatternNames(): PatternNames {
  const { t, i18n } = useTranslation();
  return useMemo(() => patternNames(t), [t, i18n.language]);
}
