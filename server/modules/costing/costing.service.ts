import type { CostingLineDto, CostingSettingsDto, CostingSheetDto, ConsumptionBasis, LabourBasis } from '../../../shared/schemas/costing';
import { MM_PER_YARD, minor, mm, type Millimetres } from '../../../shared/units';
import { computeCostingFigures, type CostingFigures } from '../../../exports/xlsx/costing-figures';
import type { CostingOverheadLine, CostingSheetInput, CostingLabourLine } from '../../../exports/types';
import type { BatchEntity, CostingSettingsEntity, LayEntity } from '../../entities';
import { notFound } from '../../errors';
import { batchCode } from '../batches/batch.routes';
import {
  consumptionBySize,
  estimateConsumption,
  ESTIMATE_GARMENT_SAM,
  layTotals,
  localeForCurrency,
  type LayLike,
} from './costing-consumption';
import type { CostingRepository } from './costing.repository';

/** Settings of a style that has none saved yet (entity defaults; labour must be entered). */
export const DEFAULT_SETTINGS = {
  labourCostPerMinuteMinor: 0,
  overheadPercent: 0,
  wastagePercent: 3,
  marginPercent: 20,
  retailMultiplier: 2,
};

export const presentSettings = (styleId: number, s: CostingSettingsEntity | null): CostingSettingsDto => ({
  styleId,
  labourCostPerMinuteMinor: s?.labourCostPerMinuteMinor ?? DEFAULT_SETTINGS.labourCostPerMinuteMinor,
  overheadPercent: s?.overheadPercent ?? DEFAULT_SETTINGS.overheadPercent,
  wastagePercent: s?.wastagePercent ?? DEFAULT_SETTINGS.wastagePercent,
  marginPercent: s?.marginPercent ?? DEFAULT_SETTINGS.marginPercent,
  retailMultiplier: s?.retailMultiplier ?? DEFAULT_SETTINGS.retailMultiplier,
  isDefault: !s,
});

const round1 = (x: number) => Math.round(x * 10) / 10;

/** Planned lays of a cut plan: saved lay rows, else the plan result's lays. */
function plannedLays(lays: LayEntity[], result: unknown): LayLike[] {
  if (lays.length) return lays;
  const r = result as { lays?: { ratio: Record<string, number>; plies: number; markerLength: number }[]; endAllowance?: number } | null;
  return (r?.lays ?? []).map((l) => ({ ratio: l.ratio, plies: l.plies, markerLengthMm: l.markerLength, endAllowanceMm: r?.endAllowance ?? 0 }));
}

/** Plies actually spread on a cut lay: the rolls' actual plies when recorded. */
const cutPlies = (l: LayEntity) => {
  const actual = l.rolls?.reduce((a, r) => a + (r.actualPlies ?? r.plies), 0) ?? 0;
  return actual > 0 ? actual : l.plies;
};

export type CostingService = ReturnType<typeof createCostingService>;

