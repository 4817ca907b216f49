import { isMaterialFabric } from './cut-plan.service';
import { checkRollWidth, makeBundles } from '@planning';
import { DEFAULT_REMNANT_STOCK_THRESHOLD_MM } from '@planning';
import type { CorrectLayInput, RecordLayInput } from '../../../shared/schemas/cutting';
import type { RollEntity } from '../../entities';
import type { LayCorrection, LayRollLine } from '../../entities/lay.entity';
import { badRequest, conflict, notFound } from '../../errors';
import { said, type Said } from '../../../shared/i18n/speak';
import { batchCode } from '../../../shared/schemas/batches';
import type { CutPlanRepository } from './cut-plan.repository';
import { withStockLock } from './stock-lock';

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

/** Field name of a lay line's remnant: the input row that carried it, else the lay's own line. */
const remnantField = (input: RecordLayInput | undefined, rollId: number, lineIndex: number) => {
  const i = input?.rolls.findIndex((r) => r.rollId === rollId) ?? -1;
  return i >= 0 ? `rolls.${i}.actualRemnantMm` : `rolls.${lineIndex}.actualRemnantMm`;
};

/** A measured remnant can never be longer than what the roll held: stock only goes down. */
function checkRemnants(lines: LayRollLine[], onHand: Map<number, RollEntity>, input: RecordLayInput | undefined) {
  const fields: Record<string, Said> = {};
  lines.forEach((l, i) => {
    const roll = onHand.get(l.rollId);
    if (!roll || l.actualRemnantMm === undefined) return;
    if (l.actualRemnantMm > roll.remainingMm + REMNANT_EPSILON_MM) {
      fields[remnantField(input, l.rollId, i)] = said('remnantTooLong', { label: l.label, remaining: (roll.remainingMm / 1000).toFixed(2), remainingMm: roll.remainingMm });
    }
  });
  if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
}
const REMNANT_EPSILON_MM = 1e-6;

/**
 * A roll narrower than the lay's marker cannot carry its plies: a 400 naming the roll and both widths,
 * on the plies field of the row that spreads it. Rows with no plies spread are not checked.
 */
export function checkRollWidths(lines: LayRollLine[], onHand: Map<number, RollEntity>, markerWidthMm: number | undefined, input: RecordLayInput | undefined) {
  if (markerWidthMm === undefined) return;
  const fields: Record<string, string | Said> = {};
  lines.forEach((l, i) => {
    const roll = onHand.get(l.rollId);
    if (!roll || !((l.actualPlies ?? l.plies) > 0)) return;
    const refusal = checkRollWidth({ id: String(roll.id), label: roll.label, width: roll.widthMm }, markerWidthMm);
    const at = input?.rolls.findIndex((r) => r.rollId === l.rollId) ?? -1;
    // The core's sentence is the English one; the key lets French give both widths in the studio's units.
    if (refusal) fields[`rolls.${at >= 0 ? at : i}.actualPlies`] = { ...said('rollTooNarrow', { label: roll.label, width: refusal.rollWidth, marker: refusal.markerWidth }), english: refusal.message };
  });
  if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
}

/** Every roll line needs the plies spread and the measured remnant, typed now or saved before: the plan is never taken as fact. */
function checkMeasured(lines: LayRollLine[], input: RecordLayInput | undefined) {
  const fields: Record<string, string> = {};
  lines.forEach((l, i) => {
    const at = input?.rolls.findIndex((r) => r.rollId === l.rollId) ?? -1;
    const row = at >= 0 ? at : i;
    if (l.actualPlies == null) fields[`rolls.${row}.actualPlies`] = `Enter the plies spread from roll ${l.label}`;
    if (l.actualRemnantMm == null) fields[`rolls.${row}.actualRemnantMm`] = `Measure and enter the remnant left on roll ${l.label}`;
  });
  if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
}

/** Save the plies spread, remnants and flaws without cutting yet. */
export async function recordLay(plans: CutPlanRepository, studioId: number, id: number, input: RecordLayInput, markerWidthMm?: number) {
  const lay = await plans.getLay(studioId, id);
  if (!lay) throw notFound('Lay');
  if (lay.status === 'retired') throw conflict(RETIRED);
  if (lay.status === 'cut') throw conflict('This lay is already cut');
  const rolls = applyRecord(lay.rolls, input);
  const onHand = new Map((await plans.stock.rolls(studioId, rolls.map((r) => r.rollId))).map((r) => [r.id, r]));
  checkRollWidths(rolls, onHand, markerWidthMm, input);
  checkRemnants(rolls, onHand, input);
  return plans.transaction(async (tx) => {
    await tx.updateLay(studioId, id, { rolls, flaws: input.flaws ?? '' });
    return tx.lay(studioId, id);
  });
}

