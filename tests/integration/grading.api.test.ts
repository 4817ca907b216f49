import fs from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { demoSizeChart } from '@grading';
import { polygonArea, polygonBBox } from '@shared/geometry/polygon';
import { createCuttingPieceSource } from '../../server/modules/grading/cutting-pieces.service';
import { createGradingSetRepository } from '../../server/modules/grading/grading-set.repository';
import { createStyleRepository } from '../../server/modules/styles/style.repository';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';
import { datasetPath, hasDatasets } from '../fixtures/reference-data';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, cutter: Agent, machinist: Agent;
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
let ds: DataSource;
const ANSUR = datasetPath('anthropometry', 'ANSUR_II_FEMALE_Public.csv');

/** Read any response body as bytes. */
const asBytes = (res: unknown, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  const stream = res as NodeJS.ReadableStream;
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  ({ app, ds } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
  cutter = await signIn(app, DEMO.cutter);
  machinist = await signIn(app, DEMO.machinist);
}, 60_000);

describe('grading of the demo style', () => {
  it('grades eight pieces over five sizes with every seam matching', async () => {
    const res = await owner.get('/api/styles/1/grading');
    expect(res.status).toBe(200);
    const g = res.body.grading;
    expect(g.sizes).toEqual(['XS', 'S', 'M', 'L', 'XL']);
    expect(g.baseSize).toBe('M');
    expect(g.pieces.map((p: { id: string }) => p.id)).toEqual(['front', 'back', 'sleeve', 'collar-band', 'pocket', 'belt', 'front-facing', 'back-neck-facing']);
    expect(g.errors).toEqual([]);
    expect(g.seams.length).toBeGreaterThanOrEqual(30);
    expect(g.seams.every((s: { ok: boolean }) => s.ok)).toBe(true);
    // Areas grow with the size for the front (XS < S < M < L < XL).
    const front = g.pieces[0];
    const areas = g.sizes.map((s: string) => front.measurements[s].areaMm2);
    expect([...areas].sort((a, b) => a - b)).toEqual(areas);
    // The bust grade shown between neighbouring sizes: demo chart bust 838, 895, 946, 1026, 1118 mm
    // (ASTM D5585-11e1 Table 1 sizes 2, 6, 10, 14, 18, × 25.4, rounded; grading's demo chart).
    const bust = g.chart.rows.find((r: { pointOfMeasure: string }) => r.pointOfMeasure === 'bust');
    expect(bust.grades).toEqual([57, 51, 80, 92]);
    // EN 13402-3 bust intervals (CEN 2005, via CRAN Anthropometry bustSizesStandard): 94.6 cm lies in 94–98.
    expect(g.designations.M).toBe('94–98');
  });

  it('lets the cutter read but not change; refuses floor roles', async () => {
    expect((await cutter.get('/api/styles/1/grading')).status).toBe(200);
    expect((await cutter.post('/api/styles/1/grading/propose')).status).toBe(403);
    expect((await machinist.get('/api/styles/1/grading')).status).toBe(403);
    expect((await machinist.get('/api/styles/1/grading/pieces/front/svg')).status).toBe(403);
    const rule = { target: { kind: 'vertex', index: 0 }, steps: [{ dx: 0, dy: 0 }, { dx: 0, dy: 0 }, { dx: 0, dy: 0 }, { dx: 0, dy: 0 }] };
    expect((await cutter.put('/api/styles/1/grading/pieces/front/rules').send(rule)).status).toBe(403);
    expect((await (await signIn(app, DEMO.finisher)).get('/api/styles/1/grading')).status).toBe(403);
  });

  it('moves the graded outline when a grade rule is edited, and records it', async () => {
    const before = (await owner.get('/api/styles/1/grading')).body.grading;
    const front = before.pieces.find((p: { id: string }) => p.id === 'front');
    const hemIndex = front.landmarks['side-hem'];
    const rule = front.rules.find((r: { target: { kind: string; index?: number } }) => r.target.kind === 'vertex' && r.target.index === hemIndex);
    const steps = rule.steps.map((s: { dx: number; dy: number }) => ({ dx: s.dx + 5, dy: s.dy }));
    const res = await owner.put('/api/styles/1/grading/pieces/front/rules').send({ target: rule.target, steps });
    expect(res.status).toBe(200);
    const after = res.body.grading.pieces.find((p: { id: string }) => p.id === 'front');
    // Two steps above the base (M → XL) add 2 × 5 mm; the base does not move.
    expect(after.bySize.XL.outline[hemIndex].x - front.bySize.XL.outline[hemIndex].x).toBeCloseTo(10, 6);
    expect(after.bySize.M.outline[hemIndex]).toEqual(front.bySize.M.outline[hemIndex]);
    expect(after.bySize.XS.outline[hemIndex].x - front.bySize.XS.outline[hemIndex].x).toBeCloseTo(-10, 6);
    const { entries } = (await owner.get('/api/audit')).body;
    expect(entries[0]).toMatchObject({ action: 'update_grade_rule', entity: 'grading_set' });
    // Put it back so later checks see the proposed set.
    await owner.put('/api/styles/1/grading/pieces/front/rules').send({ target: rule.target, steps: rule.steps });
  });

  it('reports a rule with the wrong number of steps by field', async () => {
    const res = await owner.put('/api/styles/1/grading/pieces/front/rules').send({ target: { kind: 'vertex', index: 0 }, steps: [{ dx: 1, dy: 0 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.steps).toBe('Give 4 movements, one per size step');
    const bad = await owner.put('/api/styles/1/grading/pieces/front/rules').send({ target: { kind: 'vertex', index: -1 }, steps: 'x' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['target.index', 'steps']));
    expect((await owner.put('/api/styles/1/grading/pieces/nope/rules').send({ target: { kind: 'vertex', index: 0 }, steps: [{ dx: 0, dy: 0 }, { dx: 0, dy: 0 }, { dx: 0, dy: 0 }, { dx: 0, dy: 0 }] })).status).toBe(404);
  });

  it('downloads a piece as SVG in mm, DXF and a tiled PDF', async () => {
    const svg = await cutter.get('/api/styles/1/grading/pieces/front/svg').buffer(true);
    expect(svg.status).toBe(200);
    expect(svg.headers['content-type']).toMatch(/image\/svg\+xml/);
    const text = svg.body.toString();
    expect(text).toMatch(/width="[\d.]+mm"/);
    for (const s of ['XS', 'S', 'M', 'L', 'XL']) expect(text).toContain(`data-size="${s}"`);
    const dxf = await owner.get('/api/styles/1/grading/pieces/back/dxf?size=L').buffer(true).parse(asBytes);
    expect(dxf.status).toBe(200);
    expect(dxf.body.toString()).toContain('LWPOLYLINE');
    for (const paper of ['A4', 'Letter']) {
      const pdf = await owner.get(`/api/styles/1/grading/pieces/front/pdf?paper=${paper}`).buffer(true).parse(asBytes);
      expect(pdf.status).toBe(200);
      expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
      expect(pdf.headers['content-disposition']).toContain(`-${paper}.pdf`);
    }
    expect((await owner.get('/api/styles/1/grading/pieces/front/pdf?paper=A3')).status).toBe(400);
    expect((await owner.get('/api/styles/1/grading/pieces/front/svg?size=XXL')).status).toBe(400);
  });
});

describe('size charts: import, export, errors', () => {
  let styleId = 0;
  // ASTM D5585-11e1, Table 1 (inch-pound), sizes 00–20: the published rows as printed (sizing-and-grading.md §1.1).
  const ASTM_CSV = [
    'measurement,unit,00,0,2,4,6,8,10,12,14,16,18,20',
    'Chest/bust girth,in,31 1/8,31 3/4,33,34 1/8,35 1/4,36 1/4,37 1/4,38 3/4,40 3/8,42 1/8,44,46',
    'Waist girth, curvy,in,23 7/8,24 5/8,25 3/8,26 1/8,27,28,29,30 3/4,32 1/2,34 1/2,36 3/4,39',
    'Neck base girth,in,13 1/4,13 1/2,13 3/4,14,14 1/4,14 5/8,14 7/8,15 1/8,15 1/2,15 3/4,16,16 3/8',
  ].map((l) => l.replace('Waist girth, curvy', '"Waist girth, curvy"')).join('\n');

  beforeAll(async () => {
    const res = await owner.post('/api/styles').send({
      code: 'ASTM-00-20', name: 'Chart check', sizeRun: ['00', '0', '2', '4', '6', '8', '10', '12', '14', '16', '18', '20'], baseSize: '10',
    });
    styleId = res.body.style.id;
  });

  it('imports the ASTM rows and shows the published size-to-size grades', async () => {
    const res = await owner.post(`/api/styles/${styleId}/grading/chart/import`).set('X-Seamrun-Csrf', '1').attach('file', Buffer.from(ASTM_CSV), 'astm.csv');
    expect(res.status).toBe(200);
    const rows = res.body.grading.chart.rows as { pointOfMeasure: string; grades: number[] }[];
    const inches = (pom: string) => rows.find((r) => r.pointOfMeasure === pom)!.grades.map((g) => g / 25.4);
    // ASTM D5585-11e1 Table 1 grades, computed (sizing-and-grading.md §1.1): bust 5/8, 1 1/4, 1 1/8, 1 1/8, 1, 1, 1 1/2, 1 5/8, 1 3/4, 1 7/8, 2 in.
    const bust = [0.625, 1.25, 1.125, 1.125, 1, 1, 1.5, 1.625, 1.75, 1.875, 2];
    inches('bust').forEach((g, i) => expect(g).toBeCloseTo(bust[i], 9));
    const waist = [0.75, 0.75, 0.75, 0.875, 1, 1, 1.75, 1.75, 2, 2.25, 2.25];
    inches('waist').forEach((g, i) => expect(g).toBeCloseTo(waist[i], 9));
    const neck = [0.25, 0.25, 0.25, 0.25, 0.375, 0.25, 0.25, 0.375, 0.25, 0.25, 0.375];
    inches('neck-base').forEach((g, i) => expect(g).toBeCloseTo(neck[i], 9));
  });

  it('reports every bad cell with its row and column and imports nothing', async () => {
    const before = (await owner.get(`/api/styles/${styleId}/grading`)).body.grading.chart;
    const bad = ['measurement,unit,00,0,2,4,6,8,10,12,14,16,18,20', 'bust,in,31,x,33,34,35,36,37,38,40,42,44,46', 'elbow,mm,1,2,3,4,5,6,7,8,9,10,11,12', 'hip,ft,1,2,3,4,5,6,7,8,9,10,11,12'].join('\n');
    const res = await owner.post(`/api/styles/${styleId}/grading/chart/import`).set('X-Seamrun-Csrf', '1').attach('file', Buffer.from(bad), 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({ 'row 2, column 4': expect.stringMatching(/not a length/), 'row 3, column 1': expect.stringMatching(/unknown point of measure/), 'row 4, column 2': expect.stringMatching(/unit/) });
    expect((await owner.get(`/api/styles/${styleId}/grading`)).body.grading.chart).toEqual(before);
  });

  it('refuses an import without the CSRF header and a chart whose sizes are not the run', async () => {
    const noHeader = await owner.post(`/api/styles/${styleId}/grading/chart/import`).attach('file', Buffer.from(ASTM_CSV), 'astm.csv');
    expect(noHeader.status).toBe(403);
    const res = await owner.put('/api/styles/1/grading/chart').send({ name: 'x', sizes: ['S', 'M'], rows: [{ pointOfMeasure: 'bust', values: [900, 950] }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sizes).toMatch(/size run/);
    const grid = await owner.put('/api/styles/1/grading/chart').send({ name: 'x', sizes: ['XS', 'S', 'M', 'L', 'XL'], rows: [{ pointOfMeasure: 'elbow', values: [1, 2, 3, 4, 5] }, { pointOfMeasure: 'bust', values: [1, 2, -3] }] });
    expect(grid.status).toBe(400);
    expect(grid.body.error.fields).toMatchObject({ 'rows.1.values': 'Give 5 values, one per size', 'rows.1.values.2': 'Must be more than 0' });
  });

  it('exports the chart as CSV and XLSX that import back to the same grades', async () => {
    const csv = await owner.get('/api/styles/1/grading/chart/export?format=csv&unit=mm');
    expect(csv.status).toBe(200);
    expect(csv.text.split('\r\n')[0]).toBe('measurement,unit,XS,S,M,L,XL');
    // A metric studio's export is in cm, the unit its grid shows; mm (the default) and in stay for files made elsewhere.
    const cm = await owner.get('/api/styles/1/grading/chart/export?format=csv&unit=cm');
    expect(cm.status).toBe(200);
    const bustCm = cm.text.split('\r\n').find((l) => l.startsWith('bust,'))!.split(',');
    expect(bustCm[1]).toBe('cm');
    demoSizeChart().values.bust!.forEach((mm, i) => expect(Number(bustCm[2 + i])).toBeCloseTo(mm / 10, 6));
    expect((await owner.get('/api/styles/1/grading/chart/export?format=csv&unit=yd')).status).toBe(400);
    const xlsx = await owner.get('/api/styles/1/grading/chart/export?format=xlsx').buffer(true).parse(asBytes);
    expect(xlsx.status).toBe(200);
    expect((xlsx.body as Buffer).subarray(0, 2).toString()).toBe('PK');
    const back = await owner.post('/api/styles/1/grading/chart/import').set('X-Seamrun-Csrf', '1').attach('file', xlsx.body as Buffer, 'chart.xlsx');
    expect(back.status).toBe(200);
    const chart = demoSizeChart();
    const bust = back.body.grading.chart.rows.find((r: { pointOfMeasure: string }) => r.pointOfMeasure === 'bust');
    expect(bust.values).toEqual(chart.values.bust);
  });
});

describe('size mix', () => {
  it.skipIf(!hasDatasets)('counts the ANSUR II female chest girths per EN 13402-3 interval and splits a batch', async () => {
    const res = await owner.post('/api/styles/1/grading/size-mix').set('X-Seamrun-Csrf', '1')
      .field('total', '40').field('minPerSize', '3').field('column', 'chestcircumference')
      .attach('file', fs.readFileSync(ANSUR), 'ansur.csv');
    expect(res.status).toBe(200);
    const mix = res.body.sizeMix;
    expect(mix.measured).toBe(1986);
    // ANSUR II female, Paquette et al. 2012, ../shared/datasets/anthropometry/ANSUR_II_FEMALE_Public.csv; counts per
    // EN 13402-3 bust interval [computed] in sizing-and-grading.md §4.
    expect(mix.en13402.map((b: { count: number }) => b.count)).toEqual([3, 10, 72, 189, 318, 396, 343, 282, 216, 106, 39, 11, 1, 0]);
    const garments = mix.sizes.map((s: { garments: number }) => s.garments);
    expect(garments.reduce((a: number, b: number) => a + b, 0)).toBe(40);
    expect(Math.min(...garments)).toBeGreaterThanOrEqual(3);
  });

  it('reports bad rows and impossible minimums', async () => {
    const bad = await owner.post('/api/styles/1/grading/size-mix').set('X-Seamrun-Csrf', '1').field('total', '40')
      .attach('file', Buffer.from('bust_cm\n90\nabc\n\n95\n-1\n'), 'm.csv');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ 'row 3, column 1': 'not a girth: "abc"', 'row 6, column 1': 'not a girth: "-1"' });
    const min = await owner.post('/api/styles/1/grading/size-mix').set('X-Seamrun-Csrf', '1').field('total', '10').field('minPerSize', '3')
      .attach('file', Buffer.from('bust_cm\n90\n95\n'), 'm.csv');
    expect(min.status).toBe(400);
    expect(min.body.error.fields.minPerSize).toBeTruthy();
    const noTotal = await owner.post('/api/styles/1/grading/size-mix').set('X-Seamrun-Csrf', '1').field('total', '2.5').attach('file', Buffer.from('90\n'), 'm.csv');
    expect(noTotal.body.error.fields.total).toBe('Give a whole number');
  });
});

describe('cutting pieces for the cutting area', () => {
  it('gives every size its cutting outlines, pairs mirrored and folds unfolded', async () => {
    const bySize = await createCuttingPieceSource({ styles: createStyleRepository(ds), sets: createGradingSetRepository(ds) })(1, 1);
    expect(Object.keys(bySize)).toEqual(['XS', 'S', 'M', 'L', 'XL']);
    const m = bySize.M;
    expect(m.map((p) => p.pieceId)).toHaveLength(8);
    const front = m.find((p) => p.pieceId === 'front')!;
    expect(front).toMatchObject({ quantity: 2, mirrored: true });
    const back = m.find((p) => p.pieceId === 'back')!;
    expect(back).toMatchObject({ quantity: 1, mirrored: false });
    // Unfolded about the centre-back fold: symmetric box and twice the half's cutting area (within the clipped wedge).
    const grading = (await owner.get('/api/styles/1/grading')).body.grading;
    const halfBack = grading.pieces.find((p: { id: string }) => p.id === 'back');
    const box = polygonBBox(back.outline);
    const foldX = halfBack.bySize.M.outline[halfBack.landmarks['cb-neck']].x; // the centre back lies on the fold
    expect(box.minX + box.maxX).toBeCloseTo(2 * foldX, 3);
    const halfArea = polygonArea(halfBack.baseCutting);
    expect(polygonArea(back.outline)).toBeGreaterThan(1.95 * halfArea);
    expect(polygonArea(back.outline)).toBeLessThan(2.01 * halfArea);
    // Larger sizes cut larger fronts.
    const area = (s: string) => polygonArea(bySize[s].find((p) => p.pieceId === 'front')!.outline);
    expect(area('XS')).toBeLessThan(area('M'));
    expect(area('M')).toBeLessThan(area('XL'));
  });
});
