import ExcelJS from 'exceljs';
import { AppError, badRequest } from '../../errors';
import { checkSheetSize, checkWorkbookArchive, parseCsvWithinLimits } from '../uploads/table-limits';

/** An uploaded file as multer hands it over (memory storage). */
export interface UploadedTable {
  originalname: string;
  mimetype: string;
  buffer: Buffer;
}

const isXlsx = (f: UploadedTable) =>
  /\.xlsx$/i.test(f.originalname) || f.mimetype === 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/**
 * Read a CSV (UTF-8 or Latin-1, comma or semicolon) or the first sheet of an XLSX into rows of trimmed strings.
 * A file that cannot be read at all, or lies past the table limits (rows, columns, unpacked size), is a
 * 400 (413 for a workbook that unpacks too large) with field `file`.
 */
export async function readTable(file: UploadedTable): Promise<string[][]> {
  if (isXlsx(file)) {
    checkWorkbookArchive(file.buffer);
    const wb = new ExcelJS.Workbook();
    try {
      await wb.xlsx.load(file.buffer as unknown as ArrayBuffer);
    } catch {
      throw badRequest('file: not a readable XLSX workbook', { file: 'Not a readable XLSX workbook' });
    }
    const sheet = wb.worksheets[0];
    if (!sheet) throw badRequest('file: the workbook has no sheet', { file: 'The workbook has no sheet' });
    checkSheetSize(sheet);
    const rows: string[][] = [];
    const width = sheet.columnCount;
    sheet.eachRow({ includeEmpty: true }, (row, n) => {
      const cells: string[] = [];
      for (let c = 1; c <= width; c++) cells.push(cellText(row.getCell(c).value));
      rows[n - 1] = cells;
    });
    return Array.from(rows, (r) => r ?? []);
  }
  const text = decode(file.buffer);
  const delimiter = (text.split('\n')[0] ?? '').includes(';') && !(text.split('\n')[0] ?? '').includes(',') ? ';' : ',';
  try {
    return parseCsvWithinLimits(text, { delimiter }).map((r) => r.map((c) => restoreCsvCell(c.trim())));
  } catch (e) {
    if (e instanceof AppError) throw e;
    throw badRequest(`file: ${(e as Error).message}`, { file: 'Not a readable CSV file' });
  }
}

function decode(buf: Buffer): string {
  const utf8 = buf.toString('utf8');
  return utf8.includes('\uFFFD') ? buf.toString('latin1') : utf8;
}

function cellText(v: ExcelJS.CellValue): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'object') {
    if ('result' in v && v.result !== undefined) return String(v.result);
    if ('richText' in v) return v.richText.map((t) => t.text).join('');
    if ('text' in v) return String(v.text);
    if (v instanceof Date) return v.toISOString().slice(0, 10);
    return '';
  }
  return String(v).trim();
}

/** First characters a spreadsheet may read as the start of a formula (OWASP "CSV Injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * A cell a spreadsheet will show as text, never run: one that begins with = + - @, a tab or a carriage
 * return gets a leading single quote, as the OWASP "CSV Injection" page advises. Applied to every cell,
 * numbers included, since a cell such as `-2+3+cmd|' /C calc'!A0` starts like a negative number.
 */
export function neutraliseCsvCell(cell: string): string {
  return FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/** Undoes {@link neutraliseCsvCell} on import, so an exported file reads back as it was. */
const restoreCsvCell = (cell: string) => (cell.startsWith("'") && FORMULA_START.test(cell.slice(1)) ? cell.slice(1) : cell);

/** Rows → CSV text (RFC 4180 quoting), every cell neutralised against formula injection. */
export function rowsToCsv(rows: string[][]): string {
  const q = (raw: string) => {
    const c = neutraliseCsvCell(raw);
    return /[",\n\r]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c;
  };
  return rows.map((r) => r.map(q).join(',')).join('\r\n') + '\r\n';
}

/** Rows → one-sheet XLSX workbook with a bold header row; numbers stay numbers. */
export async function rowsToXlsx(rows: string[][], sheetName: string, created: Date): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Seamrun';
  wb.created = created;
  wb.modified = created;
  const ws = wb.addWorksheet(sheetName.slice(0, 31));
  rows.forEach((r) => ws.addRow(r.map((c) => (c !== '' && /^-?\d+(\.\d+)?$/.test(c) ? Number(c) : c))));
  ws.getRow(1).font = { bold: true };
  ws.columns.forEach((c, i) => (c.width = i === 0 ? 22 : 10));
  return Buffer.from(await wb.xlsx.writeBuffer());
}
