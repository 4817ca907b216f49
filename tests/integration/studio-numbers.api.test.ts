import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createGradingSetRepository } from '../../server/modules/grading/grading-set.repository';
import { createPayRepository } from '../../server/modules/pay/pay.repository';
import { binary, buildTestApp, DEMO, signIn } from '../fixtures/test-app';
import { buildBatchInput } from '../fixtures/factories';
import { pdfWords, workbookWords } from '../fixtures/locale-findings';

// Batch, purchase order and pay period numbers count within one studio: a studio's first batch is B-0001 and
// its first order PO-0001 whatever other studios made before it (common practice: a business's document
// numbers run in its own series, and one customer of a shared service never sees another's counts).

type Agent = Awaited<ReturnType<typeof signIn>>;
let ctx: Awaited<ReturnType<typeof buildTestApp>>;
let demo: Agent;

const DEMO_SIZES = ['XS', 'S', 'M', 'L', 'XL'];

/** A new studio through the sign-up route; the agent comes back signed in as its owner. */
async function openStudio(name: string, email: string) {
  const owner = request.agent(ctx.app);
  const res = await owner.post('/api/auth/studios').send({
    studioName: name, currency: 'EUR', unitSystem: 'metric', ownerName: `Owner of ${name}`, email, password: 'another-long-password',
  });
  expect(res.status).toBe(201);
  return { owner, studioId: res.body.user.studioId as number };
}

async function newStyle(owner: Agent, code: string) {
  const res = await owner.post('/api/styles').send({ code, name: 'Shirt dress', sizeRun: DEMO_SIZES, baseSize: 'M' });
  expect(res.status).toBe(201);
  return res.body.style.id as number;
}

async function newSupplierAndFabric(owner: Agent) {
  const supplier = await owner.post('/api/purchasing/suppliers').send({ name: 'Rift Valley Mills', email: 'orders@rift-mills.example', leadTimeDays: 7 });
  expect(supplier.status).toBe(201);
  const fabric = await owner.post('/api/fabrics').send({ name: 'Poplin', widthMm: 1500 });
  expect(fabric.status).toBe(201);
  return { supplierId: supplier.body.supplier.id as number, fabricId: fabric.body.fabric.id as number };
}

const orderOf = (supplierId: number, fabricId: number, batchId: number | null) => ({ supplierId, batchId, lines: [{ kind: 'fabric', refId: fabricId, quantity: 5000 }] });

beforeAll(async () => {
  ctx = await buildTestApp();
  demo = await signIn(ctx.app, DEMO.owner);
  // The demo studio makes more of everything first, so the second studio's ids are well past its numbers.
  for (let i = 0; i < 2; i += 1) expect((await demo.post('/api/batches').send(buildBatchInput(1))).status).toBe(201);
  const { supplierId, fabricId } = await newSupplierAndFabric(demo);
  for (let i = 0; i < 2; i += 1) expect((await demo.post('/api/purchasing/orders').send(orderOf(supplierId, fabricId, 1))).status).toBe(201);
  // The demo seed logs work on 26, 27 and 30 Nov; the studio approves them as its first period.
  expect((await demo.post('/api/pay/periods').send({ fromDay: '2026-11-23', toDay: '2026-11-30' })).status).toBe(201);
}, 60_000);

