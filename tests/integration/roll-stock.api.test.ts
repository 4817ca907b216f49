import { beforeAll, describe, expect, it } from 'vitest';
import { createLocalJobRunner, type JobRunner } from '../../server/jobs/job-runner';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
type Line = { rollId: number; plies: number; expectedRemnantMm: number };
type Lay = { id: number; seq: number; status: string; plies: number; markerLengthMm: number; endAllowanceMm: number; rolls: Line[]; shortage: { message: string; pliesWithoutFabric: number } | null };
type Roll = { id: number; label: string; remainingMm: number; reservedMm: number };

let owner: Agent, cutter: Agent;
let seq = 0;
beforeAll(async () => {
  const { app } = await buildTestApp();
  [owner, cutter] = await Promise.all([signIn(app, DEMO.owner), signIn(app, DEMO.cutter)]);
});

// The demo style 1 at these quantities needs about 33 m of a 145 cm fabric (five lays' worth), so one
// 40 m roll serves one such batch and not two.
const ORDER = { XS: 2, S: 4, M: 6, L: 5, XL: 3 };
const PLAN = { maxPlies: 10, maxGarmentsPerMarker: 4, overcutPercent: 0 };

async function fabricWithRoll(lengthMm: number) {
  seq += 1;
  const f = (await owner.post('/api/fabrics').send({ name: `Stock test twill ${seq}`, widthMm: 1450, maxPlies: 40 })).body.fabric;
  const r = await owner.post(`/api/fabrics/${f.id}/rolls`).send({ rolls: [{ label: `ST-${seq}`, lengthMm, widthMm: 1470, shadeLot: 'A', receivedDate: '2026-11-30' }] });
  expect(r.status).toBe(201);
  return { fabricId: f.id as number, rollId: r.body.rolls[0].id as number };
}
const newBatch = async () => (await owner.post('/api/batches').send({ styleId: 1, quantities: ORDER, dueDate: '2027-01-15' })).body.batch.id as number;
const plan = (batchId: number, fabricId: number) => owner.post(`/api/batches/${batchId}/cut-plan`).send({ fabricId, ...PLAN });
const roll = async (fabricId: number, rollId: number) => ((await owner.get(`/api/fabrics/${fabricId}/rolls`)).body.rolls as Roll[]).find((r) => r.id === rollId)!;
/** Length the plan's planned lays spread from one roll, mm (marker lengths are shown rounded: ≤ 1 mm per ply). */
const spreadFrom = (lays: Lay[], rollId: number) =>
  lays.filter((l) => l.status === 'planned').flatMap((l) => l.rolls.filter((r) => r.rollId === rollId).map((r) => r.plies * (l.markerLengthMm + l.endAllowanceMm))).reduce((a, b) => a + b, 0);

