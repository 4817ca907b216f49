import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent, cutter: Agent;

beforeAll(async () => {
  const { app } = await buildTestApp();
  owner = await signIn(app, DEMO.owner);
  machinist = await signIn(app, DEMO.machinist);
  cutter = await signIn(app, DEMO.cutter);
}, 60_000);

// W1 of ../shared/reference/production-and-costing.md §1.3 (Scribd 722882170 "SAM", quoted): 0.60 min (36 s)
// rated 80, allowances 10 % + 20 % → 0.624 standard minutes.
const sheet = { elements: [{ name: 'Sew side seam', observations: [{ seconds: 36, rating: 80 }] }], relaxationPercent: 20, contingencyPercent: 10 };

describe('time-study sheet on an operation', () => {
  it('sets the operation standard minutes from the sheet and keeps the sheet when the owner sends it', async () => {
    const ops = (await owner.get('/api/styles/1/operations')).body.operations;
    const op = ops.find((o: { section: string }) => o.section === 'sewing');
    const res = await owner.put(`/api/styles/1/operations/${op.id}/time-study`).send(sheet);
    expect(res.status).toBe(200);
    expect(res.body.operation.sam).toBe(0.624);
    expect(res.body.operation.timeStudy).toMatchObject({ relaxationPercent: 20, contingencyPercent: 10, standardMinutes: 0.624 });
    expect(res.body.operation.timeStudy.basicMinutes).toBeCloseTo(0.48, 10);
    const again = (await owner.get('/api/styles/1/operations')).body.operations.find((o: { id: number }) => o.id === op.id);
    expect(again.sam).toBe(0.624);
    expect(again.timeStudy.elements[0].observations).toEqual([{ seconds: 36, rating: 80 }]);
  });

  it('refuses the sheet from a machinist and a cutter and leaves the minutes as they were', async () => {
    const ops = (await owner.get('/api/styles/1/operations')).body.operations;
    const op = ops.find((o: { section: string }) => o.section === 'finishing');
    expect((await machinist.put(`/api/styles/1/operations/${op.id}/time-study`).send(sheet)).status).toBe(403);
    expect((await cutter.put(`/api/styles/1/operations/${op.id}/time-study`).send(sheet)).status).toBe(403);
    const after = (await owner.get('/api/styles/1/operations')).body.operations.find((o: { id: number }) => o.id === op.id);
    expect(after.sam).toBe(op.sam);
  });

  it('answers a 400 naming the field when an element has no timed cycle or a rating of 0', async () => {
    const op = (await owner.get('/api/styles/1/operations')).body.operations[3];
    const empty = await owner.put(`/api/styles/1/operations/${op.id}/time-study`).send({ ...sheet, elements: [{ name: 'Hem', observations: [] }] });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields).toMatchObject({ 'elements.0.observations': 'Time at least one cycle' });
    const zero = await owner.put(`/api/styles/1/operations/${op.id}/time-study`).send({ ...sheet, elements: [{ name: 'Hem', observations: [{ seconds: 30, rating: 0 }] }] });
    expect(zero.status).toBe(400);
    expect(zero.body.error.fields).toMatchObject({ 'elements.0.observations.0.rating': 'Must be more than 0' });
    expect((await owner.put('/api/styles/1/operations/999999/time-study').send(sheet)).status).toBe(404);
  });

  it('drops the sheet when the owner types other minutes for the operation in the table', async () => {
    const ops = (await owner.get('/api/styles/1/operations')).body.operations;
    const i = ops.findIndex((o: { timeStudy: unknown }) => o.timeStudy);
    const rows = ops.map((o: Record<string, unknown>) => ({ code: o.code, name: o.name, section: o.section, machineType: o.machineType, sam: o.sam, predecessors: o.predecessors, pieceRateMinor: o.pieceRateMinor }));
    const same = (await owner.put('/api/styles/1/operations').send({ operations: rows })).body.operations;
    expect(same[i].timeStudy).not.toBeNull();
    rows[i].sam = 0.7;
    const changed = (await owner.put('/api/styles/1/operations').send({ operations: rows })).body.operations;
    expect(changed[i].timeStudy).toBeNull();
  });
});
