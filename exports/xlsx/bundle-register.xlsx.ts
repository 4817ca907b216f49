/**
 * The bundle register of one batch: one row per bundle with its size, shade lot, ply range, pieces, lay and
 * a status column per sewing operation, and the total pieces as a formula.
 */
import type { BundleRegisterInput } from '../types';
import { documentWords, wordFor } from '../document-words';
import { formatPlyRange } from '../pdf/document-format';
import {
  bandRow,
  boldRow,
  createWorkbook,
  formula,
  ref,
  workbookToBuffer,
  writeHeaderRow,
  writeTitleBlock,
} from './xlsx-theme';

/** Worksheet name of the bundle register (in English; the document's language names it in its own). */
export const BUNDLE_REGISTER_SHEET_NAME = 'Bundle register';

/**
 * Builds the bundle register workbook (one worksheet, "Bundle register"): bundle no., size, shade lot,
 * plies (range), pieces, lay no., then one column per operation holding its status ('' when not started).
 * Bundles appear in input order; the last row totals pieces with SUM (0 for no bundles).
 */
export async function buildBundleRegisterXlsx(input: BundleRegisterInput): Promise<Buffer> {
  const t = documentWords(input.language);
  const workbook = createWorkbook(input);
  const name = t('register.sheet');
  const sheet = workbook.addWorksheet(name);
  const header = writeTitleBlock(sheet, name, input, [
    [t('style'), `${input.style.code} — ${input.style.name}`],
    [t('batch'), input.batch.code],
  ]);
  const labels = ['bundleNo', 'size', 'shadeLot', 'plies', 'pieces', 'layNo'].map((k) => t(`register.${k}`));
  const lastCol = labels.length + input.operations.length;
  writeHeaderRow(sheet, header, [...labels, ...input.operations.map((o) => o.name)]);
  input.bundles.forEach((b, i) => {
    const row = sheet.getRow(header + 1 + i);
    row.values = [
      b.bundleNo,
      b.size,
      b.shadeLot,
      formatPlyRange(b.plyFrom, b.plyTo),
      b.pieces,
      b.layNo,
      ...input.operations.map((o) => {
        const status = b.statusByOperation?.[o.name] ?? '';
        return status && wordFor(t, 'register.status', status);
      }),
    ];
    bandRow(row, i, 1, lastCol);
  });
  const totalNo = header + 1 + input.bundles.length;
  const total = sheet.getRow(totalNo);
  total.getCell(1).value = t('register.totalPieces');
  const pieces = input.bundles.reduce((sum, b) => sum + b.pieces, 0);
  const sum = input.bundles.length ? `SUM(${ref(5, header + 1)}:${ref(5, totalNo - 1)})` : '0';
  total.getCell(5).value = formula(sum, pieces);
  boldRow(total, 1, 5);
  sheet.getColumn(1).width = 12;
  for (let c = 2; c <= lastCol; c++) sheet.getColumn(c).width = c > labels.length ? 18 : 11;
  return workbookToBuffer(workbook);
}
