import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units/units';
import { demoSizeChart, DEMO_SIZE_RUN } from './demo-size-chart';
import { designateByBust, en13402BustIntervals } from './en13402';
import { computeGrades } from './size-chart';
import { parseSizeChartTable, sizeChartToRows } from './size-chart-table';
import { sizeMix } from './size-mix';
import { buildSpecSheet } from './spec-sheet';
import { datasetPath, hasDatasets } from '../../tests/fixtures/reference-data';

// ASTM D5585-11e1, Table 1 (inch-pound), sizes 00–20, girth rows as printed [quoted]
const ASTM_SIZES = ['00', '0', '2', '4', '6', '8', '10', '12', '14', '16', '18', '20'];
const ASTM_ROWS: string[][] = [
  ['Measurement', 'unit', ...ASTM_SIZES],
  ['Head girth', 'in', '21 1/4', '21 1/4', '21 1/2', '21 1/2', '21 3/4', '21 3/4', '22', '22', '22 1/4', '22 1/4', '22 1/2', '22 1/2'],
  ['Neck base girth', 'in', '13 1/4', '13 1/2', '13 3/4', '14', '14 1/4', '14 5/8', '14 7/8', '15 1/8', '15 1/2', '15 3/4', '16', '16 3/8'],
  ['Mid-neck girth', 'in', '12 3/8', '12 5/8', '12 7/8', '13 1/8', '13 3/8', '13 5/8', '13 7/8', '14 1/4', '14 5/8', '15', '15 1/2', '16'],
  ['Shoulder girth', 'in', '37 1/8', '37 3/4', '38 3/8', '39', '39 3/4', '40 1/2', '41 1/4', '42', '43', '44 1/4', '45 1/2', '46 7/8'],
  ['Chest/bust girth', 'in', '31 1/8', '31 3/4', '33', '34 1/8', '35 1/4', '36 1/4', '37 1/4', '38 3/4', '40 3/8', '42 1/8', '44', '46'],
  ['Under-bust girth', 'in', '25 3/4', '26 1/2', '27 1/4', '28', '29', '30', '31', '32 1/2', '34', '35 3/4', '37 5/8', '39 5/8'],
  ['Upper-chest girth', 'in', '31 3/4', '32 1/4', '33 1/4', '34 1/8', '35', '35 7/8', '36 3/4', '38', '39 1/4', '40 5/8', '42 1/4', '43 7/8'],
  ['Waist girth, curvy', 'in', '23 7/8', '24 5/8', '25 3/8', '26 1/8', '27', '28', '29', '30 3/4', '32 1/2', '34 1/2', '36 3/4', '39'],
  ['Waist girth, straight', 'in', '25 3/8', '26 1/8', '26 7/8', '27 5/8', '28 1/2', '29 1/2', '30 1/2', '32 1/4', '34', '36', '38 1/4', '40 1/2'],
];
const IN = 25.4;

