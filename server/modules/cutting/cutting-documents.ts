import type { BundleRegisterInput, LayPlan, MarkerListInput, SpreadingMode } from '@exports/types';
import { mm } from '@shared/units/units';
import { rollsInCuttingOrder } from '@planning';
import type { BatchEntity, BundleEntity, FabricEntity, LayEntity, OperationEntity, RollEntity, StudioEntity } from '../../entities';
import { batchCode } from '../../../shared/schemas/batches';
import { documentSettings } from '../studios/document-settings';
import { bundleQrText } from '../../../shared/schemas/cutting';


/** Lays → the marker list / cut ticket input of exports/. End allowance is printed per end (half the per-ply value). */
export function markerListInput(studio: StudioEntity, batch: BatchEntity, fabric: FabricEntity, lays: LayEntity[], today: Date, rolls?: RollEntity[]): MarkerListInput {
  const sizes = batch.style?.sizeRun ?? [];
  const sheets = rolls ? byRoll(lays, rolls) : undefined;
  // With the rolls known, each lay's roll line gives the roll's length when that lay starts on it and what it
  // leaves, the same figures as the rolls-in-cutting-order section; without them, the plan's own figures.
  const atLay = new Map<string, { startMm: number; afterMm: number }>();
  for (const sheet of sheets ?? []) {
    for (const u of sheet.uses) atLay.set(`${u.layNo}|${sheet.rollLabel}`, { startMm: Math.round(u.remainingAfterMm + u.lengthMm), afterMm: Math.round(u.remainingAfterMm) });
  }
  const plans: LayPlan[] = lays.map((l) => ({
    layNo: l.seq,
    ratio: sizes.filter((s) => (l.ratio[s] ?? 0) > 0).map((s) => ({ size: s, count: l.ratio[s] })),
    markerLengthMm: mm(l.markerLengthMm),
    plies: l.plies,
    spreadingMode: l.spreadingMode as SpreadingMode,
    endAllowanceMm: mm(l.endAllowanceMm / 2),
    rolls: l.rolls.map((r) => {
      const known = atLay.get(`${l.seq}|${r.label}`);
      return {
        rollLabel: r.label, shadeLot: r.shadeLot,
        lengthMm: mm(known?.startMm ?? Math.round(r.plies * (l.markerLengthMm + l.endAllowanceMm) + r.expectedRemnantMm)),
        pliesToSpread: r.plies, expectedRemnantMm: mm(known?.afterMm ?? Math.round(r.expectedRemnantMm)),
      };
    }),
  }));
  return {
    studioName: studio.name, dateIso: today.toISOString(), ...documentSettings(studio), unitSystem: studio.unitSystem,
    style: { code: batch.style?.code ?? '', name: batch.style?.name ?? '' }, batch: { code: batchCode(batch) },
    fabric: { description: `${fabric.name}${fabric.composition ? `, ${fabric.composition}` : ''}`, widthMm: mm(fabric.widthMm) },
    lays: plans,
    ...(sheets ? { byRoll: sheets } : {}),
  };
}

/**
 * The plan organised by roll, lays in cutting order (their sequence): each lay takes plies × (marker length
 * + end allowance), the plies actually spread on a cut lay. A roll's start is what it holds now plus what
 * the cut lays of this list took from it, so the remnants printed are those this order leaves.
 */
export function byRoll(lays: LayEntity[], rolls: RollEntity[]): NonNullable<MarkerListInput['byRoll']> {
  const ordered = [...lays].filter((l) => l.status !== 'retired').sort((a, b) => a.seq - b.seq);
  const taken = (l: LayEntity, r: LayEntity['rolls'][number]) => (l.status === 'cut' ? (r.actualPlies ?? r.plies) : r.plies) * (l.markerLengthMm + l.endAllowanceMm);
  const start = new Map(rolls.map((r) => [r.id, r.remainingMm]));
  for (const l of ordered) if (l.status === 'cut') for (const r of l.rolls) start.set(r.rollId, (start.get(r.rollId) ?? 0) + taken(l, r));
  const sheets = rollsInCuttingOrder(
    ordered.map((l) => ({ layNo: l.seq, rolls: l.rolls.filter((r) => start.has(r.rollId)).map((r) => ({ rollId: String(r.rollId), plies: l.status === 'cut' ? (r.actualPlies ?? r.plies) : r.plies, lengthMm: taken(l, r) })) })),
    rolls.map((r) => ({ rollId: String(r.id), label: r.label, shadeLot: r.shadeLot, lengthMm: start.get(r.id) ?? r.remainingMm })),
  );
  return sheets.map((s) => ({
    rollLabel: s.label, shadeLot: s.shadeLot, startLengthMm: mm(Math.round(s.startLengthMm)),
    uses: s.uses.map((u) => ({ layNo: u.layNo, plies: u.plies, lengthMm: mm(Math.round(u.lengthMm)), remainingAfterMm: mm(Math.round(u.remainingAfterMm)) })),
    expectedRemnantMm: mm(Math.round(s.expectedRemnantMm)), isStock: s.isStock,
  }));
}

/** Bundles → bundle register input; operations from the style's operation list (sewing and finishing). */
export function bundleRegisterInput(studio: StudioEntity, batch: BatchEntity, bundles: BundleEntity[], lays: LayEntity[], ops: OperationEntity[], today: Date): BundleRegisterInput {
  const seqOf = new Map(lays.map((l) => [l.id, l.seq]));
  return {
    studioName: studio.name, dateIso: today.toISOString(), ...documentSettings(studio),
    style: { code: batch.style?.code ?? '', name: batch.style?.name ?? '' }, batch: { code: batchCode(batch) },
    operations: ops.filter((o) => o.section !== 'cutting').map((o) => ({ name: o.name, samMinutes: o.sam })),
    bundles: bundles.map((b) => ({ bundleNo: b.number, size: b.size, shadeLot: b.shadeLot, plyFrom: b.plyFrom, plyTo: b.plyTo, pieces: b.pieces, layNo: seqOf.get(b.layId) ?? 0 })),
  };
}

export const withQr = (input: BundleRegisterInput, batchId: number) => ({
  ...input,
  bundles: input.bundles.map((b) => ({ ...b, qrText: bundleQrText(batchId, b.bundleNo) })),
});
