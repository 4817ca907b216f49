import { describe, expect, it } from 'vitest';
import { minor, mm } from '@shared/units';
import type { CostingSheetInput } from '../types';
import { buildCostingSheetXlsx, COSTING_SHEET_NAME } from './costing-sheet.xlsx';
import { computeCostingFigures } from './costing-figures';
import {
  cachedOf,
  evaluateCell,
  findRow,
  formulaOf,
  readWorkbook,
} from './workbook-reader.testing';
import { HEADER_FILL_ARGB } from './xlsx-theme';

/**
 * Texas Education Agency (2015), CTE "Costing Garments – Student Notes Key" (txcte.org), as condensed in
 * shared/reference/production-and-costing.md §5.2 K1 [quoted]: fabric $7.99 × 3 yd; lining $2.99 × 3 yd;
 * zipper 0.75 + button 0.15; cutting 1 h × $8; sewing 4 h × $12; overhead 12 %; "marginal cost of
 * production" 20 % → total cost 120.74. Profit: total cost × 2.2 → 265.63 [computed].
 */
const k1: CostingSheetInput = {
  studioName: 'Linden Row Studio',
  dateIso: '2026-03-14',
  locale: 'en-US',
  currency: 'USD',
  unitSystem: 'imperial',
  style: { code: 'K1', name: 'Single garment (costing key)' },
  batch: { code: 'B-001' },
  sizes: [{ size: 'One size', quantity: 1 }],
  fabrics: [
    {
      description: 'Fabric',
      pricePerLengthMinor: minor(799),
      consumptionMmBySize: { 'One size': mm(2743.2) },
    },
    {
      description: 'Lining',
      pricePerLengthMinor: minor(299),
      consumptionMmBySize: { 'One size': mm(2743.2) },
    },
  ],
  trims: [
    { description: 'Zipper', quantityPerGarment: 1, unit: 'pcs', unitPriceMinor: minor(75) },
    { description: 'Button', quantityPerGarment: 1, unit: 'pcs', unitPriceMinor: minor(15) },
  ],
  labour: [
    { operation: 'Cutting', samMinutes: 60, rate: { perHourMinor: minor(800) } },
    { operation: 'Sewing', samMinutes: 240, rate: { perHourMinor: minor(1200) } },
  ],
  overheads: [
    { kind: 'percent', description: 'Overhead', percent: 12 },
    { kind: 'percent', description: 'Marginal cost of production', percent: 20 },
  ],
  marginPercent: 0,
  retailMultiplier: 2.2,
};

const threeSizes: CostingSheetInput = {
  ...k1,
  locale: 'en-GB',
  currency: 'EUR',
  unitSystem: 'metric',
  style: { code: 'DR-12', name: 'Wrap dress' },
  sizes: [
    { size: 'S', quantity: 10 },
    { size: 'M', quantity: 20 },
    { size: 'L', quantity: 10 },
  ],
  fabrics: [
    {
      description: 'Viscose twill',
      pricePerLengthMinor: minor(1250),
      consumptionMmBySize: { S: mm(1800), M: mm(1900), L: mm(2050) },
    },
  ],
  trims: [
    {
      description: 'Button',
      quantityPerGarment: { S: 5, M: 5, L: 6 },
      unit: 'pcs',
      unitPriceMinor: minor(12),
    },
  ],
  labour: [{ operation: 'Sewing', samMinutes: 15, rate: { perMinute: '0.4006' } }],
  overheads: [{ kind: 'per-garment', description: 'Packing', amountMinor: minor(50) }],
  marginPercent: 60,
  retailMultiplier: undefined,
};

