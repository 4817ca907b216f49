import PDFDocument from 'pdfkit';
import { useSeamrunFonts } from './pdf-fonts';
import { polygonBBox } from '@shared/geometry/polygon';
import type { BBox, Point, Polygon } from '@shared/geometry/types';
import type { Piece } from '@grading';

/** Paper sizes in mm (ISO 216 A4; US Letter 8 1/2 × 11 in). */
export const PAPER_MM = { A4: { w: 210, h: 297 }, Letter: { w: 215.9, h: 279.4 } } as const;
const PT_PER_MM = 72 / 25.4;

/** Options for {@link tiledPiecePdf} (mm). */
export interface TiledPdfOptions {
  paper?: keyof typeof PAPER_MM;
  marginMm?: number;
  overlapMm?: number;
  /** Cutting line to print (solid); the sewing line prints dashed. */
  cutting?: Polygon;
  title?: string;
  /** Document dates; default the Unix epoch so the same input gives the same bytes. */
  creationDate?: Date;
  /** Uncompressed content streams (for inspection in tests). */
  uncompressed?: boolean;
}

/** One page tile: its label (row letter + column number), grid position and the piece-space area it shows. */
export interface Tile {
  label: string;
  row: number;
  col: number;
  area: BBox;
}

/**
 * Tile a piece-space box onto pages: each page prints `page − 2·margin` of the pattern, neighbours share
 * `overlapMm`. Rows run top to bottom (A, B, …), columns left to right (1, 2, …). Empty box → no tiles.
 */
export function planTiles(box: BBox, paper: keyof typeof PAPER_MM = 'A4', marginMm = 10, overlapMm = 10): Tile[] {
  if (!(box.maxX >= box.minX && box.maxY >= box.minY)) return [];
  const pw = PAPER_MM[paper].w - 2 * marginMm, ph = PAPER_MM[paper].h - 2 * marginMm;
  const stepX = pw - overlapMm, stepY = ph - overlapMm;
  const cols = Math.max(1, Math.ceil((box.maxX - box.minX - overlapMm) / stepX));
  const rows = Math.max(1, Math.ceil((box.maxY - box.minY - overlapMm) / stepY));
  const tiles: Tile[] = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const minX = box.minX + c * stepX, maxY = box.maxY - r * stepY;
      tiles.push({ label: `${String.fromCharCode(65 + (r % 26))}${r >= 26 ? Math.floor(r / 26) : ''}${c + 1}`, row: r, col: c, area: { minX, maxX: minX + pw, maxY, minY: maxY - ph } });
    }
  }
  return tiles;
}

/**
 * Print a piece at 1:1 as a tiled PDF (pdfkit) for A4 or Letter. Page 1 holds the legend: piece name and cut
 * instruction, a 50 mm check square and a 2 in check square (measure them to confirm "actual size" printing),
 * and the tile map. Each further page is one tile with its label, its neighbours' labels at the edges, and
 * alignment crosses at the corners of the overlap band so pages are trimmed and taped mark to mark.
 * Resolves to the PDF bytes.
 */
export function tiledPiecePdf(piece: Piece, options: TiledPdfOptions = {}): Promise<Buffer> {
  const paper = options.paper ?? 'A4';
  const margin = options.marginMm ?? 10, overlap = options.overlapMm ?? 10;
  const rings = [piece.outline, options.cutting ?? []].filter((r) => r.length);
  const tiles = planTiles(polygonBBox(rings.flat()), paper, margin, overlap);
  const { w, h } = PAPER_MM[paper];
  const date = options.creationDate ?? new Date(0);
  const doc = new PDFDocument({ size: [w * PT_PER_MM, h * PT_PER_MM], margin: 0, autoFirstPage: false, compress: !options.uncompressed, info: { Title: options.title ?? piece.name, CreationDate: date, ModDate: date } });
  useSeamrunFonts(doc);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  legendPage(doc, piece, tiles, options.title);
  const cols = Math.max(0, ...tiles.map((t) => t.col)) + 1, rows = Math.max(0, ...tiles.map((t) => t.row)) + 1;
  for (const t of tiles) tilePage(doc, piece, t, { margin, overlap, cutting: options.cutting, rows, cols, tiles });
  doc.end();
  return done;
}

