/**
 * Piece-rate pay for one period: one row per person and operation (pieces × rate, as a formula), a subtotal
 * per person and a grand total over the subtotals, with the approval line.
 */
import { documentWords } from '../document-words';
import type { PaySheetInput, PieceworkEntry } from '../types';
import { currencyDigits, formatDate, spreadsheetCurrencyFormat } from '../pdf/document-format';
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

/** Worksheet name of the pay sheet. */
export const PAY_SHEET_NAME = 'Piece-rate pay';

/** Entries grouped by person, people in first-seen order, entries in input order. */
export function groupEntriesByPerson(
  entries: readonly PieceworkEntry[],
): [string, PieceworkEntry[]][] {
  const groups = new Map<string, PieceworkEntry[]>();
  for (const entry of entries) {
    const list = groups.get(entry.person) ?? [];
    list.push(entry);
    groups.set(entry.person, list);
  }
  return [...groups.entries()];
}

/**
 * Builds the piece-rate pay workbook (one worksheet, "Piece-rate pay"): person, operation, pieces, rate,
 * amount = ROUND(pieces × rate); a "Subtotal" row after each person (SUM of their amounts) and a "Total"
 * row (sum of the subtotals); then "Approved by" / "Approved at" (blank lines to sign when not given).
 * Results are cached from integer minor-unit arithmetic.
 */
export async function buildPaySheetXlsx(input: PaySheetInput): Promise<Buffer> {
  const digits = currencyDigits(input.currency);
  const scale = 10 ** digits;
  const money = spreadsheetCurrencyFormat(input.currency, input.locale);
  const t = documentWords(input.language);
  const workbook = createWorkbook(input);
  const name = t('pay.sheet');
  const sheet = workbook.addWorksheet(name);
  const period = `${formatDate(input.periodStartIso, input.locale)} – ${formatDate(input.periodEndIso, input.locale)}`;
  let r = writeTitleBlock(sheet, name, input, [
    [t('pay.period'), period],
    [t('currency'), input.currency],
  ]);
  writeHeaderRow(sheet, r, ['person', 'operation', 'pieces', 'rate', 'amount'].map((k) => t(`pay.${k}`)));
  r += 1;

  const subtotalCells: string[] = [];
  let totalMinor = 0;
  let band = 0;
  for (const [person, entries] of groupEntriesByPerson(input.entries)) {
    const first = r;
    let personMinor = 0;
    for (const entry of entries) {
      const row = sheet.getRow(r);
      const amountMinor = roundHalfAwayFromZero(entry.pieces * entry.ratePerPieceMinor);
      personMinor += amountMinor;
      row.getCell(1).value = person;
      row.getCell(2).value = entry.operation;
      row.getCell(3).value = entry.pieces;
      row.getCell(4).value = entry.ratePerPieceMinor / scale;
      row.getCell(4).numFmt = money;
      row.getCell(5).value = formula(
        `ROUND(${ref(3, r)}*${ref(4, r)},${digits})`,
        amountMinor / scale,
      );
      row.getCell(5).numFmt = money;
      markInput(row.getCell(3));
      markInput(row.getCell(4));
      bandRow(row, band++, 1, 5);
      r += 1;
    }
    const sub = sheet.getRow(r);
    sub.getCell(1).value = person;
    sub.getCell(2).value = t('pay.subtotal');
    sub.getCell(5).value = formula(`SUM(${ref(5, first)}:${ref(5, r - 1)})`, personMinor / scale);
    sub.getCell(5).numFmt = money;
    boldRow(sub, 1, 5);
    subtotalCells.push(ref(5, r));
    totalMinor += personMinor;
    r += 1;
  }
  const total = sheet.getRow(r);
  total.getCell(1).value = t('pay.total');
  total.getCell(5).value = formula(
    subtotalCells.length ? subtotalCells.join('+') : '0',
    totalMinor / scale,
  );
  total.getCell(5).numFmt = money;
  boldRow(total, 1, 5);

  sheet.getRow(r + 2).getCell(1).value = t('pay.approvedBy');
  sheet.getRow(r + 2).getCell(2).value = input.approvedBy ?? '';
  sheet.getRow(r + 3).getCell(1).value = t('pay.approvedAt');
  sheet.getRow(r + 3).getCell(2).value = input.approvedAtIso
    ? formatDate(input.approvedAtIso, input.locale, input.timeZone)
    : '';
  [24, 30, 10, 16, 16].forEach((w, i) => (sheet.getColumn(i + 1).width = w));
  return workbookToBuffer(workbook);
}
