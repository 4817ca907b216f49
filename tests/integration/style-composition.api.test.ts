import { beforeAll, describe, expect, it } from 'vitest';
import { demoSizeChart } from '@grading';
import { presetComposition } from '@shared/schemas/style-composition';
import { polygonArea } from '@shared/geometry/polygon';
import type { DataSource } from 'typeorm';
import { MarkerEntity } from '../../server/entities';
import { createCuttingPieceSource } from '../../server/modules/grading/cutting-pieces.service';
import { createGradingSetRepository } from '../../server/modules/grading/grading-set.repository';
import { createStyleRepository } from '../../server/modules/styles/style.repository';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, cutter: Agent;
let ds: DataSource;

beforeAll(async () => {
  const built = await buildTestApp();
  const app = built.app;
  ds = built.ds;
  owner = await signIn(app, DEMO.owner);
  cutter = await signIn(app, DEMO.cutter);
}, 60_000);

const SIZES = ['XS', 'S', 'M', 'L', 'XL'];

/** A new style with the demo chart (ASTM D5585-11e1 sizes 2–18, the grading core's demo chart). */
async function newStyle(code: string): Promise<number> {
  const res = await owner.post('/api/styles').send({ code, name: `Style ${code}`, sizeRun: SIZES, baseSize: 'M' });
  expect(res.status).toBe(201);
  const id = res.body.style.id as number;
  const rows = Object.entries(demoSizeChart().values).map(([pointOfMeasure, values]) => ({ pointOfMeasure, values }));
  expect((await owner.put(`/api/styles/${id}/grading/chart`).send({ name: 'Demo chart', sizes: SIZES, rows })).status).toBe(200);
  return id;
}

type PieceDto = { id: string; name: string };

describe('the second demo style', () => {
  it('seeds the lined fitted dress with its blocks, a fabric per material, graded pieces in five sizes and its trims', async () => {
    const styles = (await owner.get('/api/styles')).body.styles as { id: number; code: string; composition: { preset: string } | null; materialFabrics: Record<string, number> }[];
    expect(styles.map((s) => s.code)).toEqual(['SR-101', 'SR-202']);
    const lined = styles[1];
    expect(lined.composition?.preset).toBe('lined-fitted-dress');
    expect(Object.keys(lined.materialFabrics).sort()).toEqual(['contrast', 'interfacing', 'lining', 'self']);
    const fabrics = (await owner.get('/api/fabrics')).body.fabrics as { id: number; name: string }[];
    const nameOf = (id: number) => fabrics.find((f) => f.id === id)?.name;
    expect(nameOf(lined.materialFabrics.self)).toBe('Sable cotton poplin');
    expect(nameOf(lined.materialFabrics.lining)).toBe('Usiku viscose lining');
    expect(nameOf(lined.materialFabrics.contrast)).toBe('Tausi silk organza');
    const g = (await owner.get(`/api/styles/${lined.id}/grading`)).body.grading;
    expect(g.sizes).toEqual(SIZES);
    expect(g.errors).toEqual([]);
    expect(g.pieces.find((p: { id: string }) => p.id === 'peplum').material).toBe('contrast');
    // The shirt dress keeps its eight pieces and stays first in every list.
    expect((await owner.get('/api/styles/1/grading')).body.grading.pieces).toHaveLength(8);
    expect(fabrics[0].name).toBe('Sable cotton poplin');
  });
});

describe('costing a style of several materials', () => {
  it('prices a fabric line for each linked fabric, lining and contrast from their own pieces, when the batch has no cut plan yet', async () => {
    const styles = (await owner.get('/api/styles')).body.styles as { id: number; code: string; materialFabrics: Record<string, number> }[];
    const lined = styles.find((s) => s.code === 'SR-202')!;
    const batch = await owner.post('/api/batches').send({ styleId: lined.id, quantities: { S: 4, M: 6, L: 4 }, dueDate: '2027-03-01' });
    expect(batch.status).toBe(201);
    const sheet = (await owner.get(`/api/batches/${batch.body.batch.id}/costing`)).body.costing;
    const fabricLines = (sheet.lines as { kind: string; refId: number; quantities: Record<string, number>; costMinor: Record<string, number> }[]).filter((l) => l.kind === 'fabric');
    expect(fabricLines.map((l) => l.refId).sort()).toEqual(Object.values(lined.materialFabrics).sort());
    const line = (m: string) => fabricLines.find((l) => l.refId === lined.materialFabrics[m])!;
    // The sheet's main fabric is the self fabric; the others rest on their pieces' area.
    expect(sheet.fabric.id).toBe(lined.materialFabrics.self);
    for (const m of ['lining', 'contrast', 'interfacing']) expect(line(m).quantities.M, m).toBeGreaterThan(0);
    // A larger size takes more lining; the organza is priced; the workbook carries every fabric line.
    expect(line('lining').quantities.L).toBeGreaterThan(line('lining').quantities.S);
    expect(line('contrast').costMinor.M).toBeGreaterThan(0);
    expect((await owner.get(`/api/batches/${batch.body.batch.id}/costing.xlsx`)).status).toBe(200);
  });
});

