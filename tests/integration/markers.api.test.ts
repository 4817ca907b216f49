import DxfParser from 'dxf-parser';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { openDatabase } from '../../server/db/data-source';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { loadEnv } from '../../server/env';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { binary, DEMO, DEMO_PASSWORD, TEST_TODAY } from '../fixtures/test-app';

type Agent = ReturnType<typeof request.agent>;
const login = async (app: Parameters<typeof request.agent>[0], email: string) => {
  const a = request.agent(app);
  await a.post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
  return a;
};
const poll = async (agent: Agent, id: number, until: (m: { status: string }) => boolean, ms = 120_000) => {
  const end = Date.now() + ms;
  for (;;) {
    const m = (await agent.get(`/api/markers/${id}?drawing=false`)).body.marker;
    if (until(m) || Date.now() > end) return m;
    await new Promise((r) => setTimeout(r, 250));
  }
};

let ds: Awaited<ReturnType<typeof openDatabase>>;
const env = loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000', NESTING_SECONDS: '1' });
let owner: Agent, cutter: Agent, machinist: Agent;
let app: ReturnType<typeof createApp>;
beforeAll(async () => {
  ds = await openDatabase(await freshDatabaseTarget());
  await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
  app = createApp({ ds, env, clientDir: '/nonexistent' });
  [owner, cutter, machinist] = await Promise.all([login(app, DEMO.owner), login(app, DEMO.cutter), login(app, DEMO.machinist)]);
});

/** A second app on the same database whose queue runs a test double of the worker, one job at a time. */
async function appWithWorker(entry: string, overrunMs: number) {
  const a = createApp({ ds, env, clientDir: '/nonexistent', markerQueue: { workerEntry: new URL(entry, import.meta.url).href, overrunMs, cores: 1 } });
  return login(a, DEMO.owner);
}

