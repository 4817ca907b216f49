import { describe, expect, it } from 'vitest';
import { calibrationLayout } from '@shared/calibration/calibration-sheet';
import { calibrationSheetPdf, planBorderTiles } from './calibration-sheet.pdf';
import { pdfPageCount, pdfText } from './pdf-reader.testing';

describe('calibrationSheetPdf', () => {
  it('prints one A4 page (595.28 × 841.89 pt, ISO 216) with four corner marks and the 100 mm scale bar', async () => {
    const pdf = await calibrationSheetPdf({ kind: 'sheet', paper: 'A4', uncompressed: true });
    const raw = pdf.toString('latin1');
    expect(pdfPageCount(pdf)).toBe(1);
    expect(raw).toMatch(/MediaBox \[0 0 595\.27\d* 841\.88\d*\]/);
    expect(pdfText(pdf)).toContain('This bar measures 100 mm');
    const layout = calibrationLayout('sheet', 'A4');
    // Each mark's black square is drawn as a 14 mm rectangle in page millimetres (the page is scaled to mm).
    for (const m of layout.marks) expect(raw).toContain(`${m.cx - 7} ${m.cy - 7} 14 14 re`);
    // The scale bar: a 100 mm long rectangle.
    expect(raw).toContain(`${layout.scaleBar.x} ${layout.scaleBar.y} 100 1.2 re`);
  });

  it('speaks French and draws a 4 in check bar for a studio in inches, with no millimetre in its words', async () => {
    const pdf = await calibrationSheetPdf({ kind: 'sheet', paper: 'Letter', uncompressed: true, language: 'fr', unitSystem: 'imperial' });
    const layout = calibrationLayout('sheet', 'Letter');
    // 4 in = 101.6 mm exactly (1 in = 25.4 mm, NIST SP 811 Appendix B).
    expect(pdf.toString('latin1')).toContain(`${layout.scaleBar.x} ${layout.scaleBar.y} 101.6 1.2 re`);
    const text = pdfText(pdf);
    expect(text).toContain('Cette barre mesure 4"');
    expect(text).not.toMatch(/\d\s?mm\b|This bar/);
  });

  it('prints Letter (8 1/2 × 11 in = 612 × 792 pt) and the same bytes for the same options', async () => {
    const a = await calibrationSheetPdf({ kind: 'sheet', paper: 'Letter', uncompressed: true });
    const b = await calibrationSheetPdf({ kind: 'sheet', paper: 'Letter', uncompressed: true });
    expect(a.toString('latin1')).toMatch(/MediaBox \[0 0 612(\.0+)? 792(\.0+)?\]/);
    expect(a.equals(b)).toBe(true);
  });

  it('tiles the border frame onto A4 pages, leaving out pages wholly inside the opening, after an instruction page', async () => {
    const layout = calibrationLayout('border');
    const tiles = planBorderTiles(layout, 'A4');
    // 900 × 640 mm on 190 × 277 mm printable with 10 mm overlap: 5 columns, 3 rows [computed by hand:
    // ceil(890 / 180) = 5, ceil(630 / 267) = 3]; the middle row's columns 2–4 (x 180–730, y 267–544) lie inside
    // the opening (50–850 × 50–590) and are left out.
    expect(tiles.map((t) => t.label)).toEqual(['A1', 'A2', 'A3', 'A4', 'A5', 'B1', 'B5', 'C1', 'C2', 'C3', 'C4', 'C5']);
    const pdf = await calibrationSheetPdf({ kind: 'border', paper: 'A4', uncompressed: true });
    expect(pdfPageCount(pdf)).toBe(tiles.length + 1);
    expect(pdfText(pdf)).toContain('tape the pages together');
  });

  it('prints the border frame on one page of its own size for a plotter', async () => {
    const pdf = await calibrationSheetPdf({ kind: 'border', paper: 'whole', uncompressed: true });
    expect(pdfPageCount(pdf)).toBe(1);
    // 900 × 640 mm = 2551.18 × 1814.17 pt (72 pt per inch, 25.4 mm per inch)
    expect(pdf.toString('latin1')).toMatch(/MediaBox \[0 0 2551\.18\d* 1814\.17\d*\]/);
  });
});