describe('roll reservations across batches', () => {
  it('plans a second batch on free length only when another batch already holds the roll', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const a = await plan(await newBatch(), fabricId);
    const b = await plan(await newBatch(), fabricId);
    expect(a.status).toBe(201);
    expect(b.status).toBe(201);
    const both = spreadFrom(a.body.cutPlan.lays, rollId) + spreadFrom(b.body.cutPlan.lays, rollId);
    expect(both).toBeLessThanOrEqual(40_000 + 20);
    const r = await roll(fabricId, rollId);
    expect(r.remainingMm).toBe(40_000);
    expect(r.reservedMm).toBeLessThanOrEqual(r.remainingMm + 1e-6);
    expect(b.body.cutPlan.lays.some((l: Lay) => l.shortage && l.shortage.pliesWithoutFabric > 0)).toBe(true);
  });

  it('releases the old holds when a batch is planned again, so the roll is not held twice', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const batchId = await newBatch();
    const first = await plan(batchId, fabricId);
    const held = (await roll(fabricId, rollId)).reservedMm;
    expect(held).toBeGreaterThan(20_000);
    const again = await plan(batchId, fabricId);
    expect(again.status).toBe(201);
    expect(again.body.cutPlan.lays.every((l: Lay) => !l.shortage)).toBe(true);
    expect((await roll(fabricId, rollId)).reservedMm).toBeCloseTo(held, 3);
    expect(spreadFrom(again.body.cutPlan.lays, rollId)).toBeCloseTo(spreadFrom(first.body.cutPlan.lays, rollId), -1);
  });

  it('never drops a batch\'s plan on one fabric because another fabric was planned, unless the owner confirms', async () => {
    const self = await fabricWithRoll(40_000);
    const lining = await fabricWithRoll(40_000);
    const batchId = await newBatch();
    const first = await plan(batchId, self.fabricId);
    expect(first.status).toBe(201);
    const held = (await roll(self.fabricId, self.rollId)).reservedMm;
    expect(held).toBeGreaterThan(20_000);
    const refused = await plan(batchId, lining.fabricId);
    expect(refused.status).toBe(409);
    expect(refused.body.error.fields.fabricId).toMatch(/^The batch is planned on Stock test twill \d+$/);
    expect(refused.body.error.message).toMatch(/replaces that plan and releases the rolls it holds/);
    // Nothing changed: the first plan and its holds stand, the other roll holds nothing.
    expect((await roll(self.fabricId, self.rollId)).reservedMm).toBeCloseTo(held, 3);
    expect((await roll(lining.fabricId, lining.rollId)).reservedMm).toBe(0);
    expect((await owner.get(`/api/batches/${batchId}/cut-plan`)).body.cutPlan.id).toBe(first.body.cutPlan.id);
    const replaced = await owner.post(`/api/batches/${batchId}/cut-plan`).send({ fabricId: lining.fabricId, ...PLAN, replacePlan: true });
    expect(replaced.status).toBe(201);
    expect((await roll(self.fabricId, self.rollId)).reservedMm).toBe(0);
    expect((await roll(lining.fabricId, lining.rollId)).reservedMm).toBeGreaterThan(20_000);
  });

  // Rolls are served longest marker first (allocateRolls), and the lays are numbered in that order: a cutter
  // who spreads lay 1, then lay 2, … meets the expected remnants in the order the plan printed them.
  it('numbers the lays in the order the roll is spread, so its expected remnant falls from lay to lay', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const res = await plan(await newBatch(), fabricId);
    expect(res.status).toBe(201);
    const lays = [...(res.body.cutPlan.lays as Lay[])].sort((a, b) => a.seq - b.seq);
    expect(lays.length).toBeGreaterThan(1);
    const remnants = lays.flatMap((l) => l.rolls.filter((r) => r.rollId === rollId).map((r) => r.expectedRemnantMm));
    for (let i = 1; i < remnants.length; i++) expect(remnants[i]).toBeLessThan(remnants[i - 1]);
    const lengths = lays.map((l) => l.markerLengthMm);
    for (let i = 1; i < lengths.length; i++) expect(lengths[i]).toBeLessThanOrEqual(lengths[i - 1]);
  });

  it('gives a cancelled batch\'s hold back to the next batch planned on the roll', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const gone = await newBatch();
    await plan(gone, fabricId);
    expect((await owner.patch(`/api/batches/${gone}`).send({ status: 'cancelled' })).status).toBe(200);
    const next = await plan(await newBatch(), fabricId);
    expect(next.body.cutPlan.lays.every((l: Lay) => !l.shortage)).toBe(true);
    expect((await roll(fabricId, rollId)).reservedMm).toBeCloseTo(spreadFrom(next.body.cutPlan.lays, rollId), -2);
  });
});