describe('markers', () => {
  it('runs a marker on a worker thread, reports progress, stores a checked layout and its SVG', async () => {
    const res = await owner.post('/api/markers').send({ styleId: 1, batchId: 1, fabricId: 1, ratio: { XS: 1 }, seconds: 1 });
    expect(res.status).toBe(202);
    expect(res.body.marker.status).toMatch(/queued|running/);
    expect((await owner.get('/api/health')).status).toBe(200);
    const done = await poll(owner, res.body.marker.id, (m) => m.status !== 'queued' && m.status !== 'running');
    expect(done.status).toBe('done');
    expect(done.utilisation).toBeGreaterThan(0.3);
    expect(done.lengthMm).toBeGreaterThan(0);
    // Progress over time: lengths never grow, the last point is the stored marker, density = area ÷ (L × W).
    const points = done.progress as { elapsedMs: number; lengthMm: number; utilisation: number }[];
    expect(points.length).toBeGreaterThan(0);
    points.slice(1).forEach((p, k) => expect(p.lengthMm).toBeLessThanOrEqual(points[k].lengthMm));
    // PostgreSQL keeps a marker's length to 4 decimals of a millimetre; the progress points keep the full figure.
    expect(points.at(-1)!.lengthMm).toBeCloseTo(done.lengthMm, 3);
    expect(points.at(-1)!.utilisation).toBeCloseTo(done.utilisation, 3);
    const full = (await cutter.get(`/api/markers/${done.id}`)).body.marker;
    expect(full.drawing.placements.length).toBe(full.pieceCount);
    const svg = await cutter.get(`/api/markers/${done.id}/svg`).buffer(true).parse((r, cb) => { let s = ''; r.on('data', (c: Buffer) => (s += c)); r.on('end', () => cb(null, s)); });
    expect(svg.headers['content-type']).toMatch(/image\/svg\+xml/);
    expect((svg.body as string).match(/class="piece"/g)?.length).toBe(full.pieceCount);
    expect(svg.body).toContain('XS Front');
    // The plotter file: one closed cutting line per placed copy, read back by an independent DXF reader.
    const dxf = await cutter.get(`/api/markers/${done.id}/dxf`).buffer(true).parse((r, cb) => { let s = ''; r.on('data', (c: Buffer) => (s += c)); r.on('end', () => cb(null, s)); });
    expect(dxf.status).toBe(200);
    expect(dxf.headers['content-disposition']).toMatch(/marker-B-0001-.*\.dxf/);
    const parsed = new DxfParser().parseSync(dxf.body as string) as unknown as { entities: { layer: string; shape?: boolean }[] };
    expect(parsed.entities.filter((e) => e.layer === 'CUT' && e.shape).length).toBe(full.pieceCount);
    expect(svg.headers['content-disposition']).toMatch(/marker-B-0001-.*\.svg/);
    // The plotter PDF at 1:1: PDF user space is 1/72 in (ISO 32000-1 §8.3.2.3) and 1 in = 25.4 mm, so the page is
    // the marker's width × 72 ÷ 25.4 points wide.
    const pdf = await cutter.get(`/api/markers/${done.id}/plot.pdf`).buffer(true).parse(binary);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-disposition']).toMatch(/marker-B-0001-.*\.pdf/);
    const box = (pdf.body as Buffer).toString('latin1').match(/\/MediaBox \[([^\]]+)\]/)![1].trim().split(/\s+/).map(Number);
    expect(box[2]).toBeCloseTo((full.widthMm / 25.4) * 72, 3);
  }, 180_000);

  // One-way fabric: "all pieces one direction" (Vilumsone-Nemes, Industrial Cutting of Textile Materials, pp. 20, 228).
  it('lays every piece of a one-way fabric the same way along the length, pairs mirrored across the grain', async () => {
    const fabric = (await owner.post('/api/fabrics').send({ name: 'Napped needlecord', widthMm: 1450, isDirectional: true })).body.fabric;
    const res = await owner.post('/api/markers').send({ styleId: 1, fabricId: fabric.id, ratio: { XS: 1 }, seconds: 1 });
    expect([200, 202]).toContain(res.status);
    const done = await poll(owner, res.body.marker.id, (m) => m.status !== 'queued' && m.status !== 'running');
    expect(done.status).toBe('done');
    const full = (await cutter.get(`/api/markers/${done.id}`)).body.marker as { drawing: { placements: { pieceKey: string; rotation: number; mirrored: boolean }[] } };
    expect(full.drawing.placements.every((p) => p.rotation === 0 && !p.mirrored)).toBe(true);
    expect(full.drawing.placements.some((p) => p.pieceKey.endsWith(':pair'))).toBe(true);
  }, 180_000);

  it("becomes the drawn marker of its batch's planned lays of the same ratio when it finishes (the cutting area's completion hook)", async () => {
    const plan = (await owner.get('/api/batches/1/cut-plan')).body.cutPlan as { lays: { id: number; status: string; ratio: Record<string, number>; markerId: number | null }[] };
    const lay = plan.lays.find((l) => l.status === 'planned' && l.markerId === null)!;
    expect(lay).toBeDefined();
    const res = await owner.post('/api/markers').send({ styleId: 1, batchId: 1, fabricId: 1, ratio: lay.ratio, seconds: 1 });
    expect(res.status).toBe(202);
    const done = await poll(owner, res.body.marker.id, (m) => m.status !== 'queued' && m.status !== 'running');
    expect(done.status).toBe('done');
    const after = (await cutter.get(`/api/lays/${lay.id}`)).body.lay;
    expect(after.markerId).toBe(done.id);
  }, 180_000);

  it('never recomputes an unchanged marker: the same inputs return the stored one', async () => {
    const again = await owner.post('/api/markers').send({ styleId: 1, batchId: 1, fabricId: 1, ratio: { XS: 1 }, seconds: 1 });
    expect(again.status).toBe(200);
    expect(again.body.reused).toBe(true);
    expect(again.body.marker.status).toBe('done');
  });

  it('checks permissions and fields', async () => {
    expect((await cutter.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { M: 1 } })).status).toBe(403);
    expect((await machinist.get('/api/markers')).status).toBe(403);
    expect((await cutter.get('/api/markers')).status).toBe(200);
    const bad = await owner.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { M: -1, XXL: 2 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['ratio.M']).toBe('Cannot be negative');
    const size = await owner.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { XXL: 2 } });
    expect(size.body.error.fields['ratio.XXL']).toMatch(/not in the style's size run/);
  });

  it('runs a marker alone on both cores and splits them when a second marker starts', async () => {
    const a = await login(createApp({ ds, env, clientDir: '/nonexistent', markerQueue: { cores: 2 } }), DEMO.owner);
    const first = (await a.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { S: 2 }, seconds: 6 })).body.marker;
    const alone = await poll(a, first.id, (m) => (m as { cores?: number }).cores === 2, 20_000);
    expect(alone.cores).toBe(2);
    const second = (await a.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { M: 2 }, seconds: 4 })).body.marker;
    const sharing = await poll(a, second.id, (m) => (m as { cores?: number }).cores === 1, 20_000);
    expect(sharing.status).toBe('running');
    expect((await a.get(`/api/markers/${first.id}?drawing=false`)).body.marker.cores).toBe(1);
    const ends = await Promise.all([first.id, second.id].map((id) => poll(a, id, (m) => m.status !== 'queued' && m.status !== 'running', 30_000)));
    expect(ends.map((m) => m.status)).toEqual(['done', 'done']);
  }, 60_000);

  it('cancels a queued marker', async () => {
    const a = await appWithWorker('../../server/workers/testing/hanging.worker.ts', 60_000);
    const first = (await a.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { S: 1 }, seconds: 2 })).body.marker;
    const second = (await a.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { L: 1 }, seconds: 2 })).body.marker;
    const c2 = await a.post(`/api/markers/${second.id}/cancel`);
    expect(c2.body.marker.status).toBe('cancelled');
    await a.post(`/api/markers/${first.id}/cancel`);
    const m = await poll(a, first.id, (x) => x.status !== 'queued' && x.status !== 'running', 10_000);
    expect(m.status).toBe('cancelled');
    expect((await a.post(`/api/markers/${first.id}/cancel`)).status).toBe(409);
  }, 30_000);

  it('marks a crashed or overrunning worker failed and keeps serving', async () => {
    const crash = await appWithWorker('../../server/workers/testing/crashing.worker.ts', 60_000);
    const c = (await crash.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { XL: 1 }, seconds: 1 })).body.marker;
    const failed = await poll(crash, c.id, (x) => x.status === 'failed', 20_000);
    expect(failed.status).toBe('failed');
    expect(failed.error).toMatch(/crash/);
    const hang = await appWithWorker('../../server/workers/testing/hanging.worker.ts', 300);
    const h = (await hang.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { XL: 2 }, seconds: 1 })).body.marker;
    const over = await poll(hang, h.id, (x) => x.status === 'failed', 20_000);
    expect(over.error).toMatch(/overran its 1 s budget/);
    expect((await owner.get('/api/markers')).status).toBe(200);
  }, 60_000);
});