/**
 * Mark a lay cut: the recorded plies (planned plies where none were recorded) make the lay's bundles
 * (planning/bundles: one size, one shade lot, ply ranges of 10, numbered on from the studio's last bundle, so a number is never another batch's).
 * Each roll keeps the remnant the cutter measured (else what the plies spread leave); a remnant longer
 * than the roll held is refused, so stock only goes down, and the lay's holds on its rolls are consumed.
 * A remnant no other lay holds is kept as a short roll when it reaches the stock threshold (1 m, common
 * practice), else written off as end-of-roll waste. The plies spread and the remnant of every roll must be
 * entered (400 naming the row otherwise); only the demo seed's history is cut `asPlanned`.
 */
export async function markLayCut(plans: CutPlanRepository, studioId: number, id: number, input: RecordLayInput | undefined, now: Date, opts: { asPlanned?: boolean; markerWidthMm?: number } = {}) {
  const lay = await plans.getLay(studioId, id);
  if (!lay) throw notFound('Lay');
  if (lay.status === 'retired') throw conflict(RETIRED);
  if (lay.status === 'cut') throw conflict('This lay is already cut');
  const later = (await plans.laysOf(studioId, lay.cutPlanId)).filter((l) => l.id !== lay.id && l.status === 'planned');
  const usedLater = new Set(later.flatMap((l) => l.rolls.map((r) => r.rollId)));
  const rolls = input ? applyRecord(lay.rolls, input) : lay.rolls;
  if (!opts.asPlanned) checkMeasured(rolls, input);
  const byLot: { shadeLot: string; plies: number }[] = [];
  for (const r of rolls) {
    const plies = r.actualPlies ?? r.plies;
    const last = byLot[byLot.length - 1];
    if (last && last.shadeLot === r.shadeLot) last.plies += plies;
    else if (plies > 0) byLot.push({ shadeLot: r.shadeLot, plies });
  }
  if (!byLot.length) throw badRequest('rolls: no plies were spread', { rolls: 'No plies were spread' });
  return withStockLock(studioId, () => plans.transaction(async (tx) => {
    const current = await plans.getLay(studioId, id);
    if (current?.status === 'cut') throw conflict('This lay is already cut');
    const onHand = new Map((await tx.stock.rolls(studioId, rolls.map((r) => r.rollId))).map((r) => [r.id, r]));
    checkRollWidths(rolls, onHand, opts.markerWidthMm, input);
    checkRemnants(rolls, onHand, input);
    const offset = await tx.maxBundleNumber(studioId);
    const batch = await tx.batch(studioId, lay.batchId);
    const style = await tx.batchWithStyle(studioId, lay.batchId);
    const sizes = style?.style?.sizeRun ?? Object.keys(lay.ratio);
    // A material's lay (lining…) makes no bundles: its pieces join the self bundles of their size at sewing.
    const plan = await plans.getPlan(studioId, lay.cutPlanId);
    const materialLay = plan ? isMaterialFabric(style?.style?.materialFabrics, plan.fabricId) : false;
    const made = materialLay ? [] : makeBundles({ batch: batchCode(batch), sizes, lays: [{ ratio: lay.ratio, pliesByLot: byLot }], bundleSize: 10, firstNumber: offset + 1 });
    await tx.insertBundles(
      made.map((b) => ({
        studioId, batchId: lay.batchId, layId: lay.id, number: b.number, size: b.size, shadeLot: b.shadeLot,
        plyFrom: b.plyFrom, plyTo: b.plyTo, pieces: b.pieces, reopened: {},
      })),
    );
    const held = await tx.stock.heldOfLay(studioId, lay.id);
    for (const [i, r] of rolls.entries()) {
      const roll = onHand.get(r.rollId);
      if (!roll) continue;
      const spread = (r.actualPlies ?? r.plies) * (lay.markerLengthMm + lay.endAllowanceMm);
      const left = Math.min(roll.remainingMm, Math.max(0, r.actualRemnantMm ?? roll.remainingMm - spread));
      const heldHere = held.filter((h) => h.rollId === roll.id).reduce((a, h) => a + h.lengthMm, 0);
      const heldElsewhere = roll.reservedMm - heldHere > REMNANT_EPSILON_MM * 1000;
      const wanted = usedLater.has(roll.id) || heldElsewhere;
      const keep = wanted || left >= DEFAULT_REMNANT_STOCK_THRESHOLD_MM;
      const isRemnant = !wanted && keep && left > 0 && left < roll.lengthMm;
      if (!(await tx.stock.consume(studioId, lay.id, roll.id, keep ? left : 0, isRemnant, now))) {
        throw conflict(`Roll ${roll.label} changed while this lay was being cut; reload and try again`, { [remnantField(input, roll.id, i)]: 'The roll changed meanwhile' });
      }
    }
    await tx.updateLay(studioId, id, { rolls, flaws: input?.flaws ?? lay.flaws, status: 'cut', cutAt: now });
    if (batch.status === 'planned') await tx.setBatchStatus(studioId, batch.id, 'cutting');
    return { lay: await tx.lay(studioId, id), bundles: made.length };
  }));
}

