import { describe, expect, it } from 'vitest';
import { minor } from '@shared/units';
import type { PaySheetInput } from '../types';
import { buildPaySheetXlsx, PAY_SHEET_NAME } from './pay-sheet.xlsx';
import {
  cachedOf,
  evaluateCell,
  findRow,
  formulaOf,
  readWorkbook,
} from './workbook-reader.testing';

const pay: PaySheetInput = {
  studioName: 'Linden Row Studio',
  dateIso: '2026-03-21',
  locale: 'en-GB',
  currency: 'GBP',
  periodStartIso: '2026-03-16',
  periodEndIso: '2026-03-20',
  entries: [
    { person: 'Ada', operation: 'Join shoulders', pieces: 120, ratePerPieceMinor: minor(9) },
    { person: 'Ben', operation: 'Hem', pieces: 80, ratePerPieceMinor: minor(14) },
    { person: 'Ada', operation: 'Set sleeves', pieces: 60, ratePerPieceMinor: minor(25) },
  ],
  approvedBy: 'C. Okafor',
  approvedAtIso: '2026-03-21T16:00:00Z',
};

describe('buildPaySheetXlsx', () => {
  it('groups entries per person with subtotal and total formulas', async () => {
    const sheet = (await readWorkbook(await buildPaySheetXlsx(pay))).getWorksheet(PAY_SHEET_NAME)!;
    const first = findRow(sheet, 'Ada');
    expect(sheet.getCell(first, 2).value).toBe('Join shoulders');
    expect(sheet.getCell(first + 1, 2).value).toBe('Set sleeves');
    expect(formulaOf(sheet.getCell(first, 5))).toBe(`ROUND(C${first}*D${first},2)`);
    // computed: Ada 120 × 0.09 + 60 × 0.25 = 10.80 + 15.00 = 25.80; Ben 80 × 0.14 = 11.20; total 37.00
    const adaSub = sheet.getCell(first + 2, 5);
    expect(sheet.getCell(first + 2, 2).value).toBe('Subtotal');
    expect(formulaOf(adaSub)).toBe(`SUM(E${first}:E${first + 1})`);
    expect(cachedOf(adaSub)).toBe(25.8);
    expect(cachedOf(sheet.getCell(first + 4, 5))).toBe(11.2);
    const total = sheet.getCell(findRow(sheet, 'Total'), 5);
    expect(formulaOf(total)).toBe(`E${first + 2}+E${first + 4}`);
    expect(cachedOf(total)).toBe(37);
    expect(evaluateCell(sheet, total.address)).toBeCloseTo(37, 9);
    expect(evaluateCell(sheet, total.address, { [`C${first}`]: 130 })).toBeCloseTo(37.9, 9);
  });

  it('prints the period, approver and approval date', async () => {
    const sheet = (await readWorkbook(await buildPaySheetXlsx(pay))).getWorksheet(PAY_SHEET_NAME)!;
    expect(sheet.getCell('A1').value).toBe('Piece-rate pay');
    expect(sheet.getCell(findRow(sheet, 'Period'), 2).value).toBe('16 Mar 2026 – 20 Mar 2026');
    expect(sheet.getCell(findRow(sheet, 'Approved by'), 2).value).toBe('C. Okafor');
    expect(sheet.getCell(findRow(sheet, 'Approved at'), 2).value).toBe('21 Mar 2026');
  });

  it('totals 0 with no entries', async () => {
    const sheet = (
      await readWorkbook(await buildPaySheetXlsx({ ...pay, entries: [] }))
    ).getWorksheet(PAY_SHEET_NAME)!;
    // exceljs's reader drops a cached 0 (the file holds <v>0</v>), hence `?? 0`
    expect(cachedOf(sheet.getCell(findRow(sheet, 'Total'), 5)) ?? 0).toBe(0);
  });
});
