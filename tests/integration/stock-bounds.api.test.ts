import request from 'supertest';
import type { DataSource } from 'typeorm';
import { beforeAll, describe, expect, it } from 'vitest';
import { FabricEntity, TrimEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
let ds: DataSource;
let owner: Agent;
let trimId: number;
let supplierId: number;

beforeAll(async () => {
  ({ app, ds } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
  trimId = ((await owner.get('/api/purchasing/items')).body.items as { kind: string; refId: number }[]).find((i) => i.kind === 'trim')!.refId;
  supplierId = (await owner.post('/api/purchasing/suppliers').send({ name: 'Bounds Notions', email: 'orders@bounds-notions.example' })).body.supplier.id;
});

/** A sent order of `quantity` of the trim, ready to receive. */
async function sentTrimOrder(quantity: number) {
  const po = await owner.post('/api/purchasing/orders').send({ supplierId, lines: [{ kind: 'trim', refId: trimId, quantity }] });
  expect(po.status).toBe(201);
  expect((await owner.post(`/api/purchasing/orders/${po.body.order.id}/send`)).status).toBe(200);
  return po.body.order.id as number;
}
const stockOf = async (id: number) => (await ds.getRepository(TrimEntity).findOneByOrFail({ id })).inStock;

describe('upper bounds on receipts, stock, quantities and prices', () => {
  it('refuses a receipt of 1e308 with a 400 naming the quantity, and the stock stays as it was', async () => {
    const orderId = await sentTrimOrder(100);
    const before = await stockOf(trimId);
    const res = await owner.post(`/api/purchasing/orders/${orderId}/receive`).send({ receiptKey: 'test-receipt-001', lines: [{ index: 0, quantity: 1e308 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['lines.0.quantity']).toBe('At most 10,000,000 in one receipt');
    expect(await stockOf(trimId)).toBe(before);
  });

  it('refuses a receipt that would take the stock on hand past ten million, naming the line', async () => {
    expect((await owner.put(`/api/costing/trims/${trimId}`).send({ inStock: 9_999_990 })).status).toBe(200);
    const orderId = await sentTrimOrder(100);
    const res = await owner.post(`/api/purchasing/orders/${orderId}/receive`).send({ receiptKey: 'test-receipt-002', lines: [{ index: 0, quantity: 100 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['lines.0.quantity']).toMatch(/would hold more than 10,000,000 .* in stock$/);
    expect(await stockOf(trimId)).toBe(9_999_990);
    // Within the bound the same receipt goes through.
    expect((await owner.put(`/api/costing/trims/${trimId}`).send({ inStock: 150 })).status).toBe(200);
    expect((await owner.post(`/api/purchasing/orders/${orderId}/receive`).send({ receiptKey: 'test-receipt-003', lines: [{ index: 0, quantity: 100 }] })).status).toBe(200);
    expect(await stockOf(trimId)).toBe(250);
  });

  it('refuses a trim stock of 1e308 on create and on edit with a 400 naming inStock', async () => {
    const made = await owner.post('/api/costing/styles/1/trims').send({ name: 'Huge stock', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 10, inStock: 1e308 });
    expect(made.status).toBe(400);
    expect(made.body.error.fields.inStock).toBe('At most 10,000,000 in stock');
    const edit = await owner.put(`/api/costing/trims/${trimId}`).send({ inStock: 1e308 });
    expect(edit.status).toBe(400);
    expect(edit.body.error.fields.inStock).toBe('At most 10,000,000 in stock');
    expect(await stockOf(trimId)).toBe(250);
  });

  it('refuses a fabric price past one billion minor units, naming pricePerMetreMinor', async () => {
    const res = await owner.post('/api/fabrics').send({ name: 'Gold cloth', widthMm: 1400, pricePerMetreMinor: 9e15 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.pricePerMetreMinor).toBe('At most 1,000,000,000 minor units');
    expect(await ds.getRepository(FabricEntity).countBy({ name: 'Gold cloth' })).toBe(0);
  });

  it('refuses roll lengths, order quantities and order line counts past their maxima, naming each field', async () => {
    const fabricId = (await owner.get('/api/fabrics')).body.fabrics[0].id;
    const roll = await owner.post(`/api/fabrics/${fabricId}/rolls`).send({ rolls: [{ label: 'HUGE-1', lengthMm: 1e308, widthMm: 1470, shadeLot: 'A', receivedDate: '2026-11-30' }] });
    expect(roll.status).toBe(400);
    expect(roll.body.error.fields['rolls.0.lengthMm']).toMatch(/too large: at most 1,000,000 mm/);
    const order = await owner.post('/api/purchasing/orders').send({ supplierId, lines: [{ kind: 'trim', refId: trimId, quantity: 1e308 }] });
    expect(order.status).toBe(400);
    expect(order.body.error.fields['lines.0.quantity']).toBe('At most 10,000,000');
    const many = await owner.post('/api/purchasing/orders').send({ supplierId, lines: Array.from({ length: 501 }, () => ({ kind: 'trim', refId: trimId, quantity: 1 })) });
    expect(many.status).toBe(400);
    expect(many.body.error.fields.lines).toBe('At most 500 lines');
  });
});

describe("a fabric's supplier", () => {
  let strangersSupplier: number;
  beforeAll(async () => {
    const stranger = request.agent(app);
    expect((await stranger.post('/api/auth/studios').send({
      studioName: 'Far Bench Studio', currency: 'EUR', unitSystem: 'metric',
      ownerName: 'Far Owner', email: 'owner@far-bench.example', password: 'another-long-password',
    })).status).toBe(201);
    strangersSupplier = (await stranger.post('/api/purchasing/suppliers').send({ name: 'Far Mill', email: 'mill@far-bench.example' })).body.supplier.id;
  });

  it("refuses another studio's supplier on a new fabric with a 400 naming supplierId, and saves nothing", async () => {
    const res = await owner.post('/api/fabrics').send({ name: 'Borrowed twill', widthMm: 1450, supplierId: strangersSupplier });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.supplierId).toBe('No such supplier');
    expect(await ds.getRepository(FabricEntity).countBy({ name: 'Borrowed twill' })).toBe(0);
  });

  it("refuses another studio's supplier when a fabric is edited, and keeps the supplier it had", async () => {
    const made = await owner.post('/api/fabrics').send({ name: 'Own twill', widthMm: 1450, supplierId });
    expect(made.status).toBe(201);
    expect(made.body.fabric.supplierId).toBe(supplierId);
    const res = await owner.put(`/api/fabrics/${made.body.fabric.id}`).send({ supplierId: strangersSupplier });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.supplierId).toBe('No such supplier');
    const missing = await owner.put(`/api/fabrics/${made.body.fabric.id}`).send({ supplierId: 999_999 });
    expect(missing.status).toBe(400);
    expect((await ds.getRepository(FabricEntity).findOneByOrFail({ id: made.body.fabric.id })).supplierId).toBe(supplierId);
    expect((await owner.put(`/api/fabrics/${made.body.fabric.id}`).send({ supplierId: null })).status).toBe(200);
  });
});
