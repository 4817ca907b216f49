import { In, Not, type DataSource, type EntityManager } from 'typeorm';
import { createRollStockRepository } from './roll-stock.repository';
import { BundleEntity, CutPlanEntity, LayEntity, OperationEntity, StudioEntity } from '../../entities';

export type CutPlanRepository = ReturnType<typeof createCutPlanRepository>;

/** Cut plans, their lays and the bundles cut from them; every query scoped by studio. */
export function createCutPlanRepository(ds: DataSource) {
  const plans = ds.getRepository(CutPlanEntity);
  const lays = ds.getRepository(LayEntity);
  const bundles = ds.getRepository(BundleEntity);
  return {
    stock: createRollStockRepository(ds),
    transaction: <T>(fn: (m: EntityManager) => Promise<T>) => ds.transaction(fn),
    getPlan: (studioId: number, id: number) => plans.findOne({ where: { studioId, id } }),
    /** The batch's current plan: the newest that is not superseded. */
    currentPlan: (studioId: number, batchId: number) =>
      plans.findOne({ where: { studioId, batchId, status: Not('superseded') }, order: { id: 'DESC' } }),
    livePlans: (studioId: number, batchId: number) => plans.find({ where: { studioId, batchId, status: Not('superseded') } }),
    laysOf: (studioId: number, cutPlanId: number) => lays.find({ where: { studioId, cutPlanId }, order: { seq: 'ASC' } }),
    getLay: (studioId: number, id: number) => lays.findOne({ where: { studioId, id } }),
    /** Lays of every live plan, oldest plan first, then by sequence. */
    async liveLays(studioId: number) {
      const live = await plans.find({ where: { studioId, status: Not('superseded') }, select: { id: true } });
      if (!live.length) return [];
      return lays.find({ where: { studioId, cutPlanId: In(live.map((p) => p.id)) }, order: { cutPlanId: 'ASC', seq: 'ASC' } });
    },
    bundlesOfBatch: (studioId: number, batchId: number) => bundles.find({ where: { studioId, batchId }, order: { number: 'ASC' } }),
    bundlesOfLay: (studioId: number, layId: number) => bundles.find({ where: { studioId, layId }, order: { number: 'ASC' } }),
    async bundleCounts(studioId: number, layIds: number[]) {
      if (!layIds.length) return new Map<number, number>();
      const rows = await bundles.find({ where: { studioId, layId: In(layIds) }, select: { layId: true } });
      const out = new Map<number, number>();
      for (const r of rows) out.set(r.layId, (out.get(r.layId) ?? 0) + 1);
      return out;
    },
    /** The highest bundle number in the studio (any batch): new bundles count on from it. */
    async maxBundleNumber(m: EntityManager, studioId: number) {
      const last = await m.getRepository(BundleEntity).findOne({ where: { studioId }, order: { number: 'DESC' } });
      return last?.number ?? 0;
    },
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
    operations: (studioId: number, styleId: number) => ds.getRepository(OperationEntity).find({ where: { studioId, styleId }, order: { seq: 'ASC' } }),
  };
}
