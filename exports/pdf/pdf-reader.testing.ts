/**
 * Test helpers for PDFs built with `compress: false`: the header, the page count and the text shown.
 * pdfkit writes Helvetica text as hex strings in TJ arrays (WinAnsi bytes), split at kerning pairs; joining
 * the hex runs of each TJ and decoding as windows-1252 gives back the line.
 */
export function pdfHeader(pdf: Buffer): string {
  return pdf.subarray(0, 5).toString('latin1');
}

/** Number of page objects (`/Type /Page`, not `/Pages`). */
export function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type \/Page(?![a-z])/g)?.length ?? 0;
}

/** The text lines drawn, one per TJ operator, in content order. */
export function pdfTextLines(pdf: Buffer): string[] {
  const lines: string[] = [];
  for (const m of pdf.toString('latin1').matchAll(/\[([^\]]*)\] TJ/g)) {
    const hex = [...m[1].matchAll(/<([0-9a-fA-F]*)>/g)].map((h) => h[1]).join('');
    lines.push(decodeWinAnsi(Buffer.from(hex, 'hex')));
  }
  return lines;
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
