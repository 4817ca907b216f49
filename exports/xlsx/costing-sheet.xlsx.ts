/**
 * The costing sheet as a live workbook: prices and quantities are input cells (major units, the currency's
 * format), every cost, total and price is a formula over them with the computed result cached, so a reader
 * that recalculates follows a changed price and one that does not shows the app's figures.
 */
import type ExcelJS from 'exceljs';
import type { TFunction } from 'i18next';
import { documentWords } from '../document-words';
import type { CostingSheetInput } from '../types';
import { longLengthUnit, spreadsheetCurrencyFormat } from '../pdf/document-format';
import {
  computeCostingFigures,
  type CostingFigures,
  type CostingLineFigures,
} from './costing-figures';
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

/** Worksheet name of the costing sheet. */
export const COSTING_SHEET_NAME = 'Costing sheet';

/** Column layout: A line, B kind, C unit, D price, then quantities per size, then costs per size, then total. */
const PRICE_COL = 4;
const FIRST_QTY_COL = 5;

/**
 * Builds the costing sheet workbook (one worksheet, "Costing sheet"): one row per cost line with a cost per
 * garment for each size, the unit cost per size, batch quantities and costs, the weighted average unit cost,
 * the wholesale price from the margin and the suggested retail from the multiplier (keystone 2× by default).
 * Every money figure is rounded to the currency's minor unit with ROUND, as the app's minor-unit core does.
 * Throws RangeError for a margin outside [0, 100), a non-positive multiplier or an unknown currency.
 */
export async function buildCostingSheetXlsx(input: CostingSheetInput): Promise<Buffer> {
  const figures = computeCostingFigures(input);
  const t = documentWords(input.language);
  const sheetName = input.language && input.language !== 'en' ? t('costing.sheet') : COSTING_SHEET_NAME;
  const workbook = createWorkbook(input);
  const sheet = workbook.addWorksheet(sheetName);
  const money = spreadsheetCurrencyFormat(input.currency, input.locale);
  const rateFormat = spreadsheetCurrencyFormat(input.currency, input.locale, 4);
  const n = input.sizes.length;
  const costCol = (i: number) => FIRST_QTY_COL + n + i;
  const totalCol = FIRST_QTY_COL + 2 * n;

  let rowNo = writeTitleBlock(sheet, sheetName, input, [
    [t('style'), `${input.style.code} — ${input.style.name}`],
    [t('batch'), input.batch.code],
    [t('currency'), input.currency],
    [t('costing.lengthsIn'), longLengthUnit(input.unitSystem) === 'm' ? t('costing.metres') : t('costing.yards')],
  ]);
  writeHeaderRow(sheet, rowNo, [
    t('costing.costLine'),
    t('costing.kind'),
    t('costing.unit'),
    t('costing.price'),
    ...input.sizes.map((s) => t('costing.qtyPerGarment', { size: s.size })),
    ...input.sizes.map((s) => t('costing.costPerGarment', { size: s.size })),
  ]);
  const firstLineRow = rowNo + 1;
  figures.lines.forEach((line, i) => {
    writeCostLine(
      sheet,
      firstLineRow + i,
      firstLineRow,
      line,
      figures.digits,
      money,
      rateFormat,
      costCol,
      t,
    );
    bandRow(sheet.getRow(firstLineRow + i), i, 1, costCol(n - 1));
  });
  const lastLineRow = firstLineRow + figures.lines.length - 1;
  const unitCostRow = lastLineRow + 1;
  writeUnitCostRow(sheet, unitCostRow, firstLineRow, lastLineRow, figures, money, costCol, t);

  rowNo = unitCostRow + 2;
  writeHeaderRow(sheet, rowNo, [t('costing.batchTotals'), '', '', '']);
  writeHeaderRow(sheet, rowNo, [...input.sizes.map((s) => s.size), t('costing.total')], costCol(0));
  const batch = writeBatchRows(
    sheet,
    rowNo + 1,
    unitCostRow,
    input,
    figures,
    money,
    costCol,
    totalCol,
    t,
  );
  writeSummary(sheet, batch.nextRow + 1, batch, input, figures, money, t);
  setWidths(sheet, totalCol);
  return workbookToBuffer(workbook);
}

/** The cost formula of size `i`: quantity × price, minutes × hourly rate / 60, or % of the cost above. */
function lineFormula(
  line: CostingLineFigures,
  row: number,
  firstRow: number,
  i: number,
  d: number,
) {
  const price = ref(PRICE_COL, row, true);
  if (line.shape === 'percent-of-running') {
    const col = FIRST_QTY_COL + line.quantities.length + i;
    const above = row > firstRow ? `SUM(${ref(col, firstRow)}:${ref(col, row - 1)})` : '0';
    return `ROUND(${above}*${price},${d})`;
  }
  const qty = ref(FIRST_QTY_COL + i, row);
  return line.shape === 'minutes-x-hourly'
    ? `ROUND(${qty}*${price}/60,${d})`
    : `ROUND(${qty}*${price},${d})`;
}

