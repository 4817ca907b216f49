import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoSizeChart } from '@grading';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
const dir = mkdtempSync(join(tmpdir(), 'seamrun-names-'));
let owner: Agent;
beforeAll(async () => {
  const { app } = await buildTestApp({ env: { DATABASE_PATH: join(dir, 'seamrun.sqlite') } });
  owner = await signIn(app, DEMO.owner);
}, 60_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const PNG = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082', 'hex');
// RFC 8187 §3.2.1: ext-value = charset "'" [ language ] "'" value-chars, percent-encoded UTF-8.
const rfc8187 = (name: string) => `filename*=UTF-8''${encodeURIComponent(name)}`;

describe('file names in any script', () => {
  it('keeps an uploaded file name sent as UTF-8 and downloads it with an RFC 6266 filename* header', async () => {
    const name = 'Эскиз платья ₹.png';
    const res = await owner.post('/api/uploads').set('X-Seamrun-Csrf', '1').field('kind', 'sketch').attach('file', PNG, name);
    expect(res.status).toBe(201);
    expect(res.body.upload.originalName).toBe(name);
    const back = await owner.get(res.body.upload.url);
    expect(back.status).toBe(200);
    expect(back.headers['content-disposition']).toContain(rfc8187(name));
    expect(back.headers['content-disposition']).toMatch(/^inline; filename="[\x20-\x7e]+"/);
    expect(back.headers['content-type']).toBe('image/png');
  });

  it('downloads a piece whose size label is Cyrillic without a 500, the label kept in filename*', async () => {
    // The demo chart's measurements with Cyrillic size labels (sizes as a Russian studio marks them).
    const demo = demoSizeChart();
    const sizes = demo.sizes.map((_, i) => `Р${42 + 2 * i}`);
    const style = await owner.post('/api/styles').send({ code: 'RU-1', name: 'Платье', sizeRun: sizes, baseSize: sizes[2] });
    expect(style.status).toBe(201);
    const id = style.body.style.id;
    const rows = Object.entries(demo.values).map(([pointOfMeasure, values]) => ({ pointOfMeasure, values }));
    const chart = await owner.put(`/api/styles/${id}/grading/chart`).send({ name: 'ГОСТ', sizes, rows });
    expect(chart.status).toBe(200);
    const csv = await owner.get(`/api/styles/${id}/grading/chart/export?format=csv&unit=mm`);
    expect(csv.status).toBe(200);
    expect(csv.text.split('\r\n')[0]).toBe(`measurement,unit,${sizes.join(',')}`);
    expect((await owner.put(`/api/styles/${id}/composition`).send({ composition: { preset: 'shirt-dress' } })).status).toBe(200);
    expect((await owner.post(`/api/styles/${id}/grading/propose`).set('X-Seamrun-Csrf', '1')).status).toBe(200);
    const svg = await owner.get(`/api/styles/${id}/grading/pieces/front/svg?size=${encodeURIComponent('Р44')}`);
    expect(svg.status).toBe(200);
    expect(svg.headers['content-disposition']).toContain(rfc8187('RU-1-front-Р44.svg'));
    expect(svg.headers['content-disposition']).toMatch(/^attachment; filename="RU-1-front-\?44\.svg"/);
  });
});
