import { formatLength, parseLength } from '@shared/units/length-format';
import type { Millimetres } from '@shared/units/units';
import { isPointOfMeasure, type PointOfMeasure, type SizeChart } from './size-chart';

/** One problem found in a size-chart table; `row` and `column` are 1-based, as a spreadsheet shows them. */
export interface TableError {
  row: number;
  column: number;
  message: string;
}

/** Result of {@link parseSizeChartTable}: the chart, or every error (never a partial chart). */
export type ParseSizeChartResult = { ok: true; chart: SizeChart } | { ok: false; errors: TableError[] };

const ALIASES: Record<string, PointOfMeasure> = {
  'chest/bust girth': 'bust', 'bust girth': 'bust', chest: 'bust', 'under-bust girth': 'under-bust',
  'upper-chest girth': 'upper-chest', 'waist girth, curvy': 'waist', 'waist girth': 'waist',
  'waist girth, straight': 'waist-straight', hips: 'hip', 'hip girth': 'hip', 'neck base girth': 'neck-base',
  'mid-neck girth': 'mid-neck', 'head girth': 'head', 'shoulder girth': 'shoulder-girth',
  'nape to waist': 'back-waist-length', 'scye depth': 'armhole-depth',
};
const UNITS = new Set(['mm', 'cm', 'in']);

function toKey(label: string): PointOfMeasure | null {
  const l = label.trim().toLowerCase();
  if (ALIASES[l]) return ALIASES[l];
  const k = l.replace(/[\s_]+/g, '-');
  return isPointOfMeasure(k) ? k : null;
}

/**
 * Parse rows from a CSV or spreadsheet (the caller turns the file into a 2-D string array).
 * Layout: header row `[label, 'unit', size1, size2, …]` (the `unit` column is optional; without it values are mm),
 * then one row per point of measure: `[name, unit (mm|cm|in), value per size]`. Names are the keys of
 * POINTS_OF_MEASURE or common labels ("Chest/bust girth"). Values may be decimals or inch fractions
 * (`37 1/4`). Blank rows are skipped. All-or-nothing: any bad cell makes the result a list of every error.
 */
export function parseSizeChartTable(rows: string[][], name = 'Imported chart'): ParseSizeChartResult {
  const errors: TableError[] = [];
  const header = rows[0]?.map((c) => c.trim()) ?? [];
  const hasUnit = header[1]?.toLowerCase() === 'unit';
  const first = hasUnit ? 2 : 1;
  const sizes = header.slice(first);
  if (sizes.length === 0) errors.push({ row: 1, column: first + 1, message: 'header names no sizes' });
  // One pass with a set: a header thousands of sizes wide must not cost sizes² comparisons.
  const seen = new Set<string>();
  sizes.forEach((s, i) => {
    if (!s) errors.push({ row: 1, column: first + i + 1, message: 'empty size name' });
    else if (seen.has(s)) errors.push({ row: 1, column: first + i + 1, message: `duplicate size "${s}"` });
    else seen.add(s);
  });
  const values: SizeChart['values'] = {};
  for (let r = 1; r < rows.length; r++) {
    const row = rows[r];
    if (row.every((c) => c.trim() === '')) continue;
    parseRow(row, r + 1, { hasUnit, first, sizeCount: sizes.length, values, errors });
  }
  if (Object.keys(values).length === 0 && errors.length === 0) errors.push({ row: 2, column: 1, message: 'no measurement rows' });
  return errors.length ? { ok: false, errors } : { ok: true, chart: { name, sizes, values } };
}

interface RowContext {
  hasUnit: boolean;
  first: number;
  sizeCount: number;
  values: SizeChart['values'];
  errors: TableError[];
}

function parseRow(row: string[], rowNo: number, ctx: RowContext): void {
  const { errors } = ctx;
  const before = errors.length;
  const key = toKey(row[0] ?? '');
  if (!key) errors.push({ row: rowNo, column: 1, message: `unknown point of measure "${row[0] ?? ''}"` });
  else if (ctx.values[key]) errors.push({ row: rowNo, column: 1, message: `duplicate point of measure "${key}"` });
  const unit = ctx.hasUnit ? (row[1] ?? '').trim().toLowerCase() : 'mm';
  if (!UNITS.has(unit)) errors.push({ row: rowNo, column: 2, message: `unit must be mm, cm or in, got "${row[1] ?? ''}"` });
  const cells = row.slice(ctx.first);
  while (cells.length > ctx.sizeCount && cells[cells.length - 1].trim() === '') cells.pop();
  if (cells.length !== ctx.sizeCount) {
    errors.push({ row: rowNo, column: ctx.first + 1, message: `expected ${ctx.sizeCount} values, got ${cells.length}` });
  }
  const vals: Millimetres[] = [];
  cells.slice(0, ctx.sizeCount).forEach((cell, i) => {
    const v = UNITS.has(unit) ? parseLength(`${cell.trim()} ${unit}`, 'metric') : null;
    if (v === null || !cell.trim()) errors.push({ row: rowNo, column: ctx.first + i + 1, message: `not a length: "${cell}"` });
    else if (v <= 0) errors.push({ row: rowNo, column: ctx.first + i + 1, message: 'value must be positive' });
    else vals.push(v);
  });
  if (errors.length === before && key) ctx.values[key] = vals;
}

/**
 * Rows for export (CSV/XLSX): header `['measurement', 'unit', ...sizes]` then one row per point of measure in
 * POINTS_OF_MEASURE order. `unit` 'mm' writes plain numbers (up to 3 decimals); 'in' writes fractions to 1/8 in.
 * The output parses back with {@link parseSizeChartTable}.
 */
export function sizeChartToRows(chart: SizeChart, unit: 'mm' | 'cm' | 'in' = 'mm'): string[][] {
  const rows: string[][] = [['measurement', 'unit', ...chart.sizes]];
  for (const [key, vals] of Object.entries(chart.values) as [PointOfMeasure, Millimetres[]][]) {
    const cells = vals.map((v) => (unit === 'mm' ? String(Number(v.toFixed(3))) : unit === 'cm' ? String(Number((v / 10).toFixed(4))) : formatLength(v, 'imperial').replace('"', '')));
    rows.push([key, unit, ...cells]);
  }
  return rows;
}
