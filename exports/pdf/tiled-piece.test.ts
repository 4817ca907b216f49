import { describe, expect, it } from 'vitest';
import { cuttingOutline, demoSizeChart, draftShirtDress, measurementsForSize } from '@grading';
import { planTiles, tiledPiecePdf } from './tiled-piece';

const pieces = draftShirtDress(measurementsForSize(demoSizeChart(), 'M'));

describe('planTiles', () => {
  it('covers the box with overlapping A4 tiles (190 × 277 mm printable, 10 mm overlap)', () => {
    const tiles = planTiles({ minX: 0, minY: 0, maxX: 400, maxY: 500 }, 'A4', 10, 10);
    // columns: ceil((400 − 10) / 180) = 3; rows: ceil((500 − 10) / 267) = 2 [computed]
    expect(tiles.map((t) => t.label)).toEqual(['A1', 'A2', 'A3', 'B1', 'B2', 'B3']);
    expect(tiles[1].area.minX).toBe(180);
    expect(tiles[0].area.maxX - tiles[1].area.minX).toBe(10);
    expect(planTiles({ minX: 0, minY: 0, maxX: -1, maxY: 0 })).toEqual([]);
  });
});

describe('tiledPiecePdf', () => {
  it('prints a legend with 50 mm and 2 in check squares and one page per tile', async () => {
    const front = pieces[0];
    const cut = cuttingOutline(front);
    const pdf = await tiledPiecePdf(front, { cutting: cut, uncompressed: true });
    const text = pdf.toString('latin1');
    expect(text.startsWith('%PDF')).toBe(true);
    const pages = (text.match(/\/Type \/Page\b/g) ?? []).length;
    const xs = cut.map((p) => p.x), ys = cut.map((p) => p.y);
    const tiles = planTiles({ minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) });
    expect(pages).toBe(tiles.length + 1);
    expect(text).toContain('15 35 50 50 re');
    expect(text).toContain('80 35 50.8 50.8 re');
    // A4 = 210 × 297 mm = 595.28 × 841.89 pt (ISO 216; 72 pt per inch)
    expect(text).toMatch(/MediaBox \[0 0 595\.27\d* 841\.88\d*\]/);
  });

  it('uses Letter paper (8 1/2 × 11 in = 612 × 792 pt) and the same bytes for the same input', async () => {
    const a = await tiledPiecePdf(pieces[4], { paper: 'Letter', uncompressed: true });
    const b = await tiledPiecePdf(pieces[4], { paper: 'Letter', uncompressed: true });
    expect(a.toString('latin1')).toMatch(/MediaBox \[0 0 612(\.0+)? 792(\.0+)?\]/);
    expect(a.equals(b)).toBe(true);
  });
});
