/**
 * A fabric and trims purchase order for one supplier, as a workbook with live line-total and total formulas.
 */
import { documentWords, wordFor } from '../document-words';
import type { PurchaseOrderInput, PurchaseOrderLine, UnitSystem } from '../types';
import {
  currencyDigits,
  formatDate,
  longLengthUnit,
  spreadsheetCurrencyFormat,
  toLongLength,
} from '../pdf/document-format';
import { roundHalfAwayFromZero } from './spreadsheet-round';
import {
  bandRow,
  boldRow,
  createWorkbook,
  formula,
  markInput,
  ref,
  workbookToBuffer,
  writeHeaderRow,
  writeTitleBlock,
} from './xlsx-theme';

/** Worksheet name of the purchase order. */
export const PURCHASE_ORDER_SHEET_NAME = 'Purchase order';

/** A line's quantity and unit as shown: lengths in m or yd, counts as given. */
export function purchaseOrderQuantity(
  line: PurchaseOrderLine,
  system: UnitSystem,
): { quantity: number; unit: string } {
  return line.quantity.kind === 'length'
    ? { quantity: toLongLength(line.quantity.lengthMm, system), unit: longLengthUnit(system) }
    : { quantity: line.quantity.count, unit: line.quantity.unit };
}

/** Line total in minor units, rounded as the sheet's ROUND(quantity × unit price) rounds it. */
export function purchaseOrderLineTotalMinor(line: PurchaseOrderLine, system: UnitSystem): number {
  return roundHalfAwayFromZero(purchaseOrderQuantity(line, system).quantity * line.unitPriceMinor);
}

/**
 * Builds the purchase order workbook (one worksheet, "Purchase order"): PO number, supplier, delivery date,
 * one row per line (item, description, quantity, unit, unit price, line total = ROUND(quantity × price)),
 * and the order total as SUM of the line totals; results are cached. An empty order totals 0.
 */
export async function buildPurchaseOrderXlsx(input: PurchaseOrderInput): Promise<Buffer> {
  const digits = currencyDigits(input.currency);
  const money = spreadsheetCurrencyFormat(input.currency, input.locale);
  const t = documentWords(input.language);
  const workbook = createWorkbook(input);
  const name = t('order.sheet');
  const sheet = workbook.addWorksheet(name);
  const extra: [string, string][] = [
    [t('order.poNumber'), input.poNumber],
    [t('order.supplier'), input.supplier.name],
  ];
  if (input.supplier.address) extra.push([t('order.address'), input.supplier.address]);
  if (input.supplier.contact) extra.push([t('order.contact'), input.supplier.contact]);
  extra.push(
    [t('order.deliveryDate'), formatDate(input.deliveryDateIso, input.locale)],
    [t('currency'), input.currency],
  );
  const headerRow = writeTitleBlock(sheet, name, input, extra);
  writeHeaderRow(sheet, headerRow, ['item', 'description', 'quantity', 'unit', 'unitPrice', 'lineTotal'].map((k) => t(`order.${k}`)));

  let totalMinor = 0;
  input.lines.forEach((line, i) => {
    const r = headerRow + 1 + i;
    const row = sheet.getRow(r);
    const { quantity, unit } = purchaseOrderQuantity(line, input.unitSystem);
    const lineMinor = purchaseOrderLineTotalMinor(line, input.unitSystem);
    totalMinor += lineMinor;
    row.getCell(1).value = line.item;
    row.getCell(2).value = wordFor(t, 'order.items', line.description);
    row.getCell(3).value = quantity;
    row.getCell(3).numFmt = line.quantity.kind === 'length' ? '0.000' : '0.###';
    // A length's unit is the studio's (m or yd); a trim keeps the unit it is counted in.
    row.getCell(4).value = line.quantity.kind === 'length' ? wordFor(t, 'markerSheet.units', unit) : unit;
    row.getCell(5).value = line.unitPriceMinor / 10 ** digits;
    row.getCell(5).numFmt = money;
    row.getCell(6).value = formula(
      `ROUND(${ref(3, r)}*${ref(5, r)},${digits})`,
      lineMinor / 10 ** digits,
    );
    row.getCell(6).numFmt = money;
    markInput(row.getCell(3));
    markInput(row.getCell(5));
    bandRow(row, i, 1, 6);
  });

  const totalRowNo = headerRow + 1 + input.lines.length;
  const totalRow = sheet.getRow(totalRowNo);
  totalRow.getCell(5).value = t('order.total');
  const sum = input.lines.length ? `SUM(${ref(6, headerRow + 1)}:${ref(6, totalRowNo - 1)})` : '0';
  totalRow.getCell(6).value = formula(sum, totalMinor / 10 ** digits);
  totalRow.getCell(6).numFmt = money;
  boldRow(totalRow, 5, 6);
  if (input.notes) sheet.getRow(totalRowNo + 2).getCell(1).value = t('order.notes', { notes: input.notes });
  [16, 40, 12, 8, 14, 16].forEach((w, i) => (sheet.getColumn(i + 1).width = w));
  return workbookToBuffer(workbook);
}
