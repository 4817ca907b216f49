/**
 * What an uploaded file really is, judged from its bytes (never from the client's name or type): binary
 * formats by their signatures (file-type), CSV and SVG by looking at the text.
 */
export type Sniffed = { ext: string; mime: string } | null;

const XLSX_MIME = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/** Which detected types each kind of upload accepts. */
export const ACCEPTED: Record<string, string[]> = {
  sketch: ['png', 'jpg', 'webp', 'gif', 'svg'],
  photo: ['png', 'jpg', 'webp'],
  swatch: ['png', 'jpg', 'webp'],
  'packing-list': ['csv', 'xlsx'],
  measurements: ['csv', 'xlsx'],
};

function asText(buf: Buffer): string | null {
  if (buf.includes(0)) return null;
  const text = buf.toString('utf8');
  // U+FFFD means the bytes were not UTF-8.
  return text.includes('\uFFFD') ? null : text;
}

/** A CSV: text whose first line has a comma, semicolon or tab and whose lines are printable. */
export function looksLikeCsv(text: string): boolean {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/).filter((l) => l.length);
  if (!lines.length || !/[,;\t]/.test(lines[0])) return false;
  // eslint-disable-next-line no-control-regex
  return !/[\x00-\x08\x0B\x0C\x0E-\x1F]/.test(text) && !/^\s*</.test(text);
}

/**
 * Reasons to refuse an SVG: scripts, event handlers, javascript: URLs, embedded HTML, entity tricks and
 * references to anything outside the file (only #fragment links are allowed). Empty when it is clean.
 */
export function svgProblems(text: string): string[] {
  const rules: [RegExp, string][] = [
    [/<script\b/i, 'a script'],
    [/\son[a-z]+\s*=/i, 'an event handler (on… attribute)'],
    [/javascript:/i, 'a javascript: link'],
    [/<foreignObject\b/i, 'embedded HTML (foreignObject)'],
    [/<!ENTITY|<!DOCTYPE/i, 'a DOCTYPE or entity declaration'],
    [/\b(?:xlink:)?href\s*=\s*["']\s*(?!#)/i, 'a link to another file'],
    [/url\(\s*["']?\s*(?!#)/i, 'a url() to another file'],
    [/@import/i, 'a style @import'],
  ];
  return rules.filter(([re]) => re.test(text)).map(([, why]) => why);
}

/** Detects the file's type from its content; null when it is nothing we accept anywhere. */
export async function sniffUpload(buf: Buffer): Promise<Sniffed> {
  const { fileTypeFromBuffer } = await import('file-type');
  const found = await fileTypeFromBuffer(buf);
  if (found) {
    if (found.ext === 'xlsx') return { ext: 'xlsx', mime: XLSX_MIME };
    if (['png', 'jpg', 'webp', 'gif'].includes(found.ext)) return { ext: found.ext, mime: found.mime };
    return null;
  }
  const text = asText(buf);
  if (text === null) return null;
  if (/^\s*(<\?xml[^>]*>\s*)?(<!--[\s\S]*?-->\s*)*<svg[\s>]/i.test(text)) return { ext: 'svg', mime: 'image/svg+xml' };
  if (looksLikeCsv(text)) return { ext: 'csv', mime: 'text/csv' };
  return null;
}
