import { documentSettings } from '../studios/document-settings';
import { documentWords } from '../../../exports/document-words';
import type { CostingLineDto, CostingSettingsDto, CostingSheetDto, ConsumptionBasis, LabourBasis } from '../../../shared/schemas/costing';
import { minor, mm, priceIn, pricePerMetreMinor, type Millimetres } from '../../../shared/units';
import { currencyDigits } from '../../../shared/units/money';
import { costGarment, planConsumption, priceFromMargin, roundMinor, shrinkageAreaFactor } from '../../../planning/index';
import type { CostingOverheadLine, CostingSheetInput, CostingLabourLine } from '../../../exports/types';
import type { BatchEntity, CostingSettingsEntity, FabricEntity, LayEntity } from '../../entities';
import { notFound } from '../../errors';
import { batchCode } from '../../../shared/schemas/batches';
import { utilisationForEstimates } from '../markers/marker-input';
import {
  consumptionBySize,
  estimateConsumption,
  ESTIMATE_GARMENT_SAM,
  layForConsumption,
  layTotals,
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
  labourBasis: 'sam' as LabourBasis,
};

export const presentSettings = (styleId: number, s: CostingSettingsEntity | null): CostingSettingsDto => ({
  styleId,
  labourCostPerMinuteMinor: s?.labourCostPerMinuteMinor ?? DEFAULT_SETTINGS.labourCostPerMinuteMinor,
  overheadPercent: s?.overheadPercent ?? DEFAULT_SETTINGS.overheadPercent,
  wastagePercent: s?.wastagePercent ?? DEFAULT_SETTINGS.wastagePercent,
  marginPercent: s?.marginPercent ?? DEFAULT_SETTINGS.marginPercent,
  retailMultiplier: s?.retailMultiplier ?? DEFAULT_SETTINGS.retailMultiplier,
  labourBasis: s?.labourBasis ?? DEFAULT_SETTINGS.labourBasis,
  isDefault: !s,
});

const round1 = (x: number) => Math.round(x * 10) / 10;

