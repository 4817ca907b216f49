/**
 * The Unicode font every Seamrun PDF draws with: DejaVu Sans (regular and bold) from the dejavu-fonts-ttf
 * package, embedded as a subset with a ToUnicode map, so Cyrillic, Polish (Ł), ₦, ₹ and every other
 * script the font covers print and copy as written. pdfkit's built-in Helvetica only knows WinAnsi and
 * turns those into wrong glyphs. Paths are resolved through Node's module resolution at run time, so
 * the server finds the files from any working directory.
 */
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

/** Names the fonts are registered under in each document. */
export const BODY_FONT = 'SeamrunSans';
export const BOLD_FONT = 'SeamrunSans-Bold';

/** PostScript name of the embedded body font (what a PDF's /BaseFont shows after the subset tag). */
export const BODY_FONT_POSTSCRIPT_NAME = 'DejaVuSans';

let fontDir: string | null = null;
const dejavuDir = () => {
  if (fontDir) return fontDir;
  const require = createRequire(import.meta.url);
  // The package has no "main"; resolve its package.json and take the ttf/ folder beside it.
  fontDir = join(dirname(require.resolve('dejavu-fonts-ttf/package.json')), 'ttf');
  return fontDir;
};

/** Register the body and bold fonts on a new document and make the body font current. */
export function useSeamrunFonts(doc: PDFKit.PDFDocument): PDFKit.PDFDocument {
  doc.registerFont(BODY_FONT, join(dejavuDir(), 'DejaVuSans.ttf'));
  doc.registerFont(BOLD_FONT, join(dejavuDir(), 'DejaVuSans-Bold.ttf'));
  return doc.font(BODY_FONT);
}
