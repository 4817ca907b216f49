import ExcelJS from 'exceljs';
import { isCalendarDate } from '../../../shared/schemas/common';
import type { ImportRowError, RollInput } from '../../../shared/schemas/cutting';
import { AppError } from '../../errors';
import { checkSheetSize, checkWorkbookArchive, parseCsvWithinLimits, TABLE_LIMITS } from '../uploads/table-limits';

/**
 * Column titles of a supplier packing list (header row; case, accents, spacing and punctuation ignored), in English
 * and French, with the length unit's factor to mm. "vg" is the French abbreviation of verge (yard), "po" of pouce.
 */
const LENGTH_COLUMNS: Record<string, number> = {
  'length m': 1000, 'length mm': 1, 'length yd': 914.4, 'metres': 1000, 'meters': 1000, 'yards': 914.4,
  'longueur m': 1000, 'longueur mm': 1, 'longueur yd': 914.4, 'longueur vg': 914.4, 'metrage': 1000, 'metrage m': 1000, 'verges': 914.4,
};
const WIDTH_COLUMNS: Record<string, number> = {
  'width cm': 10, 'width mm': 1, 'width in': 25.4,
  'laize cm': 10, 'laize mm': 1, 'laize po': 25.4, 'laize in': 25.4, 'largeur cm': 10, 'largeur mm': 1, 'largeur po': 25.4,
};
const LABEL_COLUMNS = ['roll', 'roll no', 'roll number', 'label', 'roll label', 'rouleau', 'no rouleau', 'n° rouleau', 'numero de rouleau', 'numero rouleau', 'etiquette'];
const LOT_COLUMNS = ['shade lot', 'lot', 'shade', 'dye lot', 'bain', 'bain de teinture', 'lot de teinture', 'nuance'];
const DATE_COLUMNS = ['received', 'received date', 'date', 'recu', 'reception', 'date de reception'];

