/**
 * Seamrun's workbook look and the steps every workbook builder shares: a title block with the studio's name
 * and the date, deep-teal header rows with white bold text, light-sand banding, input-cell borders, and the
 * buffer at the end. Deterministic: workbook dates come from the document date, never the clock.
 */
import ExcelJS from 'exceljs';
import type { DocumentHeading } from '../types';
import { formatDate, parseIsoDate } from '../pdf/document-format';
import { documentWords } from '../document-words';

/** Header fill (deep teal) and banding fill (light sand), ARGB. */
export const HEADER_FILL_ARGB = 'FF0F4C5C';
export const BAND_FILL_ARGB = 'FFF4EFE6';
const WHITE_ARGB = 'FFFFFFFF';

/** A new workbook stamped with the studio and the document date. */
export function createWorkbook(heading: DocumentHeading): ExcelJS.Workbook {
  const workbook = new ExcelJS.Workbook();
  const date = parseIsoDate(heading.dateIso);
  workbook.creator = heading.studioName;
  workbook.lastModifiedBy = heading.studioName;
  workbook.created = date;
  workbook.modified = date;
  return workbook;
}

/**
 * Writes the title block: row 1 the document title, row 2 the studio and date, then one row per extra
 * `[label, value]`. Returns the next free row number (one blank row left after the block).
 */
export function writeTitleBlock(
  sheet: ExcelJS.Worksheet,
  title: string,
  heading: DocumentHeading,
  extra: readonly (readonly [string, string])[] = [],
): number {
  sheet.getCell('A1').value = title;
  sheet.getCell('A1').font = { bold: true, size: 14, color: { argb: HEADER_FILL_ARGB } };
  const rows: (readonly [string, string])[] = [
    [documentWords(heading.language)('studio'), heading.studioName],
    [documentWords(heading.language)('date'), formatDate(heading.dateIso, heading.locale, heading.timeZone)],
    ...extra,
  ];
  rows.forEach(([label, value], i) => {
    const row = sheet.getRow(2 + i);
    row.getCell(1).value = label;
    row.getCell(1).font = { bold: true };
    row.getCell(2).value = value;
  });
  return 2 + rows.length + 1;
}

/** Paints one header row from `fromCol` to `toCol` (1-based, inclusive). */
export function styleHeaderRow(row: ExcelJS.Row, fromCol: number, toCol: number): void {
  for (let c = fromCol; c <= toCol; c++) {
    const cell = row.getCell(c);
    cell.fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: HEADER_FILL_ARGB } };
    cell.font = { bold: true, color: { argb: WHITE_ARGB } };
    cell.alignment = { vertical: 'middle', wrapText: true };
  }
}

/** Writes header labels into `rowNo` from column `fromCol` and paints them. */
export function writeHeaderRow(
  sheet: ExcelJS.Worksheet,
  rowNo: number,
  labels: readonly string[],
  fromCol = 1,
): void {
  const row = sheet.getRow(rowNo);
  labels.forEach((label, i) => {
    row.getCell(fromCol + i).value = label;
  });
  styleHeaderRow(row, fromCol, fromCol + labels.length - 1);
}

/** Sand banding on every second data row (`index` counts data rows from 0). */
export function bandRow(row: ExcelJS.Row, index: number, fromCol: number, toCol: number): void {
  if (index % 2 === 0) return;
  for (let c = fromCol; c <= toCol; c++) {
    row.getCell(c).fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: BAND_FILL_ARGB } };
  }
}

/** Marks a cell as an input the reader may change (thin teal border). */
export function markInput(cell: ExcelJS.Cell): void {
  const side = { style: 'thin' as const, color: { argb: HEADER_FILL_ARGB } };
  cell.border = { top: side, left: side, bottom: side, right: side };
}

/** Bold text for a totals row from `fromCol` to `toCol`. */
export function boldRow(row: ExcelJS.Row, fromCol: number, toCol: number): void {
  for (let c = fromCol; c <= toCol; c++) row.getCell(c).font = { bold: true };
}

/** A formula cell value with its cached result, so readers that do not recalculate show the app's figure. */
export function formula(text: string, result: number): ExcelJS.CellFormulaValue {
  return { formula: text, result };
}

/** A1 reference of a 1-based column and row, optionally absolute (`$D$5`). */
export function ref(col: number, row: number, absolute = false): string {
  const letters = columnLetters(col);
  return absolute ? `$${letters}$${row}` : `${letters}${row}`;
}

/** Column letters of a 1-based column number (1 → A, 27 → AA). */
export function columnLetters(col: number): string {
  let n = col;
  let out = '';
  while (n > 0) {
    const rem = (n - 1) % 26;
    out = String.fromCharCode(65 + rem) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** Serialises the workbook to bytes. */
export async function workbookToBuffer(workbook: ExcelJS.Workbook): Promise<Buffer> {
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
