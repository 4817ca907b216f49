import { In, Not, type DataSource, type EntityManager } from 'typeorm';
import { BatchEntity, BundleEntity, CutPlanEntity, LayEntity, MarkerEntity, OperationEntity, StudioEntity, type RollReservationEntity } from '../../entities';
import { createRollStockRepository, type RollStockRepository } from './roll-stock.repository';

export type CutPlanRepository = ReturnType<typeof createCutPlanRepository>;
/** The writes of one cut-plan transaction: each call runs inside it, so all of them commit or none does. */
export type CutPlanWrites = ReturnType<typeof writesIn>;

const sameRatio = (a: Record<string, number>, b: Record<string, number>) => {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  return [...keys].every((k) => (a[k] ?? 0) === (b[k] ?? 0));
};

/** Cut plans, their lays and the bundles cut from them; every query scoped by studio. */
export function createCutPlanRepository(ds: DataSource) {
  const plans = ds.getRepository(CutPlanEntity);
  const lays = ds.getRepository(LayEntity);
  const bundles = ds.getRepository(BundleEntity);
  const stock = createRollStockRepository(ds);
  return {
    stock: {
      rolls: (studioId: number, ids: number[]) => stock.rolls(studioId, ids),
      releasable: (studioId: number, batchId: number) => stock.releasable(studioId, batchId),
    },
    /** Runs `fn` in one database transaction; the writes it is given go through that transaction. */
    transaction: <T>(fn: (tx: CutPlanWrites) => Promise<T>) => ds.transaction((m) => fn(writesIn(m, stock))),
    getPlan: (studioId: number, id: number) => plans.findOne({ where: { studioId, id } }),
    /**
     * The batch's current plan on `fabricId`, or without one its main plan: the newest live plan on `main` (the
     * style's self fabric) when there is one, else the newest live plan.
     */
    async currentPlan(studioId: number, batchId: number, pick: { fabricId?: number; main?: number | null } = {}) {
      const live = await plans.find({ where: { studioId, batchId, status: Not('superseded') }, order: { id: 'DESC' } });
      if (pick.fabricId !== undefined) return live.find((p) => p.fabricId === pick.fabricId) ?? null;
      return live.find((p) => p.fabricId === pick.main) ?? live[0] ?? null;
    },
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
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
    operations: (studioId: number, styleId: number) => ds.getRepository(OperationEntity).find({ where: { studioId, styleId }, order: { seq: 'ASC' } }),
    /**
     * A finished marker of a batch becomes the drawn marker of that batch's planned lays with the same ratio
     * (lays that already have one keep it), on a plan of the marker's own fabric only: a lining marker of
     * the shell lay's ratio is not the marker the cutter spreads on the shell. The marker queue calls this
     * through its completion hook.
     */
    async linkMarkerToLays(studioId: number, markerId: number): Promise<void> {
      const marker = await ds.getRepository(MarkerEntity).findOneBy({ studioId, id: markerId });
      if (!marker?.batchId || marker.fabricId === null) return;
      const onFabric = await plans.find({ where: { studioId, batchId: marker.batchId, fabricId: marker.fabricId, status: Not('superseded') }, select: { id: true } });
      if (!onFabric.length) return;
      const waiting = await lays.find({ where: { studioId, batchId: marker.batchId, status: 'planned', cutPlanId: In(onFabric.map((p) => p.id)) } });
      for (const l of waiting) if (l.markerId === null && sameRatio(l.ratio, marker.ratio)) await lays.update({ studioId, id: l.id }, { markerId });
    },
  };
}

function writesIn(m: EntityManager, stock: RollStockRepository) {
  const plans = m.getRepository(CutPlanEntity);
  const lays = m.getRepository(LayEntity);
  const bundles = m.getRepository(BundleEntity);
  const batches = m.getRepository(BatchEntity);
  return {
    stock: {
      rolls: (studioId: number, ids: number[]) => stock.rolls(studioId, ids, m),
      heldOfLay: (studioId: number, layId: number) => stock.heldOfLay(m, studioId, layId),
      release: (studioId: number, rows: RollReservationEntity[], now: Date) => stock.release(m, studioId, rows, now),
      reserve: (row: Parameters<RollStockRepository['reserve']>[1]) => stock.reserve(m, row),
      consume: (studioId: number, layId: number, rollId: number, leftMm: number, isRemnant: boolean, now: Date) =>
        stock.consume(m, studioId, layId, rollId, leftMm, isRemnant, now),
      correctRemnant: (studioId: number, layId: number, rollId: number, deltaMm: number) => stock.correctRemnant(m, studioId, layId, rollId, deltaMm),
    },
    supersedePlan: async (studioId: number, id: number) => {
      await plans.update({ studioId, id }, { status: 'superseded' });
    },
    insertPlan: (row: Pick<CutPlanEntity, 'studioId' | 'batchId' | 'fabricId' | 'input' | 'result' | 'fabricUsedMm' | 'lowerBoundMm' | 'status'>) => plans.save(row),
    /** A lay row not yet saved (saveLays stores it). */
    newLay: (row: Omit<LayEntity, 'id' | 'createdAt'>) => lays.create(row),
    saveLays: (list: LayEntity[]) => lays.save(list),
    updateLay: async (studioId: number, id: number, patch: Partial<Pick<LayEntity, 'rolls' | 'flaws' | 'status' | 'cutAt' | 'cutPlanId' | 'corrections'>>) => {
      await lays.update({ studioId, id }, patch);
    },
    lay: (studioId: number, id: number) => lays.findOneByOrFail({ studioId, id }),
    /** The highest bundle number in the studio (any batch): new bundles count on from it. */
    async maxBundleNumber(studioId: number) {
      const last = await bundles.findOne({ where: { studioId }, order: { number: 'DESC' } });
      return last?.number ?? 0;
    },
    insertBundles: (rows: Pick<BundleEntity, 'studioId' | 'batchId' | 'layId' | 'number' | 'size' | 'shadeLot' | 'plyFrom' | 'plyTo' | 'pieces' | 'reopened'>[]) => bundles.save(rows.map((b) => bundles.create(b))),
    batch: (studioId: number, id: number) => batches.findOneByOrFail({ studioId, id }),
    batchWithStyle: (studioId: number, id: number) => batches.findOne({ where: { studioId, id }, relations: { style: true } }),
    setBatchStatus: async (studioId: number, id: number, status: BatchEntity['status']) => {
      await batches.update({ studioId, id }, { status });
    },
  };
}
