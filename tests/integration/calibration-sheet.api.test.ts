import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent;
let styleId: number;

const binary = (res: { on: (e: string, f: (c?: Buffer) => void) => void }, cb: (e: null, b: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c?: Buffer) => chunks.push(c!));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  const built = await buildTestApp();
  owner = await signIn(built.app, DEMO.owner);
  machinist = await signIn(built.app, DEMO.machinist);
  const res = await owner.post('/api/styles').send({ code: 'CAL-1', name: 'Traced from a photo', sizeRun: ['S', 'M'], baseSize: 'M' });
  styleId = res.body.style.id;
}, 60_000);

describe('GET /api/styles/:id/pattern/calibration-sheet', () => {
  it('answers the A4 sheet and the tiled border frame as PDFs when the owner asks', async () => {
    const sheet = await owner.get(`/api/styles/${styleId}/pattern/calibration-sheet?kind=sheet&paper=A4`).buffer(true).parse(binary);
    expect(sheet.status).toBe(200);
    expect(sheet.headers['content-type']).toMatch(/application\/pdf/);
    expect((sheet.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    const border = await owner.get(`/api/styles/${styleId}/pattern/calibration-sheet?kind=border&paper=Letter`).buffer(true).parse(binary);
    expect(border.status).toBe(200);
    expect(border.headers['content-disposition']).toMatch(/seamrun-border-frame-Letter\.pdf/);
  });

  it('refuses a sheet on "whole" paper with a 400 naming the paper', async () => {
    const res = await owner.get(`/api/styles/${styleId}/pattern/calibration-sheet?kind=sheet&paper=whole`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.paper).toMatch(/A4 or Letter/);
  });

  it('answers 404 for a style that is not the studio\'s', async () => {
    const res = await owner.get('/api/styles/999999/pattern/calibration-sheet');
    expect(res.status).toBe(404);
  });

  it('refuses a machinist, who has no pattern work', async () => {
    const res = await machinist.get(`/api/styles/${styleId}/pattern/calibration-sheet`);
    expect(res.status).toBe(403);
  });
});
