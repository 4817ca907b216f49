/**
 * Test helpers for PDFs built with `compress: false`: the header, the page count and the text shown.
 * pdfkit writes text as hex strings in TJ arrays, split at kerning pairs. With an embedded TrueType font
 * (every Seamrun PDF) each 4 hex digits are a glyph id, turned back into text through the font's
 * ToUnicode CMap, as a PDF reader's copy and search do (ISO 32000-1 §9.10.3); with a built-in font
 * each byte is a windows-1252 character.
 */
export function pdfHeader(pdf: Buffer): string {
  return pdf.subarray(0, 5).toString('latin1');
}

/** Number of page objects (`/Type /Page`, not `/Pages`). */
export function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type \/Page(?![a-z])/g)?.length ?? 0;
}

/** The text lines drawn, one per TJ operator, in content order, decoded through each font's ToUnicode map. */
export function pdfTextLines(pdf: Buffer): string[] {
  const text = pdf.toString('latin1');
  const maps = toUnicodeByFontName(text);
  const lines: string[] = [];
  let font: Map<number, string> | undefined;
  for (const m of text.matchAll(/\/([A-Za-z0-9]+) [\d.]+ Tf|\[([^\]]*)\] TJ/g)) {
    if (m[1] !== undefined) {
      font = maps.get(m[1]);
      continue;
    }
    const hex = [...m[2].matchAll(/<([0-9a-fA-F]*)>/g)].map((h) => h[1]).join('');
    if (!font) lines.push(decodeWinAnsi(Buffer.from(hex, 'hex')));
    else lines.push((hex.match(/.{4}/g) ?? []).map((g) => font!.get(parseInt(g, 16)) ?? '\uFFFD').join(''));
  }
  return lines;
}

/** Every embedded font's glyph → text map, by the resource name pages use (`/F1`). */
export function toUnicodeByFontName(text: string): Map<string, Map<number, string>> {
  const objects = new Map<string, string>();
  for (const m of text.matchAll(/(\d+) 0 obj([\s\S]*?)endobj/g)) objects.set(m[1], m[2]);
  const out = new Map<string, Map<number, string>>();
  for (const dict of text.matchAll(/\/Font <<([^>]*)>>/g)) {
    for (const ref of dict[1].matchAll(/\/([A-Za-z0-9]+) (\d+) 0 R/g)) {
      const cmapRef = objects.get(ref[2])?.match(/\/ToUnicode (\d+) 0 R/)?.[1];
      const cmap = cmapRef ? objects.get(cmapRef) : undefined;
      if (cmap) out.set(ref[1], parseToUnicode(cmap));
    }
  }
  return out;
}

// pdfkit writes a glyph that stands for several characters (a ligature such as "fi") as `<0066 0069>`.
const utf16 = (hex: string) => Buffer.from(hex.replace(/\s+/g, ''), 'hex').swap16().toString('utf16le');

/** bfchar and bfrange entries of a ToUnicode CMap (both the array and the incrementing form). */
export function parseToUnicode(cmap: string): Map<number, string> {
  const map = new Map<number, string>();
  for (const block of cmap.matchAll(/beginbfchar([\s\S]*?)endbfchar/g)) {
    for (const m of block[1].matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>/g)) map.set(parseInt(m[1], 16), utf16(m[2]));
  }
  for (const block of cmap.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
    for (const m of block[1].matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>\s*(\[[^\]]*\]|<[0-9a-fA-F]+>)/g)) {
      const lo = parseInt(m[1], 16);
      const hi = parseInt(m[2], 16);
      if (m[3].startsWith('[')) [...m[3].matchAll(/<([0-9a-fA-F\s]+)>/g)].forEach((u, i) => map.set(lo + i, utf16(u[1])));
      else {
        const first = parseInt(m[3].slice(1, -1), 16);
        for (let c = lo; c <= hi; c++) map.set(c, String.fromCodePoint(first + c - lo));
      }
    }
  }
  return map;
}

/** The /BaseFont names of the fonts in a PDF (subset tag included, e.g. `BZJMSM+DejaVuSans`). */
export function pdfFontNames(pdf: Buffer): string[] {
  return [...new Set([...pdf.toString('latin1').matchAll(/\/BaseFont \/([^\s/>]+)/g)].map((m) => m[1]))];
}

/** All text joined by newlines. */
export function pdfText(pdf: Buffer): string {
  return pdfTextLines(pdf).join('\n');
}

/** Number of embedded images (`/Subtype /Image`), not counting the alpha masks (SMask) of PNGs. */
export function pdfImageCount(pdf: Buffer): number {
  const text = pdf.toString('latin1');
  const images = text.match(/\/Subtype \/Image/g)?.length ?? 0;
  const masks = text.match(/\/SMask \d+ 0 R/g)?.length ?? 0;
  return images - masks;
}

/** windows-1252 bytes 0x80–0x9F differ from Latin-1 (Node's small-ICU TextDecoder treats them as Latin-1). */
const CP1252_HIGH =
  '\u20ac\u0081\u201a\u0192\u201e\u2026\u2020\u2021\u02c6\u2030\u0160\u2039\u0152\u008d\u017d\u008f' +
  '\u0090\u2018\u2019\u201c\u201d\u2022\u2013\u2014\u02dc\u2122\u0161\u203a\u0153\u009d\u017e\u0178';

function decodeWinAnsi(bytes: Buffer): string {
  let out = '';
  for (const b of bytes)
    out += b >= 0x80 && b <= 0x9f ? CP1252_HIGH[b - 0x80] : String.fromCharCode(b);
  return out;
}
