import { addDays, format } from 'date-fns';
import { limitText, MAX_STOCK_QUANTITY } from '../../../shared/schemas/limits';
import type { CreateOrderInput, NeedDto, OrderableItemDto, ReceiveOrderInput } from '../../../shared/schemas/purchasing';
import type { JobRunner } from '../../jobs/job-runner';
import type { PurchaseOrderEntity, RollEntity } from '../../entities';
import type { PurchaseOrderLine } from '../../entities/purchase-order.entity';
import { badRequest, conflict, notFound } from '../../errors';
import type { CostingService } from '../costing/costing.service';
import { documentSettings } from '../studios/document-settings';
import type { MailService } from '../mail/mail.service';
import { netFabricNeed } from '../../../planning/index';
import { batchCode } from '../../../shared/schemas/batches';
import { poNumber } from '../../../shared/schemas/purchasing';
import { said } from '../../../shared/i18n/speak';
import { documentLine } from './purchasing.presenter';

/** Receipt keys an order keeps: far more receipts than any order has, so a retry is always recognised. */
const MAX_RECEIPT_KEYS = 200;
import type { PurchasingRepository } from './purchasing.repository';

/** Fabric is ordered in whole 100 mm steps; counted trims in whole units; others to 0.01. */
const FABRIC_STEP_MM = 100;
const COUNTED = new Set(['pcs', 'cone', 'pair', 'set', 'roll']);
const roundUp = (x: number, step: number) => Math.ceil(x / step - 1e-9) * step;
const trimStep = (unit: string) => (COUNTED.has(unit) ? 1 : 0.01);
const tidy = (x: number) => Math.round(x * 1000) / 1000;

export type PurchasingService = ReturnType<typeof createPurchasingService>;

