import { inflateRawSync } from 'node:zlib';
import { parse } from 'csv-parse/sync';
import type ExcelJS from 'exceljs';
import { AppError, badRequest } from '../../errors';

/**
 * Bounds on an uploaded table (packing list, size chart, measurements, operations sheet). An XLSX is a
 * zip: a 256 KB file can unpack to 100 MiB of XML, and ExcelJS holds all of it, and every cell as an
 * object, in memory on the request thread. So the archive is checked entry by entry before ExcelJS sees
 * it, with the inflater itself stopped at the budget (the sizes a zip declares can lie).
 */
export interface TableLimits {
  /** Total unpacked bytes of every entry of a workbook. */
  maxInflatedBytes: number;
  /** Data rows after the header. */
  maxRows: number;
  /** Columns of any row. */
  maxColumns: number;
}

export const TABLE_LIMITS: TableLimits = { maxInflatedBytes: 24 * 1024 * 1024, maxRows: 10_000, maxColumns: 200 };

/** The first problems of an import are listed; the rest only counted. */
export const LISTED_ERRORS = 20;

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;
const ZIP64_MARK = 0xffffffff;

const tooLarge = (why: string) => new AppError(413, 'too_large', `The workbook is too large to read: ${why}. Save a smaller sheet and try again`);
const unreadable = () => badRequest('file: not a readable XLSX workbook', { file: 'Not a readable XLSX workbook' });
const tooManyRows = (limits: TableLimits) =>
  badRequest(`file: more than ${limits.maxRows.toLocaleString('en')} rows; split the file`, { file: `At most ${limits.maxRows.toLocaleString('en')} rows per file` });
const tooManyColumns = (limits: TableLimits) =>
  badRequest(`file: more than ${limits.maxColumns} columns`, { file: `At most ${limits.maxColumns} columns` });

function findEndOfCentralDirectory(buf: Buffer): number {
  // The record is 22 bytes plus a comment of at most 65,535 bytes, at the very end.
  for (let i = buf.length - 22; i >= Math.max(0, buf.length - 22 - 0xffff); i--) if (buf.readUInt32LE(i) === EOCD) return i;
  return -1;
}

/** Counts `<row …>` elements (any namespace prefix) in a worksheet's XML. */
function countRows(xml: Buffer): number {
  const text = xml.toString('latin1');
  return (text.match(/<(?:[A-Za-z_][\w.-]*:)?row[\s>/]/g) ?? []).length;
}

/**
 * Walks the zip's central directory and unpacks each entry with the inflater capped at what is left of
 * the budget; refuses (413) a workbook that unpacks past `maxInflatedBytes`, and (400) one whose sheets
 * hold more than `maxRows` rows. Memory stays within the budget; time is linear in it. A file that is
 * not a zip, or uses ZIP64 (no workbook under the upload limit needs it), is a 400.
 */
export function checkWorkbookArchive(buf: Buffer, limits: TableLimits = TABLE_LIMITS): void {
  const end = findEndOfCentralDirectory(buf);
  if (end < 0) throw unreadable();
  const entries = buf.readUInt16LE(end + 10);
  let at = buf.readUInt32LE(end + 16);
  if (entries === 0xffff || at === ZIP64_MARK) throw unreadable();
  let left = limits.maxInflatedBytes;
  for (let n = 0; n < entries; n++) {
    if (at + 46 > buf.length || buf.readUInt32LE(at) !== CENTRAL) throw unreadable();
    const method = buf.readUInt16LE(at + 10);
    const packed = buf.readUInt32LE(at + 20);
    const declared = buf.readUInt32LE(at + 24);
    const nameLength = buf.readUInt16LE(at + 28);
    const local = buf.readUInt32LE(at + 42);
    const name = buf.toString('utf8', at + 46, at + 46 + nameLength);
    at += 46 + nameLength + buf.readUInt16LE(at + 30) + buf.readUInt16LE(at + 32);
    if (packed === ZIP64_MARK || declared === ZIP64_MARK || local === ZIP64_MARK) throw unreadable();
    if (declared > left) throw tooLarge(`it unpacks to more than ${Math.round(limits.maxInflatedBytes / 1024 / 1024)} MB`);
    if (local + 30 > buf.length || buf.readUInt32LE(local) !== LOCAL) throw unreadable();
    const start = local + 30 + buf.readUInt16LE(local + 26) + buf.readUInt16LE(local + 28);
    const data = buf.subarray(start, start + packed);
    let inflated: Buffer;
    if (method === 0) inflated = data;
    else if (method === 8) {
      try {
        inflated = inflateRawSync(data, { maxOutputLength: Math.max(1, left) });
      } catch (err) {
        if ((err as { code?: string }).code === 'ERR_BUFFER_TOO_LARGE') throw tooLarge(`it unpacks to more than ${Math.round(limits.maxInflatedBytes / 1024 / 1024)} MB`);
        throw unreadable();
      }
    } else throw unreadable();
    left -= inflated.length;
    if (/^xl\/worksheets\/[^/]+\.xml$/i.test(name) && countRows(inflated) > limits.maxRows + 1) throw tooManyRows(limits);
  }
}

/**
 * After ExcelJS has read a checked archive: refuses a sheet whose last row or column lies past the caps
 * (one cell at row 1,048,576 is a small file but a million empty rows to walk).
 */
export function checkSheetSize(sheet: ExcelJS.Worksheet, limits: TableLimits = TABLE_LIMITS): void {
  if (sheet.rowCount > limits.maxRows + 1) throw tooManyRows(limits);
  if (sheet.columnCount > limits.maxColumns) throw tooManyColumns(limits);
}

/**
 * Parses CSV text, stopping after `maxRows` data rows plus the header: a longer file is a 400, found
 * without parsing the rest. Rows wider than `maxColumns` are a 400 as well.
 */
export function parseCsvWithinLimits(
  input: string | Buffer,
  options: { delimiter?: string; trim?: boolean } = {},
  limits: TableLimits = TABLE_LIMITS,
): string[][] {
  const rows = parse(input, {
    bom: true,
    relax_column_count: true,
    skip_empty_lines: false,
    ...options,
    to: limits.maxRows + 2,
  }) as string[][];
  if (rows.length > limits.maxRows + 1) throw tooManyRows(limits);
  if (rows.some((r) => r.length > limits.maxColumns)) throw tooManyColumns(limits);
  return rows;
}