describe('numbers of a studio', () => {
  let second: Awaited<ReturnType<typeof openStudio>>;
  let batch: { id: number; number: number; code: string };
  let order: { id: number; number: string };

  beforeAll(async () => {
    second = await openStudio('Second Seam Studio', 'owner@second-seam.example');
    const styleId = await newStyle(second.owner, 'SD-1');
    const made = await second.owner.post('/api/batches').send(buildBatchInput(styleId));
    expect(made.status).toBe(201);
    batch = made.body.batch;
    const { supplierId, fabricId } = await newSupplierAndFabric(second.owner);
    const placed = await second.owner.post('/api/purchasing/orders').send(orderOf(supplierId, fabricId, batch.id));
    expect(placed.status).toBe(201);
    order = placed.body.order;
    // The second studio's style is cut from the demo style's pieces, so it has cut tickets to print.
    const sets = createGradingSetRepository(ctx.ds);
    const pieces = (await sets.byStyle(1, 1))!;
    await sets.save(second.studioId, styleId, { sizeChart: pieces.sizeChart, pieces: pieces.pieces, gradeRules: pieces.gradeRules });
    await second.owner.put(`/api/styles/${styleId}`).send({ materialFabrics: { self: fabricId } });
  }, 60_000);

  it("calls a second studio's first batch B-0001 and its first purchase order PO-0001 while the demo studio has others", async () => {
    expect(batch.id).toBeGreaterThan(1);
    expect(batch).toMatchObject({ number: 1, code: 'B-0001' });
    expect(order.id).toBeGreaterThan(1);
    expect(order.number).toBe('PO-0001');
    // The demo studio counts on from its own: batch 1 (seed) + 2 made above → its next is B-0004, its next order PO-0003.
    const next = await demo.post('/api/batches').send(buildBatchInput(1));
    expect(next.body.batch).toMatchObject({ number: 4, code: 'B-0004' });
    const listed = (await second.owner.get('/api/batches')).body.batches as { code: string }[];
    expect(listed.map((b) => b.code)).toEqual(['B-0001']);
    const orders = (await second.owner.get('/api/purchasing/orders')).body.orders as { number: string }[];
    expect(orders.map((o) => o.number)).toEqual(['PO-0001']);
  });

  it("prints the studio's numbers on the purchase order workbook, its file name and its mail", async () => {
    const xlsx = await second.owner.get(`/api/purchasing/orders/${order.id}/xlsx`).buffer(true).parse(binary);
    expect(xlsx.status).toBe(200);
    expect(xlsx.headers['content-disposition']).toContain('PO-0001.xlsx');
    const text = await workbookWords(xlsx.body as Buffer);
    expect(text).toContain('PO-0001');
    expect(text).toContain('For batch B-0001');
    expect(text).not.toMatch(new RegExp(`PO-${String(order.id).padStart(4, '0')}|B-${String(batch.id).padStart(4, '0')}`));
    const sent = await second.owner.post(`/api/purchasing/orders/${order.id}/send`).send({});
    expect(sent.status).toBe(200);
    const outbox = (await second.owner.get('/api/mail/outbox')).body;
    expect(JSON.stringify(outbox)).toContain('Purchase order PO-0001 from Second Seam Studio');
  });

  it("prints the studio's batch code on a cut ticket and in its file name", async () => {
    const pdf = await second.owner.get(`/api/batches/${batch.id}/material-cut-ticket.pdf?material=self`).buffer(true).parse(binary);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-disposition']).toContain('cut-ticket-B-0001-self.pdf');
    const text = pdfWords(pdf.body as Buffer);
    expect(text).toContain('B-0001');
    expect(text).not.toContain(`B-${String(batch.id).padStart(4, '0')}`);
  });

  it("shows each lay of a cut plan with the studio's batch code", async () => {
    const fabricId = ((await second.owner.get('/api/fabrics')).body.fabrics as { id: number }[])[0].id;
    const plan = await second.owner.post(`/api/batches/${batch.id}/cut-plan`).send({ fabricId, maxPlies: 10, maxGarmentsPerMarker: 3 });
    expect(plan.status).toBe(201);
    const lays = plan.body.cutPlan.lays as { batchCode: string }[];
    expect(lays.length).toBeGreaterThan(0);
    for (const l of lays) expect(l.batchCode).toBe('B-0001');
    const list = await second.owner.get(`/api/batches/${batch.id}/marker-list.pdf`).buffer(true).parse(binary);
    expect(list.status).toBe(200);
    expect(pdfWords(list.body as Buffer)).toContain('B-0001');
  });

  it("names the studio's batch and order by their codes in the audit trail", async () => {
    const entries = (await second.owner.get('/api/audit')).body.entries as { action: string; entity: string; entityId: number; record: string | null }[];
    expect(entries.find((e) => e.entity === 'batch' && e.entityId === batch.id)).toMatchObject({ action: 'create', record: 'B-0001' });
    expect(entries.find((e) => e.entity === 'purchase_order' && e.entityId === order.id)).toMatchObject({ record: 'PO-0001' });
  });

  it('finds a typed batch code by its number in the searcher\'s own studio', async () => {
    const own = await second.owner.get('/api/search').query({ q: 'B-0001' });
    const hits = (own.body.hits as { kind: string; id: number; title: string }[]).filter((h) => h.kind === 'batch');
    expect(hits).toEqual([expect.objectContaining({ id: batch.id, title: 'B-0001' })]);
    // The same words in the demo studio mean the demo's own first batch, never the second studio's.
    const theirs = (await demo.get('/api/search').query({ q: 'B-0001' })).body.hits as { kind: string; id: number }[];
    expect(theirs.filter((h) => h.kind === 'batch').map((h) => h.id)).toEqual([1]);
    // The second studio has no fourth batch, though the demo does.
    const none = (await second.owner.get('/api/search').query({ q: 'B-0004' })).body.hits as { kind: string }[];
    expect(none.filter((h) => h.kind === 'batch')).toEqual([]);
  });

  it("numbers a studio's first pay period 1 and names an overlap by that number", async () => {
    const demoPeriods = (await demo.get('/api/pay/periods')).body.periods as { number: number }[];
    expect(demoPeriods.map((p) => p.number)).toEqual([1]);
    // A second demo period, then the second studio's first (its floor has logged no work to approve, so straight
    // through the repository the approval writes with).
    const pay = createPayRepository(ctx.ds);
    const later = await pay.insertPeriod({ studioId: 1, fromDay: '2026-12-07', toDay: '2026-12-13', status: 'approved', approvedBy: 1, lines: [] });
    expect(later.number).toBe(2);
    const first = await pay.insertPeriod({ studioId: second.studioId, fromDay: '2026-11-23', toDay: '2026-11-30', status: 'approved', approvedBy: 1, lines: [] });
    expect(first.id).toBeGreaterThan(2);
    expect(first.number).toBe(1);
    expect(((await second.owner.get('/api/pay/periods')).body.periods as { number: number }[]).map((p) => p.number)).toEqual([1]);
    const preview = (await second.owner.get('/api/pay/preview?from=2026-11-30&to=2026-12-01')).body.preview;
    expect(preview).toMatchObject({ overlapsPeriodId: first.id, overlapsPeriodNumber: 1 });
    const refused = await second.owner.post('/api/pay/periods').send({ fromDay: '2026-11-30', toDay: '2026-12-01' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe('These days overlap pay period 1, already approved');
  });
});

describe('numbers under creates at once', () => {
  it('gives five batches, five orders and five pay periods made at once in one studio the numbers 1 to 5, each once', async () => {
    const third = await openStudio('Third Seam Studio', 'owner@third-seam.example');
    const styleId = await newStyle(third.owner, 'TD-1');
    const { supplierId, fabricId } = await newSupplierAndFabric(third.owner);
    // Another studio's creates run alongside, as they would on a shared server.
    const [batches, orders] = await Promise.all([
      Promise.all(Array.from({ length: 5 }, () => third.owner.post('/api/batches').send(buildBatchInput(styleId)))),
      Promise.all(Array.from({ length: 5 }, () => third.owner.post('/api/purchasing/orders').send(orderOf(supplierId, fabricId, null)))),
      Promise.all(Array.from({ length: 3 }, () => demo.post('/api/batches').send(buildBatchInput(1)))),
    ]);
    expect(batches.map((r) => r.status)).toEqual([201, 201, 201, 201, 201]);
    expect(batches.map((r) => r.body.batch.number).sort()).toEqual([1, 2, 3, 4, 5]);
    expect(orders.map((r) => r.status)).toEqual([201, 201, 201, 201, 201]);
    expect(orders.map((r) => r.body.order.number).sort()).toEqual(['PO-0001', 'PO-0002', 'PO-0003', 'PO-0004', 'PO-0005']);
    const pay = createPayRepository(ctx.ds);
    const periods = await Promise.all(
      Array.from({ length: 5 }, (_, i) => pay.insertPeriod({ studioId: third.studioId, fromDay: `2026-10-0${i + 1}`, toDay: `2026-10-0${i + 1}`, status: 'approved', approvedBy: 1, lines: [] })),
    );
    expect(periods.map((p) => p.number).sort()).toEqual([1, 2, 3, 4, 5]);
  });
});
