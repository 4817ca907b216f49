import { describe, expect, it } from 'vitest';
import { buildBundleTicketsInput } from '../xlsx/fixtures.testing';
import { buildBundleTicketsPdf } from './bundle-tickets.pdf';
import {
  pdfHeader,
  pdfImageCount,
  pdfPageCount,
  pdfText,
  pdfTextLines,
} from './pdf-reader.testing';

describe('buildBundleTicketsPdf', () => {
  it('prints one page per bundle with a QR image and one coupon per operation', async () => {
    const input = buildBundleTicketsInput();
    const pdf = await buildBundleTicketsPdf(input, { compress: false });
    expect(pdfHeader(pdf)).toBe('%PDF-');
    expect(pdfPageCount(pdf)).toBe(3);
    expect(pdfImageCount(pdf)).toBe(3);
    const text = pdfText(pdf);
    expect(text).toContain('SR-B:b-2026-07:1');
    expect(text).toContain('Bundle 2');
    expect(text).toContain('Lot 4');
    expect(text).toContain('1–4');
    const lines = pdfTextLines(pdf);
    // 4 operations × 3 bundles = 12 coupons, each naming its operation and SAM
    expect(lines.filter((l) => l === 'Set sleeves')).toHaveLength(3);
    expect(lines.filter((l) => l.startsWith('SAM '))).toHaveLength(12);
    expect(lines).toContain('SAM 2.40 min');
    expect(lines).toContain('Bundle 3  ·  DR-12  ·  size XL  ·  6 pcs');
  });

  it('continues coupons on a new page when the operation list is long', async () => {
    const operations = Array.from({ length: 20 }, (_, i) => ({
      name: `Operation ${i + 1}`,
      samMinutes: 1,
    }));
    const input = buildBundleTicketsInput({ operations });
    const pdf = await buildBundleTicketsPdf(
      { ...input, bundles: input.bundles.slice(0, 1) },
      { compress: false },
    );
    expect(pdfPageCount(pdf)).toBe(2);
    expect(pdfText(pdf)).toContain('Bundle 1 (continued)');
    expect(pdfTextLines(pdf).filter((l) => l.startsWith('SAM '))).toHaveLength(20);
  });

  it('draws dashed cut lines between coupons', async () => {
    const pdf = await buildBundleTicketsPdf(buildBundleTicketsInput(), { compress: false });
    // pdfkit writes a dash pattern as `[5 4] 0 d`
    expect(pdf.toString('latin1').match(/\[5 4\] 0 d/g)?.length).toBeGreaterThanOrEqual(15);
  });
});
