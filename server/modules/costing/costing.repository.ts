import { updateIfChanged } from '../../db/update-if-changed';
import { In, Not, type DataSource } from 'typeorm';
import {
  BatchEntity,
  BundleEntity,
  CostingSettingsEntity,
  CutPlanEntity,
  FabricEntity,
  LayEntity,
  MarkerEntity,
  OperationEntity,
  RollReservationEntity,
  StudioEntity,
  SupplierEntity,
  TrimEntity,
  WorkLogEntity,
  StyleEntity,
} from '../../entities';

import { polygonArea } from '@shared/geometry/polygon';
import type { CuttingPieceSource } from '../grading/graded-pieces';

export type CostingRepository = ReturnType<typeof createCostingRepository>;

/**
 * Costing queries, every one scoped to one studio. Cut plans, lays, markers, operations and work logs
 * belong to other areas: they are only read here.
 */
export function createCostingRepository(ds: DataSource, cuttingPieces: CuttingPieceSource) {
  const trims = ds.getRepository(TrimEntity);
  const settings = ds.getRepository(CostingSettingsEntity);
  return {
    /** Cut area per garment by size and material (mm², copies counted), from the style's graded cutting pieces. */
    async materialAreas(studioId: number, styleId: number): Promise<Record<string, Record<string, number>>> {
      const pieces = await cuttingPieces(studioId, styleId);
      const out: Record<string, Record<string, number>> = {};
      for (const [size, list] of Object.entries(pieces)) {
        out[size] = {};
        for (const p of list) out[size][p.material] = (out[size][p.material] ?? 0) + polygonArea(p.outline) * p.quantity;
      }
      return out;
    },
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
    batch: (studioId: number, id: number) =>
      ds.getRepository(BatchEntity).findOne({ where: { studioId, id }, relations: { style: true } }),
    styleExists: async (studioId: number, styleId: number) =>
      ds.getRepository(StyleEntity).exists({ where: { studioId, id: styleId } }),
    settings: (studioId: number, styleId: number) => settings.findOneBy({ studioId, styleId }),
    async saveSettings(studioId: number, styleId: number, patch: Partial<CostingSettingsEntity>) {
      const existing = await settings.findOneBy({ studioId, styleId });
      if (existing) await updateIfChanged(settings, { id: existing.id }, patch);
      else await settings.save(settings.create({ labourCostPerMinuteMinor: 0, ...patch, studioId, styleId }));
      return settings.findOneByOrFail({ studioId, styleId });
    },
    trims: (studioId: number, styleId: number) => trims.find({ where: { studioId, styleId }, order: { id: 'ASC' } }),
    trim: (studioId: number, id: number) => trims.findOneBy({ studioId, id }),
    insertTrim: (t: Partial<TrimEntity>) => trims.save(trims.create(t)),
    async updateTrim(studioId: number, id: number, patch: Partial<TrimEntity>) {
      await updateIfChanged(trims, { studioId, id }, patch);
      return trims.findOneByOrFail({ studioId, id });
    },
    deleteTrim: (studioId: number, id: number) => trims.delete({ studioId, id }),
    suppliers: (studioId: number) => ds.getRepository(SupplierEntity).find({ where: { studioId } }),
    supplier: (studioId: number, id: number) => ds.getRepository(SupplierEntity).findOneBy({ studioId, id }),
    fabric: (studioId: number, id: number) => ds.getRepository(FabricEntity).findOneBy({ studioId, id }),
    firstFabric: (studioId: number) =>
      ds.getRepository(FabricEntity).findOne({ where: { studioId }, order: { id: 'ASC' } }),
    /**
     * The batch's main cut plan: on the style's self fabric (`main`) when it links one, since a lining's plan is
     * not the garment's fabric; released before draft, newest first; superseded plans never.
     */
    async cutPlan(studioId: number, batchId: number, main?: number | null) {
      const all = await ds.getRepository(CutPlanEntity).find({
        where: { studioId, batchId, status: Not('superseded') },
        order: { id: 'DESC' },
      });
      const plans = main ? all.filter((p) => p.fabricId === main) : all;
      return plans.find((p) => p.status === 'released') ?? plans[0] ?? null;
    },
    lays: (studioId: number, cutPlanId: number) =>
      ds.getRepository(LayEntity).find({ where: { studioId, cutPlanId }, order: { seq: 'ASC' } }),
    /** What each cut lay took from each roll, as settled at the cut (on hand before less the measured remnant), mm. */
    async consumedByLay(studioId: number, layIds: number[]): Promise<Map<number, Map<number, number>>> {
      const out = new Map<number, Map<number, number>>();
      if (!layIds.length) return out;
      const rows = await ds.getRepository(RollReservationEntity).find({ where: { studioId, layId: In(layIds), status: 'consumed' } });
      for (const r of rows) {
        if (r.consumedMm === null) continue;
        const m = out.get(r.layId) ?? new Map<number, number>();
        m.set(r.rollId, (m.get(r.rollId) ?? 0) + r.consumedMm);
        out.set(r.layId, m);
      }
      return out;
    },
    /** Finished markers made for this batch (or the style when none is tied to the batch). */
    async doneMarkers(studioId: number, styleId: number, batchId: number) {
      const repo = ds.getRepository(MarkerEntity);
      const forBatch = await repo.find({ where: { studioId, batchId, status: 'done' }, order: { id: 'DESC' } });
      if (forBatch.length) return forBatch;
      return repo.find({ where: { studioId, styleId, status: 'done' }, order: { id: 'DESC' } });
    },
    /** Finished markers of a style on one fabric at its width: what that fabric's estimates learn from. */
    styleMarkersOn: (studioId: number, styleId: number, fabricId: number, widthMm: number) =>
      ds.getRepository(MarkerEntity).find({ where: { studioId, styleId, fabricId, widthMm, status: 'done' }, select: { id: true, lengthMm: true, utilisation: true } }),
    operations: (studioId: number, styleId: number) =>
      ds.getRepository(OperationEntity).find({ where: { studioId, styleId }, order: { seq: 'ASC' } }),
    async workLogs(studioId: number, batchId: number) {
      const bundles = await ds.getRepository(BundleEntity).find({ where: { studioId, batchId }, select: { id: true } });
      if (!bundles.length) return [];
      return ds.getRepository(WorkLogEntity).find({ where: { studioId, bundleId: In(bundles.map((b) => b.id)) } });
    },
  };
}
