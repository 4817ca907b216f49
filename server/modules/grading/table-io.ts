import ExcelJS from 'exceljs';
import { parse } from 'csv-parse/sync';
import { badRequest } from '../../errors';

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
 * A file that cannot be read at all is a 400 with field `file`.
 */
export async function readTable(file: UploadedTable): Promise<string[][]> {
  if (isXlsx(file)) {
    const wb = new ExcelJS.Workbook();
    try {
      await wb.xlsx.load(file.buffer as unknown as ArrayBuffer);
    } catch {
      throw badRequest('file: not a readable XLSX workbook', { file: 'Not a readable XLSX workbook' });
    }
    const sheet = wb.worksheets[0];
    if (!sheet) throw badRequest('file: the workbook has no sheet', { file: 'The workbook has no sheet' });
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
    return (parse(text, { delimiter, relax_column_count: true, skip_empty_lines: false, bom: true }) as string[][]).map((r) => r.map((c) => c.trim()));
  } catch (e) {
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

/** Rows → CSV text (RFC 4180 quoting). */
export function rowsToCsv(rows: string[][]): string {
  const q = (c: string) => (/[",\n\r]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c);
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
