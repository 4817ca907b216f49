import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
let styleId: number;

const piece = (name: string, outline: number[][]) => ({ name, outline, cut: 'cut1', copies: 1, seamAllowanceMm: 10, grainLine: { from: [10, 5], to: [10, 40] } });

beforeAll(async () => {
  const built = await buildTestApp();
  owner = await signIn(built.app, DEMO.owner);
  const res = await owner.post('/api/styles').send({ code: 'PHOTO-1', name: 'Traced pieces', sizeRun: ['S', 'M'], baseSize: 'M' });
  styleId = res.body.style.id;
  await owner.put(`/api/styles/${styleId}/grading/chart`).send({ name: 'Run', sizes: ['S', 'M'], rows: [{ pointOfMeasure: 'bust', values: [880, 920] }] });
}, 60_000);

describe('POST /api/styles/:id/pattern/accept with keepExisting (a piece traced from a photo)', () => {
  it('adds the traced piece beside the style\'s pieces, with an id of its own, when keepExisting is set', async () => {
    const first = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({ outlineIs: 'sewing', pieces: [piece('Pocket', [[0, 0], [120, 0], [120, 140], [0, 140]])] });
    expect(first.status).toBe(200);
    const added = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({ outlineIs: 'sewing', keepExisting: true, pieces: [piece('Pocket', [[0, 0], [60, 0], [60, 50], [0, 50]])] });
    expect(added.status).toBe(200);
    expect(added.body.grading.pieces.map((p: { id: string }) => p.id)).toEqual(['pocket', 'pocket-2']);
  });

  it('replaces the style\'s pieces when keepExisting is not set, as before', async () => {
    const res = await owner.post(`/api/styles/${styleId}/pattern/accept`).send({ outlineIs: 'sewing', pieces: [piece('Cuff', [[0, 0], [60, 0], [60, 50], [0, 50]])] });
    expect(res.status).toBe(200);
    expect(res.body.grading.pieces.map((p: { id: string }) => p.id)).toEqual(['cuff']);
  });
});