describe('costing learns from the markers of each fabric', () => {
  it('keeps the self fabric as the sheet\'s main fabric when a lining marker is newer, and prices the lining at its own markers\' utilisation', async () => {
    const styles = (await owner.get('/api/styles')).body.styles as { id: number; code: string; materialFabrics: Record<string, number> }[];
    const lined = styles.find((s) => s.code === 'SR-202')!;
    const fabrics = (await owner.get('/api/fabrics')).body.fabrics as { id: number; widthMm: number }[];
    const widthOf = (id: number) => fabrics.find((f) => f.id === id)!.widthMm;
    const batchId = (await owner.post('/api/batches').send({ styleId: lined.id, quantities: { S: 2, M: 3, L: 2 }, dueDate: '2027-03-01' })).body.batch.id as number;
    const sheetOf = async () => (await owner.get(`/api/batches/${batchId}/costing`)).body.costing;
    const liningM = (sheet: { lines: { kind: string; refId: number; quantities: Record<string, number> }[] }) =>
      sheet.lines.find((l) => l.kind === 'fabric' && l.refId === lined.materialFabrics.lining)!.quantities.M;
    const before = liningM(await sheetOf());
    const save = (fabricId: number, lengthMm: number, utilisation: number) => ds.getRepository(MarkerEntity).save({
      studioId: 1, styleId: lined.id, batchId: null, fabricId, ratio: { M: 1 }, widthMm: widthOf(fabricId), inputHash: `costing-${fabricId}`.padEnd(64, '0'),
      status: 'done' as const, lengthMm, utilisation, elapsedMs: 0, input: null, result: null, error: '',
    });
    await save(lined.materialFabrics.self, 1500, 0.7);
    await save(lined.materialFabrics.lining, 900, 0.6); // newer than the shell's
    const sheet = await sheetOf();
    expect(sheet.fabric.id).toBe(lined.materialFabrics.self);
    // Lining length ∝ 1 ÷ utilisation: 75 % assumed before, 60 % learnt now, so × 0.75 ÷ 0.60 = × 1.25 (rounding to 0.1 mm).
    expect(liningM(sheet)).toBeCloseTo(before * 1.25, 0);
    expect(sheet.notes.join(' ')).toMatch(/60 % utilisation, that of the style's marker on it/);
  });
});

describe('a style drafted from its blocks', () => {
  it('creates a style with no blocks chosen and no material linked', async () => {
    const res = await owner.post('/api/styles').send({ code: 'NB-0', name: 'Blank', sizeRun: SIZES, baseSize: 'M' });
    expect(res.body.style.composition).toBeNull();
    expect(res.body.style.materialFabrics).toEqual({});
  });

  it('answers 400 asking to choose blocks when a new style without a composition proposes rules', async () => {
    const id = await newStyle('NB-1');
    const res = await owner.post(`/api/styles/${id}/grading/propose`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.composition).toMatch(/Choose blocks/);
    const g = await owner.get(`/api/styles/${id}/grading`);
    expect(g.body.grading.pieces).toEqual([]);
  });

  it('drafts the lined fitted dress pieces, not the demo shirt dress, when the style has that preset', async () => {
    const id = await newStyle('LF-1');
    const put = await owner.put(`/api/styles/${id}/composition`).send({ composition: presetComposition('lined-fitted-dress') });
    expect(put.status).toBe(200);
    expect(put.body.style.composition.preset).toBe('lined-fitted-dress');
    const res = await owner.post(`/api/styles/${id}/grading/propose`);
    expect(res.status).toBe(200);
    const ids = res.body.grading.pieces.map((p: PieceDto) => p.id);
    expect(ids).toEqual(expect.arrayContaining(['bodice-front', 'bodice-back', 'sleeve', 'peplum', 'skirt-front', 'skirt-back', 'neckline-facing-front', 'bodice-front-2']));
    expect(ids).not.toContain('collar-band');
    expect(ids).not.toContain('belt');
    // The full-ring peplum no longer crosses itself at its opening in any size.
    expect(res.body.grading.errors).toEqual([]);
  });

  it('drafts a composition edited by the owner: one straight skirt gives front and back only', async () => {
    const id = await newStyle('SK-1');
    expect((await owner.put(`/api/styles/${id}/composition`).send({ composition: { blocks: [{ block: 'skirt', shape: 'straight' }] } })).status).toBe(200);
    const res = await owner.post(`/api/styles/${id}/grading/propose`);
    expect(res.status).toBe(200);
    expect(res.body.grading.pieces.map((p: PieceDto) => p.id)).toEqual(['skirt-front', 'skirt-back']);
  });

  it('keeps the demo shirt dress pieces when the demo style proposes its rules again', async () => {
    const res = await owner.post('/api/styles/1/grading/propose');
    expect(res.status).toBe(200);
    expect(res.body.grading.pieces.map((p: PieceDto) => p.id)).toEqual(['front', 'back', 'sleeve', 'collar-band', 'pocket', 'belt', 'front-facing', 'back-neck-facing']);
  });

  it('checks the seams proposed from a drafted composition (not the demo\'s piece names), all matching in every size', async () => {
    const id = await newStyle('SE-1');
    expect((await owner.put(`/api/styles/${id}/composition`).send({ composition: presetComposition('lined-fitted-dress') })).status).toBe(200);
    const g = (await owner.post(`/api/styles/${id}/grading/propose`)).body.grading;
    const names = [...new Set(g.seams.map((s: { seam: string }) => s.seam))];
    expect(names).toEqual(expect.arrayContaining(['Side seam', 'Shoulder seam', 'Sleeve cap to armhole', 'Sleeve underarm', 'Side seam (lining)']));
    expect(g.seams.every((s: { ok: boolean }) => s.ok)).toBe(true);
    expect(g.errors).toEqual([]);
  });

  it('stores a seam the owner fixed with the style and checks that one: a wrong pairing shows as a mismatch, a missing edge as an error', async () => {
    const id = await newStyle('SE-2');
    const seams = [
      { name: 'Side seam', a: [{ pieceId: 'skirt-front', edges: ['side'] }], b: [{ pieceId: 'skirt-back', edges: ['side'] }], toleranceMm: 1 },
      { name: 'Side to waist', a: [{ pieceId: 'skirt-front', edges: ['side'] }], b: [{ pieceId: 'skirt-back', edges: ['waist'] }], toleranceMm: 1 },
      { name: 'Yoke seam', a: [{ pieceId: 'skirt-front', edges: ['yoke'] }], b: [{ pieceId: 'skirt-back', edges: ['side'] }], toleranceMm: 1 },
    ];
    const put = await owner.put(`/api/styles/${id}/composition`).send({ composition: { blocks: [{ block: 'skirt', shape: 'straight' }], seams } });
    expect(put.status).toBe(200);
    expect(put.body.style.composition.seams).toHaveLength(3);
    const g = (await owner.post(`/api/styles/${id}/grading/propose`)).body.grading;
    const checks = (name: string) => g.seams.filter((s: { seam: string }) => s.seam === name);
    expect(checks('Side seam').every((s: { ok: boolean }) => s.ok)).toBe(true);
    expect(checks('Side to waist').some((s: { ok: boolean }) => !s.ok)).toBe(true);
    expect(checks('Yoke seam')).toEqual([]);
    expect(g.errors.map((e: { message: string }) => e.message)).toContain('Seam Yoke seam: Straight skirt front has no edge "yoke"');
  });

  it('answers 400 naming the seams when two seams share a name, keeping the saved composition', async () => {
    const seam = { name: 'Side seam', a: [{ pieceId: 'front', edges: ['side'] }], b: [{ pieceId: 'back', edges: ['side'] }], toleranceMm: 1 };
    const res = await owner.put('/api/styles/1/composition').send({ composition: { preset: 'shirt-dress', seams: [seam, seam] } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).join()).toContain('seams');
    expect((await owner.get('/api/styles/1')).body.style.composition.seams ?? null).toBeNull();
  });

  it('answers 400 naming the block list when a composition has no blocks and no preset', async () => {
    const res = await owner.put('/api/styles/1/composition').send({ composition: { blocks: [] } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).join()).toContain('blocks');
  });

  it('answers 400 naming the material when a material links to a fabric of no such id, keeping the saved composition', async () => {
    const res = await owner.put('/api/styles/1/composition').send({ composition: { preset: 'shirt-dress' }, materialFabrics: { lining: 99999 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['materialFabrics.lining']).toMatch(/No such fabric/);
    expect((await owner.get('/api/styles/1')).body.style.composition.preset).toBe('shirt-dress');
  });

  it('keeps the blocks and material links when the style details are saved', async () => {
    const id = await newStyle('KP-1');
    const lining = (await owner.post('/api/fabrics').send({ name: 'Cupro lining', widthMm: 1400 })).body.fabric.id as number;
    await owner.put(`/api/styles/${id}/composition`).send({ composition: presetComposition('lined-fitted-dress'), materialFabrics: { lining } });
    const saved = await owner.put(`/api/styles/${id}`).send({ code: 'KP-1', name: 'Renamed', sizeRun: SIZES, baseSize: 'M' });
    expect(saved.status).toBe(200);
    expect(saved.body.style.composition.preset).toBe('lined-fitted-dress');
    expect(saved.body.style.materialFabrics).toEqual({ lining });
  });

  it('forbids a cutter to change the blocks of a style', async () => {
    expect((await cutter.put('/api/styles/1/composition').send({ composition: { preset: 'shirt-dress' } })).status).toBe(403);
  });
});

describe('materials of a style', () => {
  const fabric = async (name: string, widthMm: number) => {
    const res = await owner.post('/api/fabrics').send({ name, widthMm });
    expect(res.status).toBe(201);
    return res.body.fabric.id as number;
  };

  it('gives a lined fitted dress pieces in self, lining, contrast and interfacing, each with its copies', async () => {
    const id = await newStyle('LF-2');
    await owner.put(`/api/styles/${id}/composition`).send({ composition: presetComposition('lined-fitted-dress') });
    const pieces = (await owner.post(`/api/styles/${id}/grading/propose`)).body.grading.pieces as { id: string; material: string; cut: string; quantity: number }[];
    const by = (m: string) => pieces.filter((p) => p.material === m).map((p) => p.id);
    expect(by('self')).toEqual(expect.arrayContaining(['bodice-front', 'bodice-back', 'sleeve', 'skirt-front', 'skirt-back']));
    expect(by('lining')).toEqual(['bodice-front-2', 'bodice-back-2', 'skirt-front-2', 'skirt-back-2']);
    expect(by('contrast')).toEqual(['peplum']);
    expect(by('interfacing').length).toBeGreaterThan(0);
  });

  it('plans the cut on the lining fabric from the lining pieces only', async () => {
    const id = await newStyle('LF-3');
    const self = await fabric('Wool crepe', 1500);
    const lining = await fabric('Acetate lining', 1400);
    const contrast = await fabric('Silk organza', 1400);
    const put = await owner.put(`/api/styles/${id}/composition`).send({
      composition: presetComposition('lined-fitted-dress'), materialFabrics: { self, lining, contrast, interfacing: self },
    });
    expect(put.status).toBe(200);
    expect(put.body.style.materialFabrics).toEqual({ self, lining, contrast, interfacing: self });
    expect((await owner.post(`/api/styles/${id}/grading/propose`)).status).toBe(200);
    const batch = await owner.post('/api/batches').send({ styleId: id, quantities: { XS: 2, S: 2, M: 4, L: 2, XL: 2 }, dueDate: '2027-02-01' });
    expect(batch.status).toBe(201);
    const plan = await owner.post(`/api/batches/${batch.body.batch.id}/cut-plan`).send({ fabricId: lining, maxPlies: 10, maxGarmentsPerMarker: 2, overcutPercent: 0 });
    expect(plan.status).toBe(201);
    // Each lay rests on the plan's stated estimate (area ÷ (width × assumed utilisation)); the areas are summed
    // here from the loader's pieces of each material, independently of the plan's own filter.
    const all = await createCuttingPieceSource({ styles: createStyleRepository(ds), sets: createGradingSetRepository(ds) })(1, id);
    const area = (size: string, keep: (m: string) => boolean) => all[size].filter((p) => keep(p.material)).reduce((a, p) => a + polygonArea(p.outline) * p.quantity, 0);
    const { lays, assumedUtilisation } = plan.body.cutPlan as { lays: { ratio: Record<string, number>; markerLengthMm: number }[]; assumedUtilisation: number };
    expect(lays.length).toBeGreaterThan(0);
    for (const l of lays) {
      const estimate = (keep: (m: string) => boolean) => Object.entries(l.ratio).reduce((a, [s, n]) => a + n * area(s, keep), 0) / (1400 * assumedUtilisation);
      expect(l.markerLengthMm).toBeGreaterThan(0.97 * estimate((m) => m === 'lining'));
      expect(l.markerLengthMm).toBeLessThan(1.03 * estimate((m) => m === 'lining') + 50);
      expect(l.markerLengthMm).toBeLessThan(0.8 * estimate(() => true));
    }
  });

  it('prints a cut ticket for each material of the batch, and answers 400 naming the materials for one the style does not cut', async () => {
    const styles = (await owner.get('/api/styles')).body.styles as { id: number; code: string }[];
    const lined = styles.find((s) => s.code === 'SR-202')!;
    const batch = (await owner.post('/api/batches').send({ styleId: lined.id, quantities: { S: 4, M: 6 }, dueDate: '2027-03-01' })).body.batch;
    for (const material of ['self', 'lining', 'contrast', 'interfacing']) {
      const pdf = await cutter.get(`/api/batches/${batch.id}/material-cut-ticket.pdf?material=${material}`).buffer(true);
      expect(pdf.status, material).toBe(200);
      expect(pdf.headers['content-type']).toMatch(/pdf/);
      expect(pdf.headers['content-disposition']).toContain(`cut-ticket-${batch.code}-${material}.pdf`);
      expect(String(pdf.body.subarray(0, 5))).toBe('%PDF-');
    }
    // The cutter's lay page offers the same tickets: its lay lists the style's materials.
    const style = (await owner.get(`/api/styles/${lined.id}`)).body.style as { materialFabrics: Record<string, number> };
    const planned = await owner.post(`/api/batches/${batch.id}/cut-plan`).send({ fabricId: style.materialFabrics.self, maxPlies: 10, maxGarmentsPerMarker: 3 });
    expect(planned.status).toBe(201);
    const layView = await cutter.get(`/api/lays/${planned.body.cutPlan.lays[0].id}`);
    expect(layView.status).toBe(200);
    expect(layView.body.materials).toEqual(['self', ...Object.keys(style.materialFabrics).filter((m) => m !== 'self')]);
    expect(layView.body.materials).toEqual(expect.arrayContaining(['lining', 'contrast', 'interfacing']));
    const bad = await owner.get(`/api/batches/${batch.id}/material-cut-ticket.pdf?material=mesh`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/cuts no pieces from "mesh" \(it uses self, .*lining/);
    expect((await owner.get(`/api/batches/${batch.id}/material-cut-ticket.pdf`)).status).toBe(400);
  });

  it('answers 400 on fabricId when the cut is planned on a fabric no material of the style uses', async () => {
    const id = await newStyle('LF-4');
    const self = await fabric('Ponte', 1500);
    const other = await fabric('Denim', 1500);
    await owner.put(`/api/styles/${id}/composition`).send({ composition: presetComposition('lined-fitted-dress'), materialFabrics: { self } });
    await owner.post(`/api/styles/${id}/grading/propose`);
    const batch = await owner.post('/api/batches').send({ styleId: id, quantities: { M: 2 }, dueDate: '2027-02-01' });
    const plan = await owner.post(`/api/batches/${batch.body.batch.id}/cut-plan`).send({ fabricId: other, maxPlies: 10, maxGarmentsPerMarker: 2 });
    expect(plan.status).toBe(400);
    expect(plan.body.error.fields.fabricId).toMatch(/No material/);
  });
});
