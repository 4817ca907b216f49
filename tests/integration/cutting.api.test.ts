import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, cutter: Agent, machinist: Agent;
beforeAll(async () => {
  const { app } = await buildTestApp();
  [owner, cutter, machinist] = await Promise.all([signIn(app, DEMO.owner), signIn(app, DEMO.cutter), signIn(app, DEMO.machinist)]);
});

describe('fabrics and rolls', () => {
  it('shows the price to the owner and never to the cutter', async () => {
    const o = (await owner.get('/api/fabrics')).body.fabrics[0];
    expect(o).toMatchObject({ name: 'Sable cotton poplin', widthMm: 1450, pricePerMetreMinor: 48000, rollCount: 5 });
    const c = await cutter.get('/api/fabrics/1');
    expect(c.status).toBe(200);
    expect(c.body.fabric.pricePerMetreMinor).toBeUndefined();
    expect(JSON.stringify(c.body)).not.toContain('48000');
    expect((await machinist.get('/api/fabrics')).status).toBe(403);
    expect((await cutter.post('/api/fabrics').send({ name: 'X', widthMm: 1400 })).status).toBe(403);
  });

  it('reports every bad field of a fabric by path', async () => {
    const res = await owner.post('/api/fabrics').send({ name: '', widthMm: -5, maxPlies: 0.5 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({ name: 'Name is required', widthMm: 'Cuttable width must be above 0', maxPlies: 'Whole plies' });
  });

  it('enters rolls from the table, all or none', async () => {
    const roll = { label: 'T-1', lengthMm: 25000, widthMm: 1470, shadeLot: 'Lot C', receivedDate: '2026-11-30' };
    const dup = await owner.post('/api/fabrics/1/rolls').send({ rolls: [roll, { ...roll, label: 'SCP-0101' }] });
    expect(dup.status).toBe(400);
    expect(dup.body.error.fields['rolls.1.label']).toMatch(/already in stock/);
    const ok = await owner.post('/api/fabrics/1/rolls').send({ rolls: [roll] });
    expect(ok.status).toBe(201);
    expect(ok.body.rolls[0]).toMatchObject({ label: 'T-1', remainingMm: 25000, isRemnant: false });
  });

  it('imports a CSV packing list and names the row, column and reason of each bad cell', async () => {
    const bad = 'Roll,Length m,Width cm,Shade lot,Received\nP-1,31.5,147,Lot D,2026-11-28\nP-2,abc,147,Lot D,2026-11-28\nP-3,20,147,,28/11/2026\n';
    const res = await owner.post('/api/fabrics/1/rolls/import').set('X-Seamrun-Csrf', '1').attach('file', Buffer.from(bad), 'packing.csv');
    expect(res.status).toBe(400);
    expect(res.body.rows).toEqual(
      expect.arrayContaining([
        { row: 3, column: 'Length m', message: 'Length "abc" is not a positive number' },
        { row: 4, column: 'Shade lot', message: 'Shade lot is empty' },
        { row: 4, column: 'Received', message: 'Date "28/11/2026" is not a date as YYYY-MM-DD' },
      ]),
    );
    const rolls = (await owner.get('/api/fabrics/1/rolls')).body.rolls;
    expect(rolls.some((r: { label: string }) => r.label === 'P-1')).toBe(false);
    const good = 'Roll,Length m,Width cm,Shade lot,Received\nP-1,31.5,147,Lot D,2026-11-28\nP-2,"22,4",147,Lot D,2026-11-28\n';
    const ok = await owner.post('/api/fabrics/1/rolls/import').set('X-Seamrun-Csrf', '1').attach('file', Buffer.from(good), 'packing.csv');
    expect(ok.status).toBe(201);
    expect(ok.body.rolls.map((r: { lengthMm: number }) => r.lengthMm)).toEqual([31500, 22400]);
  });

  it('refuses a multipart upload without the CSRF header', async () => {
    const res = await owner.post('/api/fabrics/1/rolls/import').attach('file', Buffer.from('Roll\n'), 'p.csv');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
  });
});

describe('the demo cut plan and the cutter', () => {
  it('holds lays, a lower bound and a gap; lay 1 was cut with bundles numbered from 1', async () => {
    const plan = (await owner.get('/api/batches/1/cut-plan')).body.cutPlan;
    expect(plan.lays.length).toBeGreaterThanOrEqual(2);
    expect(plan.fabricUsedMm).toBeGreaterThanOrEqual(plan.lowerBoundMm - 1e-6);
    expect(plan.gap).toBeGreaterThanOrEqual(0);
    const cut: Record<string, number> = {};
    for (const l of plan.lays) for (const [s, n] of Object.entries(l.ratio as Record<string, number>)) cut[s] = (cut[s] ?? 0) + n * l.plies;
    expect(cut).toEqual({ XS: 4, S: 8, M: 12, L: 10, XL: 6 });
    expect(plan.lays[0].status).toBe('cut');
    for (const l of plan.lays) expect(l.plies).toBeLessThanOrEqual(6);
    const bundles = (await cutter.get('/api/batches/1/bundles')).body.bundles;
    expect(bundles[0]).toMatchObject({ number: 1, qrText: 'SR-B:1:1' });
    expect(bundles.map((b: { number: number }) => b.number)).toEqual(bundles.map((_: unknown, i: number) => i + 1));
  });

  it('lets only the owner plan a cut, with field errors', async () => {
    expect((await cutter.post('/api/batches/1/cut-plan').send({ fabricId: 1, maxPlies: 6, maxGarmentsPerMarker: 4 })).status).toBe(403);
    const bad = await owner.post('/api/batches/1/cut-plan').send({ fabricId: 0, maxPlies: 0, maxGarmentsPerMarker: 2.5 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['fabricId', 'maxPlies', 'maxGarmentsPerMarker']));
    // Lay 1 is cut from fabric 1: another fabric cannot take over the batch's plan, even when asked to.
    const otherFabric = ((await owner.get('/api/fabrics')).body.fabrics as { id: number; name: string }[]).find((f) => f.id !== 1)!;
    const refused = await owner.post('/api/batches/1/cut-plan').send({ fabricId: otherFabric.id, maxPlies: 6, maxGarmentsPerMarker: 4, replacePlan: true });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(new RegExp(`^Lays of this batch are already cut from .+: its cut plan stays on .+; cut ${otherFabric.name} from its material cut ticket$`));
    // Re-planning keeps the cut lay and plans only what is left to cut.
    const again = await owner.post('/api/batches/1/cut-plan').send({ fabricId: 1, maxPlies: 6, maxGarmentsPerMarker: 4 });
    expect(again.status).toBe(201);
    const lays = again.body.cutPlan.lays as { seq: number; status: string; ratio: Record<string, number>; plies: number }[];
    expect(lays[0]).toMatchObject({ seq: 1, status: 'cut' });
    const cut: Record<string, number> = {};
    for (const l of lays) for (const [s, n] of Object.entries(l.ratio)) cut[s] = (cut[s] ?? 0) + n * l.plies;
    expect(cut).toEqual({ XS: 4, S: 8, M: 12, L: 10, XL: 6 });
  });

  it('plans a new batch: lays cover the order and no roll is used beyond its length', async () => {
    const b = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
    const res = await owner.post(`/api/batches/${b.body.batch.id}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3, overcutPercent: 0 });
    expect(res.status).toBe(201);
    const plan = res.body.cutPlan;
    expect(plan.lowerBoundMm).toBeGreaterThan(0);
    expect(plan.lengthSources.every((s: { source: string }) => s.source === 'estimate')).toBe(true);
    const rolls = (await owner.get('/api/fabrics/1/rolls')).body.rolls as { id: number; remainingMm: number }[];
    const used = new Map<number, number>();
    for (const l of plan.lays) for (const r of l.rolls) used.set(r.rollId, (used.get(r.rollId) ?? 0) + r.plies * (l.markerLengthMm + l.endAllowanceMm));
    for (const [id, mmUsed] of used) expect(mmUsed).toBeLessThanOrEqual(rolls.find((r) => r.id === id)!.remainingMm + 1);
  });

  it('the cutter records plies spread and marks lay 2 cut; bundles continue the batch numbering', async () => {
    const lays = (await cutter.get('/api/lays')).body.lays.filter((l: { batchId: number }) => l.batchId === 1);
    const lay = lays.find((l: { status: string }) => l.status === 'planned');
    const before = (await cutter.get('/api/batches/1/bundles')).body.bundles.length;
    const rolls = lay.rolls.map((r: { rollId: number; plies: number; expectedRemnantMm: number }) => ({ rollId: r.rollId, actualPlies: r.plies, actualRemnantMm: Math.max(0, r.expectedRemnantMm - 100) }));
    const rec = await cutter.put(`/api/lays/${lay.id}`).send({ rolls, flaws: 'Slub at 3 m on the first ply' });
    expect(rec.status).toBe(200);
    expect(rec.body.lay.rolls[0].actualPlies).toBe(lay.rolls[0].plies);
    const bad = await cutter.put(`/api/lays/${lay.id}`).send({ rolls: [{ rollId: 9999, actualPlies: -1, actualRemnantMm: 0 }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['rolls.0.actualPlies']).toBe('Cannot be negative');
    const cut = await cutter.post(`/api/lays/${lay.id}/cut`).send({ rolls, flaws: 'Slub at 3 m on the first ply' });
    expect(cut.status).toBe(200);
    expect(cut.body.lay.status).toBe('cut');
    expect(cut.body.bundles[0].number).toBe(before + 1);
    expect((await cutter.post(`/api/lays/${lay.id}/cut`).send({})).status).toBe(409);
    const roll = (await owner.get('/api/fabrics/1/rolls')).body.rolls.find((r: { id: number }) => r.id === rolls[0].rollId);
    expect([rolls[0].actualRemnantMm, 0]).toContain(roll.remainingMm);
    expect((await machinist.post(`/api/lays/${lay.id}/cut`).send({})).status).toBe(403);
  });

  it('serves the cut ticket, marker list per roll, bundle tickets and register', async () => {
    const pdf = await cutter.get('/api/lays/1/cut-ticket.pdf').buffer(true);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toMatch(/pdf/);
    expect(String(pdf.body.subarray(0, 5))).toBe('%PDF-');
    for (const url of ['/api/lays/1/marker-list.xlsx', '/api/batches/1/marker-list.xlsx', '/api/batches/1/bundle-register.xlsx']) {
      const x = await cutter.get(url).buffer(true);
      expect(x.status).toBe(200);
      expect(x.headers['content-type']).toMatch(/spreadsheetml/);
    }
    for (const url of ['/api/lays/1/marker-list.pdf', '/api/lays/1/bundle-tickets.pdf', '/api/batches/1/bundle-tickets.pdf']) {
      const x = await cutter.get(url).buffer(true);
      expect(x.status).toBe(200);
    }
    expect((await machinist.get('/api/lays/1/cut-ticket.pdf')).status).toBe(403);
  });
});
