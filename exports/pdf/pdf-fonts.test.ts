import { describe, expect, it } from 'vitest';
import { cuttingOutline, demoSizeChart, draftShirtDress, measurementsForSize } from '@grading';
import { buildBundleTicketsInput, buildMarkerListInput } from '../xlsx/fixtures.testing';
import { buildBundleTicketsPdf } from './bundle-tickets.pdf';
import { buildCutTicketPdf } from './cut-ticket.pdf';
import { buildMarkerListPdf } from './marker-list.pdf';
import { BODY_FONT_POSTSCRIPT_NAME } from './pdf-fonts';
import { pdfFontNames, pdfText, toUnicodeByFontName } from './pdf-reader.testing';
import { tiledPiecePdf } from './tiled-piece';

// Cyrillic, Polish Ł, naira and rupee signs: none of them is in WinAnsi, the only encoding of pdfkit's Helvetica.
const STUDIO = 'Ателье Łódź ₦ ₹';
const piece = draftShirtDress(measurementsForSize(demoSizeChart(), 'M'))[0];

const builders: [string, () => Promise<Buffer>][] = [
  ['marker list', () => buildMarkerListPdf(buildMarkerListInput({ studioName: STUDIO }), { compress: false })],
  ['cut ticket', () => buildCutTicketPdf(buildMarkerListInput({ studioName: STUDIO }), { compress: false })],
  ['bundle tickets', () => buildBundleTicketsPdf({ ...buildBundleTicketsInput(), studioName: STUDIO }, { compress: false })],
  ['tiled piece', () => tiledPiecePdf(piece, { cutting: cuttingOutline(piece), uncompressed: true, title: STUDIO })],
];

describe('PDF text in every script', () => {
  it.each(builders)('embeds DejaVu Sans, never a built-in font, in the %s', async (_name, build) => {
    const names = pdfFontNames(await build());
    // A subset font's /BaseFont is a six-letter tag, "+", then the PostScript name (ISO 32000-1 §9.6.4).
    expect(names.some((n) => new RegExp(`^[A-Z]{6}\\+${BODY_FONT_POSTSCRIPT_NAME}$`).test(n))).toBe(true);
    expect(names.filter((n) => !n.includes('DejaVu'))).toEqual([]);
  });

  it.each(builders)('maps Cyrillic, Ł, ₦ and ₹ back through the ToUnicode CMap in the %s', async (_name, build) => {
    const pdf = await build();
    const mapped = new Set([...toUnicodeByFontName(pdf.toString('latin1')).values()].flatMap((m) => [...m.values()]));
    for (const ch of ['А', 'т', 'е', 'л', 'ь', 'Ł', '₦', '₹']) expect([ch, mapped.has(ch)]).toEqual([ch, true]);
    expect(pdfText(pdf)).toContain(STUDIO);
  });
});