describe('marking a lay cut', () => {
  it('refuses a measured remnant longer than the roll held, naming the field, and keeps the stock', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const batchId = await newBatch();
    const lays = (await plan(batchId, fabricId)).body.cutPlan.lays as Lay[];
    const lay = lays[0];
    const line = lay.rolls[0];
    const tooLong = { rolls: [{ rollId: line.rollId, actualPlies: line.plies, actualRemnantMm: 45_000 }] };
    const saved = await cutter.put(`/api/lays/${lay.id}`).send(tooLong);
    expect(saved.status).toBe(400);
    expect(saved.body.error.fields['rolls.0.actualRemnantMm']).toMatch(/had only 40\.00 m/);
    const cut = await cutter.post(`/api/lays/${lay.id}/cut`).send(tooLong);
    expect(cut.status).toBe(400);
    expect(cut.body.error.fields['rolls.0.actualRemnantMm']).toMatch(/cannot be longer/);
    expect((await roll(fabricId, rollId)).remainingMm).toBe(40_000);
    expect((await cutter.get(`/api/batches/${batchId}/bundles`)).body.bundles).toEqual([]);
  });

  it('refuses to mark a lay cut until the plies spread and the measured remnant are entered for every roll', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const batchId = await newBatch();
    const [lay] = (await plan(batchId, fabricId)).body.cutPlan.lays as Lay[];
    const bare = await cutter.post(`/api/lays/${lay.id}/cut`).send({});
    expect(bare.status).toBe(400);
    expect(bare.body.error.fields['rolls.0.actualPlies']).toMatch(/^Enter the plies spread from roll ST-\d+$/);
    expect(bare.body.error.fields['rolls.0.actualRemnantMm']).toMatch(/^Measure and enter the remnant left on roll ST-\d+$/);
    const pliesOnly = await cutter.post(`/api/lays/${lay.id}/cut`).send({ rolls: [{ rollId, actualPlies: lay.rolls[0].plies }] });
    expect(pliesOnly.status).toBe(400);
    expect((await roll(fabricId, rollId)).remainingMm).toBe(40_000);
    expect((await cutter.get(`/api/batches/${batchId}/bundles`)).body.bundles).toEqual([]);
    // Saved earlier on the lay page, the measured figures are what the cut uses.
    const measured = { rolls: [{ rollId, actualPlies: lay.rolls[0].plies, actualRemnantMm: 30_000 }] };
    expect((await cutter.put(`/api/lays/${lay.id}`).send(measured)).status).toBe(200);
    expect((await cutter.post(`/api/lays/${lay.id}/cut`).send({})).status).toBe(200);
    expect((await roll(fabricId, rollId)).remainingMm).toBe(30_000);
  });

  it('keeps the remnant the cutter measured and consumes the lay\'s hold; stock only goes down', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const lays = (await plan(await newBatch(), fabricId)).body.cutPlan.lays as Lay[];
    const before = await roll(fabricId, rollId);
    const [lay] = lays;
    const layHold = lay.rolls[0].plies * (lay.markerLengthMm + lay.endAllowanceMm);
    const measured = 40_000 - layHold - 150;
    const cut = await cutter.post(`/api/lays/${lay.id}/cut`).send({ rolls: [{ rollId, actualPlies: lay.rolls[0].plies, actualRemnantMm: measured }] });
    expect(cut.status).toBe(200);
    const after = await roll(fabricId, rollId);
    expect(after.remainingMm).toBe(measured);
    expect(after.reservedMm).toBeCloseTo(before.reservedMm - layHold, -1);
  });

  it('flags the next lay short on its page and on the owner\'s Today when a remnant comes up shorter than planned', async () => {
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const lays = (await plan(await newBatch(), fabricId)).body.cutPlan.lays as Lay[];
    expect(lays.length).toBeGreaterThanOrEqual(2);
    const [first, second] = lays;
    expect((await cutter.get(`/api/lays/${second.id}`)).body.lay.shortage).toBeNull();
    // A flaw cut out of the roll: only 2 m are left for the lays still to come.
    await cutter.post(`/api/lays/${first.id}/cut`).send({ rolls: [{ rollId, actualPlies: first.rolls[0].plies, actualRemnantMm: 2000 }] });
    const page = (await cutter.get(`/api/lays/${second.id}`)).body.lay;
    expect(page.shortage.message).toMatch(/^Not enough fabric: roll ST-\d+ has 2\.00 m but the lays waiting on it need \d+\.\d\d m\.$/);
    const today = (await owner.get('/api/lays/shortages')).body.shortages as { layId: number; message: string }[];
    expect(today.find((s) => s.layId === second.id)?.message).toBe(page.shortage.message);
  });
});

/**
 * Cut-order solves that wait for each other: both plans have read the free stock before either saves,
 * as when two solves run at once on job workers.
 */
function solvesInStep(width: number): JobRunner {
  const local = createLocalJobRunner(width);
  let waiting: (() => void)[] = [];
  return {
    where: 'in-process',
    run: (async (name: Parameters<JobRunner['run']>[0], input: Parameters<JobRunner['run']>[1]) => {
      if (name === 'cut-order' && width > 1) {
        await new Promise<void>((go) => {
          waiting.push(go);
          if (waiting.length === width) {
            waiting.forEach((w) => w());
            waiting = [];
          }
        });
        width = 1; // later solves (the loser's second try) run straight away
      }
      return local.run(name, input);
    }) as JobRunner['run'],
    stop: () => local.stop(),
  };
}

describe('two batches planned at the same moment', () => {
  it('never hold more of a roll than it has: the later plan solves again on what is left', async () => {
    const { app } = await buildTestApp({ jobs: solvesInStep(2) });
    owner = await signIn(app, DEMO.owner);
    const { fabricId, rollId } = await fabricWithRoll(40_000);
    const [x, y] = [await newBatch(), await newBatch()];
    const [a, b] = await Promise.all([plan(x, fabricId), plan(y, fabricId)]);
    expect([a.status, b.status]).toEqual([201, 201]);
    const both = spreadFrom(a.body.cutPlan.lays, rollId) + spreadFrom(b.body.cutPlan.lays, rollId);
    expect(both).toBeGreaterThan(20_000);
    expect(both).toBeLessThanOrEqual(40_000 + 20);
    const r = await roll(fabricId, rollId);
    expect(r.reservedMm).toBeLessThanOrEqual(40_000 + 1e-6);
    const short = [...a.body.cutPlan.lays, ...b.body.cutPlan.lays].filter((l: Lay) => l.shortage);
    expect(short.length).toBeGreaterThan(0);
  });
});
