import { describe, expect, it } from 'vitest';
import { buildBundleRegisterXlsx, BUNDLE_REGISTER_SHEET_NAME } from './bundle-register.xlsx';
import { buildBundleTicketsInput } from './fixtures.testing';
import { cachedOf, findRow, formulaOf, readWorkbook } from './workbook-reader.testing';
import { BAND_FILL_ARGB } from './xlsx-theme';

describe('buildBundleRegisterXlsx', () => {
  it('writes one row per bundle with a status column per operation', async () => {
    const sheet = (
      await readWorkbook(await buildBundleRegisterXlsx(buildBundleTicketsInput()))
    ).getWorksheet(BUNDLE_REGISTER_SHEET_NAME)!;
    const header = findRow(sheet, 'Bundle no.');
    expect(sheet.getRow(header).values).toEqual([
      undefined,
      'Bundle no.',
      'Size',
      'Shade lot',
      'Plies',
      'Pieces',
      'Lay no.',
      'Join shoulders',
      'Set sleeves',
      'Side seams',
      'Hem',
    ]);
    expect(sheet.getRow(header + 1).values).toEqual([
      undefined,
      1,
      'S',
      'Lot 3',
      '1–4',
      4,
      1,
      'done',
      'in progress',
      '',
      '',
    ]);
    expect(sheet.getCell(header + 3, 4).value).toBe('1–3');
    const fill = sheet.getCell(header + 2, 1).fill as { fgColor: { argb: string } };
    expect(fill.fgColor.argb).toBe(BAND_FILL_ARGB);
    const total = sheet.getCell(findRow(sheet, 'Total pieces'), 5);
    expect(formulaOf(total)).toBe(`SUM(E${header + 1}:E${header + 3})`);
    expect(cachedOf(total)).toBe(18);
  });
});
