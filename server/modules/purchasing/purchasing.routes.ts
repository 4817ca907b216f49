import { Router } from 'express';
import { z } from 'zod';
import { idParam } from '../../../shared/schemas/common';
import { createOrderInput, createOrdersInput, createSupplierInput, receiveOrderInput, updateOrderStatusInput, updateSupplierInput } from '../../../shared/schemas/purchasing';
import type { PurchaseOrderEntity } from '../../entities';
import { actorOf, requirePermission } from '../../auth/require';
import { conflict, notFound } from '../../errors';
import { validate } from '../../middleware/validate';
import type { RouteContext } from '../module';
import { poNumber } from '../../../shared/schemas/purchasing';
import { presentOrder, presentSupplier } from './purchasing.presenter';
import type { PurchasingRepository } from './purchasing.repository';
import type { PurchasingService } from './purchasing.service';
import { sendDownload } from '../../middleware/download';

const ordersQuery = z.object({ batchId: z.coerce.number().int().positive().optional() });

/** /api/purchasing: suppliers, a batch's needs, purchase orders (suppliers:manage, owner only). */
export function purchasingRoutes(repo: PurchasingRepository, service: PurchasingService, ctx: RouteContext) {
  const r = Router();
  r.use(requirePermission('suppliers:manage'));

  const presentAll = async (studioId: number, orders: PurchaseOrderEntity[]) => {
    const [suppliers, studio] = await Promise.all([repo.suppliers(studioId), repo.studio(studioId)]);
    return orders.map((o) => presentOrder(o, suppliers.find((s) => s.id === o.supplierId), studio.unitSystem));
  };
  const presentOne = async (studioId: number, o: PurchaseOrderEntity) => (await presentAll(studioId, [o]))[0];

  r.get('/suppliers', async (req, res) => {
    res.json({ suppliers: (await repo.suppliers(actorOf(req).studioId)).map(presentSupplier) });
  });
  r.post('/suppliers', validate({ body: createSupplierInput }), async (req, res) => {
    const actor = actorOf(req);
    const s = presentSupplier(await repo.insertSupplier({ ...req.body, studioId: actor.studioId }));
    await ctx.audit.record(actor, 'create', 'supplier', s.id, undefined, s);
    res.status(201).json({ supplier: s });
  });
  r.patch('/suppliers/:id', validate({ params: idParam, body: updateSupplierInput }), async (req, res) => {
    const actor = actorOf(req);
    const id = Number(req.params.id);
    const before = await repo.supplier(actor.studioId, id);
    if (!before) throw notFound('Supplier');
    const after = await repo.updateSupplier(actor.studioId, id, req.body);
    await ctx.audit.record(actor, 'update', 'supplier', id, presentSupplier(before), presentSupplier(after));
    res.json({ supplier: presentSupplier(after) });
  });

  r.get('/batches/:id/needs', validate({ params: idParam }), async (req, res) => {
    res.json({ needs: await service.needs(actorOf(req).studioId, Number(req.params.id)) });
  });
  r.post('/batches/:id/orders', validate({ params: idParam, body: createOrdersInput }), async (req, res) => {
    const actor = actorOf(req);
    const { created, unassigned } = await service.createOrders(actor.studioId, Number(req.params.id), req.body.kinds);
    const orders = await presentAll(actor.studioId, created);
    for (const o of orders) await ctx.audit.record(actor, 'create', 'purchase_order', o.id, undefined, o);
    res.status(201).json({ orders, unassigned });
  });

  r.get('/items', async (req, res) => {
    res.json({ items: await service.items(actorOf(req).studioId) });
  });
  r.post('/orders', validate({ body: createOrderInput }), async (req, res) => {
    const actor = actorOf(req);
    const order = await presentOne(actor.studioId, await service.createOrder(actor.studioId, req.body));
    await ctx.audit.record(actor, 'create', 'purchase_order', order.id, undefined, order);
    res.status(201).json({ order });
  });
  r.get('/orders', validate({ query: ordersQuery }), async (req, res) => {
    const { studioId } = actorOf(req);
    const q = req.query as z.infer<typeof ordersQuery>;
    res.json({ orders: await presentAll(studioId, await repo.orders(studioId, q.batchId)) });
  });
  r.get('/orders/:id', validate({ params: idParam }), async (req, res) => {
    const { studioId } = actorOf(req);
    const o = await repo.order(studioId, Number(req.params.id));
    if (!o) throw notFound('Purchase order');
    res.json({ order: await presentOne(studioId, o) });
  });
  r.get('/orders/:id/xlsx', validate({ params: idParam }), async (req, res) => {
    const { studioId } = actorOf(req);
    const o = await repo.order(studioId, Number(req.params.id));
    if (!o) throw notFound('Purchase order');
    sendDownload(res, { body: await service.workbook(studioId, o), type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', filename: `${poNumber(o)}.xlsx` });
  });
  r.post('/orders/:id/send', validate({ params: idParam }), async (req, res) => {
    const actor = actorOf(req);
    const { before, after, messageId, mailId } = await service.send(actor.studioId, Number(req.params.id));
    await ctx.audit.record(actor, 'send', 'purchase_order', after.id, { status: before.status }, { status: after.status, messageId });
    res.json({ order: await presentOne(actor.studioId, after), mailId });
  });
  r.post('/orders/:id/status', validate({ params: idParam, body: updateOrderStatusInput }), async (req, res) => {
    const actor = actorOf(req);
    const id = Number(req.params.id);
    const before = await repo.order(actor.studioId, id);
    if (!before) throw notFound('Purchase order');
    if (before.status !== 'sent') throw conflict(`Only a sent order can be confirmed; this one is ${before.status}`);
    const after = await repo.setStatus(actor.studioId, id, req.body.status);
    await ctx.audit.record(actor, 'update', 'purchase_order', id, { status: before.status }, { status: after.status });
    res.json({ order: await presentOne(actor.studioId, after) });
  });
  r.post('/orders/:id/receive', validate({ params: idParam, body: receiveOrderInput }), async (req, res) => {
    const actor = actorOf(req);
    const { before, after, rolls, repeated } = await service.receive(actor.studioId, Number(req.params.id), req.body);
    // A repeated receipt changed nothing: it answers with the order as it stands and leaves no second audit entry.
    if (!repeated) await ctx.audit.record(actor, 'receive', 'purchase_order', after.id, { status: before.status, lines: before.lines }, { status: after.status, lines: after.lines, rolls, receiptKey: req.body.receiptKey });
    res.json({ order: await presentOne(actor.studioId, after), rollsAdded: rolls, repeated });
  });
  return r;
}