describe('ASTM D5585-11e1 Table 1 imported as a chart', () => {
  const parsed = parseSizeChartTable(ASTM_ROWS, 'ASTM D5585-11e1');
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  const grades = computeGrades(parsed.chart);

  it('reproduces the published size-to-size grades (sizing-and-grading.md §1.1, computed from Table 1)', () => {
    const bust = [5 / 8, 1.25, 1.125, 1.125, 1, 1, 1.5, 1.625, 1.75, 1.875, 2];
    const waist = [0.75, 0.75, 0.75, 0.875, 1, 1, 1.75, 1.75, 2, 2.25, 2.25];
    const underBust = [0.75, 0.75, 0.75, 1, 1, 1, 1.5, 1.5, 1.75, 1.875, 2];
    const upperChest = [0.5, 1, 0.875, 0.875, 0.875, 0.875, 1.25, 1.25, 1.375, 1.625, 1.625];
    const neck = [0.25, 0.25, 0.25, 0.25, 0.375, 0.25, 0.25, 0.375, 0.25, 0.25, 0.375];
    const head = [0, 0.25, 0, 0.25, 0, 0.25, 0, 0.25, 0, 0.25, 0];
    const check = (got: number[] | undefined, want: number[]) => want.forEach((w, i) => expect(got?.[i]).toBeCloseTo(w * IN, 9));
    check(grades.bust, bust);
    check(grades.waist, waist);
    check(grades['waist-straight'], waist);
    check(grades['under-bust'], underBust);
    check(grades['upper-chest'], upperChest);
    check(grades['neck-base'], neck);
    check(grades.head, head);
  });

  it('keeps waist straight − waist curvy = 1 1/2 in at all 12 sizes (ASTM D5585-11e1 Table 1)', () => {
    const { waist, 'waist-straight': straight } = parsed.chart.values;
    ASTM_SIZES.forEach((_, i) => expect(straight![i] - waist![i]).toBeCloseTo(38.1, 9));
  });

  it('exports back to inch rows that re-import to the same mm values (all Table 1 values are eighths)', () => {
    const again = parseSizeChartTable(sizeChartToRows(parsed.chart, 'in'), parsed.chart.name);
    expect(again.ok && again.chart.values.bust).toEqual(parsed.chart.values.bust);
    expect(sizeChartToRows(parsed.chart, 'in')[5].slice(0, 4)).toEqual(['bust', 'in', '31 1/8', '31 3/4']);
  });

  it('exports centimetre rows for a metric studio: size 12 bust 38 3/4 in is 98.425 cm (1 in = 2.54 cm exactly), and they re-import to the same mm', () => {
    const rows = sizeChartToRows(parsed.chart, 'cm');
    expect(rows[5][0]).toBe('bust');
    expect(rows[5][1]).toBe('cm');
    expect(rows[5][2 + 7]).toBe('98.425');
    const again = parseSizeChartTable(rows, parsed.chart.name);
    if (!again.ok) throw new Error('the cm rows did not re-import');
    parsed.chart.values.bust!.forEach((mm, i) => expect(again.chart.values.bust![i]).toBeCloseTo(mm, 9));
  });

  it('converts size 12 bust 38 3/4 in to 984.25 mm exactly (Table 1; 1 in = 25.4 mm)', () => {
    expect(parsed.chart.values.bust![7]).toBeCloseTo(984.25, 9);
  });
});

describe('parseSizeChartTable', () => {
  it('reports every bad row and returns no chart', () => {
    const res = parseSizeChartTable([
      ['pom', 'unit', 'S', 'M', 'S'],
      ['bust', 'mm', '880', '920', '960'],
      ['elbow', 'mm', '1', '2', '3'],
      ['waist', 'furlong', '1', '2', '3'],
      ['hip', 'cm', '96', 'x', '-3'],
      ['', '', '', '', ''],
      ['bust', 'mm', '1', '2'],
    ]);
    expect(res.ok).toBe(false);
    if (res.ok) return;
    expect(res.errors).toEqual(
      expect.arrayContaining([
        { row: 1, column: 5, message: 'duplicate size "S"' },
        { row: 3, column: 1, message: 'unknown point of measure "elbow"' },
        { row: 4, column: 2, message: expect.stringContaining('unit') },
        { row: 5, column: 4, message: 'not a length: "x"' },
        { row: 5, column: 5, message: 'value must be positive' },
        { row: 7, column: 1, message: 'duplicate point of measure "bust"' },
        { row: 7, column: 3, message: 'expected 3 values, got 2' },
      ]),
    );
  });

  it('round-trips the demo chart through rows', () => {
    const chart = demoSizeChart();
    const back = parseSizeChartTable(sizeChartToRows(chart), chart.name);
    expect(back).toEqual({ ok: true, chart });
  });

  it('reads a header 200,000 sizes wide in one pass when checking for duplicate sizes', () => {
    // Behaviour, not timing: the old indexOf check made this about 2·10^10 comparisons and never finished.
    const sizes = Array.from({ length: 200_000 }, (_, i) => `S${i}`);
    const res = parseSizeChartTable([['pom', 'unit', ...sizes], ['bust', 'mm', ...sizes.map(() => '800')]]);
    expect(res.ok && res.chart.sizes.length).toBe(200_000);
    const dup = parseSizeChartTable([['pom', ...sizes, 'S7'], ['bust', ...sizes.map(() => '800'), '800']]);
    expect(!dup.ok && dup.errors).toEqual([{ row: 1, column: 200_002, message: 'duplicate size "S7"' }]);
  });

  it('reads a table without a unit column as mm', () => {
    const res = parseSizeChartTable([['pom', 'A', 'B'], ['bust', '800', '840']]);
    expect(res.ok && res.chart.values.bust).toEqual([800, 840]);
  });
});

