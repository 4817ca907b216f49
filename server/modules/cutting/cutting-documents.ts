import type { BundleRegisterInput, LayPlan, MarkerListInput, SpreadingMode } from '@exports/types';
import { mm } from '@shared/units/units';
import type { BatchEntity, BundleEntity, FabricEntity, LayEntity, OperationEntity, StudioEntity } from '../../entities';
import { batchCode } from '../batches/batch.routes';
import { documentSettings } from '../studios/document-settings';
import { bundleQrText } from '../../../shared/schemas/cutting';


/** Lays → the marker list / cut ticket input of exports/. End allowance is printed per end (half the per-ply value). */
export function markerListInput(studio: StudioEntity, batch: BatchEntity, fabric: FabricEntity, lays: LayEntity[], today: Date): MarkerListInput {
  const sizes = batch.style?.sizeRun ?? [];
  const plans: LayPlan[] = lays.map((l) => ({
    layNo: l.seq,
    ratio: sizes.filter((s) => (l.ratio[s] ?? 0) > 0).map((s) => ({ size: s, count: l.ratio[s] })),
    markerLengthMm: mm(l.markerLengthMm),
    plies: l.plies,
    spreadingMode: l.spreadingMode as SpreadingMode,
    endAllowanceMm: mm(l.endAllowanceMm / 2),
    rolls: l.rolls.map((r) => ({
      rollLabel: r.label, shadeLot: r.shadeLot, lengthMm: mm(r.plies * (l.markerLengthMm + l.endAllowanceMm) + r.expectedRemnantMm),
      pliesToSpread: r.plies, expectedRemnantMm: mm(r.expectedRemnantMm),
    })),
  }));
  return {
    studioName: studio.name, dateIso: today.toISOString(), ...documentSettings(studio), unitSystem: studio.unitSystem,
    style: { code: batch.style?.code ?? '', name: batch.style?.name ?? '' }, batch: { code: batchCode(batch.id) },
    fabric: { description: `${fabric.name}${fabric.composition ? `, ${fabric.composition}` : ''}`, widthMm: mm(fabric.widthMm) },
    lays: plans,
  };
}

/** Bundles → bundle register input; operations from the style's operation list (sewing and finishing). */
export function bundleRegisterInput(studio: StudioEntity, batch: BatchEntity, bundles: BundleEntity[], lays: LayEntity[], ops: OperationEntity[], today: Date): BundleRegisterInput {
  const seqOf = new Map(lays.map((l) => [l.id, l.seq]));
  return {
    studioName: studio.name, dateIso: today.toISOString(), ...documentSettings(studio),
    style: { code: batch.style?.code ?? '', name: batch.style?.name ?? '' }, batch: { code: batchCode(batch.id) },
    operations: ops.filter((o) => o.section !== 'cutting').map((o) => ({ name: o.name, samMinutes: o.sam })),
    bundles: bundles.map((b) => ({ bundleNo: b.number, size: b.size, shadeLot: b.shadeLot, plyFrom: b.plyFrom, plyTo: b.plyTo, pieces: b.pieces, layNo: seqOf.get(b.layId) ?? 0 })),
  };
}

export const withQr = (input: BundleRegisterInput, batchId: number) => ({
  ...input,
  bundles: input.bundles.map((b) => ({ ...b, qrText: bundleQrText(batchId, b.bundleNo) })),
});
