import { beforeAll, describe, expect, it } from 'vitest';
import { BundleEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

/**
 * A lined style is cut from two fabrics: the shell (the style's self fabric) and the lining, each with its own
 * rolls, lays and marker list. The main plan's lays make the sewing bundles; the lining's lays make none.
 * Facts of the trade (common practice): lining is spread and cut on its own lays, from its own rolls, after
 * the shell; its pieces are matched to the shell bundles by size at sewing.
 */
type Agent = Awaited<ReturnType<typeof signIn>>;
type Lay = { id: number; seq: number; status: string; plies: number; markerLengthMm: number; endAllowanceMm: number; rolls: { rollId: number; plies: number }[] };
type Roll = { id: number; remainingMm: number; reservedMm: number };

let ctx: Awaited<ReturnType<typeof buildTestApp>>;
let owner: Agent, cutter: Agent;
let self: number, lining: number;
const PLAN = { maxPlies: 10, maxGarmentsPerMarker: 4, overcutPercent: 0 };
const ORDER = { XS: 2, S: 4, M: 6, L: 5, XL: 3 };

async function addRoll(fabricId: number, label: string, lengthMm: number) {
  const r = await owner.post(`/api/fabrics/${fabricId}/rolls`).send({ rolls: [{ label, lengthMm, widthMm: 1500, shadeLot: 'A', receivedDate: '2026-11-30' }] });
  expect(r.status).toBe(201);
  return r.body.rolls[0].id as number;
}
const rollOf = async (fabricId: number, id: number) => ((await owner.get(`/api/fabrics/${fabricId}/rolls`)).body.rolls as Roll[]).find((r) => r.id === id)!;

beforeAll(async () => {
  ctx = await buildTestApp();
  [owner, cutter] = await Promise.all([signIn(ctx.app, DEMO.owner), signIn(ctx.app, DEMO.cutter)]);
  const styles = (await owner.get('/api/styles')).body.styles as { id: number; materialFabrics: Record<string, number> | null }[];
  const lined = styles.find((s) => s.materialFabrics?.lining && s.materialFabrics.self)!;
  ({ self, lining } = lined.materialFabrics as { self: number; lining: number });
  (ctx as unknown as { styleId: number }).styleId = lined.id;
});

const newBatch = async () => {
  const styleId = (ctx as unknown as { styleId: number }).styleId;
  const res = await owner.post('/api/batches').send({ styleId, quantities: ORDER, dueDate: '2027-01-15' });
  expect(res.status).toBe(201);
  return res.body.batch.id as number;
};
/** A plan on the test's own roll, so the demo's other rolls do not enter it. */
const plan = (batchId: number, fabricId: number, rollId: number) => owner.post(`/api/batches/${batchId}/cut-plan`).send({ fabricId, rollIds: [rollId], ...PLAN });

describe('a lined style: the lining has a cut plan of its own beside the shell', () => {
  it('plans the lining without touching the shell plan or its holds, and shows each plan on its own', async () => {
    const shellRoll = await addRoll(self, 'MP-SHELL-1', 60_000);
    const liningRoll = await addRoll(lining, 'MP-LINING-1', 60_000);
    const batchId = await newBatch();
    const shell = await plan(batchId, self, shellRoll);
    expect(shell.status).toBe(201);
    expect(shell.body.cutPlan.material).toBe(false);
    const shellHeld = (await rollOf(self, shellRoll)).reservedMm;
    expect(shellHeld).toBeGreaterThan(0);

    const lined = await plan(batchId, lining, liningRoll);
    expect(lined.status).toBe(201);
    expect(lined.body.cutPlan.fabricId).toBe(lining);
    expect(lined.body.cutPlan.material).toBe(true);
    expect(lined.body.cutPlan.lays.length).toBeGreaterThan(0);
    // The shell plan and its holds stand; the lining plan holds the lining roll.
    expect((await rollOf(self, shellRoll)).reservedMm).toBeCloseTo(shellHeld, 3);
    expect((await rollOf(lining, liningRoll)).reservedMm).toBeGreaterThan(0);
    const main = (await owner.get(`/api/batches/${batchId}/cut-plan`)).body.cutPlan;
    expect(main.id).toBe(shell.body.cutPlan.id);
    expect(main.plans.map((p: { fabricId: number; material: boolean }) => [p.fabricId, p.material])).toEqual([[self, false], [lining, true]]);
    expect((await owner.get(`/api/batches/${batchId}/cut-plan?fabricId=${lining}`)).body.cutPlan.id).toBe(lined.body.cutPlan.id);
    // The costing sheet prices the lining from its own plan: Σ garments × metres per garment is what the plan
    // spreads, plus the style's wastage (at most 10 % here).
    const sheet = (await owner.get(`/api/batches/${batchId}/costing`)).body.costing;
    const liningName = ((await owner.get('/api/fabrics')).body.fabrics as { id: number; name: string }[]).find((f) => f.id === lining)!.name;
    const line = sheet.lines.find((l: { kind: string; refId: number }) => l.kind === 'fabric' && l.refId === lining);
    const total = Object.entries(ORDER).reduce((a, [size, q]) => a + q * line.quantities[size], 0);
    expect(total).toBeGreaterThanOrEqual(lined.body.cutPlan.fabricUsedMm / 1000 - 0.01);
    expect(total).toBeLessThanOrEqual((lined.body.cutPlan.fabricUsedMm / 1000) * 1.1);
    expect(sheet.notes).toContain(`${liningName}: from its own cut plan for this batch, wastage included.`);
    // Planning the lining again replaces only the lining plan.
    const again = await plan(batchId, lining, liningRoll);
    expect(again.status).toBe(201);
    expect((await owner.get(`/api/batches/${batchId}/cut-plan`)).body.cutPlan.id).toBe(shell.body.cutPlan.id);
    expect((await rollOf(self, shellRoll)).reservedMm).toBeCloseTo(shellHeld, 3);

    // The cutter's list of lays names each lay's fabric: the lining's lay 1 is not the shell's lay 1.
    const fabricsById = new Map(((await owner.get('/api/fabrics')).body.fabrics as { id: number; name: string }[]).map((f) => [f.id, f.name]));
    const lays = ((await cutter.get('/api/lays')).body.lays as { batchId: number; seq: number; fabricName: string }[]).filter((l) => l.batchId === batchId);
    expect(new Set(lays.map((l) => l.fabricName))).toEqual(new Set([fabricsById.get(self), fabricsById.get(lining)]));
    // Each fabric's marker list is its own: the lining's names the lining roll, not the shell's.
    const list = await cutter.get(`/api/batches/${batchId}/marker-list.xlsx?fabricId=${lining}`).buffer(true);
    expect(list.status).toBe(200);
    expect(String(list.headers['content-disposition'])).toContain(`-fabric-${lining}.xlsx`);
  });

  it('cuts a lining lay from the lining roll and makes no bundles; a shell lay makes the bundles', async () => {
    const shellRoll = await addRoll(self, 'MP-SHELL-2', 60_000);
    const liningRoll = await addRoll(lining, 'MP-LINING-2', 60_000);
    const batchId = await newBatch();
    const shellLays = (await plan(batchId, self, shellRoll)).body.cutPlan.lays as Lay[];
    const liningLays = (await plan(batchId, lining, liningRoll)).body.cutPlan.lays as Lay[];
    const bundles = () => ctx.ds.getRepository(BundleEntity).countBy({ batchId });

    /** Cut the first lay on `rollId` as planned, the remnant measured as spread; the roll's length before and the spread. */
    const cutFirstLay = async (lays: Lay[], fabricId: number, rollId: number) => {
      const lay = lays.find((l) => l.rolls.some((r) => r.rollId === rollId))!;
      const line = lay.rolls.find((r) => r.rollId === rollId)!;
      const before = (await rollOf(fabricId, rollId)).remainingMm;
      const spread = line.plies * (lay.markerLengthMm + lay.endAllowanceMm);
      const cut = await cutter.post(`/api/lays/${lay.id}/cut`).send({ rolls: [{ rollId, actualPlies: line.plies, actualRemnantMm: before - spread }] });
      expect(cut.status).toBe(200);
      return { before, spread };
    };
    const liningCut = await cutFirstLay(liningLays, lining, liningRoll);
    expect(await bundles()).toBe(0);
    expect((await rollOf(lining, liningRoll)).remainingMm).toBeCloseTo(liningCut.before - liningCut.spread, 0);
    // Materials to order: the lining needs what its lays still to cut spread; what is cut has left the stock.
    const liningNow = (await owner.get(`/api/batches/${batchId}/cut-plan?fabricId=${lining}`)).body.cutPlan.lays as Lay[];
    const stillToSpread = liningNow.filter((l) => l.status === 'planned').reduce((a, l) => a + l.plies * (l.markerLengthMm + l.endAllowanceMm), 0);
    const needs = (await owner.get(`/api/purchasing/batches/${batchId}/needs`)).body.needs as { kind: string; refId: number; required: number }[];
    expect(needs.find((n) => n.kind === 'fabric' && n.refId === lining)!.required).toBeCloseTo(stillToSpread, -1);
    await cutFirstLay(shellLays, self, shellRoll);
    expect(await bundles()).toBeGreaterThan(0);
    // The costing sheet's fabric stays the shell's, whichever plan was made last.
    const sheet = (await owner.get(`/api/batches/${batchId}/costing`)).body;
    expect(JSON.stringify(sheet)).toContain((await owner.get(`/api/fabrics`)).body.fabrics.find((f: { id: number; name: string }) => f.id === self).name);
  });
});
