import { describe, expect, it } from 'vitest';
import { buildMaterialCutTicketPdf, type MaterialCutTicketInput } from './material-cut-ticket.pdf';
import { pdfPageCount, pdfText } from './pdf-reader.testing';

const input = (over: Partial<MaterialCutTicketInput> = {}): MaterialCutTicketInput => ({
  studioName: 'Linden Row Studio', dateIso: '2026-03-14', locale: 'en-GB', unitSystem: 'metric',
  style: { code: 'SR-202', name: 'Lined fitted dress' }, batch: { code: 'B-0007' }, material: 'lining',
  fabric: { description: 'Usiku viscose lining', widthMm: 1400 },
  sizes: [{ size: 'S', quantity: 10 }, { size: 'M', quantity: 20 }, { size: 'L', quantity: 0 }],
  pieces: [{ name: 'Bodice front lining', copiesPerGarment: 1, mirrored: false }, { name: 'Bodice back lining', copiesPerGarment: 2, mirrored: true }],
  ...over,
});

describe('buildMaterialCutTicketPdf', () => {
  it('lists the material\'s pieces with copies per garment × garments of each size, and their totals', async () => {
    const text = pdfText(await buildMaterialCutTicketPdf(input(), { compress: false }));
    expect(pdfPageCount(await buildMaterialCutTicketPdf(input(), { compress: false }))).toBe(1);
    for (const s of ['Cut ticket by material: lining', 'SR-202 — Lined fitted dress', 'B-0007', 'Usiku viscose lining, width 140 cm', '30 (S 10, M 20)']) expect(text).toContain(s);
    // Bodice back lining: 2 per garment → S 20, M 40, total 60; all pieces 3 per garment → 30, 60, 90.
    expect(text).toMatch(/Bodice back lining \(L \+ R\)\s*2\s*20\s*40\s*60/);
    expect(text).toMatch(/All pieces\s*3\s*30\s*60\s*90/);
    expect(text).not.toMatch(/\bL\b\s*Total/);
  });

  it('says when the material has no pieces or no fabric linked yet', async () => {
    const text = pdfText(await buildMaterialCutTicketPdf(input({ pieces: [], fabric: null }), { compress: false }));
    expect(text).toContain('No pieces are cut from lining in this style.');
    expect(text).toContain('not linked yet');
  });
});