/** Builds a batch's costing sheet from real numbers where they exist, estimates where they do not. */
export function createCostingService(repo: CostingRepository) {
  async function fabricFor(studioId: number, batch: BatchEntity) {
    const plan = await repo.cutPlan(studioId, batch.id);
    const sizeRun = batch.style?.sizeRun ?? Object.keys(batch.quantities);
    if (plan) {
      const lays = await repo.lays(studioId, plan.id);
      const planned = plannedLays(lays, plan.result);
      const fabric = await repo.fabric(studioId, plan.fabricId);
      if (fabric && planned.length) {
        return { fabric, basis: 'cut-plan' as ConsumptionBasis, perSize: consumptionBySize(planned), planned, cutLays: lays.filter((l) => l.status === 'cut') };
      }
    }
    const markers = await repo.doneMarkers(studioId, batch.styleId, batch.id);
    const marker = markers.find((m) => m.lengthMm && Object.keys(m.ratio).length);
    if (marker) {
      const fabric = (marker.fabricId ? await repo.fabric(studioId, marker.fabricId) : null) ?? (await repo.firstFabric(studioId));
      if (fabric) {
        // One marker standing for the batch; sizes it lacks take its average garment.
        const lay: LayLike = { ratio: marker.ratio, plies: 1, markerLengthMm: marker.lengthMm!, endAllowanceMm: 20 };
        const inMarker = consumptionBySize([lay]);
        const avg = layTotals([lay]).fabricMm / Math.max(1, layTotals([lay]).garments);
        const perSize = Object.fromEntries(sizeRun.map((s) => [s, inMarker[s] ?? avg]));
        return { fabric, basis: 'marker' as ConsumptionBasis, perSize, planned: [] as LayLike[], cutLays: [] as LayEntity[] };
      }
    }
    const fabric = await repo.firstFabric(studioId);
    if (!fabric) return null;
    const perSize = estimateConsumption(sizeRun, batch.style?.baseSize ?? sizeRun[0]);
    return { fabric, basis: 'estimate' as ConsumptionBasis, perSize, planned: [] as LayLike[], cutLays: [] as LayEntity[] };
  }

  async function build(studioId: number, batchId: number, labourBasis: LabourBasis, now: Date) {
    const batch = await repo.batch(studioId, batchId);
    if (!batch || !batch.style) throw notFound('Batch');
    const style = batch.style;
    const studio = await repo.studio(studioId);
    const settings = presentSettings(style.id, await repo.settings(studioId, style.id));
    const [trims, operations, logs, fab] = await Promise.all([
      repo.trims(studioId, style.id),
      repo.operations(studioId, style.id),
      repo.workLogs(studioId, batch.id),
      fabricFor(studioId, batch),
    ]);
    const sizes = style.sizeRun.map((size) => ({ size, quantity: batch.quantities[size] ?? 0 }));
    const locale = localeForCurrency(studio.currency);
    const digits = new Intl.NumberFormat('en', { style: 'currency', currency: studio.currency }).resolvedOptions().maximumFractionDigits ?? 2;
    const notes: string[] = [];

    const wastage = 1 + settings.wastagePercent / 100;
    const fabricMm: Record<string, Millimetres> = {};
    for (const { size } of sizes) fabricMm[size] = mm(round1((fab?.perSize[size] ?? 0) * wastage));
    if (!fab) notes.push('No fabric is recorded for this studio yet, so the sheet has no fabric line.');
    else if (fab.basis === 'estimate') notes.push('Fabric is an estimate until a marker or cut plan exists for this batch.');
    else if (fab.basis === 'marker') notes.push('Fabric comes from the latest finished marker; the cut plan will replace it.');

    const samMinutes = operations.reduce((a, o) => a + o.sam, 0);
    const pieceRateMinor = operations.reduce((a, o) => a + (o.pieceRateMinor ?? 0), 0);
    const isEstimate = operations.length === 0;
    const garmentSam = isEstimate ? ESTIMATE_GARMENT_SAM : Math.round(samMinutes * 1000) / 1000;
    if (isEstimate) notes.push(`No operation list yet: labour uses an estimated ${ESTIMATE_GARMENT_SAM} standard minutes.`);
    const basis: LabourBasis = labourBasis === 'piece-rates' && pieceRateMinor > 0 ? 'piece-rates' : 'sam';
    if (labourBasis === 'piece-rates' && basis !== labourBasis) notes.push('The operations carry no piece rates, so labour is costed by standard minutes.');
    if (settings.labourCostPerMinuteMinor === 0 && basis === 'sam') notes.push('Enter a labour cost per minute in the settings.');

    const scale = 10 ** digits;
    const labour: CostingLabourLine[] =
      basis === 'sam'
        ? [{ operation: `Sewing and finishing (${garmentSam} SAM)`, samMinutes: garmentSam, rate: { perMinute: (settings.labourCostPerMinuteMinor / scale).toFixed(digits) } }]
        : [];
    const overheads: CostingOverheadLine[] = [];
    if (basis === 'piece-rates') overheads.push({ kind: 'per-garment', description: `Labour at piece rates (${operations.length} operations)`, amountMinor: minor(pieceRateMinor) });
    if (settings.overheadPercent > 0) overheads.push({ kind: 'percent', description: `Overheads ${settings.overheadPercent} %`, percent: settings.overheadPercent });

    const perLength = (perMetre: number) => (studio.unitSystem === 'imperial' ? Math.round((perMetre * MM_PER_YARD) / 1000) : perMetre);
    const input: CostingSheetInput = {
      studioName: studio.name,
      dateIso: now.toISOString(),
      locale,
      currency: studio.currency,
      unitSystem: studio.unitSystem,
      style: { code: style.code, name: style.name },
      batch: { code: batchCode(batch.id) },
      sizes,
      fabrics: fab ? [{ description: fab.fabric.name, pricePerLengthMinor: minor(perLength(fab.fabric.pricePerMetreMinor)), consumptionMmBySize: fabricMm }] : [],
      trims: trims.map((t) => ({ description: t.name, quantityPerGarment: t.quantityPerGarment, unit: t.unit, unitPriceMinor: minor(t.unitPriceMinor) })),
      labour,
      overheads,
      marginPercent: settings.marginPercent,
      retailMultiplier: settings.retailMultiplier,
    };
    const figures = computeCostingFigures(input);
    const refs: { kind: CostingLineDto['kind']; refId: number | null; priceMinor: number | null; percent: number | null }[] = [
      ...(fab ? [{ kind: 'fabric' as const, refId: fab.fabric.id, priceMinor: fab.fabric.pricePerMetreMinor, percent: null }] : []),
      ...trims.map((t) => ({ kind: 'trim' as const, refId: t.id, priceMinor: t.unitPriceMinor, percent: null })),
      ...labour.map(() => ({ kind: 'labour' as const, refId: null, priceMinor: settings.labourCostPerMinuteMinor, percent: null })),
      ...overheads.map((o) =>
        o.kind === 'percent'
          ? { kind: 'overhead' as const, refId: null, priceMinor: null, percent: o.percent }
          : { kind: 'labour' as const, refId: null, priceMinor: o.amountMinor, percent: null },
      ),
    ];
    const dto = present(figures, refs, { batch, studio, settings, sizes, locale, notes });
    dto.fabric = fab
      ? { id: fab.fabric.id, name: fab.fabric.name, pricePerMetreMinor: fab.fabric.pricePerMetreMinor, basis: fab.basis, batchFabricMm: round1(sizes.reduce((a, s) => a + fabricMm[s.size] * s.quantity, 0)) }
      : null;
    dto.labour = { basis, samMinutes: garmentSam, pieceRateMinor, operations: operations.length, isEstimate };
    dto.sizes.forEach((s) => (s.fabricMmPerGarment = fabricMm[s.size]));
    dto.actual = actualFigures(fab?.planned ?? [], fab?.cutLays ?? [], logs, garmentSam, dto.totals.garments);
    return { dto, input };
  }

  return { build };
}