/**
 * Correct the record of a cut lay: the remnants measured, the notes and the flaws, with a reason. The
 * record stays closed otherwise: the plies spread made the bundles, so a change of plies is refused
 * (400 on that row). Each roll's stock follows the corrected remnant in the same transaction (409 when
 * a roll cannot move so, e.g. it has been cut from since). The correction is appended to the lay.
 */
export async function correctLay(plans: CutPlanRepository, studioId: number, id: number, input: CorrectLayInput, who: { id: number; name: string }, now: Date) {
  const lay = await plans.getLay(studioId, id);
  if (!lay) throw notFound('Lay');
  if (lay.status !== 'cut') throw conflict('Only a cut lay’s record is corrected; before the cut, save what was spread');
  const rolls = applyRecord(lay.rolls, input);
  const fields: Record<string, string> = {};
  input.rolls.forEach((r, i) => {
    const old = lay.rolls.find((l) => l.rollId === r.rollId)!;
    if (r.actualPlies !== (old.actualPlies ?? old.plies)) fields[`rolls.${i}.actualPlies`] = `The plies spread made the bundles; they stay ${old.actualPlies ?? old.plies}`;
  });
  if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
  const changes: string[] = [];
  rolls.forEach((l) => {
    const old = lay.rolls.find((x) => x.rollId === l.rollId)!;
    if ((old.actualRemnantMm ?? null) !== (l.actualRemnantMm ?? null)) changes.push(`${l.label}: remnant ${fmtM(old.actualRemnantMm)} → ${fmtM(l.actualRemnantMm)}`);
    if ((old.note ?? '') !== (l.note ?? '')) changes.push(`${l.label}: note changed`);
  });
  if ((input.flaws ?? '') !== lay.flaws) changes.push('flaws changed');
  if (!changes.length) throw badRequest('rolls: nothing differs from the record', { rolls: 'Nothing differs from the record' });
  return withStockLock(studioId, () => plans.transaction(async (tx) => {
    for (const [i, l] of rolls.entries()) {
      const old = lay.rolls.find((x) => x.rollId === l.rollId)!;
      if (old.actualRemnantMm === undefined || l.actualRemnantMm === undefined || old.actualRemnantMm === l.actualRemnantMm) continue;
      if (!(await tx.stock.correctRemnant(studioId, lay.id, l.rollId, l.actualRemnantMm - old.actualRemnantMm))) {
        throw conflict(`Roll ${l.label} has changed since this lay was cut; its stock cannot take this remnant`, { [remnantField(input, l.rollId, i)]: 'The roll has changed since the cut' });
      }
    }
    const corrections: LayCorrection[] = [...(lay.corrections ?? []), { at: now.toISOString(), byUserId: who.id, by: who.name, reason: input.reason.trim(), changes }];
    await tx.updateLay(studioId, id, { rolls, flaws: input.flaws ?? lay.flaws, corrections });
    return tx.lay(studioId, id);
  }));
}

const fmtM = (v: number | undefined) => (v === undefined ? 'none' : `${(v / 1000).toFixed(2)} m`);
