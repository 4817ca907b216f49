import { describe, expect, it } from 'vitest';
import { minor, mm } from '@shared/units';
import { buildBundleTicketsPdf } from './pdf/bundle-tickets.pdf';
import { buildCutTicketPdf } from './pdf/cut-ticket.pdf';
import { pdfText } from './pdf/pdf-reader.testing';
import { buildCostingSheetXlsx } from './xlsx/costing-sheet.xlsx';
import { buildBundleTicketsInput, buildMarkerListInput } from './xlsx/fixtures.testing';
import { readWorkbook } from './xlsx/workbook-reader.testing';
import type { CostingSheetInput } from './types';

/** Words an English document prints that must not reach a French one. */
const ENGLISH = ['Style', 'Batch', 'Marker length', 'Plies per roll', 'Shade lot', 'Expected remnant', 'Cutting-room cautions', 'garments', 'Bundle ticket', 'Pieces', 'Unit cost', 'Wholesale price', 'Suggested retail price', 'Lengths in', 'Cost line'];
const french = { language: 'fr' as const, locale: 'fr-CA', timeZone: 'America/Toronto' };

describe('documents in the studio language', () => {
  it('prints a cut ticket in French, in yards and inches, with no English label', async () => {
    const text = pdfText(await buildCutTicketPdf({ ...buildMarkerListInput({ unitSystem: 'imperial' }), ...french }, { compress: false }));
    expect(text).toContain('Fiche de coupe — matelas 1');
    expect(text).toContain('Longueur du placement');
    // 6.5 m = 7 yd 3 7/8 in (1 yd = 0.9144 m, 1 in = 25.4 mm: NIST SP 811 B.9); verge is the French yard.
    expect(text).toContain('7 vg 3 7/8"');
    for (const word of ENGLISH) expect(text, word).not.toContain(word);
    expect(text).not.toMatch(/\d[.,]\d+ (yd|vg|in|po|m)\b/);
  });

  it('prints bundle tickets in French with French plurals and decimal commas', async () => {
    const text = pdfText(await buildBundleTicketsPdf({ ...buildBundleTicketsInput(), ...french }, { compress: false }));
    expect(text).toContain('Ticket de paquet');
    expect(text).toMatch(/Temps alloué \d+,\d\d min/);
    expect(text).toMatch(/\d+ pièces/);
    for (const word of ENGLISH) expect(text, word).not.toContain(word);
  });

  it('dates a document in the studio time zone, not UTC', async () => {
    // 2026-12-03T02:00Z is 21:00 on 2 December in Toronto (UTC−5 in December, IANA tz database).
    const text = pdfText(await buildCutTicketPdf({ ...buildMarkerListInput(), ...french, dateIso: '2026-12-03T02:00:00Z' }, { compress: false }));
    expect(text).toContain('2 déc. 2026');
    expect(text).not.toContain('3 déc. 2026');
  });

  it('writes the costing workbook in French', async () => {
    const input: CostingSheetInput = {
      studioName: 'Atelier Laurier', dateIso: '2026-12-02', currency: 'CAD', unitSystem: 'imperial', ...french,
      style: { code: 'K1', name: 'Robe' }, batch: { code: 'B-0001' }, sizes: [{ size: 'M', quantity: 4 }],
      fabrics: [{ description: 'Popeline', pricePerLengthMinor: minor(799), consumptionMmBySize: { M: mm(2743.2) } }],
      trims: [{ description: 'Boutons', quantityPerGarment: 6, unit: 'pcs', unitPriceMinor: minor(15) }],
      labour: [{ operation: 'Montage', samMinutes: 30, rate: { perHourMinor: minor(1800) } }],
      overheads: [], marginPercent: 40, retailMultiplier: 2,
    };
    const workbook = await readWorkbook(await buildCostingSheetXlsx(input));
    const sheet = workbook.worksheets[0];
    expect(sheet.name).toBe('Fiche de prix de revient');
    const cells: string[] = [];
    sheet.eachRow((row) => row.eachCell((c) => { if (typeof c.value === 'string') cells.push(c.value); }));
    expect(cells).toContain('Coût unitaire');
    expect(cells).toContain('verges');
    expect(cells).toContain('Tissu');
    for (const word of ENGLISH) expect(cells.join('\n'), word).not.toContain(word);
  });
});
