import { makeBundles } from '@planning';
import { DEFAULT_REMNANT_STOCK_THRESHOLD_MM } from '@planning';
import type { RecordLayInput } from '../../../shared/schemas/cutting';
import { BatchEntity, BundleEntity, LayEntity, RollEntity } from '../../entities';
import type { LayRollLine } from '../../entities/lay.entity';
import { badRequest, conflict, notFound } from '../../errors';
import { batchCode } from '../batches/batch.routes';
import type { CutPlanRepository } from './cut-plan.repository';

const RETIRED = 'This lay was retired when the batch was planned again: cut the lays of the current plan';

/** Apply what the cutter recorded to the lay's roll lines; unknown rolls are field errors. */
export function applyRecord(lines: LayRollLine[], input: RecordLayInput): LayRollLine[] {
  const fields: Record<string, string> = {};
  input.rolls.forEach((r, i) => {
    if (!lines.some((l) => l.rollId === r.rollId)) fields[`rolls.${i}.rollId`] = 'This roll is not in the lay';
  });
  if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
  return lines.map((l) => {
    const r = input.rolls.find((x) => x.rollId === l.rollId);
    return r ? { ...l, actualPlies: r.actualPlies, actualRemnantMm: r.actualRemnantMm, note: r.note ?? l.note } : l;
  });
}

/** Save the plies spread, remnants and flaws without cutting yet. */
export async function recordLay(plans: CutPlanRepository, studioId: number, id: number, input: RecordLayInput) {
  const lay = await plans.getLay(studioId, id);
  if (!lay) throw notFound('Lay');
  if (lay.status === 'retired') throw conflict(RETIRED);
  if (lay.status === 'cut') throw conflict('This lay is already cut');
  return plans.transaction(async (m) => {
    const rolls = applyRecord(lay.rolls, input);
    await m.getRepository(LayEntity).update({ studioId, id }, { rolls, flaws: input.flaws ?? '' });
    return m.getRepository(LayEntity).findOneByOrFail({ studioId, id });
  });
}

/**
 * Mark a lay cut: the recorded plies (planned plies where none were recorded) make the lay's bundles
 * (planning/bundles: one size, one shade lot, ply ranges of 10, numbered on from the batch's last bundle);
 * each roll's remaining length becomes its actual remnant. A remnant that no later lay uses is kept as a
 * short roll when it reaches the stock threshold (1 m, common practice), else written off as end-of-roll waste.
 */
export async function markLayCut(plans: CutPlanRepository, studioId: number, id: number, input: RecordLayInput | undefined, now: Date) {
  const lay = await plans.getLay(studioId, id);
  if (!lay) throw notFound('Lay');
  if (lay.status === 'retired') throw conflict(RETIRED);
  if (lay.status === 'cut') throw conflict('This lay is already cut');
  const later = (await plans.laysOf(studioId, lay.cutPlanId)).filter((l) => l.id !== lay.id && l.status === 'planned');
  const usedLater = new Set(later.flatMap((l) => l.rolls.map((r) => r.rollId)));
  const rolls = input ? applyRecord(lay.rolls, input) : lay.rolls;
  const byLot: { shadeLot: string; plies: number }[] = [];
  for (const r of rolls) {
    const plies = r.actualPlies ?? r.plies;
    const last = byLot[byLot.length - 1];
    if (last && last.shadeLot === r.shadeLot) last.plies += plies;
    else if (plies > 0) byLot.push({ shadeLot: r.shadeLot, plies });
  }
  if (!byLot.length) throw badRequest('rolls: no plies were spread', { rolls: 'No plies were spread' });
  return plans.transaction(async (m) => {
    const offset = await plans.maxBundleNumber(m, studioId, lay.batchId);
    const batch = await m.getRepository(BatchEntity).findOneByOrFail({ studioId, id: lay.batchId });
    const style = await m.getRepository(BatchEntity).findOne({ where: { studioId, id: lay.batchId }, relations: { style: true } });
    const sizes = style?.style?.sizeRun ?? Object.keys(lay.ratio);
    const made = makeBundles({ batch: batchCode(lay.batchId), sizes, lays: [{ ratio: lay.ratio, pliesByLot: byLot }], bundleSize: 10 });
    await m.getRepository(BundleEntity).save(
      made.map((b) => m.getRepository(BundleEntity).create({
        studioId, batchId: lay.batchId, layId: lay.id, number: offset + b.number, size: b.size, shadeLot: b.shadeLot,
        plyFrom: b.plyFrom, plyTo: b.plyTo, pieces: b.pieces, reopened: {},
      })),
    );
    for (const r of rolls) {
      const roll = await m.getRepository(RollEntity).findOneBy({ studioId, id: r.rollId });
      if (!roll) continue;
      const spread = (r.actualPlies ?? r.plies) * (lay.markerLengthMm + lay.endAllowanceMm);
      const left = Math.max(0, r.actualRemnantMm ?? roll.remainingMm - spread);
      const keep = usedLater.has(roll.id) || left >= DEFAULT_REMNANT_STOCK_THRESHOLD_MM;
      await m.getRepository(RollEntity).update({ studioId, id: roll.id }, {
        remainingMm: keep ? left : 0,
        isRemnant: !usedLater.has(roll.id) && keep && left > 0 && left < roll.lengthMm,
      });
    }
    await m.getRepository(LayEntity).update({ studioId, id }, { rolls, flaws: input?.flaws ?? lay.flaws, status: 'cut', cutAt: now });
    if (batch.status === 'planned') await m.getRepository(BatchEntity).update({ studioId, id: batch.id }, { status: 'cutting' });
    return { lay: await m.getRepository(LayEntity).findOneByOrFail({ studioId, id }), bundles: made.length };
  });
}