describe('buildCostingSheetXlsx', () => {
  it('reproduces the Texas Education Agency costing key total of 120.74 when given its lines', async () => {
    const workbook = await readWorkbook(await buildCostingSheetXlsx(k1));
    const sheet = workbook.getWorksheet(COSTING_SHEET_NAME)!;
    const unitRow = findRow(sheet, 'Unit cost');
    // TEA (2015) costing key: total cost 120.74 [quoted]
    expect(cachedOf(sheet.getCell(unitRow, 6))).toBe(120.74);
    expect(evaluateCell(sheet, sheet.getCell(unitRow, 6).address)).toBeCloseTo(120.74, 9);
    // per-step figures of the same key [quoted]: 23.97, 8.97, 0.75, 0.15, 8, 48, 10.78, 20.12
    const costs = [
      'Fabric',
      'Lining',
      'Zipper',
      'Button',
      'Cutting',
      'Sewing',
      'Overhead',
      'Marginal cost of production',
    ].map((label) => cachedOf(sheet.getCell(findRow(sheet, label), 6)));
    expect(costs).toEqual([23.97, 8.97, 0.75, 0.15, 8, 48, 10.78, 20.12]);
    // total cost × 2.2 = 265.63 [computed from the key's 120.74]
    const retail = sheet.getCell(findRow(sheet, 'Suggested retail price'), 4);
    expect(cachedOf(retail)).toBe(265.63);
    expect(evaluateCell(sheet, retail.address)).toBe(265.63);
  });

  it('writes heading, sheet name and the teal header style', async () => {
    const workbook = await readWorkbook(await buildCostingSheetXlsx(k1));
    const sheet = workbook.getWorksheet(COSTING_SHEET_NAME)!;
    expect(sheet.getCell('A1').value).toBe('Costing sheet');
    expect(sheet.getCell(findRow(sheet, 'Studio'), 2).value).toBe('Linden Row Studio');
    expect(sheet.getCell(findRow(sheet, 'Date'), 2).value).toBe('Mar 14, 2026');
    const header = sheet.getCell(findRow(sheet, 'Cost line'), 1);
    expect((header.fill as { fgColor: { argb: string } }).fgColor.argb).toBe(HEADER_FILL_ARGB);
    expect(header.font?.bold).toBe(true);
    expect(sheet.getCell(findRow(sheet, 'Fabric'), 4).numFmt).toBe('"$"#,##0.00;-"$"#,##0.00');
  });

  it('caches the same figures the formulas give when re-evaluated, size by size', async () => {
    const figures = computeCostingFigures(threeSizes);
    const sheet = (await readWorkbook(await buildCostingSheetXlsx(threeSizes))).getWorksheet(
      COSTING_SHEET_NAME,
    )!;
    const unitRow = findRow(sheet, 'Unit cost');
    // computed by hand: S = 1.8 × 12.50 + 5 × 0.12 + 15 × 0.4006 + 0.50 = 22.50 + 0.60 + 6.01 + 0.50
    expect(figures.unitCostMinor).toEqual([2961, 3086, 3286]);
    for (let i = 0; i < 3; i++) {
      const cell = sheet.getCell(unitRow, 8 + i);
      expect(cachedOf(cell)).toBe(figures.unitCostMinor[i] / 100);
      expect(evaluateCell(sheet, cell.address)).toBeCloseTo(figures.unitCostMinor[i] / 100, 10);
    }
    const batchRow = findRow(sheet, 'Batch cost');
    // 10 × 29.61 + 20 × 30.86 + 10 × 32.86 = 1241.90 [computed]
    expect(cachedOf(sheet.getCell(batchRow, 11))).toBe(1241.9);
    expect(evaluateCell(sheet, sheet.getCell(batchRow, 11).address)).toBeCloseTo(1241.9, 9);
    // weighted average 1241.90 / 40 = 31.0475 → 31.05; 60 % margin on wholesale → 31.05 / 0.40 = 77.63 (K4 rule)
    expect(cachedOf(sheet.getCell(findRow(sheet, 'Average unit cost'), 4))).toBe(31.05);
    expect(cachedOf(sheet.getCell(findRow(sheet, 'Wholesale price'), 4))).toBe(77.63);
    // keystone default: retail = 2 × wholesale (Monash Business School marketing dictionary)
    expect(cachedOf(sheet.getCell(findRow(sheet, 'Retail multiplier (keystone = 2)'), 4))).toBe(2);
    expect(cachedOf(sheet.getCell(findRow(sheet, 'Suggested retail price'), 4))).toBe(155.26);
  });

  it('makes the unit cost follow a changed price cell when recalculated', async () => {
    const sheet = (await readWorkbook(await buildCostingSheetXlsx(threeSizes))).getWorksheet(
      COSTING_SHEET_NAME,
    )!;
    const fabricRow = findRow(sheet, 'Viscose twill');
    const price = sheet.getCell(fabricRow, 4);
    expect(price.value).toBe(12.5);
    expect(formulaOf(sheet.getCell(fabricRow, 8))).toBe(`ROUND(E${fabricRow}*$D$${fabricRow},2)`);
    const unitCell = sheet.getCell(findRow(sheet, 'Unit cost'), 8);
    expect(formulaOf(unitCell)).toBe(`SUM(H${fabricRow}:H${fabricRow + 3})`);
    // 14.00 a metre instead of 12.50: S fabric 1.8 × 14 = 25.20, +2.70 on the unit cost
    expect(evaluateCell(sheet, unitCell.address, { [price.address]: 14 })).toBeCloseTo(32.31, 10);
    const retail = sheet.getCell(findRow(sheet, 'Suggested retail price'), 4);
    expect(evaluateCell(sheet, retail.address, { [price.address]: 14 })).toBeGreaterThan(155.26);
  });

  it('uses whole units for a zero-digit currency and refuses a 100 % margin', async () => {
    const yen = { ...threeSizes, currency: 'JPY', locale: 'ja-JP' };
    const sheet = (await readWorkbook(await buildCostingSheetXlsx(yen))).getWorksheet(
      COSTING_SHEET_NAME,
    )!;
    const fabricRow = findRow(sheet, 'Viscose twill');
    expect(sheet.getCell(fabricRow, 4).value).toBe(1250);
    expect(formulaOf(sheet.getCell(fabricRow, 8))).toContain(',0)');
    await expect(buildCostingSheetXlsx({ ...k1, marginPercent: 100 })).rejects.toThrow(RangeError);
  });
});
