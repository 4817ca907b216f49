import type { BundleDto, CutPlanDto, LayDto, LayShortageDto } from '../../../shared/schemas/cutting';
import { bundleQrText } from '../../../shared/schemas/cutting';
import type { BundleEntity, CutPlanEntity, FabricEntity, LayEntity } from '../../entities';
import { batchCode } from '../../../shared/schemas/batches';
import type { StoredCutPlanResult } from './cut-plan.service';

/** A lay, shown with its batch's code (the batch is the lay's own: `l.batchId`). */
export const presentLay = (l: LayEntity, batch: { number: number }, bundleCount = 0, shortage: LayShortageDto | null = null): LayDto => ({
  id: l.id,
  cutPlanId: l.cutPlanId,
  batchId: l.batchId,
  batchCode: batchCode(batch),
  seq: l.seq,
  ratio: l.ratio,
  garmentsPerPly: Object.values(l.ratio).reduce((a, b) => a + b, 0),
  plies: l.plies,
  markerLengthMm: l.markerLengthMm,
  endAllowanceMm: l.endAllowanceMm,
  markerId: l.markerId,
  spreadingMode: l.spreadingMode,
  rolls: l.rolls,
  status: l.status,
  flaws: l.flaws,
  cutAt: l.cutAt ? new Date(l.cutAt).toISOString() : null,
  bundleCount,
  shortage,
  corrections: (l.corrections ?? []).map((c) => ({ at: c.at, by: c.by, reason: c.reason, changes: c.changes })),
});

/** Cut plan → DTO. Rates and cost go only to roles that may read costs (`showCosts`), never to the cutter. */
export function presentCutPlan(p: CutPlanEntity, batch: { number: number }, fabricName: string, lays: LayEntity[], counts: Map<number, number>, shortages = new Map<number, LayShortageDto>(), showCosts = false): Omit<CutPlanDto, 'material' | 'plans'> {
  const r = p.result as StoredCutPlanResult;
  return {
    id: p.id,
    batchId: p.batchId,
    fabricId: p.fabricId,
    fabricName,
    status: p.status,
    fabricUsedMm: p.fabricUsedMm,
    lowerBoundMm: p.lowerBoundMm,
    gap: r.plan.gap,
    layLowerBound: r.plan.layLowerBound,
    method: r.plan.method,
    overcut: r.plan.overcut,
    cut: r.plan.cut,
    lengthSources: r.lengthSources,
    assumedUtilisation: r.assumedUtilisation,
    utilisationFromMarkers: r.utilisationFromMarkers ?? 0,
    markerLengths: r.markerLengths ?? (r.lengthSources.some((s) => s.source === 'estimate') ? 'estimated' : 'measured'),
    markerLengthsNote: r.markerLengthsNote ?? null,
    objective: r.plan.cost === undefined ? 'fabric' : 'cost',
    rates: showCosts ? (r.rates ?? null) : null,
    costMinor: showCosts && r.plan.cost !== undefined ? Math.round(r.plan.cost) : null,
    endOfRollWasteMm: r.allocation.endOfRollWaste,
    stockKeptMm: r.allocation.stockKept,
    shortfall: r.allocation.shortfall,
    splitLays: r.allocation.splitLays,
    rollRefusals: [...new Set((r.allocation.refusals ?? []).map((x) => x.refusal.message))],
    lays: lays.map((l) => presentLay(l, batch, counts.get(l.id) ?? 0, shortages.get(l.id) ?? null)),
    createdAt: new Date(p.createdAt).toISOString(),
  };
}

export const presentBundle = (b: BundleEntity): BundleDto => ({
  id: b.id,
  number: b.number,
  layId: b.layId,
  size: b.size,
  shadeLot: b.shadeLot,
  plyFrom: b.plyFrom,
  plyTo: b.plyTo,
  pieces: b.pieces,
  qrText: bundleQrText(b.batchId, b.number),
});

/** The fabric a cutter spreads a lay from, as the lay page shows it. */
export const presentLayFabric = (f: FabricEntity) => ({
  id: f.id, name: f.name, composition: f.composition, widthMm: f.widthMm, isDirectional: f.isDirectional, maxPlies: f.maxPlies,
});