describe('buildSpecSheet', () => {
  it('adds ease and tolerance per size (ease: CWU costume text ch. 16, 1 1/2–2 in at the bust)', () => {
    const rows = buildSpecSheet(demoSizeChart(), { bust: { easeMm: mm(2 * IN), toleranceMm: mm(10) } });
    expect(rows).toHaveLength(5);
    expect(rows[2]).toMatchObject({ size: 'M', bodyMm: 946, garmentMm: 946 + 50.8, minMm: 936 + 50.8, maxMm: 956 + 50.8 });
  });
});

describe('EN 13402-3 designation', () => {
  it('uses the published limits 74…102 by 4 cm, then 107…131 by 6 (CEN 2005 via CRAN Anthropometry bustSizesStandard)', () => {
    const iv = en13402BustIntervals();
    expect(iv).toHaveLength(12);
    expect(iv.map((d) => d.lowerMm / 10)).toEqual([74, 78, 82, 86, 90, 94, 98, 102, 107, 113, 119, 125]);
    expect(designateByBust(880)?.label).toBe('86–90'); // BSI 2002 "Ms Average" 88-72-96
    expect(designateByBust(1020)?.label).toBe('102–107');
    expect(designateByBust(739.9)).toBeNull();
    expect(designateByBust(1310)).toBeNull();
  });

  it.skipIf(!hasDatasets)('counts ANSUR II female chest girths per interval as the reference table (Paquette et al. 2012, ANSUR_II_FEMALE_Public.csv)', () => {
    const file = datasetPath('anthropometry', 'ANSUR_II_FEMALE_Public.csv');
    const lines = readFileSync(file, 'latin1').trim().split(/\r?\n/);
    const col = lines[0].split(',').indexOf('chestcircumference');
    const chest = lines.slice(1).map((l) => Number(l.split(',')[col]));
    expect(chest).toHaveLength(1986);
    const counts = new Array(12).fill(0);
    let below = 0, above = 0;
    for (const c of chest) {
      const d = designateByBust(c);
      if (d) counts[d.index]++;
      else if (c < 740) below++;
      else above++;
    }
    // sizing-and-grading.md §4 [computed]: <74: 3, then 10 72 189 318 396 343 282 216 106 39 11 1, ≥131: 0
    expect([below, ...counts, above]).toEqual([3, 10, 72, 189, 318, 396, 343, 282, 216, 106, 39, 11, 1, 0]);

    const run = en13402BustIntervals().slice(2, 9).map((d) => ({ size: d.label, fromMm: d.lowerMm, toMm: d.upperMm }));
    const mix = sizeMix(chest, run, 500, 10);
    expect(Object.values(mix.counts).reduce((a, b) => a + b, 0)).toBe(500);
    expect(Math.min(...Object.values(mix.counts))).toBeGreaterThanOrEqual(10);
    expect(mix.bodies['86–90']).toBe(318);
  });
});

describe('sizeMix', () => {
  const run = DEMO_SIZE_RUN.map((size, i) => ({ size, fromMm: 800 + 50 * i, toMm: 850 + 50 * i }));
  it('splits by largest remainder, ties to the earlier size', () => {
    // bodies 1,1,1,0,0 → 10 garments: quotas 3.33 each → 4,3,3,0,0 (computed)
    const mix = sizeMix([810, 860, 910], run, 10);
    expect(mix.counts).toEqual({ XS: 4, S: 3, M: 3, L: 0, XL: 0 });
  });
  it('lifts small sizes to the minimum and re-splits the rest', () => {
    const mix = sizeMix([810, 860, 910], run, 10, 1);
    expect(mix.counts).toEqual({ XS: 3, S: 3, M: 2, L: 1, XL: 1 });
    expect(() => sizeMix([], run, 4, 1)).toThrow(RangeError);
  });
  it('counts bodies outside the run into the end sizes', () => {
    const mix = sizeMix([100, 5000], run, 2);
    expect(mix.outsideRun).toBe(2);
    expect(mix.counts).toEqual({ XS: 1, S: 0, M: 0, L: 0, XL: 1 });
  });
});