function present(
  figures: CostingFigures,
  refs: { kind: CostingLineDto['kind']; refId: number | null; priceMinor: number | null; percent: number | null }[],
  ctx: {
    batch: BatchEntity;
    studio: { name: string; currency: string; unitSystem: 'metric' | 'imperial' };
    settings: CostingSettingsDto;
    sizes: { size: string; quantity: number }[];
    locale: string;
    notes: string[];
  },
): CostingSheetDto {
  const bySize = (values: number[]) => Object.fromEntries(ctx.sizes.map((s, i) => [s.size, values[i]]));
  const garments = figures.totalQuantity;
  return {
    batch: { id: ctx.batch.id, code: batchCode(ctx.batch.id), total: garments },
    style: { id: ctx.batch.styleId, code: ctx.batch.style!.code, name: ctx.batch.style!.name },
    studioName: ctx.studio.name,
    currency: ctx.studio.currency,
    locale: ctx.locale,
    unitSystem: ctx.studio.unitSystem,
    settings: ctx.settings,
    fabric: null,
    labour: { basis: 'sam', samMinutes: 0, pieceRateMinor: 0, operations: 0, isEstimate: true },
    lines: figures.lines.map((l, i) => ({
      kind: refs[i].kind,
      refId: refs[i].refId,
      description: l.description,
      unit: l.unit,
      priceMinor: refs[i].priceMinor,
      percent: refs[i].percent,
      quantities: bySize(l.quantities),
      costMinor: bySize(l.costsMinor),
    })),
    sizes: ctx.sizes.map((s, i) => ({
      size: s.size,
      quantity: s.quantity,
      unitCostMinor: figures.unitCostMinor[i],
      batchCostMinor: figures.batchCostMinor[i],
      fabricMmPerGarment: 0,
    })),
    totals: {
      garments,
      batchCostMinor: figures.totalBatchCostMinor,
      averageUnitCostMinor: figures.averageUnitCostMinor,
      wholesaleMinor: figures.wholesaleMinor,
      retailMinor: figures.suggestedRetailMinor,
      batchWholesaleMinor: figures.wholesaleMinor * garments,
      batchRetailMinor: figures.suggestedRetailMinor * garments,
    },
    actual: {
      layPlies: { planned: 0, cut: 0 },
      fabricMmPerGarment: { planned: 0, actual: null },
      labourMinutesPerGarment: { planned: 0, actual: null },
      labourPaidMinor: 0,
      piecesLogged: 0,
    },
    notes: ctx.notes,
  };
}

function actualFigures(
  planned: LayLike[],
  cutLays: LayEntity[],
  logs: { earnedMinutes: number; payMinor: number; pieces: number; attempt: number }[],
  garmentSam: number,
  garments: number,
): CostingSheetDto['actual'] {
  const plan = layTotals(planned);
  const cut = layTotals(cutLays.map((l) => ({ ...l, plies: cutPlies(l) })));
  const firstTime = logs.filter((l) => l.attempt === 0);
  const earned = firstTime.reduce((a, l) => a + l.earnedMinutes, 0);
  return {
    layPlies: { planned: planned.reduce((a, l) => a + l.plies, 0), cut: cutLays.reduce((a, l) => a + cutPlies(l), 0) },
    fabricMmPerGarment: {
      planned: plan.garments ? round1(plan.fabricMm / plan.garments) : 0,
      actual: cut.garments ? round1(cut.fabricMm / cut.garments) : null,
    },
    labourMinutesPerGarment: { planned: garmentSam, actual: logs.length && garments ? Math.round((earned / garments) * 100) / 100 : null },
    labourPaidMinor: firstTime.reduce((a, l) => a + l.payMinor, 0),
    piecesLogged: firstTime.reduce((a, l) => a + l.pieces, 0),
  };
}
