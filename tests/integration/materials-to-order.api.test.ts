import { beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { RollReservationEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
let ds: DataSource;
beforeAll(async () => {
  let app;
  ({ app, ds } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
});

type Lay = { status: string; plies: number; markerLengthMm: number; endAllowanceMm: number };
const fabricNeed = async (batchId: number) =>
  ((await owner.get(`/api/purchasing/batches/${batchId}/needs`)).body.needs as { kind: string; required: number; inStock: number; onOrder: number; toOrder: number }[]).find((n) => n.kind === 'fabric')!;

// Net requirement = gross − on hand − scheduled receipts (Orlicky 1975, MRP; from memory).
describe('materials to order', () => {
  it('needs exactly the spread of the lays the cut plan still has to cut', async () => {
    const b = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
    const plan = (await owner.post(`/api/batches/${b.body.batch.id}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3 })).body.cutPlan;
    const spread = (plan.lays as Lay[]).filter((l) => l.status === 'planned').reduce((a, l) => a + (l.markerLengthMm + l.endAllowanceMm) * l.plies, 0);
    const need = await fabricNeed(b.body.batch.id);
    expect(need.required).toBe(Math.ceil(spread));
    const { costing } = (await owner.get(`/api/batches/${b.body.batch.id}/costing`)).body;
    expect(costing.fabric.stillToCutMm).toBeCloseTo(spread, 0);
  });

  it('counts as free stock what is on hand less what other batches hold, never this batch\'s own holds', async () => {
    const rolls = (await owner.get('/api/fabrics/1/rolls')).body.rolls as { id: number; remainingMm: number }[];
    const onHand = rolls.reduce((a, r) => a + r.remainingMm, 0);
    const held = await ds.getRepository(RollReservationEntity).find({ where: { status: 'held' } });
    const ids = new Set(rolls.map((r) => r.id));
    const byOthers = held.filter((h) => ids.has(h.rollId) && h.batchId !== 1).reduce((a, h) => a + h.lengthMm, 0);
    expect(byOthers).toBeGreaterThan(0); // the batch planned above holds rolls of this fabric
    const need = await fabricNeed(1);
    expect(need.inStock).toBeCloseTo(Math.max(0, onHand - byOthers), 6);
  });
});
