import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { RollEntity, TrimEntity } from '../../server/entities';
import { cachedOf, findRow, formulaOf } from '../../exports/xlsx/workbook-reader.testing';
import { buildTestApp, DEMO, signIn, binary } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
let ds: DataSource;
let owner: Agent;
beforeAll(async () => {
  ({ app, ds } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
});

describe('suppliers and purchase orders', () => {
  it('is owner-only: the cutter gets 403 on suppliers, needs, orders and the outbox', async () => {
    const cutter = await signIn(app, DEMO.cutter);
    for (const url of ['/api/purchasing/suppliers', '/api/purchasing/batches/1/needs', '/api/purchasing/orders', '/api/mail/outbox']) {
      expect((await cutter.get(url)).status, url).toBe(403);
    }
    expect((await cutter.post('/api/mail/invite/1').send({})).status).toBe(403);
  });

  it('adds a supplier and reports bad fields by path', async () => {
    const bad = await owner.post('/api/purchasing/suppliers').send({ name: 'X', email: 'not-mail', leadTimeDays: -1 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'leadTimeDays', 'name']);
    const ok = await owner.post('/api/purchasing/suppliers').send({ name: 'Pwani Zips', email: 'hello@pwani-zips.example', leadTimeDays: 5 });
    expect(ok.status).toBe(201);
    expect(ok.body.supplier).toMatchObject({ name: 'Pwani Zips', contact: '', leadTimeDays: 5 });
  });

  it('works out the batch\'s needs net of stock: 10 buttons × 40 garments less 150 in stock', async () => {
    const { needs } = (await owner.get('/api/purchasing/batches/1/needs')).body;
    const buttons = needs.find((n: { item: string }) => n.item.startsWith('Shirt buttons'));
    expect(buttons).toMatchObject({ required: 400, inStock: 150, onOrder: 0, toOrder: 250, supplierName: 'Baobab Notions Supply' });
    const fabric = needs.find((n: { kind: string }) => n.kind === 'fabric');
    expect(fabric.toOrder).toBe(Math.max(0, Math.ceil((fabric.required - fabric.inStock) / 100) * 100));
  });

  it('makes one draft per supplier, e-mails it with its workbook and finds it in the outbox', async () => {
    const made = await owner.post('/api/purchasing/batches/1/orders').send({});
    expect(made.status).toBe(201);
    const trimsPo = made.body.orders.find((o: { supplierName: string }) => o.supplierName === 'Baobab Notions Supply');
    expect(trimsPo.status).toBe('draft');
    expect(trimsPo.lines.find((l: { item: string }) => l.item.startsWith('Shirt buttons')).quantity).toBe(250);
    // Ordered lines now count as on order: a second run orders nothing more for them.
    const again = (await owner.get('/api/purchasing/batches/1/needs')).body.needs.find((n: { item: string }) => n.item.startsWith('Shirt buttons'));
    expect(again).toMatchObject({ onOrder: 250, toOrder: 0 });

    const xlsx = await owner.get(`/api/purchasing/orders/${trimsPo.id}/xlsx`).buffer(true).parse(binary);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(xlsx.body as unknown as ArrayBuffer);
    const sheet = wb.getWorksheet('Purchase order')!;
    const totalRow = sheet.getRow(findRow(sheet, 'Total', 5));
    const totalCell = totalRow.getCell(6);
    expect(formulaOf(totalCell)).toMatch(/^SUM\(/);
    expect(Math.round((cachedOf(totalCell) as number) * 100)).toBe(trimsPo.totalMinor);

    const sent = await owner.post(`/api/purchasing/orders/${trimsPo.id}/send`);
    expect(sent.status).toBe(200);
    expect(sent.body.order.status).toBe('sent');
    const { messages } = (await owner.get('/api/mail/outbox')).body;
    expect(messages[0]).toMatchObject({ to: 'sales@baobab-notions.example', subject: `Purchase order ${trimsPo.number} from Tamarind Row Studio`, status: 'sent' });
    expect(messages[0].attachments[0].filename).toBe(`${trimsPo.number}.xlsx`);
    expect(messages[0].attachments[0].size).toBeGreaterThan(1000);
    expect(messages[0].text).toContain('Shirt buttons 11 mm, 4-hole: 250 pcs');
  });

  it('orders every fabric of a lined style, lining, contrast and interfacing too, each from its costing line', async () => {
    const styles = (await owner.get('/api/styles')).body.styles as { id: number; code: string; materialFabrics: Record<string, number> }[];
    const lined = styles.find((s) => s.code === 'SR-202')!;
    const batch = (await owner.post('/api/batches').send({ styleId: lined.id, quantities: { S: 10, M: 20, L: 10 }, dueDate: '2027-04-01' })).body.batch;
    const { needs } = (await owner.get(`/api/purchasing/batches/${batch.id}/needs`)).body as { needs: { kind: string; refId: number; required: number; toOrder: number; inStock: number; onOrder: number; supplierId: number | null }[] };
    const fabrics = needs.filter((n) => n.kind === 'fabric');
    expect(fabrics.map((n) => n.refId).sort()).toEqual([...new Set(Object.values(lined.materialFabrics))].sort());
    const sheet = (await owner.get(`/api/batches/${batch.id}/costing`)).body.costing as { lines: { kind: string; refId: number; quantities: Record<string, number> }[] };
    const lining = sheet.lines.find((l) => l.kind === 'fabric' && l.refId === lined.materialFabrics.lining)!;
    const liningMm = 1000 * (10 * lining.quantities.S + 20 * lining.quantities.M + 10 * lining.quantities.L);
    expect(fabrics.find((n) => n.refId === lined.materialFabrics.lining)!.required).toBe(Math.ceil(liningMm - 1e-6));
    // Fabric is ordered on ticket length, which arrives 1 % short and 1 % flawed (common practice): what is still
    // needed after free stock and usable ordered length is grossed up by 1 / 0.98, in whole 100 mm steps.
    for (const n of fabrics) {
      const net = Math.max(0, n.required - n.inStock - Math.floor(n.onOrder * 0.98));
      expect(n.toOrder).toBe(net === 0 ? 0 : Math.ceil(net / 0.98 / 100 - 1e-9) * 100);
    }
    const made = await owner.post(`/api/purchasing/batches/${batch.id}/orders`).send({});
    expect(made.status).toBe(201);
    const ordered = (made.body.orders as { lines: { kind: string; refId: number; quantity: number }[] }[]).flatMap((o) => o.lines).filter((l) => l.kind === 'fabric');
    for (const n of fabrics.filter((x) => x.supplierId && x.toOrder > 0)) expect(ordered.find((l) => l.refId === n.refId)?.quantity).toBe(n.toOrder);
  });

  it('receives a fabric order into stock as rolls, and trims into the trim stock', async () => {
    const { items } = (await owner.get('/api/purchasing/items')).body;
    const fabric = items.find((i: { kind: string }) => i.kind === 'fabric');
    const mill = (await owner.get('/api/purchasing/suppliers')).body.suppliers.find((s: { name: string }) => s.name === 'Mvuli Weaving Co.');
    const po = (await owner.post('/api/purchasing/orders').send({ supplierId: mill.id, batchId: 1, lines: [{ kind: 'fabric', refId: fabric.refId, quantity: 29_950 }] })).body.order;
    expect(po.lines[0]).toMatchObject({ quantity: 30_000, unit: 'mm', unitPriceMinor: fabric.unitPriceMinor });
    expect(po.totalMinor).toBe(30 * fabric.unitPriceMinor);
    expect((await owner.post(`/api/purchasing/orders/${po.id}/receive`).send({ receiptKey: 'test-receipt-004', lines: [{ index: 0, rolls: [{ label: 'R', lengthMm: 1, shadeLot: 'A' }] }] })).status).toBe(409);
    await owner.post(`/api/purchasing/orders/${po.id}/send`);
    const rollsBefore = await ds.getRepository(RollEntity).count();
    const dup = await owner.post(`/api/purchasing/orders/${po.id}/receive`).send({ receiptKey: 'test-receipt-005', lines: [{ index: 0, rolls: [{ label: 'MV-1', lengthMm: 15000, shadeLot: 'A' }, { label: 'MV-1', lengthMm: 15000, shadeLot: 'A' }] }] });
    expect(dup.status).toBe(400);
    const got = await owner.post(`/api/purchasing/orders/${po.id}/receive`).send({ receiptKey: 'test-receipt-006', lines: [{ index: 0, rolls: [{ label: 'MV-1', lengthMm: 15000, shadeLot: 'A' }, { label: 'MV-2', lengthMm: 15000, shadeLot: 'A' }] }] });
    expect(got.status).toBe(200);
    expect(got.body.order.status).toBe('received');
    expect(await ds.getRepository(RollEntity).count()).toBe(rollsBefore + 2);
    const roll = await ds.getRepository(RollEntity).findOneByOrFail({ label: 'MV-2' });
    expect(roll).toMatchObject({ fabricId: fabric.refId, lengthMm: 15000, remainingMm: 15000, receivedDate: '2026-12-01' });

    const trimsPo = (await owner.get('/api/purchasing/orders')).body.orders.find((o: { supplierName: string; status: string }) => o.supplierName === 'Baobab Notions Supply' && o.status === 'sent');
    const buttonsIdx = trimsPo.lines.findIndex((l: { item: string }) => l.item.startsWith('Shirt buttons'));
    const part = await owner.post(`/api/purchasing/orders/${trimsPo.id}/receive`).send({ receiptKey: 'test-receipt-007', lines: [{ index: buttonsIdx, quantity: 250 }] });
    expect(part.body.order.status).toBe('confirmed');
    const buttons = await ds.getRepository(TrimEntity).findOneByOrFail({ id: trimsPo.lines[buttonsIdx].refId });
    expect(buttons.inStock).toBe(400);
  });
});

describe('mail: invitations go through the same outbox', () => {
  it('e-mails a sign-in note to a new member of staff, never a password', async () => {
    const add = await owner.post('/api/users').send({ name: 'Pendo Njeri', email: 'pendo@tamarind.example', role: 'finisher', temporaryPassword: 'temporary-123' });
    const res = await owner.post(`/api/mail/invite/${add.body.user.id}`).send({ note: 'Start on Monday at 8.' });
    expect(res.status).toBe(201);
    expect(res.body.message).toMatchObject({ to: 'pendo@tamarind.example', subject: 'Your Seamrun sign-in for Tamarind Row Studio' });
    expect(res.body.message.text).toContain('/signin');
    expect(res.body.message.text).toContain('Start on Monday at 8.');
    expect(res.body.message.text).not.toContain('temporary-123');
    expect((await owner.post('/api/mail/invite/9999').send({})).status).toBe(404);
  });
});
