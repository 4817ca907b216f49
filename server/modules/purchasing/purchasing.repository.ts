import { isUniqueViolation } from '../../db/data-source';
import { insertWithStudioNumber } from '../../db/studio-number';
import { conflict } from '../../errors';
import { said } from '../../../shared/i18n/speak';
import { updateIfChanged } from '../../db/update-if-changed';
import { In, Not, type DataSource } from 'typeorm';
import { FabricEntity, PurchaseOrderEntity, RollEntity, RollReservationEntity, StudioEntity, SupplierEntity, TrimEntity, BatchEntity } from '../../entities';

export type PurchasingRepository = ReturnType<typeof createPurchasingRepository>;

/** Suppliers, purchase orders and the stock they fill; every query scoped by studio. */
export function createPurchasingRepository(ds: DataSource) {
  const suppliers = ds.getRepository(SupplierEntity);
  const orders = ds.getRepository(PurchaseOrderEntity);
  return {
    studio: (id: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id }),
    suppliers: (studioId: number) => suppliers.find({ where: { studioId }, order: { name: 'ASC' } }),
    supplier: (studioId: number, id: number) => suppliers.findOneBy({ studioId, id }),
    insertSupplier: (s: Partial<SupplierEntity>) => suppliers.save(suppliers.create(s)),
    async updateSupplier(studioId: number, id: number, patch: Partial<SupplierEntity>) {
      await updateIfChanged(suppliers, { studioId, id }, patch);
      return suppliers.findOneByOrFail({ studioId, id });
    },
    fabric: (studioId: number, id: number) => ds.getRepository(FabricEntity).findOneBy({ studioId, id }),
    allFabrics: (studioId: number) => ds.getRepository(FabricEntity).find({ where: { studioId }, order: { name: 'ASC' } }),
    allTrims: (studioId: number) => ds.getRepository(TrimEntity).find({ where: { studioId }, order: { name: 'ASC' } }),
    trim: (studioId: number, id: number) => ds.getRepository(TrimEntity).findOneBy({ studioId, id }),
    batchExists: async (studioId: number, id: number) =>
      ds.getRepository(BatchEntity).exists({ where: { studioId, id } }),
    batch: (studioId: number, id: number) => ds.getRepository(BatchEntity).findOneBy({ studioId, id }),
    trims: (studioId: number, styleId: number) => ds.getRepository(TrimEntity).find({ where: { studioId, styleId }, order: { id: 'ASC' } }),
    /** Fabric on hand: what is left on every roll of the fabric. */
    async fabricStockMm(studioId: number, fabricId: number) {
      const rolls = await ds.getRepository(RollEntity).find({ where: { studioId, fabricId }, select: { remainingMm: true } });
      return rolls.reduce((a, r) => a + r.remainingMm, 0);
    },
    /** Length of the fabric's rolls held by other batches' planned lays, mm (not free for this batch). */
    async heldByOtherBatchesMm(studioId: number, fabricId: number, batchId: number) {
      const rolls = await ds.getRepository(RollEntity).find({ where: { studioId, fabricId }, select: { id: true } });
      if (!rolls.length) return 0;
      const held = await ds.getRepository(RollReservationEntity).find({ where: { studioId, rollId: In(rolls.map((r) => r.id)), status: 'held', batchId: Not(batchId) } });
      return held.reduce((a, h) => a + h.lengthMm, 0);
    },
    openOrders: (studioId: number) => orders.find({ where: { studioId, status: Not('received') } }),
    orders: (studioId: number, batchId?: number) =>
      orders.find({ where: batchId ? { studioId, batchId } : { studioId }, order: { id: 'DESC' } }),
    order: (studioId: number, id: number) => orders.findOneBy({ studioId, id }),
    /** A new order takes the studio's next number (PO-0001 for its first). */
    async insertOrder(o: Omit<Partial<PurchaseOrderEntity>, 'id' | 'number'> & { studioId: number }) {
      const id = await insertWithStudioNumber(ds, PurchaseOrderEntity, o);
      return orders.findOneByOrFail({ studioId: o.studioId, id });
    },
    async setStatus(studioId: number, id: number, status: PurchaseOrderEntity['status']) {
      await orders.update({ studioId, id }, { status });
      return orders.findOneByOrFail({ studioId, id });
    },
    /** Labels among `labels` that a roll of this studio already has. */
    async rollLabelsTaken(studioId: number, labels: string[]) {
      const found = await ds.getRepository(RollEntity).find({ select: { label: true }, where: { studioId, label: In(labels) } });
      return found.map((r) => r.label);
    },
    /**
     * Receiving in one transaction: the order's lines, status and receipt keys first, saved only over the revision
     * the receipt was worked out from (so of two receipts at once only one adds stock), then rolls for fabric lines
     * and stock for trims. Null when another receipt saved first; nothing is written then.
     */
    receive(
      studioId: number,
      order: PurchaseOrderEntity,
      readRevision: number,
      rolls: Partial<RollEntity>[],
      trimStock: { trimId: number; add: number }[],
    ): Promise<PurchaseOrderEntity | null> {
      return ds.transaction(async (m) => {
        const claimed = await m
          .createQueryBuilder()
          .update(PurchaseOrderEntity)
          .set({ lines: order.lines, status: order.status, receiptKeys: order.receiptKeys, revision: () => '"revision" + 1' })
          .where('"studioId" = :studioId AND "id" = :id AND "revision" = :readRevision', { studioId, id: order.id, readRevision })
          .execute();
        if (!claimed.affected) return null;
        if (rolls.length) {
          try {
            await m.getRepository(RollEntity).insert(rolls.map((r) => m.getRepository(RollEntity).create({ ...r, studioId })));
          } catch (e) {
            // A roll of the same label saved meanwhile: the whole receipt is undone and the caller told why.
            if (isUniqueViolation(e)) throw conflict(said('rollSavedMeanwhile'), { lines: said('rollSavedMeanwhile') });
            throw e;
          }
        }
        for (const t of trimStock) await m.getRepository(TrimEntity).increment({ studioId, id: t.trimId }, 'inStock', t.add);
        return m.getRepository(PurchaseOrderEntity).findOneByOrFail({ studioId, id: order.id });
      });
    },
  };
}
