import { beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { GradingSetEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, cutter: Agent, machinist: Agent;
let ds: DataSource;
let styleId: number;

/** DXF text from [code, value] pairs with an ENTITIES section (and $INSUNITS when given). */
const dxf = (entities: (string | number)[][], insunits?: number) =>
  [[0, 'SECTION'], [2, 'HEADER'], ...(insunits ? [[9, '$INSUNITS'], [70, insunits]] : []), [0, 'ENDSEC'],
    [0, 'SECTION'], [2, 'ENTITIES'], ...entities, [0, 'ENDSEC'], [0, 'EOF']].map(([c, v]) => `${c}\n${v}`).join('\n') + '\n';
const rect = (layer: string, w: number, h: number) => [[0, 'LWPOLYLINE'], [8, layer], [90, 4], [70, 1], [10, 0], [20, 0], [10, w], [20, 0], [10, w], [20, h], [10, 0], [20, h]];
const halfDisc = [[0, 'LWPOLYLINE'], [8, '1'], [90, 2], [70, 1], [10, -50], [20, 0], [42, 1], [10, 50], [20, 0]];
const storedPieces = async () => (await ds.getRepository(GradingSetEntity).findOne({ where: { styleId } }))?.pieces as { id: string; name: string; outline: { x: number; y: number }[]; cut: string; quantity: number; material?: string; edges: { allowanceMm: number }[] }[] | undefined;
const preview = (file: string, name: string, fields: Record<string, string>) => {
  let req = owner.post(`/api/styles/${styleId}/pattern/import`).set('X-Seamrun-Csrf', '1');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', Buffer.from(file), name);
};

beforeAll(async () => {
  const built = await buildTestApp();
  ds = built.ds;
  owner = await signIn(built.app, DEMO.owner);
  cutter = await signIn(built.app, DEMO.cutter);
  machinist = await signIn(built.app, DEMO.machinist);
  const res = await owner.post('/api/styles').send({ code: 'IMPORT-1', name: 'Imported pattern', sizeRun: ['S', 'M', 'L'], baseSize: 'M' });
  styleId = res.body.style.id;
}, 60_000);

describe('POST /api/styles/:id/pattern/import (preview)', () => {
  it('previews a DXF half-disc to scale with area and perimeter and saves nothing', async () => {
    const res = await preview(dxf(halfDisc, 4), 'half.dxf', { outlineIs: 'sewing' });
    expect(res.status).toBe(200);
    const [p] = res.body.preview.pieces;
    // Half-disc r = 50: area πr²/2, within arc length × 0.05 mm chord tolerance (analytic).
    expect(Math.PI * 1250 - p.areaMm2).toBeGreaterThanOrEqual(0);
    expect(Math.PI * 1250 - p.areaMm2).toBeLessThanOrEqual(Math.PI * 50 * 0.05);
    expect(p.widthMm).toBe(100);
    expect(p.outline.length).toBeGreaterThan(10);
    expect(await storedPieces()).toBeUndefined(); // no set at all: nothing was written
  });

  it('refuses a preview when the owner did not say whether the outline is the sewing or the cutting line', async () => {
    const res = await preview(dxf(halfDisc, 4), 'half.dxf', {});
    expect(res.status).toBe(400);
    expect(res.body.error.fields.outlineIs).toMatch(/sewing line or the cutting line/);
  });

  it('asks for the units when the file has none, and reads them when given', async () => {
    const none = await preview(dxf(rect('1', 10, 5)), 'r.dxf', { outlineIs: 'sewing' });
    expect(none.status).toBe(400);
    expect(none.body.error.fields.units).toMatch(/mm, cm or in/);
    const cm = await preview(dxf(rect('1', 10, 5)), 'r.dxf', { outlineIs: 'sewing', units: 'cm' });
    expect(cm.status).toBe(200);
    expect(cm.body.preview.pieces[0].areaMm2).toBe(5000); // 10 cm × 5 cm
  });

  it('answers a bad file with each entity it could not read and saves nothing', async () => {
    const open = [[0, 'LINE'], [5, 'B7'], [8, '1'], [10, 0], [20, 0], [11, 100], [21, 0]];
    const res = await preview(dxf([...rect('1', 10, 5), ...open, [0, 'HATCH'], [8, '1']], 4), 'bad.dxf', { outlineIs: 'sewing' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/nothing imported/);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['1 HATCH entity', 'LINE #B7 on layer 1']);
    expect(await storedPieces()).toBeUndefined(); // no set at all: nothing was written
  });

  it('reads back the demo front piece from Seamrun\'s own DXF download with the same area', async () => {
    const file = await owner.get('/api/styles/1/grading/pieces/front/dxf?size=M');
    expect(file.status).toBe(200);
    const grading = await owner.get('/api/styles/1/grading');
    const front = grading.body.grading.pieces[0];
    const res = await preview(file.text, 'front.dxf', { outlineIs: 'sewing' });
    expect(res.status).toBe(200);
    const base = grading.body.grading.baseSize;
    expect(res.body.preview.pieces[0].areaMm2).toBeCloseTo(front.measurements[base].areaMm2, 0);
  });

  it('lists the sizes of a graded file and those outside the style\'s run', async () => {
    // One block per size with `Size:` piece text (reference §4.2 [from memory]); the style's run is S, M, L.
    const block = (size: string, w: number) => [[0, 'BLOCK'], [8, '0'], [2, `FRONT-${size}`], [70, 0], [10, 0], [20, 0],
      ...rect('1', w, 50), [0, 'TEXT'], [8, '1'], [10, 5], [20, 5], [40, 3], [1, `Size: ${size}`], [0, 'ENDBLK'], [8, '0']];
    const ins = (size: string) => [[0, 'INSERT'], [8, '0'], [2, `FRONT-${size}`], [10, 0], [20, 0]];
    const file = [[0, 'SECTION'], [2, 'HEADER'], [9, '$INSUNITS'], [70, 4], [0, 'ENDSEC'], [0, 'SECTION'], [2, 'BLOCKS'], ...block('M', 100), ...block('XL', 120), [0, 'ENDSEC'],
      [0, 'SECTION'], [2, 'ENTITIES'], ...ins('M'), ...ins('XL'), [0, 'ENDSEC'], [0, 'EOF']].map(([c, v]) => `${c}\n${v}`).join('\n') + '\n';
    const res = await preview(file, 'graded.dxf', { outlineIs: 'sewing' });
    expect(res.status).toBe(200);
    expect(res.body.preview).toMatchObject({ baseSize: 'M', sizesInFile: ['M', 'XL'], sizesNotInRun: ['XL'] });
    expect(res.body.preview.pieces.map((p: { size: string; areaMm2: number }) => [p.size, p.areaMm2])).toEqual([['M', 5000], ['XL', 6000]]);
  });

  it('lets only the owner import a pattern', async () => {
    expect((await cutter.post(`/api/styles/${styleId}/pattern/import`).set('X-Seamrun-Csrf', '1').field('outlineIs', 'sewing').attach('file', Buffer.from(dxf(halfDisc, 4)), 'h.dxf')).status).toBe(403);
    expect((await machinist.post(`/api/styles/${styleId}/pattern/accept`).send({})).status).toBe(403);
  });
});

describe('POST /api/styles/:id/pattern/accept', () => {
  const piece = (name: string, outline: number[][], extra: Record<string, unknown> = {}) => ({ name, outline, cut: 'pair', copies: 2, material: 'Lining', seamAllowanceMm: 10, ...extra });

  it('asks for the size chart first when the style has none', async () => {
    const res = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({ outlineIs: 'sewing', pieces: [piece('Tab', [[0, 0], [50, 0], [50, 50]])] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sizeChart).toMatch(/size chart first/);
    const chart = await owner.put(`/api/styles/${styleId}/grading/chart`).send({ name: 'Run', sizes: ['S', 'M', 'L'], rows: [{ pointOfMeasure: 'bust', values: [880, 920, 960] }] });
    expect(chart.status).toBe(200);
  });

  it('stores the accepted pieces, taking a cutting line in by the seam allowance', async () => {
    const res = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({
      outlineIs: 'cutting',
      pieces: [piece('Yoke', [[0, 0], [200, 0], [200, 100], [0, 100]]), piece('Yoke', [[0, 0], [0, 50], [50, 50], [50, 0]], { cut: 'fold', copies: 1, material: undefined })],
    });
    expect(res.status).toBe(200);
    expect(res.body.grading.pieces.map((p: { id: string }) => p.id)).toEqual(['yoke', 'yoke-2']);
    const stored = (await storedPieces())!;
    expect(stored.map((p) => p.id)).toEqual(['yoke', 'yoke-2']);
    expect(stored[0]).toMatchObject({ name: 'Yoke', cut: 'pair', quantity: 2, material: 'Lining' });
    expect(stored[0].edges[0].allowanceMm).toBe(10);
    // A 200 × 100 cutting line with 10 mm all round is a 180 × 80 sewing line (inward offset of a rectangle).
    const xs = stored[0].outline.map((p) => p.x), ys = stored[0].outline.map((p) => p.y);
    expect([Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)].map((v) => Math.round(v * 100) / 100)).toEqual([10, 190, 10, 90]);
    expect(stored[1]).toMatchObject({ cut: 'fold', quantity: 1 });
  });

  it('keeps the stored pieces when one accepted piece is bad, naming it', async () => {
    const res = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({
      outlineIs: 'sewing',
      pieces: [piece('Cuff', [[0, 0], [60, 0], [60, 30], [0, 30]]), piece('Bow tie', [[0, 0], [50, 50], [50, 0], [0, 50]])],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['pieces.1.outline']).toMatch(/crosses itself/);
    expect((await storedPieces())!.map((p) => p.id)).toEqual(['yoke', 'yoke-2']);
  });

  it('refuses a seam allowance too wide for a cutting line and a missing cut instruction', async () => {
    const wide = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({ outlineIs: 'cutting', pieces: [piece('Tab', [[0, 0], [15, 0], [15, 15], [0, 15]])] });
    expect(wide.status).toBe(400);
    expect(wide.body.error.fields['pieces.0.seamAllowanceMm']).toMatch(/too wide/);
    const noCut = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({ outlineIs: 'sewing', pieces: [{ ...piece('Tab', [[0, 0], [15, 0], [15, 15]]), cut: undefined }] });
    expect(noCut.status).toBe(400);
    expect(noCut.body.error.fields['pieces.0.cut']).toMatch(/cut once/);
  });
});
