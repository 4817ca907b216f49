/**
 * French typography for text written with plain spaces: a narrow no-break space (U+202F) before : ; ! ? %
 * and » and after «, where the source has a plain space (or a no-break one). Pure.
 * Source: Lexique des règles typographiques en usage à l'Imprimerie nationale (ponctuation haute, guillemets).
 */
export function frenchTypography(text: string): string {
  return text.replace(/[ \u00a0]([:;!?%»])/g, '\u202f$1').replace(/«[ \u00a0]/g, '«\u202f');
}

/** {@link frenchTypography} on every string of a dictionary (nested objects kept), for words typed with plain spaces. */
export function withFrenchTypography<T>(words: T): T {
  if (typeof words === 'string') return frenchTypography(words) as T;
  if (words && typeof words === 'object') {
    return Object.fromEntries(Object.entries(words).map(([k, v]) => [k, withFrenchTypography(v)])) as T;
  }
  return words;
}
