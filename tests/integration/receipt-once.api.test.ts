import type { DataSource } from 'typeorm';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEntryEntity, RollEntity, TrimEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

/** Goods received are added to stock once, whatever the network, the second tap or a colleague does. */
type Agent = Awaited<ReturnType<typeof signIn>>;
let ds: DataSource;
let owner: Agent;
let trimId: number;
let fabricId: number;
let supplierId: number;

beforeAll(async () => {
  let app;
  ({ app, ds } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
  const items = (await owner.get('/api/purchasing/items')).body.items as { kind: string; refId: number }[];
  trimId = items.find((i) => i.kind === 'trim')!.refId;
  fabricId = items.find((i) => i.kind === 'fabric')!.refId;
  supplierId = (await owner.post('/api/purchasing/suppliers').send({ name: 'Once Notions', email: 'orders@once-notions.example' })).body.supplier.id;
});

async function sentOrder(line: { kind: 'trim' | 'fabric'; refId: number; quantity: number }) {
  const po = await owner.post('/api/purchasing/orders').send({ supplierId, lines: [line] });
  expect(po.status).toBe(201);
  expect((await owner.post(`/api/purchasing/orders/${po.body.order.id}/send`)).status).toBe(200);
  return po.body.order as { id: number; revision: number };
}
const stockOf = async () => (await ds.getRepository(TrimEntity).findOneByOrFail({ id: trimId })).inStock;
const receive = (id: number, body: object) => owner.post(`/api/purchasing/orders/${id}/receive`).send(body);
const receipts = async (id: number) => (await ds.getRepository(AuditEntryEntity).findBy({ entity: 'purchase_order', entityId: id, action: 'receive' })).length;

describe('a purchase-order receipt adds its goods once', () => {
  it('answers a receipt sent again with the same key as the first did, and adds the trims once', async () => {
    const po = await sentOrder({ kind: 'trim', refId: trimId, quantity: 100 });
    const before = await stockOf();
    const body = { receiptKey: 'once-retry-0001', lines: [{ index: 0, quantity: 100 }] };
    const first = await receive(po.id, body);
    expect(first.status).toBe(200);
    expect(first.body.repeated).toBe(false);
    const again = await receive(po.id, body);
    expect(again.status).toBe(200);
    expect(again.body.repeated).toBe(true);
    expect(again.body.order.status).toBe('received');
    expect(await stockOf()).toBe(before + 100);
    expect(await receipts(po.id)).toBe(1);
  });

  it('adds the trims once when the same receipt arrives five times at once', async () => {
    const po = await sentOrder({ kind: 'trim', refId: trimId, quantity: 40 });
    const before = await stockOf();
    const body = { receiptKey: 'once-burst-0001', lines: [{ index: 0, quantity: 40 }] };
    const answers = await Promise.all(Array.from({ length: 5 }, () => receive(po.id, body)));
    expect(answers.map((a) => a.status)).toEqual([200, 200, 200, 200, 200]);
    expect(answers.filter((a) => !a.body.repeated)).toHaveLength(1);
    expect(await stockOf()).toBe(before + 40);
  });

  it('takes one of two different receipts made at once from the same form state, and refuses the other with a 409', async () => {
    const po = await sentOrder({ kind: 'trim', refId: trimId, quantity: 30 });
    const before = await stockOf();
    const [a, b] = await Promise.all([
      // Half each, so the order is still open after the first and only the revision can refuse the second.
      receive(po.id, { receiptKey: 'once-pair-000a', revision: po.revision, lines: [{ index: 0, quantity: 15 }] }),
      receive(po.id, { receiptKey: 'once-pair-000b', revision: po.revision, lines: [{ index: 0, quantity: 15 }] }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect((a.status === 409 ? a : b).body.error.fields.revision).toBe('Out of date');
    expect(await stockOf()).toBe(before + 15);
  });

  it('refuses a receipt made from a form opened before a partial receipt, and adds nothing', async () => {
    const po = await sentOrder({ kind: 'trim', refId: trimId, quantity: 50 });
    const before = await stockOf();
    expect((await receive(po.id, { receiptKey: 'once-part-0001', revision: po.revision, lines: [{ index: 0, quantity: 20 }] })).status).toBe(200);
    const stale = await receive(po.id, { receiptKey: 'once-part-0002', revision: po.revision, lines: [{ index: 0, quantity: 20 }] });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/received by someone else/);
    expect(await stockOf()).toBe(before + 20);
    // Filled again from the order as it now stands, the rest comes in.
    const now = (await owner.get('/api/purchasing/orders')).body.orders.find((o: { id: number }) => o.id === po.id);
    expect(now.revision).toBe(po.revision + 1);
    const rest = await receive(po.id, { receiptKey: 'once-part-0003', revision: now.revision, lines: [{ index: 0, quantity: 30 }] });
    expect(rest.status).toBe(200);
    expect(rest.body.order.status).toBe('received');
    expect(await stockOf()).toBe(before + 50);
  });

  it('refuses a receipt without a key with a 400 naming receiptKey, and adds nothing', async () => {
    const po = await sentOrder({ kind: 'trim', refId: trimId, quantity: 10 });
    const before = await stockOf();
    const res = await receive(po.id, { lines: [{ index: 0, quantity: 10 }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('receiptKey');
    expect(await stockOf()).toBe(before);
  });

  it('refuses a roll whose label is already in stock with a 409, saving no roll and leaving the order open', async () => {
    const po = await sentOrder({ kind: 'fabric', refId: fabricId, quantity: 20_000 });
    const first = await receive(po.id, { receiptKey: 'once-roll-0001', lines: [{ index: 0, rolls: [{ label: 'ONCE-R1', lengthMm: 10_000, shadeLot: 'A' }] }] });
    expect(first.status).toBe(200);
    const rolls = await ds.getRepository(RollEntity).count();
    const twin = await receive(po.id, { receiptKey: 'once-roll-0002', lines: [{ index: 0, rolls: [{ label: 'ONCE-R1', lengthMm: 10_000, shadeLot: 'A' }] }] });
    expect(twin.status).toBe(409);
    expect(twin.body.error.message).toMatch(/ONCE-R1 is already in stock/);
    expect(await ds.getRepository(RollEntity).count()).toBe(rolls);
    const order = (await owner.get('/api/purchasing/orders')).body.orders.find((o: { id: number }) => o.id === po.id);
    expect(order.status).toBe('confirmed');
    expect(order.lines[0].receivedQuantity).toBe(10_000);
  });
});
