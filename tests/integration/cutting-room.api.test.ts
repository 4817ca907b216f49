import { beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { RollEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, cutter: Agent, ds: DataSource;
beforeAll(async () => {
  let app;
  ({ app, ds } = await buildTestApp());
  [owner, cutter] = await Promise.all([signIn(app, DEMO.owner), signIn(app, DEMO.cutter)]);
});

type RollLine = { rollId: number; label: string; plies: number; expectedRemnantMm: number; actualRemnantMm?: number };
type Lay = { id: number; status: string; rolls: RollLine[]; corrections?: { by: string; reason: string; changes: string[] }[] };

describe('fabric prices and shrinkage as the supplier gives them', () => {
  // 1 yd = 0.9144 m exactly (NBS Circular 572 Addendum, 1960): the price is kept per yard, never turned into a rounded metre rate.
  it('keeps a price per yard exactly as quoted through save and read', async () => {
    const made = await owner.post('/api/fabrics').send({ name: 'Yard-priced twill', widthMm: 1143, priceMinor: 4000, priceUnit: 'yard', shrinkageLengthPercent: 3, shrinkageWidthPercent: 1 });
    expect(made.status).toBe(201);
    expect(made.body.fabric.price).toEqual({ amountMinor: 4000, per: 'yard' });
    const read = (await owner.get(`/api/fabrics/${made.body.fabric.id}`)).body.fabric;
    expect(read.price).toEqual({ amountMinor: 4000, per: 'yard' });
    expect([read.shrinkageLengthPercent, read.shrinkageWidthPercent, read.shrinkagePercent]).toEqual([3, 1, 3]);
    const renamed = (await owner.put(`/api/fabrics/${made.body.fabric.id}`).send({ name: 'Yard-priced twill, navy' })).body.fabric;
    expect(renamed.price).toEqual({ amountMinor: 4000, per: 'yard' });
    expect((await cutter.put(`/api/fabrics/${made.body.fabric.id}`).send({ priceMinor: 1 })).status).toBe(403);
  });
});

describe('rolls narrower than the marker', () => {
  it('leaves a narrow roll out of a plan and says so, naming the roll and both widths', async () => {
    const add = await owner.post('/api/fabrics/1/rolls').send({ rolls: [{ label: 'NARROW-1', lengthMm: 60_000, widthMm: 1400, shadeLot: 'Lot N', receivedDate: '2026-11-30' }] });
    expect(add.status).toBe(201);
    const b = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
    const plan = (await owner.post(`/api/batches/${b.body.batch.id}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3, rollIds: [add.body.rolls[0].id, 1, 2, 3, 4, 5] })).body.cutPlan;
    expect(plan.rollRefusals).toEqual(['Roll NARROW-1 is 1400 mm wide, narrower than the 1450 mm marker: it cannot be spread for this lay']);
    for (const l of plan.lays as Lay[]) expect(l.rolls.map((r) => r.label)).not.toContain('NARROW-1');
  });

  it('refuses to record or cut a lay on a roll that turned out narrower than its marker', async () => {
    const lay = ((await cutter.get('/api/lays')).body.lays as (Lay & { batchId: number })[]).find((l) => l.status === 'planned' && l.rolls.length)!;
    const line = lay.rolls[0];
    await ds.getRepository(RollEntity).update({ id: line.rollId }, { widthMm: 1420 });
    const rolls = lay.rolls.map((r) => ({ rollId: r.rollId, actualPlies: r.plies, actualRemnantMm: r.expectedRemnantMm }));
    const rec = await cutter.put(`/api/lays/${lay.id}`).send({ rolls });
    expect(rec.status).toBe(400);
    expect(rec.body.error.fields['rolls.0.actualPlies']).toBe(`Roll ${line.label} is 1420 mm wide, narrower than the 1450 mm marker: it cannot be spread for this lay`);
    expect((await cutter.post(`/api/lays/${lay.id}/cut`).send({ rolls })).status).toBe(400);
    await ds.getRepository(RollEntity).update({ id: line.rollId }, { widthMm: 1450 });
  });
});

describe('a cut lay\'s record', () => {
  it('is closed after the cut; a correction with a reason moves the roll stock and is kept with who and why', async () => {
    const lay = ((await cutter.get('/api/lays')).body.lays as Lay[]).find((l) => l.status === 'planned' && l.rolls.length)!;
    const rolls = lay.rolls.map((r) => ({ rollId: r.rollId, actualPlies: r.plies, actualRemnantMm: Math.max(0, r.expectedRemnantMm - 200) }));
    expect((await cutter.post(`/api/lays/${lay.id}/cut`).send({ rolls })).status).toBe(200);
    // Closed: saving what was spread is refused once cut.
    expect((await cutter.put(`/api/lays/${lay.id}`).send({ rolls })).status).toBe(409);
    const rollBefore = (await ds.getRepository(RollEntity).findOneByOrFail({ id: rolls[0].rollId })).remainingMm;
    const noReason = await cutter.post(`/api/lays/${lay.id}/correction`).send({ rolls });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toBe('Say why the record is corrected');
    const plies = await cutter.post(`/api/lays/${lay.id}/correction`).send({ rolls: [{ ...rolls[0], actualPlies: rolls[0].actualPlies + 1 }], reason: 'Miscounted' });
    expect(plies.status).toBe(400);
    const fixed = await cutter.post(`/api/lays/${lay.id}/correction`).send({ rolls: [{ ...rolls[0], actualRemnantMm: rolls[0].actualRemnantMm + 100 }], reason: 'Remnant measured again on the table' });
    expect(fixed.status).toBe(200);
    expect(fixed.body.lay.corrections).toHaveLength(1);
    expect(fixed.body.lay.corrections[0]).toMatchObject({ reason: 'Remnant measured again on the table' });
    expect(fixed.body.lay.corrections[0].changes[0]).toMatch(/remnant .* → /);
    const rollAfter = (await ds.getRepository(RollEntity).findOneByOrFail({ id: rolls[0].rollId })).remainingMm;
    if (rollBefore > 0) expect(rollAfter - rollBefore).toBeCloseTo(100, 6);
    const audit = (await owner.get('/api/audit')).body;
    expect(JSON.stringify(audit)).toContain('Remnant measured again on the table');
  });
});

describe('the marker list per roll', () => {
  it('is organised by roll in cutting order, the batch in its file name', async () => {
    const res = await cutter.get('/api/batches/1/marker-list.pdf').buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/marker-list-B-0001\.pdf/);
    expect(String(res.body.subarray(0, 5))).toBe('%PDF-');
  });
});
