import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { zipBombXlsx } from '../../../tests/fixtures/zip-bomb';
import { AppError } from '../../errors';
import { checkSheetSize, checkWorkbookArchive, parseCsvWithinLimits, TABLE_LIMITS } from './table-limits';

const small = { maxInflatedBytes: 1024 * 1024, maxRows: 50, maxColumns: 10 };

async function workbook(rows: number, cols = 3): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet('Rolls');
  for (let r = 0; r < rows; r++) ws.addRow(Array.from({ length: cols }, (_, c) => `r${r}c${c}`));
  return Buffer.from(await wb.xlsx.writeBuffer());
}

const statusOf = (f: () => unknown) => {
  try {
    f();
  } catch (e) {
    return e instanceof AppError ? e.status : -1;
  }
  return 0;
};

describe('checkWorkbookArchive', () => {
  it('refuses with 413 a 100 KB workbook whose sheet inflates to 100 MiB when the zip tells the truth', () => {
    expect(statusOf(() => checkWorkbookArchive(zipBombXlsx(100)))).toBe(413);
  });

  it('refuses with 413 a workbook that declares a 1 KB sheet but inflates past the budget', () => {
    // The inflater itself stops at the budget, so memory stays at the cap whatever the zip claims.
    expect(statusOf(() => checkWorkbookArchive(zipBombXlsx(40, true)))).toBe(413);
  });

  it('accepts an ordinary workbook written by ExcelJS', async () => {
    const buf = await workbook(20);
    expect(statusOf(() => checkWorkbookArchive(buf, small))).toBe(0);
  });

  it('refuses with 400 a workbook with more rows than the cap before ExcelJS reads it', async () => {
    const buf = await workbook(small.maxRows + 2);
    expect(statusOf(() => checkWorkbookArchive(buf, small))).toBe(400);
  });

  it('refuses with 400 bytes that are not a zip', () => {
    expect(statusOf(() => checkWorkbookArchive(Buffer.from('Roll,Lot\n1,A\n')))).toBe(400);
  });
});

describe('checkSheetSize', () => {
  it('refuses a sheet whose one cell sits at row 1,048,576', () => {
    const ws = new ExcelJS.Workbook().addWorksheet('x');
    ws.getCell('A1048576').value = 'far';
    expect(statusOf(() => checkSheetSize(ws))).toBe(400);
  });

  it('refuses a sheet wider than the column cap', () => {
    const ws = new ExcelJS.Workbook().addWorksheet('x');
    ws.getCell(1, TABLE_LIMITS.maxColumns + 1).value = 'wide';
    expect(statusOf(() => checkSheetSize(ws))).toBe(400);
  });
});

describe('parseCsvWithinLimits', () => {
  it('reads a CSV up to the row cap and refuses one row more', () => {
    const csv = (n: number) => ['a,b', ...Array.from({ length: n }, (_, i) => `${i},x`)].join('\n');
    expect(parseCsvWithinLimits(csv(small.maxRows), {}, small)).toHaveLength(small.maxRows + 1);
    expect(statusOf(() => parseCsvWithinLimits(csv(small.maxRows + 1), {}, small))).toBe(400);
  });
});