export function createPurchasingService(deps: {
  repo: PurchasingRepository;
  costing: () => CostingService;
  mail: () => MailService;
  jobs: JobRunner;
  now: () => Date;
}) {
  const { repo } = deps;

  function onOrder(open: PurchaseOrderEntity[], kind: 'fabric' | 'trim', refId: number) {
    let sum = 0;
    for (const o of open) for (const l of o.lines) if (l.kind === kind && l.refId === refId) sum += l.quantity - (l.receivedQuantity ?? 0);
    return Math.max(0, sum);
  }

  /**
   * Every fabric and trim of the style's bill of materials the batch needs, net of stock and of open orders: the
   * main fabric as the cut plan (or estimate) has it, each other material's fabric (lining, contrast, interfacing…)
   * from its costing line's length per garment and size, and the style's trims.
   */
  async function needs(studioId: number, batchId: number): Promise<NeedDto[]> {
    const { dto } = await deps.costing().build(studioId, batchId, 'sam', deps.now());
    const [suppliers, open, trims] = await Promise.all([repo.suppliers(studioId), repo.openOrders(studioId), repo.trims(studioId, dto.style.id)]);
    const nameOf = (id: number | null) => suppliers.find((s) => s.id === id)?.name ?? '';
    const out: NeedDto[] = [];
    const garmentsOf = Object.fromEntries(dto.sizes.map((s) => [s.size, s.quantity]));
    const fabricNeeds = new Map<number, { name: string; priceMinor: number; requiredMm: number }>();
    // The main fabric: with a cut plan the need is what its lays still to cut spread, exactly as the plan says;
    // without one, the costing estimate. Other materials' fabrics from their costing lines.
    if (dto.fabric) fabricNeeds.set(dto.fabric.id, { name: dto.fabric.name, priceMinor: dto.fabric.pricePerMetreMinor, requiredMm: dto.fabric.stillToCutMm ?? dto.fabric.batchFabricMm });
    for (const l of dto.lines) {
      if (l.kind !== 'fabric' || l.refId === null || fabricNeeds.has(l.refId)) continue;
      const metres = Object.entries(l.quantities).reduce((a, [size, m]) => a + m * (garmentsOf[size] ?? 0), 0);
      // A material with its own cut plan needs what its lays still to cut spread (what is cut already left the stock).
      fabricNeeds.set(l.refId, { name: l.description, priceMinor: l.priceMinor ?? 0, requiredMm: l.stillToCutMm ?? metres * 1000 });
    }
    for (const [id, f] of fabricNeeds) {
      const fabric = await repo.fabric(studioId, id);
      const required = Math.ceil(f.requiredMm - 1e-6);
      // Free stock leaves out what other batches' plans hold; this batch's holds are its own.
      const onHand = await repo.fabricStockMm(studioId, id);
      const heldByOthers = await repo.heldByOtherBatchesMm(studioId, id, batchId);
      const need = netFabricNeed({ requiredMm: required, onHandMm: onHand, heldByOthersMm: heldByOthers, onOrderMm: onOrder(open, 'fabric', id), stepMm: FABRIC_STEP_MM });
      out.push({
        kind: 'fabric', refId: id, item: f.name, unit: 'mm', required, inStock: need.freeStock, onOrder: need.onOrder,
        toOrder: need.toOrder,
        unitPriceMinor: f.priceMinor, supplierId: fabric?.supplierId ?? null, supplierName: nameOf(fabric?.supplierId ?? null),
      });
    }
    for (const t of trims) {
      const required = tidy(roundUp(t.quantityPerGarment * dto.totals.garments, trimStep(t.unit)));
      const ordered = onOrder(open, 'trim', t.id);
      out.push({
        kind: 'trim', refId: t.id, item: t.name, unit: t.unit, required, inStock: t.inStock, onOrder: ordered,
        toOrder: tidy(roundUp(Math.max(0, required - t.inStock - ordered), trimStep(t.unit))),
        unitPriceMinor: t.unitPriceMinor, supplierId: t.supplierId, supplierName: nameOf(t.supplierId),
      });
    }
    return out;
  }

  /** One draft order per supplier for what is still to order; needs with no supplier are returned apart. */
  async function createOrders(studioId: number, batchId: number, kinds: ('fabric' | 'trim')[]) {
    const all = (await needs(studioId, batchId)).filter((n) => kinds.includes(n.kind) && n.toOrder > 0);
    const bySupplier = new Map<number, NeedDto[]>();
    for (const n of all) if (n.supplierId) bySupplier.set(n.supplierId, [...(bySupplier.get(n.supplierId) ?? []), n]);
    const created: PurchaseOrderEntity[] = [];
    for (const [supplierId, list] of bySupplier) {
      const supplier = await repo.supplier(studioId, supplierId);
      if (!supplier) continue;
      const lines: PurchaseOrderLine[] = list.map((n) => ({ kind: n.kind, refId: n.refId, item: n.item, unit: n.unit, quantity: n.toOrder, unitPriceMinor: n.unitPriceMinor, receivedQuantity: 0 }));
      created.push(await repo.insertOrder({ studioId, supplierId, batchId, status: 'draft', lines, deliveryDate: format(addDays(deps.now(), supplier.leadTimeDays), 'yyyy-MM-dd') }));
    }
    return { created, unassigned: all.filter((n) => !n.supplierId) };
  }

  /** Orderable fabrics and trims (trims of every style, one entry per trim). */
  async function items(studioId: number): Promise<OrderableItemDto[]> {
    const [fabrics, trims] = await Promise.all([repo.allFabrics(studioId), repo.allTrims(studioId)]);
    return [
      ...fabrics.map((f) => ({ kind: 'fabric' as const, refId: f.id, item: f.name, unit: 'mm', unitPriceMinor: f.pricePerMetreMinor, supplierId: f.supplierId })),
      ...trims.map((t) => ({ kind: 'trim' as const, refId: t.id, item: t.name, unit: t.unit, unitPriceMinor: t.unitPriceMinor, supplierId: t.supplierId })),
    ];
  }

  /** A draft order by hand; prices come from the fabric and trim records, never from the request. */
  async function createOrder(studioId: number, input: CreateOrderInput) {
    const supplier = await repo.supplier(studioId, input.supplierId);
    if (!supplier) throw badRequest('supplierId: no such supplier', { supplierId: 'No such supplier' });
    if (input.batchId && !(await repo.batchExists(studioId, input.batchId))) throw badRequest('batchId: no such batch', { batchId: 'No such batch' });
    const lines: PurchaseOrderLine[] = [];
    const fields: Record<string, string> = {};
    for (const [i, l] of input.lines.entries()) {
      const found = l.kind === 'fabric' ? await repo.fabric(studioId, l.refId) : await repo.trim(studioId, l.refId);
      if (!found) { fields[`lines.${i}.refId`] = `No such ${l.kind}`; continue; }
      lines.push(
        'widthMm' in found
          ? { kind: 'fabric', refId: found.id, item: found.name, unit: 'mm', quantity: roundUp(l.quantity, FABRIC_STEP_MM), unitPriceMinor: found.pricePerMetreMinor, receivedQuantity: 0 }
          : { kind: 'trim', refId: found.id, item: found.name, unit: found.unit, quantity: tidy(l.quantity), unitPriceMinor: found.unitPriceMinor, receivedQuantity: 0 },
      );
    }
    if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
    return repo.insertOrder({ studioId, supplierId: supplier.id, batchId: input.batchId ?? null, status: 'draft', lines, deliveryDate: format(addDays(deps.now(), supplier.leadTimeDays), 'yyyy-MM-dd') });
  }

  async function workbook(studioId: number, order: PurchaseOrderEntity) {
    const [studio, supplier, batch] = await Promise.all([
      repo.studio(studioId),
      repo.supplier(studioId, order.supplierId),
      order.batchId ? repo.batch(studioId, order.batchId) : null,
    ]);
    return deps.jobs.run('purchase-order.xlsx', {
      studioName: studio.name,
      dateIso: deps.now().toISOString(),
      ...documentSettings(studio),
      currency: studio.currency,
      unitSystem: studio.unitSystem,
      poNumber: poNumber(order),
      supplier: { name: supplier?.name ?? '', contact: supplier?.contact || undefined },
      deliveryDateIso: order.deliveryDate,
      lines: order.lines.map((l) => documentLine(l, studio.unitSystem)),
      notes: batch ? `For batch ${batchCode(batch)}` : undefined,
    });
  }

  async function send(studioId: number, id: number) {
    const order = await repo.order(studioId, id);
    if (!order) throw notFound('Purchase order');
    if (order.status === 'received') throw conflict('This order is already received');
    const [studio, supplier] = await Promise.all([repo.studio(studioId), repo.supplier(studioId, order.supplierId)]);
    if (!supplier) throw notFound('Supplier');
    const buffer = await workbook(studioId, order);
    const number = poNumber(order);
    const text = [
      `Dear ${supplier.contact || supplier.name},`,
      '',
      `Please find our purchase order ${number} attached, for delivery by ${order.deliveryDate}.`,
      ...order.lines.map((l) => `- ${l.item}: ${l.kind === 'fabric' ? `${(l.quantity / 1000).toFixed(1)} m` : `${l.quantity} ${l.unit}`}`),
      '',
      'Kindly confirm the order and the delivery date by return.',
      '',
      `${studio.name}`,
    ].join('\n');
    const sent = await deps.mail().send({
      studioId,
      to: supplier.email,
      subject: `Purchase order ${number} from ${studio.name}`,
      text,
      attachments: [{ filename: `${number}.xlsx`, content: buffer, contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' }],
    });
    const after = order.status === 'draft' ? await repo.setStatus(studioId, id, 'sent') : order;
    return { before: order, after, messageId: sent.messageId, mailId: sent.id };
  }

  async function receive(studioId: number, id: number, input: ReceiveOrderInput): Promise<{ before: PurchaseOrderEntity; after: PurchaseOrderEntity; rolls: number; repeated: boolean }> {
    const order = await repo.order(studioId, id);
    if (!order) throw notFound('Purchase order');
    // The same receipt sent again (a retry, a second tap, a reload) answers as the first did and adds nothing.
    if (order.receiptKeys?.includes(input.receiptKey)) return { before: order, after: order, rolls: 0, repeated: true };
    if (order.status === 'draft') throw conflict('Send the order before receiving it');
    if (order.status === 'received') throw conflict('This order is already received');
    if (input.revision !== undefined && input.revision !== (order.revision ?? 0)) {
      throw conflict(said('receiptOutOfDate'), { revision: said('outOfDate') });
    }
    const before = structuredClone(order);
    const receivedDate = input.receivedDate ?? format(deps.now(), 'yyyy-MM-dd');
    const rolls: Partial<RollEntity>[] = [];
    const trimStock: { trimId: number; add: number }[] = [];
    const fields: Record<string, string> = {};
    for (const [i, r] of input.lines.entries()) {
      const line = order.lines[r.index];
      if (!line) { fields[`lines.${i}.index`] = 'No such line on this order'; continue; }
      if (line.kind === 'fabric') {
        if (!r.rolls?.length) { fields[`lines.${i}.rolls`] = 'Enter the rolls received'; continue; }
        const fabric = await repo.fabric(studioId, line.refId);
        if (!fabric) { fields[`lines.${i}.index`] = 'The fabric is no longer recorded'; continue; }
        for (const roll of r.rolls) rolls.push({ fabricId: fabric.id, label: roll.label, lengthMm: roll.lengthMm, remainingMm: roll.lengthMm, widthMm: fabric.widthMm, shadeLot: roll.shadeLot, receivedDate, isRemnant: false });
        line.receivedQuantity = (line.receivedQuantity ?? 0) + r.rolls.reduce((a, x) => a + x.lengthMm, 0);
      } else {
        if (r.quantity === undefined) { fields[`lines.${i}.quantity`] = 'Enter the quantity received'; continue; }
        // Stock on hand stays within the same bound as a typed stock figure, however many receipts add to it.
        const trim = await repo.trim(studioId, line.refId);
        const already = trimStock.filter((t) => t.trimId === line.refId).reduce((a, t) => a + t.add, 0);
        if (trim && trim.inStock + already + r.quantity > MAX_STOCK_QUANTITY) {
          fields[`lines.${i}.quantity`] = `${trim.name} would hold more than ${limitText(MAX_STOCK_QUANTITY)} ${trim.unit} in stock`;
          continue;
        }
        trimStock.push({ trimId: line.refId, add: r.quantity });
        line.receivedQuantity = tidy((line.receivedQuantity ?? 0) + r.quantity);
      }
    }
    if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
    const labels = rolls.map((r) => r.label);
    if (new Set(labels).size !== labels.length) throw badRequest('Each roll needs its own label', { lines: 'Each roll needs its own label' });
    const taken = labels.length ? await repo.rollLabelsTaken(studioId, labels as string[]) : [];
    if (taken.length) throw conflict(said('rollInStockOwnLabel', { label: taken[0] }), { lines: said('rollInStock', { label: taken[0] }) });
    order.status = order.lines.every((l) => (l.receivedQuantity ?? 0) >= l.quantity) ? 'received' : 'confirmed';
    order.receiptKeys = [...(order.receiptKeys ?? []), input.receiptKey].slice(-MAX_RECEIPT_KEYS);
    const saved = await repo.receive(studioId, order, before.revision ?? 0, rolls, trimStock);
    if (saved) return { before, after: saved, rolls: rolls.length, repeated: false };
    // Another receipt saved first. If it was this one (the same key, sent twice at once), answer as it did.
    const now = await repo.order(studioId, id);
    if (now?.receiptKeys?.includes(input.receiptKey)) return { before: now, after: now, rolls: 0, repeated: true };
    throw conflict(said('receiptRaced'), { revision: said('outOfDate') });
  }

  return { needs, createOrders, items, createOrder, workbook, send, receive };
}
