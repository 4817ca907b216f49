import { beforeAll, describe, expect, it } from 'vitest';
import { demoSizeChart } from '@grading';
import { presetComposition } from '@shared/schemas/style-composition';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, cutter: Agent;

beforeAll(async () => {
  const { app } = await buildTestApp();
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

describe('a style drafted from its blocks', () => {
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

  it('forbids a cutter to change the blocks of a style', async () => {
    expect((await cutter.put('/api/styles/1/composition').send({ composition: { preset: 'shirt-dress' } })).status).toBe(403);
  });
});
