import ExcelJS from 'exceljs';
import { currencyDigits } from '../../../shared/units/money';
import { checkSheetSize, checkWorkbookArchive } from '../uploads/table-limits';
import { LINE_SECTIONS, type OperationInput } from '../../../shared/schemas/line';


const HEADER = ['Code', 'Operation', 'Section', 'Machine type', 'SAM (min)', 'After (codes)'];

/** The operations table as an XLSX workbook; the piece-rate column only when `withRates`. */
export async function operationsToXlsx(rows: OperationInput[], opts: { currency: string; withRates: boolean; created: Date }): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Seamrun';
  wb.created = opts.created;
  wb.modified = opts.created;
  const ws = wb.addWorksheet('Operations');
  const digits = currencyDigits(opts.currency);
  ws.addRow(opts.withRates ? [...HEADER, `Piece rate (${opts.currency})`] : HEADER);
  for (const o of rows) {
    const base = [o.code, o.name, o.section, o.machineType, o.sam, (o.predecessors ?? []).join(', ')];
    ws.addRow(opts.withRates ? [...base, o.pieceRateMinor == null ? '' : o.pieceRateMinor / 10 ** digits] : base);
  }
  ws.getRow(1).font = { bold: true, color: { argb: 'FFFFFFFF' } };
  ws.getRow(1).fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FF0F4C5C' } };
  ws.columns.forEach((c, i) => (c.width = [8, 40, 11, 14, 10, 18, 14][i] ?? 12));
  return Buffer.from(await wb.xlsx.writeBuffer());
}

/** A bad cell of an imported sheet (1-based, as a spreadsheet shows it). */
export interface SheetError {
  row: number;
  column: number;
  message: string;
}

const text = (v: ExcelJS.CellValue): string => {
  if (v === null || v === undefined) return '';
  if (typeof v === 'object' && 'result' in v) return String(v.result ?? '');
  if (typeof v === 'object' && 'richText' in v) return v.richText.map((t) => t.text).join('');
  return String(v).trim();
};

/**
 * Read an operations sheet (layout of {@link operationsToXlsx}); every bad cell is reported, no partial result.
 * Throws the 400/413 AppError of the table limits for a workbook past them.
 */
export async function operationsFromXlsx(buf: Buffer, currency: string): Promise<{ ok: true; rows: OperationInput[] } | { ok: false; errors: SheetError[] }> {
  checkWorkbookArchive(buf);
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.load(buf as unknown as ArrayBuffer);
  } catch {
    return { ok: false, errors: [{ row: 1, column: 1, message: 'not a readable XLSX workbook' }] };
  }
  const ws = wb.worksheets[0];
  if (!ws) return { ok: false, errors: [{ row: 1, column: 1, message: 'the workbook has no sheet' }] };
  checkSheetSize(ws);
  const errors: SheetError[] = [];
  const header = (ws.getRow(1).values as ExcelJS.CellValue[]).slice(1).map(text);
  HEADER.forEach((h, i) => {
    if ((header[i] ?? '').toLowerCase() !== h.toLowerCase()) errors.push({ row: 1, column: i + 1, message: `expected header "${h}"` });
  });
  const hasRates = /^piece rate/i.test(header[6] ?? '');
  const digits = currencyDigits(currency);
  const rows: OperationInput[] = [];
  ws.eachRow((row, n) => {
    if (n === 1) return;
    const c = (i: number) => text(row.getCell(i).value);
    if ([1, 2, 3, 4, 5, 6, 7].every((i) => c(i) === '')) return;
    const before = errors.length;
    const err = (column: number, message: string) => errors.push({ row: n, column, message });
    if (!/^[A-Za-z0-9-_]{1,12}$/.test(c(1))) err(1, `code must be 1–12 letters or digits, got "${c(1)}"`);
    if (!c(2)) err(2, 'operation name is empty');
    if (!(LINE_SECTIONS as readonly string[]).includes(c(3).toLowerCase())) err(3, `section must be cutting, sewing or finishing, got "${c(3)}"`);
    if (!c(4)) err(4, 'machine type is empty');
    const sam = Number(c(5));
    if (!(sam > 0 && sam <= 600)) err(5, `SAM must be minutes above 0, got "${c(5)}"`);
    const rate = hasRates && c(7) !== '' ? Number(c(7)) : null;
    if (rate !== null && !(rate >= 0)) err(7, `piece rate must be a positive amount, got "${c(7)}"`);
    if (errors.length > before) return;
    rows.push({
      code: c(1), name: c(2), section: c(3).toLowerCase() as OperationInput['section'], machineType: c(4), sam,
      predecessors: c(6) ? c(6).split(/[,;\s]+/).filter(Boolean) : [],
      pieceRateMinor: rate === null ? null : Math.round(rate * 10 ** digits),
    });
  });
  return errors.length ? { ok: false, errors } : { ok: true, rows };
}
