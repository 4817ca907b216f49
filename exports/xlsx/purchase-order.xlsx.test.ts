import { describe, expect, it } from 'vitest';
import { minor, mm } from '@shared/units';
import type { PurchaseOrderInput } from '../types';
import { buildPurchaseOrderXlsx, PURCHASE_ORDER_SHEET_NAME } from './purchase-order.xlsx';
import {
  cachedOf,
  evaluateCell,
  findRow,
  formulaOf,
  readWorkbook,
} from './workbook-reader.testing';

const order: PurchaseOrderInput = {
  studioName: 'Linden Row Studio',
  dateIso: '2026-03-14',
  locale: 'en-GB',
  currency: 'GBP',
  unitSystem: 'metric',
  poNumber: 'PO-0042',
  supplier: { name: 'North Mill Textiles', address: '4 Weir Lane', contact: 'orders@example.test' },
  deliveryDateIso: '2026-04-01',
  lines: [
    {
      item: 'F-101',
      description: 'Viscose twill, navy, 145 cm',
      quantity: { kind: 'length', lengthMm: mm(62500) },
      unitPriceMinor: minor(1250),
    },
    {
      item: 'T-7',
      description: 'Shell button 15 mm',
      quantity: { kind: 'count', count: 200, unit: 'pcs' },
      unitPriceMinor: minor(12),
    },
    {
      item: 'T-9',
      description: 'Invisible zip 55 cm',
      quantity: { kind: 'count', count: 40, unit: 'pcs' },
      unitPriceMinor: minor(85),
    },
  ],
  notes: 'Deliver to the back door.',
};

describe('buildPurchaseOrderXlsx', () => {
  it('writes line totals and the order total as formulas with cached minor-unit results', async () => {
    const sheet = (await readWorkbook(await buildPurchaseOrderXlsx(order))).getWorksheet(
      PURCHASE_ORDER_SHEET_NAME,
    )!;
    const first = findRow(sheet, 'F-101');
    expect(sheet.getCell(first, 3).value).toBe(62.5);
    expect(sheet.getCell(first, 4).value).toBe('m');
    expect(formulaOf(sheet.getCell(first, 6))).toBe(`ROUND(C${first}*E${first},2)`);
    // computed: 62.5 m × 12.50 = 781.25; 200 × 0.12 = 24.00; 40 × 0.85 = 34.00; total 839.25
    expect([0, 1, 2].map((i) => cachedOf(sheet.getCell(first + i, 6)))).toEqual([781.25, 24, 34]);
    const total = sheet.getCell(findRow(sheet, 'Total', 5), 6);
    expect(formulaOf(total)).toBe(`SUM(F${first}:F${first + 2})`);
    expect(cachedOf(total)).toBe(839.25);
    expect(evaluateCell(sheet, total.address)).toBeCloseTo(839.25, 9);
    expect(evaluateCell(sheet, total.address, { [`E${first}`]: 13 })).toBeCloseTo(870.5, 9);
  });

  it('carries PO number, supplier, delivery date, studio and date', async () => {
    const sheet = (await readWorkbook(await buildPurchaseOrderXlsx(order))).getWorksheet(
      PURCHASE_ORDER_SHEET_NAME,
    )!;
    const value = (label: string) => sheet.getCell(findRow(sheet, label), 2).value;
    expect(sheet.getCell('A1').value).toBe('Purchase order');
    expect(value('PO number')).toBe('PO-0042');
    expect(value('Supplier')).toBe('North Mill Textiles');
    expect(value('Delivery date')).toBe('1 Apr 2026');
    expect(value('Studio')).toBe('Linden Row Studio');
    expect(value('Date')).toBe('14 Mar 2026');
  });

  it('shows lengths in yards for an imperial studio and totals 0 for an empty order', async () => {
    const yd = {
      ...order,
      unitSystem: 'imperial' as const,
      lines: [{ ...order.lines[0], quantity: { kind: 'length' as const, lengthMm: mm(9144) } }],
    };
    const sheet = (await readWorkbook(await buildPurchaseOrderXlsx(yd))).getWorksheet(
      PURCHASE_ORDER_SHEET_NAME,
    )!;
    const row = findRow(sheet, 'F-101');
    // exact: 1 yd = 0.9144 m (NIST), so 9144 mm = 10 yd; 10 × 12.50 = 125.00
    expect(sheet.getCell(row, 3).value).toBe(10);
    expect(sheet.getCell(row, 4).value).toBe('yd');
    expect(cachedOf(sheet.getCell(row, 6))).toBe(125);
    const empty = (
      await readWorkbook(await buildPurchaseOrderXlsx({ ...order, lines: [] }))
    ).getWorksheet(PURCHASE_ORDER_SHEET_NAME)!;
    const total = empty.getCell(findRow(empty, 'Total', 5), 6);
    expect(formulaOf(total)).toBe('0');
    // exceljs's reader drops a cached 0 (the file holds <v>0</v>), hence `?? 0`
    expect(cachedOf(total) ?? 0).toBe(0);
  });
});
