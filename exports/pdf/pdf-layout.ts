/**
 * Seamrun's PDF look and the steps every PDF builder shares: a document whose bytes are collected into a
 * Buffer, a deep-teal title band with the studio's name and the date, simple banded tables, the cautions
 * box and dashed cut lines. Text in the embedded DejaVu Sans (pdf-fonts.ts), so every script prints. Deterministic: the PDF's
 * creation date is the document date, never the clock.
 */
import PDFDocument from 'pdfkit';
import { BODY_FONT, BOLD_FONT, useSeamrunFonts } from './pdf-fonts';
import type { DocumentHeading } from '../types';
import { documentWords } from '../document-words';
import { formatDate, parseIsoDate } from './document-format';

/** Options every PDF builder takes; `compress: false` keeps content streams readable (tests). */
export interface PdfOptions {
  compress?: boolean;
}

export const TEAL = '#0F4C5C';
export const SAND = '#F4EFE6';
export const INK = '#1A1A1A';
export const MARGIN = 40;

/** A started A4 document and the promise of its bytes (resolved after `doc.end()`). */
export function startPdf(
  heading: DocumentHeading,
  title: string,
  options: PdfOptions = {},
): { doc: PDFKit.PDFDocument; bytes: Promise<Buffer> } {
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    compress: options.compress ?? true,
    info: {
      Title: title,
      Author: heading.studioName,
      Creator: 'Seamrun',
      CreationDate: parseIsoDate(heading.dateIso),
      ModDate: parseIsoDate(heading.dateIso),
    },
  });
  useSeamrunFonts(doc);
  const chunks: Buffer[] = [];
  const bytes = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  return { doc, bytes };
}

/** Width between the margins. */
export const contentWidth = (doc: PDFKit.PDFDocument): number =>
  doc.page.width - doc.page.margins.left - doc.page.margins.right;

/**
 * Draws the title band (title left, studio and date right) and then `label: value` lines; leaves the cursor
 * below them.
 */
export function drawHeading(
  doc: PDFKit.PDFDocument,
  title: string,
  heading: DocumentHeading,
  lines: readonly (readonly [string, string])[] = [],
): void {
  const x = doc.page.margins.left;
  const width = contentWidth(doc);
  const top = doc.page.margins.top;
  doc.save().rect(x, top, width, 34).fill(TEAL).restore();
  doc
    .fillColor('#FFFFFF')
    .font(BOLD_FONT)
    .fontSize(15)
    .text(title, x + 10, top + 10, { lineBreak: false });
  doc.font(BODY_FONT).fontSize(9);
  const right = `${heading.studioName}  ·  ${formatDate(heading.dateIso, heading.locale, heading.timeZone)}`;
  doc.text(right, x + 10, top + 13, { width: width - 20, align: 'right', lineBreak: false });
  doc.fillColor(INK).fontSize(10);
  doc.y = top + 46;
  for (const [label, value] of lines) {
    doc.x = x;
    doc
      .font(BOLD_FONT)
      .text(`${label}${heading.language === 'fr' ? '\u202f' : ''}: `, { continued: true })
      .font(BODY_FONT)
      .text(value);
  }
  doc.moveDown(0.6);
}

/** A table column: header text and width in points. */
export interface PdfColumn {
  header: string;
  width: number;
}

/** Draws a table with a teal header and sand banding; starts a new page (repeating the header) when full. */
export function drawTable(
  doc: PDFKit.PDFDocument,
  columns: readonly PdfColumn[],
  rows: readonly string[][],
): void {
  const x0 = doc.page.margins.left;
  const rowHeight = 18;
  const bottom = () => doc.page.height - doc.page.margins.bottom;
  const drawRow = (cells: readonly string[], fill: string | null, bold: boolean, color: string) => {
    if (doc.y + rowHeight > bottom()) doc.addPage();
    const y = doc.y;
    const width = columns.reduce((s, c) => s + c.width, 0);
    if (fill) doc.save().rect(x0, y, width, rowHeight).fill(fill).restore();
    doc
      .font(bold ? BOLD_FONT : BODY_FONT)
      .fontSize(9)
      .fillColor(color);
    let x = x0;
    cells.forEach((cell, i) => {
      doc.text(cell, x + 4, y + 5, {
        width: columns[i].width - 8,
        height: rowHeight - 4,
        lineBreak: false,
        ellipsis: true,
      });
      x += columns[i].width;
    });
    doc.fillColor(INK);
    doc.x = x0;
    doc.y = y + rowHeight;
  };
  drawRow(
    columns.map((c) => c.header),
    TEAL,
    true,
    '#FFFFFF',
  );
  rows.forEach((row, i) => {
    if (doc.y + rowHeight > bottom()) {
      doc.addPage();
      drawRow(
        columns.map((c) => c.header),
        TEAL,
        true,
        '#FFFFFF',
      );
    }
    drawRow(row, i % 2 === 1 ? SAND : null, false, INK);
  });
  doc.moveDown(0.8);
}

/** Draws the cutting-room cautions in a sand box, titled in the document's language. */
export function drawCautions(doc: PDFKit.PDFDocument, cautions: readonly string[], heading?: DocumentHeading): void {
  const t = documentWords(heading?.language);
  const x = doc.page.margins.left;
  const width = contentWidth(doc);
  doc.font(BODY_FONT).fontSize(8.5);
  const body = cautions.map((c) => `• ${c}`).join('\n');
  const height = 30 + doc.heightOfString(body, { width: width - 16 }) + 14;
  if (doc.y + height > doc.page.height - doc.page.margins.bottom) doc.addPage();
  const y = doc.y;
  doc.save().rect(x, y, width, height).fill(SAND).restore();
  doc
    .fillColor(TEAL)
    .font(BOLD_FONT)
    .fontSize(10)
    .text(t('cautions.title'), x + 8, y + 8, { width: width - 16 });
  doc
    .fillColor(INK)
    .font(BODY_FONT)
    .fontSize(8.5)
    .text(body, x + 8, y + 24, { width: width - 16 });
  doc
    .fontSize(7)
    .fillColor('#555555')
    .text(t('cautions.source'), x + 8, doc.y + 2, { width: width - 16 });
  doc.fillColor(INK);
  doc.x = x;
  doc.y = y + height + 8;
}

/** A dashed horizontal cut line across the content width at `y`, with a scissors-free "cut here" mark. */
export function drawCutLine(doc: PDFKit.PDFDocument, y: number): void {
  const x = doc.page.margins.left;
  doc.save().dash(5, { space: 4 }).strokeColor('#777777').lineWidth(0.8);
  doc
    .moveTo(x, y)
    .lineTo(x + contentWidth(doc), y)
    .stroke();
  doc.undash().restore();
}
