import { describe, expect, it } from 'vitest';
import { buildMarkerListXlsx, MARKER_LIST_SHEET_NAME } from './marker-list.xlsx';
import { buildMarkerListInput } from './fixtures.testing';
import { cachedOf, findRow, formulaOf, readWorkbook } from './workbook-reader.testing';
import { CUTTING_ROOM_CAUTIONS, CUTTING_ROOM_CAUTIONS_TITLE } from '../pdf/cutting-cautions';

describe('buildMarkerListXlsx', () => {
  it('lists every lay and every roll with lengths in metres', async () => {
    const sheet = (
      await readWorkbook(await buildMarkerListXlsx(buildMarkerListInput()))
    ).getWorksheet(MARKER_LIST_SHEET_NAME)!;
    const layHeader = findRow(sheet, 'Lay no.');
    expect(sheet.getCell(layHeader, 4).value).toBe('Marker length (m)');
    const lay1 = sheet.getRow(layHeader + 1);
    expect(lay1.getCell(2).value).toBe('S×1 M×2 L×1');
    expect(lay1.getCell(4).value).toBe(6.5);
    expect(lay1.getCell(7).value).toBe('Face up, one way');
    expect(lay1.getCell(8).value).toBe(1);
    expect(formulaOf(lay1.getCell(6))).toBe(`C${layHeader + 1}*E${layHeader + 1}`);
    expect(cachedOf(lay1.getCell(6))).toBe(16);
    const rollHeader = findRow(sheet, 'Lay no.', 1, layHeader);
    // Jana (2008) R1 [quoted]: roll A 15 m → 2 plies, remnant 2 m; roll B 16 m → 2 plies, remnant 3 m
    expect(sheet.getRow(rollHeader + 1).values).toEqual([undefined, 1, 'A', 'Lot 3', 15, 2, 2]);
    expect(sheet.getRow(rollHeader + 2).values).toEqual([undefined, 1, 'B', 'Lot 3', 16, 2, 3]);
    expect(sheet.getRow(rollHeader + 3).values).toEqual([undefined, 2, 'C', 'Lot 4', 12, 3, 2.4]);
  });

  it('includes the cutting-room cautions and shows yards for an imperial studio', async () => {
    const input = buildMarkerListInput({ unitSystem: 'imperial' });
    const sheet = (await readWorkbook(await buildMarkerListXlsx(input))).getWorksheet(
      MARKER_LIST_SHEET_NAME,
    )!;
    const title = findRow(sheet, CUTTING_ROOM_CAUTIONS_TITLE);
    expect(sheet.getCell(title + 1, 1).value).toBe(`• ${CUTTING_ROOM_CAUTIONS[0]}`);
    const layHeader = findRow(sheet, 'Lay no.');
    expect(sheet.getCell(layHeader, 4).value).toBe('Marker length (yd)');
    // exact: 1 yd = 914.4 mm (NIST); 6500 mm = 7.108486 yd; 10 mm = 0.3937 in
    expect(sheet.getCell(layHeader + 1, 4).value).toBe(7.108486);
    expect(sheet.getCell(layHeader + 1, 8).value).toBe(0.3937);
  });
});