/** The fabric's rate per metre from its price as quoted (a yard price ÷ 0.9144, unrounded). */
const exactPerMetre = (f: Pick<FabricEntity, 'priceMinor' | 'priceUnit'>) => pricePerMetreMinor({ amountMinor: f.priceMinor, per: f.priceUnit });

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
    const plan = await repo.cutPlan(studioId, batch.id, batch.style?.materialFabrics?.self);
    const sizeRun = batch.style?.sizeRun ?? Object.keys(batch.quantities);
    if (plan) {
      const lays = await repo.lays(studioId, plan.id);
      const planned = plannedLays(lays, plan.result);
      const fabric = await repo.fabric(studioId, plan.fabricId);
      if (fabric && planned.length) {
        // Cut lays count what the cutter recorded (spread and remnants), planned lays their plan.
        const consumed = await repo.consumedByLay(studioId, lays.filter((l) => l.status === 'cut').map((l) => l.id));
        const rows = lays.map((l) => ({ ...l, rolls: l.rolls.map((r) => ({ ...r, takenMm: r.takenMm ?? consumed.get(l.id)?.get(r.rollId) })) }));
        const used = rows.length ? planConsumption(rows.map(layForConsumption)) : null;
        const perSize = used && Object.keys(used.perSize).length ? used.perSize : consumptionBySize(planned);
        return { fabric, basis: 'cut-plan' as ConsumptionBasis, perSize, planned, cutLays: rows.filter((l) => l.status === 'cut'), recorded: used?.basis ?? 'planned', stillToCutMm: used?.stillNeededMm };
      }
    }
    const markers = await repo.doneMarkers(studioId, batch.styleId, batch.id);
    // The main fabric's marker: on the style's self fabric when it links one (a newer lining marker is not the shell's).
    const self = batch.style?.materialFabrics?.self;
    const marker = markers.find((m) => m.lengthMm && Object.keys(m.ratio).length && (!self || m.fabricId === self));
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
    // The style's self fabric when it links one, else the studio's first fabric.
    const selfId = batch.style?.materialFabrics?.self;
    const fabric = (selfId ? await repo.fabric(studioId, selfId) : null) ?? (await repo.firstFabric(studioId));
    if (!fabric) return null;
    const perSize = estimateConsumption(sizeRun, batch.style?.baseSize ?? sizeRun[0]);
    return { fabric, basis: 'estimate' as ConsumptionBasis, perSize, planned: [] as LayLike[], cutLays: [] as LayEntity[] };
  }

  /**
   * The style's other materials' fabrics (lining, contrast, interfacing…: every linked fabric but the sheet's main
   * one), each with a length per garment by size: its pieces' cut area ÷ (width × the utilisation of the style's
   * finished markers on that fabric, else the assumed 75 %), plus wastage. None when the style links no materials.
   */
  async function otherMaterialFabrics(studioId: number, batchId: number, style: NonNullable<BatchEntity['style']>, mainFabricId: number | undefined, wastage: number) {
    const links = Object.entries(style.materialFabrics ?? {}).filter(([, id]) => id !== mainFabricId);
    if (!links.length) return [];
    const areas = await repo.materialAreas(studioId, style.id);
    const out = [];
    for (const id of [...new Set(links.map(([, f]) => f))]) {
      const fabric = await repo.fabric(studioId, id);
      if (!fabric) continue;
      const materials = links.filter(([, f]) => f === id).map(([m]) => m);
      const at = utilisationForEstimates(await repo.styleMarkersOn(studioId, style.id, id, fabric.widthMm));
      // The material's own cut plan for this batch, when it has one, says what its lays spread per garment.
      const plan = await repo.cutPlan(studioId, batchId, id);
      const lays = plan ? await repo.lays(studioId, plan.id) : [];
      const planned = plan ? plannedLays(lays, plan.result) : [];
      const fromPlan: Record<string, number> = planned.length ? consumptionBySize(planned) : {};
      // What is left to buy for follows what its lays still have to spread, as for the main fabric.
      const stillToCutMm = planned.length ? planConsumption(lays.map(layForConsumption)).stillNeededMm : undefined;
      const perSize: Record<string, Millimetres> = Object.fromEntries(style.sizeRun.map((s) => {
        if (fromPlan[s] !== undefined) return [s, mm(round1(fromPlan[s] * wastage))];
        const area = materials.reduce((a, m) => a + (areas[s]?.[m] ?? 0), 0);
        // The pieces are cut larger by the fabric's shrinkage, so their area is too.
        const grown = area * shrinkageAreaFactor({ lengthwisePercent: fabric.shrinkageLengthPercent, widthwisePercent: fabric.shrinkageWidthPercent });
        return [s, mm(round1((grown / (fabric.widthMm * at.utilisation)) * wastage))];
      }));
      out.push({ fabric, materials, perSize, at, fromPlan: planned.length > 0, stillToCutMm });
    }
    return out;
  }

  /** The sheet of a batch; labour on the style's saved basis unless `basisOverride` is given. */
  async function build(studioId: number, batchId: number, basisOverride: LabourBasis | undefined, now: Date) {
    const batch = await repo.batch(studioId, batchId);
    if (!batch || !batch.style) throw notFound('Batch');
    const style = batch.style;
    const studio = await repo.studio(studioId);
    const settings = presentSettings(style.id, await repo.settings(studioId, style.id));
    const labourBasis = basisOverride ?? settings.labourBasis;
    const [trims, operations, logs, fab] = await Promise.all([
      repo.trims(studioId, style.id),
      repo.operations(studioId, style.id),
      repo.workLogs(studioId, batch.id),
      fabricFor(studioId, batch),
    ]);
    const sizes = style.sizeRun.map((size) => ({ size, quantity: batch.quantities[size] ?? 0 }));
    const { locale, language, timeZone } = documentSettings(studio);
    const words = documentWords(language);
    const digits = currencyDigits(studio.currency);
    const notes: string[] = [];

    const wastage = 1 + settings.wastagePercent / 100;
    const fabricMm: Record<string, Millimetres> = {};
    for (const { size } of sizes) fabricMm[size] = mm(round1((fab?.perSize[size] ?? 0) * wastage));
    const others = await otherMaterialFabrics(studioId, batch.id, style, fab?.fabric.id, wastage);
    for (const o of others) {
      if (o.fromPlan) {
        notes.push(`${o.fabric.name}: from its own cut plan for this batch, wastage included.`);
        continue;
      }
      const pct = Math.round(o.at.utilisation * 100);
      notes.push(`${o.fabric.name}: estimated from the cut area of the pieces of ${o.materials.join(' and ')} at ${pct} % utilisation, ${o.at.markers ? `that of the style's ${o.at.markers === 1 ? 'marker' : `${o.at.markers} markers`} on it` : 'until it has its own marker'}.`);
    }
    if (!fab) notes.push('No fabric is recorded for this studio yet, so the sheet has no fabric line.');
    else if (fab.basis === 'estimate') notes.push('Fabric is an estimate until a marker or cut plan exists for this batch.');
    else if (fab.basis === 'marker') notes.push('Fabric comes from the latest finished marker; the cut plan will replace it.');
    else if ('recorded' in fab && fab.recorded !== 'planned') notes.push(fab.recorded === 'recorded' ? 'Fabric is what the cutter recorded: the lengths spread and the remnants measured.' : 'Fabric of the cut lays is what the cutter recorded (spreads and remnants); the lays still to cut count their plan.');

    const samMinutes = operations.reduce((a, o) => a + o.sam, 0);
    const pieceRateMinor = operations.reduce((a, o) => a + (o.pieceRateMinor ?? 0), 0);
    const isEstimate = operations.length === 0;
    const garmentSam = isEstimate ? ESTIMATE_GARMENT_SAM : Math.round(samMinutes * 1000) / 1000;
    if (isEstimate) notes.push(`No operation list yet: labour uses an estimated ${ESTIMATE_GARMENT_SAM} standard minutes.`);
    const basis: LabourBasis = labourBasis === 'piece-rates' && pieceRateMinor > 0 ? 'piece-rates' : 'sam';
    if (labourBasis === 'piece-rates' && basis !== labourBasis) notes.push('The operations carry no piece rates, so labour is costed by standard minutes.');
    if (settings.labourCostPerMinuteMinor === 0 && basis === 'sam') notes.push('Enter a labour cost per minute in the settings.');

    const scale = 10 ** digits;
    const sizeLabels = sizes.map((x) => x.size);
    const perSize = (v: number) => Object.fromEntries(sizeLabels.map((x) => [x, v]));
    const trimLines = trims.map((t) => ({ name: t.name, quantityPerGarment: t.quantityPerGarment, unitPrice: t.unitPriceMinor }));
    const labourLine =
      basis === 'sam'
        ? { name: words('costing.sewingLine', { sam: garmentSam }), minutes: garmentSam, costPerMinute: settings.labourCostPerMinuteMinor }
        : { name: words('costing.pieceRateLine', { count: operations.length }), pieceRate: pieceRateMinor };
    // The pure core (planning/costing) prices every size; the workbook gets the same rounded inputs.
    const sheet = costGarment({
      sizes: sizeLabels,
      quantities: batch.quantities,
      fabrics: [
        ...(fab ? [{ name: fab.fabric.name, pricePerMetre: exactPerMetre(fab.fabric), lengthPerGarment: fabricMm }] : []),
        ...others.map((o) => ({ name: o.fabric.name, pricePerMetre: exactPerMetre(o.fabric), lengthPerGarment: o.perSize })),
      ],
      trims: trimLines,
      labour: [labourLine],
      overheads: settings.overheadPercent > 0 ? { percentOfPrimeCost: settings.overheadPercent } : undefined,
      marginPercent: settings.marginPercent,
      retailMultiplier: settings.retailMultiplier,
    });
    const lines: CostingLineDto[] = [];
    if (fab) lines.push({ kind: 'fabric', refId: fab.fabric.id, description: fab.fabric.name, unit: 'm', priceMinor: fab.fabric.pricePerMetreMinor, percent: null, quantities: Object.fromEntries(sizeLabels.map((x) => [x, fabricMm[x] / 1000])), costMinor: {} });
    for (const o of others) lines.push({ kind: 'fabric', refId: o.fabric.id, description: o.fabric.name, unit: 'm', priceMinor: o.fabric.pricePerMetreMinor, percent: null, quantities: Object.fromEntries(sizeLabels.map((x) => [x, o.perSize[x] / 1000])), costMinor: {}, ...(o.stillToCutMm !== undefined ? { stillToCutMm: round1(o.stillToCutMm) } : {}) });
    for (const t of trims) lines.push({ kind: 'trim', refId: t.id, description: t.name, unit: t.unit, priceMinor: t.unitPriceMinor, percent: null, quantities: perSize(t.quantityPerGarment), costMinor: {} });
    lines.push('pieceRate' in labourLine
      ? { kind: 'labour', refId: null, description: labourLine.name, unit: 'per garment', priceMinor: pieceRateMinor, percent: null, quantities: perSize(1), costMinor: {} }
      : { kind: 'labour', refId: null, description: labourLine.name, unit: 'min', priceMinor: settings.labourCostPerMinuteMinor, percent: null, quantities: perSize(garmentSam), costMinor: {} });
    if (settings.overheadPercent > 0) lines.push({ kind: 'overhead', refId: null, description: words('costing.overheadLine', { percent: settings.overheadPercent }), unit: '%', priceMinor: null, percent: settings.overheadPercent, quantities: perSize(0), costMinor: {} });
    sheet.sizes.forEach((sc) => sc.lines.forEach((l, i) => (lines[i].costMinor[sc.size] = l.amount)));

    // The headline prices follow the sheet's own formulas: wholesale from the average unit cost.
    const averageUnitCostMinor = sheet.average.unitCost;
    const wholesaleMinor = priceFromMargin(averageUnitCostMinor, settings.marginPercent);
    const retailMinor = roundMinor(wholesaleMinor * settings.retailMultiplier);
    const garments = sheet.batch.quantity;
    const dto: CostingSheetDto = {
      batch: { id: batch.id, code: batchCode(batch), total: garments },
      style: { id: style.id, code: style.code, name: style.name },
      studioName: studio.name,
      currency: studio.currency,
      locale,
      unitSystem: studio.unitSystem,
      settings,
      fabric: null,
      labour: { basis, samMinutes: garmentSam, pieceRateMinor, operations: operations.length, isEstimate },
      lines,
      sizes: sheet.sizes.map((sc, i) => ({
        size: sc.size,
        quantity: sizes[i].quantity,
        unitCostMinor: sc.unitCost,
        batchCostMinor: sc.unitCost * sizes[i].quantity,
        wholesaleMinor: sc.wholesale,
        retailMinor: sc.retail,
        fabricMmPerGarment: fabricMm[sc.size],
      })),
      totals: {
        garments,
        batchCostMinor: sheet.batch.cost,
        averageUnitCostMinor,
        wholesaleMinor,
        retailMinor,
        batchWholesaleMinor: wholesaleMinor * garments,
        batchRetailMinor: retailMinor * garments,
      },
      actual: actualFigures(fab?.planned ?? [], fab?.cutLays ?? [], logs, garmentSam, garments),
      notes,
    };

    const labour: CostingLabourLine[] =
      basis === 'sam'
        ? [{ operation: labourLine.name, samMinutes: garmentSam, rate: { perMinute: (settings.labourCostPerMinuteMinor / scale).toFixed(digits) } }]
        : [{ operation: labourLine.name, samMinutes: 0, rate: { perGarmentMinor: minor(pieceRateMinor) } }];
    const overheads: CostingOverheadLine[] = [];
    if (settings.overheadPercent > 0) overheads.push({ kind: 'percent', description: lines[lines.length - 1].description, percent: settings.overheadPercent });
    // The workbook prices per yard for an imperial studio: a price quoted per yard goes in as quoted.
    const perLength = (f: FabricEntity) => {
      const want = studio.unitSystem === 'imperial' ? 'yard' : 'metre';
      return f.priceUnit === want ? f.priceMinor : Math.round(priceIn({ amountMinor: f.priceMinor, per: f.priceUnit }, want));
    };
    const input: CostingSheetInput = {
      studioName: studio.name,
      dateIso: now.toISOString(),
      locale,
      language,
      timeZone,
      currency: studio.currency,
      unitSystem: studio.unitSystem,
      style: { code: style.code, name: style.name },
      batch: { code: batchCode(batch) },
      sizes,
      fabrics: [
        ...(fab ? [{ description: fab.fabric.name, pricePerLengthMinor: minor(perLength(fab.fabric)), consumptionMmBySize: fabricMm }] : []),
        ...others.map((o) => ({ description: o.fabric.name, pricePerLengthMinor: minor(perLength(o.fabric)), consumptionMmBySize: o.perSize })),
      ],
      trims: trims.map((t) => ({ description: t.name, quantityPerGarment: t.quantityPerGarment, unit: t.unit, unitPriceMinor: minor(t.unitPriceMinor) })),
      labour,
      overheads,
      marginPercent: settings.marginPercent,
      retailMultiplier: settings.retailMultiplier,
    };
    dto.fabric = fab
      ? {
        id: fab.fabric.id, name: fab.fabric.name, pricePerMetreMinor: fab.fabric.pricePerMetreMinor, basis: fab.basis, batchFabricMm: round1(sizes.reduce((a, s) => a + fabricMm[s.size] * s.quantity, 0)),
        ...('stillToCutMm' in fab && fab.stillToCutMm !== undefined ? { stillToCutMm: round1(fab.stillToCutMm) } : {}),
      }
      : null;
    return { dto, input };
  }

  return { build };
}

function actualFigures(
  planned: LayLike[],
  cutLays: LayEntity[],
  logs: { earnedMinutes: number; payMinor: number; pieces: number; attempt: number }[],
  garmentSam: number,
  garments: number,
): CostingSheetDto['actual'] {
  const plan = layTotals(planned);
  // Recorded lengths where the cutter gave them (spread and remnants), else the planned spread per ply cut.
  const cut = planConsumption(cutLays.map(layForConsumption));
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
