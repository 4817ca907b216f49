import { describe, expect, it } from 'vitest';
import type { MarkerPlotInput } from '../types';
import { buildMarkerPlotPdf, PLOT_BAND_MM, PT_PER_MM } from './marker-plot.pdf';
import { pdfHeader, pdfPageCount, pdfText } from './pdf-reader.testing';

const RECT = [{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 50 }, { x: 0, y: 50 }];
const input = (over: Partial<MarkerPlotInput> = {}): MarkerPlotInput => ({
  studioName: 'Linden Row Studio',
  dateIso: '2026-03-14',
  locale: 'en-GB',
  style: { code: 'DR-12', name: 'Wrap dress' },
  batch: { code: 'B-0007' },
  ratio: [{ size: 'M', count: 2 }],
  lengthMm: 420,
  widthMm: 1450,
  outlines: { 'M:front': RECT },
  notches: { 'M:front': [{ x: 50, y: 0 }] },
  placements: [
    { pieceKey: 'M:front', size: 'M', pieceName: 'Front', rotation: 0, mirrored: false, x: 20, y: 0 },
    { pieceKey: 'M:front', size: 'M', pieceName: 'Front', rotation: 180, mirrored: false, x: 300, y: 60 },
  ],
  spliceZones: [{ near: 120, far: 270 }],
  ...over,
});

/** MediaBox of every page, in points. */
const mediaBoxes = (pdf: Buffer) => [...pdf.toString('latin1').matchAll(/\/MediaBox \[([^\]]+)\]/g)].map((m) => m[1].trim().split(/\s+/).map(Number));

describe('buildMarkerPlotPdf', () => {
  // 1:1: PDF user space is 1/72 in (ISO 32000-1 §8.3.2.3); 1 in = 25.4 mm exactly (NBS Circular 572 Addendum, 1960).
  it('makes the page exactly as wide as the marker at 1:1, with a 40 mm title band above the marker length', async () => {
    const pdf = await buildMarkerPlotPdf(input(), { compress: false });
    expect(pdfHeader(pdf)).toBe('%PDF-');
    const [box] = mediaBoxes(pdf);
    expect(box[2]).toBeCloseTo((1450 / 25.4) * 72, 3); // 4110.236 pt
    expect(box[3]).toBeCloseTo(((420 + PLOT_BAND_MM) / 25.4) * 72, 3);
  });

  it('prints the batch, each piece as size and name, the check bar and both splice lines', async () => {
    const text = pdfText(await buildMarkerPlotPdf(input(), { compress: false }));
    expect(text).toContain('Batch B-0007 · DR-12 Wrap dress · M×2');
    expect(text.match(/M Front/g)).toHaveLength(2);
    expect(text).toContain('This bar is 100 mm');
    expect(text).toContain('Splice: the new roll starts here');
    expect(text).toContain('Splice: the old roll runs to here');
  });

  it('draws the cutting line a quarter turn round, never mirrored: marker (x, y) at page (y, band + x)', async () => {
    const content = (await buildMarkerPlotPdf(input(), { compress: false })).toString('latin1');
    // Worked by hand: the first copy's corner (20, 0) → (0 pt, 60 mm); the corner (120, 50) → (50 mm, 160 mm).
    const f = (mmValue: number) => String(Number((mmValue * PT_PER_MM).toFixed(6)));
    expect(content).toContain(`0 ${f(60)} m`);
    expect(content).toContain(`${f(50)} ${f(160)} l`);
  });

  it('splits a marker longer than a panel into pages that together cover its length', async () => {
    const pdf = await buildMarkerPlotPdf(input({ lengthMm: 7200, panelLengthMm: 5000 }), { compress: false });
    expect(pdfPageCount(pdf)).toBe(2);
    const boxes = mediaBoxes(pdf);
    expect(boxes[0][3]).toBeCloseTo(((5000 + PLOT_BAND_MM) / 25.4) * 72, 3);
    expect(boxes[1][3]).toBeCloseTo(((2200 + PLOT_BAND_MM) / 25.4) * 72, 3);
    expect(pdfText(pdf)).toContain('panel 2 of 2: 5.00 m to 7.20 m');
  });

  it('refuses a panel longer than a PDF page can hold', async () => {
    await expect(buildMarkerPlotPdf(input({ panelLengthMm: 6000 }))).rejects.toThrow(RangeError);
  });
});

describe('notches on the plot', () => {
  // Worked by hand: the notch (50, 10) lies 10 mm inside the bottom edge y = 0 of the first copy (placed at x + 20);
  // it is drawn from the cutting line (70, 0) → page (0, 40 + 70 mm) 6 mm into the piece → page (6 mm, 110 mm).
  it('draws a notch as a 6 mm tick from the cutting line into the piece, square to its edge', async () => {
    const content = (await buildMarkerPlotPdf(input({ notches: { 'M:front': [{ x: 50, y: 10 }] }, placements: [input().placements[0]] }), { compress: false })).toString('latin1');
    const f = (mmValue: number) => String(Number((mmValue * PT_PER_MM).toFixed(6)));
    expect(content).toContain(`0 ${f(110)} m\n${f(6)} ${f(110)} l`);
  });
});