type Doc = InstanceType<typeof PDFDocument>;

function legendPage(doc: Doc, piece: Piece, tiles: Tile[], title?: string): void {
  doc.addPage();
  doc.scale(PT_PER_MM);
  const cut = piece.cut === 'pair' ? 'Cut a pair' : piece.cut === 'fold' ? 'Cut on fold' : 'Cut 1';
  doc.fontSize(6).text(title ?? piece.name, 15, 15).fontSize(4).text(`${cut} × ${piece.quantity}. Print at 100 % (no scaling). ${tiles.length} tiles.`, 15, 24);
  doc.lineWidth(0.3).rect(15, 35, 50, 50).stroke();
  doc.fontSize(4).text('50 mm', 15, 87);
  doc.rect(80, 35, 50.8, 50.8).stroke();
  doc.text('2 in', 80, 88);
  const cols = Math.max(0, ...tiles.map((t) => t.col)) + 1;
  const cell = Math.min(12, 170 / Math.max(cols, 1));
  for (const t of tiles) {
    doc.rect(15 + t.col * cell, 100 + t.row * cell, cell, cell).stroke();
    doc.fontSize(3).text(t.label, 16 + t.col * cell, 101 + t.row * cell);
  }
}

interface TileContext {
  margin: number;
  overlap: number;
  cutting?: Polygon;
  rows: number;
  cols: number;
  tiles: Tile[];
}

function tilePage(doc: Doc, piece: Piece, t: Tile, c: TileContext): void {
  doc.addPage();
  doc.scale(PT_PER_MM);
  const pw = t.area.maxX - t.area.minX, ph = t.area.maxY - t.area.minY;
  const P = (p: Point): [number, number] => [c.margin + p.x - t.area.minX, c.margin + t.area.maxY - p.y];
  doc.save().rect(c.margin, c.margin, pw, ph).clip();
  const ring = (r: Polygon) => {
    doc.moveTo(...P(r[0]));
    for (const p of r.slice(1)) doc.lineTo(...P(p));
    doc.closePath();
  };
  if (c.cutting?.length) {
    ring(c.cutting);
    doc.lineWidth(0.35).stroke();
  }
  ring(piece.outline);
  doc.lineWidth(0.25).dash(2, { space: 1 }).stroke().undash();
  doc.moveTo(...P(piece.grainLine.from)).lineTo(...P(piece.grainLine.to)).lineWidth(0.3).stroke();
  for (const d of piece.drillHoles) doc.circle(...P(d), 1.5).stroke();
  for (const l of piece.internalLines) {
    if (l.points.length < 2) continue;
    doc.moveTo(...P(l.points[0]));
    for (const p of l.points.slice(1)) doc.lineTo(...P(p));
    doc.stroke();
  }
  doc.restore();
  doc.lineWidth(0.2).rect(c.margin, c.margin, pw, ph).stroke();
  // Alignment crosses where the overlap band meets each edge; the same marks print on the neighbouring tile.
  for (const [x, y] of [[c.overlap, c.overlap], [pw - c.overlap, c.overlap], [c.overlap, ph - c.overlap], [pw - c.overlap, ph - c.overlap]]) {
    doc.moveTo(c.margin + x - 4, c.margin + y).lineTo(c.margin + x + 4, c.margin + y).moveTo(c.margin + x, c.margin + y - 4).lineTo(c.margin + x, c.margin + y + 4).stroke();
  }
  doc.fontSize(5).text(`${t.label}  (${piece.name})`, c.margin + 2, 3);
  const nb = (dr: number, dc: number) => c.tiles.find((o) => o.row === t.row + dr && o.col === t.col + dc)?.label;
  doc.fontSize(3);
  if (nb(-1, 0)) doc.text(`${nb(-1, 0)}`, c.margin + pw / 2, c.margin + 1);
  if (nb(1, 0)) doc.text(`${nb(1, 0)}`, c.margin + pw / 2, c.margin + ph - 4);
  if (nb(0, -1)) doc.text(`${nb(0, -1)}`, c.margin + 1, c.margin + ph / 2);
  if (nb(0, 1)) doc.text(`${nb(0, 1)}`, c.margin + pw - 6, c.margin + ph / 2);
}