function writeCostLine(
  sheet: ExcelJS.Worksheet,
  rowNo: number,
  firstRow: number,
  line: CostingLineFigures,
  digits: number,
  money: string,
  rateFormat: string,
  costCol: (i: number) => number,
  t: TFunction,
): void {
  const row = sheet.getRow(rowNo);
  row.getCell(1).value = line.description;
  row.getCell(2).value = t(`costing.kinds.${line.kind}`, { defaultValue: line.kind });
  row.getCell(3).value = t(`costing.units.${line.unit}`, { defaultValue: line.unit });
  const price = row.getCell(PRICE_COL);
  price.value = line.priceCell;
  price.numFmt = line.shape === 'percent-of-running' ? '0.00%' : money;
  // Rates per minute carry more decimals than money (0.4006 a minute).
  if (line.kind === 'Labour' && line.shape === 'quantity-x-price') price.numFmt = rateFormat;
  markInput(price);
  line.quantities.forEach((q, i) => {
    const cost = row.getCell(costCol(i));
    cost.value = formula(
      lineFormula(line, rowNo, firstRow, i, digits),
      line.costsMinor[i] / 10 ** digits,
    );
    cost.numFmt = money;
    if (line.shape === 'percent-of-running') return;
    const qty = row.getCell(FIRST_QTY_COL + i);
    qty.value = q;
    qty.numFmt = line.kind === 'Fabric' ? '0.000' : '0.###';
    markInput(qty);
  });
}

function writeUnitCostRow(
  sheet: ExcelJS.Worksheet,
  rowNo: number,
  firstRow: number,
  lastRow: number,
  figures: CostingFigures,
  money: string,
  costCol: (i: number) => number,
  t: TFunction,
): void {
  const row = sheet.getRow(rowNo);
  row.getCell(1).value = t('costing.unitCost');
  figures.unitCostMinor.forEach((cost, i) => {
    const cell = row.getCell(costCol(i));
    const sum =
      lastRow >= firstRow ? `SUM(${ref(costCol(i), firstRow)}:${ref(costCol(i), lastRow)})` : '0';
    cell.value = formula(sum, cost / 10 ** figures.digits);
    cell.numFmt = money;
  });
  boldRow(row, 1, costCol(figures.unitCostMinor.length - 1));
}

interface BatchCells {
  totalQuantity: string;
  totalCost: string;
  nextRow: number;
}

function writeBatchRows(
  sheet: ExcelJS.Worksheet,
  rowNo: number,
  unitCostRow: number,
  input: CostingSheetInput,
  figures: CostingFigures,
  money: string,
  costCol: (i: number) => number,
  totalCol: number,
  t: TFunction,
): BatchCells {
  const scale = 10 ** figures.digits;
  const qtyRow = sheet.getRow(rowNo);
  const costRow = sheet.getRow(rowNo + 1);
  qtyRow.getCell(1).value = t('costing.garmentsInBatch');
  costRow.getCell(1).value = t('costing.batchCost');
  input.sizes.forEach((s, i) => {
    const qty = qtyRow.getCell(costCol(i));
    qty.value = s.quantity;
    markInput(qty);
    const cost = costRow.getCell(costCol(i));
    cost.value = formula(
      `${ref(costCol(i), rowNo)}*${ref(costCol(i), unitCostRow)}`,
      figures.batchCostMinor[i] / scale,
    );
    cost.numFmt = money;
  });
  const span = (r: number) =>
    input.sizes.length
      ? `SUM(${ref(costCol(0), r)}:${ref(costCol(input.sizes.length - 1), r)})`
      : '0';
  qtyRow.getCell(totalCol).value = formula(span(rowNo), figures.totalQuantity);
  costRow.getCell(totalCol).value = formula(span(rowNo + 1), figures.totalBatchCostMinor / scale);
  costRow.getCell(totalCol).numFmt = money;
  bandRow(costRow, 1, 1, totalCol);
  boldRow(costRow, 1, 1);
  boldRow(costRow, totalCol, totalCol);
  return {
    totalQuantity: ref(totalCol, rowNo),
    totalCost: ref(totalCol, rowNo + 1),
    nextRow: rowNo + 2,
  };
}

function writeSummary(
  sheet: ExcelJS.Worksheet,
  rowNo: number,
  batch: BatchCells,
  input: CostingSheetInput,
  figures: CostingFigures,
  money: string,
  t: TFunction,
): void {
  const d = figures.digits;
  const scale = 10 ** d;
  const at = (offset: number) => ref(PRICE_COL, rowNo + offset);
  const rows: [string, ExcelJS.CellValue, string, boolean][] = [
    [
      t('costing.averageUnitCost'),
      formula(
        `IF(${batch.totalQuantity}=0,0,ROUND(${batch.totalCost}/${batch.totalQuantity},${d}))`,
        figures.averageUnitCostMinor / scale,
      ),
      money,
      false,
    ],
    [t('costing.margin'), input.marginPercent / 100, '0.00%', true],
    [
      t('costing.wholesale'),
      formula(`ROUND(${at(0)}/(1-${at(1)}),${d})`, figures.wholesaleMinor / scale),
      money,
      false,
    ],
    [t('costing.multiplier'), figures.retailMultiplier, '0.00', true],
    [
      t('costing.retail'),
      formula(`ROUND(${at(2)}*${at(3)},${d})`, figures.suggestedRetailMinor / scale),
      money,
      false,
    ],
  ];
  rows.forEach(([label, value, numFmt, isInput], i) => {
    const row = sheet.getRow(rowNo + i);
    row.getCell(1).value = label;
    row.getCell(1).font = { bold: true };
    const cell = row.getCell(PRICE_COL);
    cell.value = value;
    cell.numFmt = numFmt;
    if (isInput) markInput(cell);
    bandRow(row, i, 1, PRICE_COL);
  });
  sheet.getRow(rowNo + rows.length + 1).getCell(1).value =
    t('costing.inputsNote');
}

function setWidths(sheet: ExcelJS.Worksheet, lastCol: number): void {
  sheet.getColumn(1).width = 34;
  sheet.getColumn(2).width = 10;
  sheet.getColumn(3).width = 18;
  for (let c = PRICE_COL; c <= lastCol; c++) sheet.getColumn(c).width = 14;
}
