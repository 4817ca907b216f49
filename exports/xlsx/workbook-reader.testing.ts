/**
 * Test helpers: read a built workbook back with exceljs, find rows by their label, and re-evaluate the small
 * formula language our builders write (cell refs, + - * /, SUM over a range, ROUND, IF with `=`) so a test can
 * change an input cell and watch the totals follow.
 */
import ExcelJS from 'exceljs';

/** Loads workbook bytes with exceljs. */
export async function readWorkbook(buffer: Buffer): Promise<ExcelJS.Workbook> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(buffer as unknown as ArrayBuffer);
  return workbook;
}

/** The first row whose column-`col` text equals `label`; throws when there is none. */
export function findRow(sheet: ExcelJS.Worksheet, label: string, col = 1, after = 0): number {
  for (let r = after + 1; r <= sheet.rowCount; r++) {
    if (sheet.getRow(r).getCell(col).value === label) return r;
  }
  throw new Error(`no row labelled ${label}`);
}

/** The formula text of a cell, or undefined for a plain value. */
export function formulaOf(cell: ExcelJS.Cell): string | undefined {
  const v = cell.value as { formula?: string } | null;
  return v && typeof v === 'object' && 'formula' in v ? v.formula : undefined;
}

/** The cached result of a formula cell, or the plain value. */
export function cachedOf(cell: ExcelJS.Cell): unknown {
  const v = cell.value as { formula?: string; result?: unknown } | null;
  return v && typeof v === 'object' && 'formula' in v ? v.result : v;
}

const round = (x: number, d: number) => {
  const f = 10 ** d;
  return (Math.sign(x) * Math.round(Number((Math.abs(x) * f).toPrecision(15)))) / f;
};

/** Spreadsheet-style rounding of a float to `d` decimals (half away from zero, 15 significant digits). */
export const spreadsheetRound = round;

/**
 * Evaluates a cell by recalculating its formula from the sheet's current values, with `overrides`
 * (address → number) replacing input cells, as a recalculating spreadsheet would.
 */
export function evaluateCell(
  sheet: ExcelJS.Worksheet,
  address: string,
  overrides: Record<string, number> = {},
): number {
  const seen = new Map<string, number>();
  const value = (addr: string): number => {
    const key = addr.replace(/\$/g, '');
    if (key in overrides) return overrides[key];
    const hit = seen.get(key);
    if (hit !== undefined) return hit;
    const raw = sheet.getCell(key).value;
    const text = formulaOf(sheet.getCell(key));
    const out = text !== undefined ? evaluate(text) : typeof raw === 'number' ? raw : 0;
    seen.set(key, out);
    return out;
  };
  const evaluate = (text: string): number => {
    const js = text
      .replace(/(\$?[A-Z]{1,3}\$?\d+)(?![\d(])/g, (m: string) => `V("${m}")`)
      .replace(
        /SUM\(V\("([^"]+)"\):V\("([^"]+)"\)\)/g,
        (_, a: string, b: string) => `(${rangeSum(a, b)})`,
      )
      .replace(/ROUND\(/g, 'R(')
      .replace(/([^<>!=])=([^=])/g, '$1===$2');
    return new Function('R', 'IF', 'V', `return ${js};`)(
      round,
      (c: boolean, a: number, b: number) => (c ? a : b),
      value,
    ) as number;
  };
  const rangeSum = (a: string, b: string): string => {
    const [ca, ra] = split(a);
    const [cb, rb] = split(b);
    const terms: string[] = [];
    for (let c = ca; c <= cb; c++) {
      for (let r = ra; r <= rb; r++) terms.push(`V("${sheet.getCell(r, c).address}")`);
    }
    return terms.join('+') || '0';
  };
  return value(address);
}

function split(addr: string): [number, number] {
  const m = /^\$?([A-Z]+)\$?(\d+)$/.exec(addr);
  if (!m) throw new Error(`bad ref ${addr}`);
  const col = [...m[1]].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0);
  return [col, Number(m[2])];
}
