import { createLocalJobRunner } from '../jobs/job-runner';
import { addDays, format, subDays } from 'date-fns';
import { FabricEntity, MarkerEntity, RollEntity } from '../entities';
import { createBatchRepository } from '../modules/batches/batch.repository';
import { createCostingRepository } from '../modules/costing/costing.repository';
import { createCutPlanRepository } from '../modules/cutting/cut-plan.repository';
import { planBatchCut } from '../modules/cutting/cut-plan.service';
import { createFabricRepository } from '../modules/cutting/fabric.repository';
import { markLayCut } from '../modules/cutting/lay.service';
import { createCuttingPieceSource } from '../modules/grading/cutting-pieces.service';
import { createGradingSetRepository } from '../modules/grading/grading-set.repository';
import { buildMarkerInput, fabricShrinkage, markerInputHash } from '../modules/markers/marker-input';
import { createMarkerRepository } from '../modules/markers/marker.repository';
import { createStyleRepository } from '../modules/styles/style.repository';
import type { SeedContext } from './seed-context';

/** The demo fabric: our own invented quality name; price in KES minor units (cents) per metre. */
export const DEMO_FABRIC = {
  name: 'Sable cotton poplin',
  composition: '100% cotton',
  widthMm: 1450,
  shrinkagePercent: 2,
  shrinkageLengthPercent: 2,
  shrinkageWidthPercent: 2,
  isDirectional: false,
  pricePerMetreMinor: 48_000,
  priceMinor: 48_000,
  priceUnit: 'metre' as const,
  maxPlies: 40,
};

/** Five rolls in two shade lots (lengths in mm as measured on receipt). */
export const DEMO_ROLLS = [
  { label: 'SCP-0101', lengthMm: 30_400, shadeLot: 'Lot A' },
  { label: 'SCP-0102', lengthMm: 28_750, shadeLot: 'Lot A' },
  { label: 'SCP-0103', lengthMm: 26_200, shadeLot: 'Lot A' },
  { label: 'SCP-0104', lengthMm: 24_900, shadeLot: 'Lot B' },
  { label: 'SCP-0105', lengthMm: 19_600, shadeLot: 'Lot B' },
];

/** Cut plan settings of the demo batch: a small studio table and knife. */
export const DEMO_CUT_SETTINGS = { maxPlies: 6, maxGarmentsPerMarker: 4, maxMarkerLengthMm: 6000 };

/**
 * Demo data of the cutting area: the fabric and its rolls, a cut plan of the demo batch (lay lengths
 * from the per-garment estimate, so tests and the live demo plan alike), lay 1 cut yesterday (bundles
 * numbered from 1 for the floor), later lays planned for the cutter. Outside tests the demo ratios'
 * markers are queued with ctx.nestingSeconds; the marker queue computes them as soon as the server starts.
 */
export async function seedCutting(ctx: SeedContext): Promise<void> {
  const { ds, studioId } = ctx;
  const fabric = await ds.getRepository(FabricEntity).save({ studioId, supplierId: null, ...DEMO_FABRIC });
  const received = format(subDays(ctx.today, 6), 'yyyy-MM-dd');
  await ds.getRepository(RollEntity).save(
    DEMO_ROLLS.map((r) => ({ studioId, fabricId: fabric.id, ...r, widthMm: DEMO_FABRIC.widthMm + 20, receivedDate: received, remainingMm: r.lengthMm, isRemnant: false })),
  );
  const plans = createCutPlanRepository(ds);
  const cuttingPieces = createCuttingPieceSource({ styles: createStyleRepository(ds), sets: createGradingSetRepository(ds) });
  const costing = createCostingRepository(ds, cuttingPieces);
  const plan = await planBatchCut(
    {
      plans, cuttingPieces, fabrics: createFabricRepository(ds), batches: createBatchRepository(ds), jobs: createLocalJobRunner(), markers: createMarkerRepository(ds),
      labourCostPerMinute: async (s, style) => (await costing.settings(s, style))?.labourCostPerMinuteMinor ?? 0,
    },
    studioId, ctx.batchId, { fabricId: fabric.id, ...DEMO_CUT_SETTINGS },
  );
  const lays = await plans.laysOf(studioId, plan.id);
  if (lays[0]) await markLayCut(plans, studioId, lays[0].id, undefined, addDays(subDays(ctx.today, 1), 0), { asPlanned: true });
  if (process.env.NODE_ENV === 'test') return;
  const pieces = await cuttingPieces(studioId, ctx.styleId);
  const ratios = [...new Map(lays.map((l) => [JSON.stringify(l.ratio), l.ratio])).values()].slice(1, 2);
  for (const ratio of ratios) {
    const job = buildMarkerInput(pieces, ratio, { widthMm: fabric.widthMm, isDirectional: fabric.isDirectional, seconds: ctx.nestingSeconds, shrinkage: fabricShrinkage(fabric) });
    await ds.getRepository(MarkerEntity).save({
      studioId, styleId: ctx.styleId, batchId: ctx.batchId, fabricId: fabric.id, ratio, widthMm: fabric.widthMm,
      inputHash: markerInputHash(job), status: 'queued', input: job, result: null, error: '', elapsedMs: 0,
    });
  }
}