const norm = (h: string) =>
  h.normalize('NFD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[_\-.()]/g, ' ').replace(/\s+/g, ' ').trim();

export interface PackingListResult {
  rolls: RollInput[];
  errors: ImportRowError[];
}

/**
 * Parse a CSV or XLSX packing list into rolls; every bad cell is reported by row, column and reason.
 * A file past the table limits (rows, columns, a workbook's unpacked size) throws the 400/413 AppError
 * before it is read in full.
 */
export async function parsePackingList(
  file: { buffer: Buffer; originalname: string; mimetype: string },
  defaults: { widthMm: number; receivedDate: string },
): Promise<PackingListResult> {
  const isXlsx = /\.xlsx$/i.test(file.originalname) || file.mimetype.includes('spreadsheetml');
  let rows: string[][];
  try {
    rows = isXlsx ? await xlsxRows(file.buffer) : csvRows(file.buffer);
  } catch (err) {
    if (err instanceof AppError) throw err;
    return { rolls: [], errors: [{ row: 1, column: '', message: `The file could not be read as ${isXlsx ? 'XLSX' : 'CSV'}: ${(err as Error).message}` }] };
  }
  return rowsToRolls(rows, defaults);
}

function csvRows(buffer: Buffer): string[][] {
  return parseCsvWithinLimits(buffer, { trim: true });
}

async function xlsxRows(buffer: Buffer): Promise<string[][]> {
  checkWorkbookArchive(buffer, TABLE_LIMITS);
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(buffer as unknown as ArrayBuffer);
  const ws = wb.worksheets[0];
  if (!ws) throw new Error('the workbook has no sheet');
  checkSheetSize(ws, TABLE_LIMITS);
  const out: string[][] = [];
  for (let r = 1; r <= ws.rowCount; r++) {
    const row = ws.getRow(r);
    const cells: string[] = [];
    for (let c = 1; c <= Math.max(row.cellCount, ws.columnCount); c++) {
      const v = row.getCell(c).value;
      cells.push(v instanceof Date ? v.toISOString().slice(0, 10) : v === null || v === undefined ? '' : typeof v === 'object' && 'result' in v ? String(v.result) : String(v));
    }
    out.push(cells.map((s) => s.trim()));
  }
  return out;
}

/** Header-driven conversion; the header is row 1, so data rows are reported from row 2. */
export function rowsToRolls(rows: string[][], defaults: { widthMm: number; receivedDate: string }): PackingListResult {
  const errors: ImportRowError[] = [];
  const header = (rows[0] ?? []).map(norm);
  const find = (names: string[]) => header.findIndex((h) => names.includes(h));
  const labelCol = find(LABEL_COLUMNS);
  const lotCol = find(LOT_COLUMNS);
  const dateCol = find(DATE_COLUMNS);
  const lengthCol = header.findIndex((h) => h in LENGTH_COLUMNS);
  const widthCol = header.findIndex((h) => h in WIDTH_COLUMNS);
  if (labelCol < 0) errors.push({ row: 1, column: 'roll', message: 'No roll column: name one "roll" or "label"' });
  if (lotCol < 0) errors.push({ row: 1, column: 'shade lot', message: 'No shade lot column: name one "shade lot" or "lot"' });
  if (lengthCol < 0) errors.push({ row: 1, column: 'length', message: 'No length column: name one "length m", "length mm" or "length yd"' });
  if (errors.length) return { rolls: [], errors };
  const lengthFactor = LENGTH_COLUMNS[header[lengthCol]];
  const widthFactor = widthCol >= 0 ? WIDTH_COLUMNS[header[widthCol]] : 1;
  const rolls: RollInput[] = [];
  const seen = new Map<string, number>();
  rows.slice(1).forEach((cells, i) => {
    const row = i + 2;
    if (cells.every((c) => !c)) return;
    const bad = (column: string, message: string) => errors.push({ row, column, message });
    const label = cells[labelCol] ?? '';
    if (!label) bad(rows[0][labelCol], 'Roll label is empty');
    else if (label.length > 40) bad(rows[0][labelCol], 'Roll label is longer than 40 characters');
    else if (seen.has(label)) bad(rows[0][labelCol], `Roll ${label} appears twice (also row ${seen.get(label)})`);
    else seen.set(label, row);
    const lot = cells[lotCol] ?? '';
    if (!lot) bad(rows[0][lotCol], 'Shade lot is empty');
    const length = number(cells[lengthCol]);
    if (length === null || length <= 0) bad(rows[0][lengthCol], `Length "${cells[lengthCol] ?? ''}" is not a positive number`);
    let widthMm = defaults.widthMm;
    if (widthCol >= 0 && cells[widthCol]) {
      const w = number(cells[widthCol]);
      if (w === null || w <= 0) bad(rows[0][widthCol], `Width "${cells[widthCol]}" is not a positive number`);
      else widthMm = w * widthFactor;
    }
    let receivedDate = defaults.receivedDate;
    if (dateCol >= 0 && cells[dateCol]) {
      if (!isCalendarDate(cells[dateCol])) bad(rows[0][dateCol], `Date "${cells[dateCol]}" is not a date as YYYY-MM-DD`);
      else receivedDate = cells[dateCol];
    }
    if (label && lot && length !== null && length > 0) {
      rolls.push({ label, shadeLot: lot, lengthMm: Math.round(length * lengthFactor), widthMm: Math.round(widthMm), receivedDate });
    }
  });
  if (rolls.length === 0 && errors.length === 0) errors.push({ row: 2, column: '', message: 'The packing list has no rolls' });
  return { rolls: errors.length ? [] : rolls, errors };
}

/** A decimal number; a comma decimal separator is accepted when there is no dot. */
function number(text: string | undefined): number | null {
  if (!text) return null;
  const t = text.replace(/\s/g, '');
  const s = t.includes('.') ? t.replace(/,/g, '') : t.replace(',', '.');
  if (!/^-?\d+(\.\d+)?$/.test(s)) return null;
  return Number(s);
}
