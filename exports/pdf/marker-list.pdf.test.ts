import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units';
import { buildMarkerListInput } from '../xlsx/fixtures.testing';
import { CUTTING_ROOM_CAUTIONS_TITLE } from './cutting-cautions';
import { buildMarkerListPdf } from './marker-list.pdf';
import { buildCutTicketPdf } from './cut-ticket.pdf';
import { pdfHeader, pdfPageCount, pdfText } from './pdf-reader.testing';

describe('buildMarkerListPdf', () => {
  it('prints heading, lays, rolls and cautions on one page', async () => {
    const pdf = await buildMarkerListPdf(buildMarkerListInput(), { compress: false });
    expect(pdfHeader(pdf)).toBe('%PDF-');
    expect(pdfPageCount(pdf)).toBe(1);
    const text = pdfText(pdf);
    for (const s of [
      'Marker list per roll',
      'Linden Row Studio',
      '14 Mar 2026',
      'DR-12 — Wrap dress',
      'B-2026-07',
    ]) {
      expect(text).toContain(s);
    }
    expect(text).toContain('S×1 M×2 L×1');
    expect(text).toContain('Face to face, zig-zag');
    // Jana (2008) R1 [quoted]: 6.5 m lay; roll A 15 m, 2 plies, 2 m remnant
    expect(text).toContain('6.50 m');
    expect(text).toContain('15.00 m');
    expect(text).toContain('2.00 m');
    expect(text).toContain('1 cm');
    expect(text).toContain(CUTTING_ROOM_CAUTIONS_TITLE);
    expect(text).toContain('mesh (chain-mail) glove');
  });

  it('uses passed-in cautions and yards for an imperial studio', async () => {
    const input = buildMarkerListInput({
      unitSystem: 'imperial',
      cautions: ['Custom caution from the studio.'],
    });
    const text = pdfText(await buildMarkerListPdf(input, { compress: false }));
    expect(text).toContain('Custom caution from the studio.');
    expect(text).not.toContain('mesh (chain-mail) glove');
    // 6.5 m ÷ 0.9144 m/yd = 7.1085 yd = 7 yd 3.906 in (1 yd = 36 in, NIST SP 811 B.9): 3 7/8 in to the nearest 1/8.
    expect(text).toContain('7 yd 3 7/8"');
    expect(text).not.toMatch(/\d\.\d+ (yd|in)\b/);
  });

  // Jana (2008) R1, via Scribd 561483911 [quoted]: 6.5 m lay; roll A 15 m → 2 plies, 2 m left; roll B 16 m → 2 plies, 3 m left.
  it('organises the list by roll when the plan is given by roll: lays in cutting order, what is left, the remnant', async () => {
    const input = buildMarkerListInput({
      byRoll: [
        { rollLabel: 'A', shadeLot: 'Lot 3', startLengthMm: mm(15000), uses: [{ layNo: 1, plies: 2, lengthMm: mm(13000), remainingAfterMm: mm(2000) }], expectedRemnantMm: mm(2000), isStock: true },
        { rollLabel: 'C', shadeLot: 'Lot 4', startLengthMm: mm(7000), uses: [{ layNo: 2, plies: 1, lengthMm: mm(6200), remainingAfterMm: mm(800) }], expectedRemnantMm: mm(800), isStock: false },
      ],
    });
    const text = pdfText(await buildMarkerListPdf(input, { compress: false }));
    expect(text).toContain('Rolls in cutting order');
    expect(text).toContain('Roll A · shade lot Lot 3 · 15.00 m at the start');
    expect(text).toContain('Expected remnant: 2.00 m (kept as a remnant)');
    expect(text).toContain('Expected remnant: 0.80 m (end-of-roll waste)');
    expect(text).not.toContain('Lay 1: rolls');
    expect(text.indexOf('Roll A ·')).toBeLessThan(text.indexOf('Roll C ·'));
  });

  it('is compressed by default and still a PDF', async () => {
    const pdf = await buildMarkerListPdf(buildMarkerListInput());
    expect(pdfHeader(pdf)).toBe('%PDF-');
    expect(pdf.toString('latin1')).toContain('/FlateDecode');
  });
});

describe('buildCutTicketPdf', () => {
  it('prints one page per lay with its ratio, plies per roll and cautions', async () => {
    const pdf = await buildCutTicketPdf(buildMarkerListInput(), { compress: false });
    expect(pdfHeader(pdf)).toBe('%PDF-');
    expect(pdfPageCount(pdf)).toBe(2);
    const text = pdfText(pdf);
    expect(text).toContain('Cut ticket — lay 1');
    expect(text).toContain('Cut ticket — lay 2');
    expect(text).toContain('S×1 M×2 L×1 (16 garments)');
    expect(text).toContain('XL×2 (6 garments)');
    expect(text).toContain('Viscose twill, navy, width 145 cm');
    expect(
      text.match(new RegExp(CUTTING_ROOM_CAUTIONS_TITLE.replace(/[()]/g, '\\$&'), 'g'))?.length,
    ).toBe(2);
  });

  it('gives a single page when there are no lays', async () => {
    const pdf = await buildCutTicketPdf(buildMarkerListInput({ lays: [] }), { compress: false });
    expect(pdfPageCount(pdf)).toBe(1);
    expect(pdfText(pdf)).toContain('No lays in this cut order.');
  });
});
