import { DEFAULT_LAY_MINUTES, DEFAULT_PLY_MINUTES, shrinkageAreaFactor, usableTicketLength, type allocateRolls, type CutOrderPlan, type SizeRatio } from '@planning';
import { mm } from '@shared/units/units';
import type { CreateCutPlanInput } from '../../../shared/schemas/cutting';
import type { CutPlanEntity, FabricEntity, LayEntity, RollEntity, RollReservationEntity } from '../../entities';
import type { LayRollLine } from '../../entities/lay.entity';
import { badRequest, conflict, notFound } from '../../errors';
import { said } from '../../../shared/i18n/speak';
import type { JobRunner } from '../../jobs/job-runner';
import type { BatchRepository } from '../batches/batch.repository';
import type { CuttingPieceSource } from '../grading/graded-pieces';
import { fabricShrinkage, utilisationForEstimates, garmentAreas, piecesOnFabric, type MarkerJobInput } from '../markers/marker-input';
import { storedMarkerSpliceZones } from '../markers/marker-plot';
import type { MarkerRepository } from '../markers/marker.repository';
import type { CutPlanRepository } from './cut-plan.repository';
import type { FabricRepository } from './fabric.repository';
import { ratioKey } from './cut-order-job';
import { withStockLock } from './stock-lock';

/** What planning a cut needs: cutting's own repositories, and what other areas hand in. */
export interface CutPlanDeps {
  plans: CutPlanRepository;
  fabrics: Pick<FabricRepository, 'get' | 'rolls' | 'rollsById'>;
  batches: Pick<BatchRepository, 'get'>;
  jobs: Pick<JobRunner, 'run'>;
  /** The style's cutting pieces per size (the grading area's loader). */
  cuttingPieces: CuttingPieceSource;
  /** Finished markers of a style on a fabric width (the markers area's repository). */
  markers: Pick<MarkerRepository, 'doneForStyle'>;
  /** The style's labour cost per minute, minor units; 0 when the style has no costing settings (costing area). */
  labourCostPerMinute: (studioId: number, styleId: number) => Promise<number>;
}

/** The rates a plan was priced with, minor units of the studio's currency. */
export interface CutPlanRates {
  layCostMinor: number;
  plyCostMinor: number;
  fabricCostPerMetreMinor: number;
  /** Where the lay and ply costs come from. */
  basis: string;
  /** ISO 4217 code of the studio's currency. */
  currency: string;
}

/** What the plan result stores beside the core's output. */
export interface StoredCutPlanResult {
  plan: CutOrderPlan;
  allocation: ReturnType<typeof allocateRolls>;
  lengthSources: { ratio: SizeRatio; source: 'marker' | 'estimate'; markerId?: number }[];
  assumedUtilisation: number;
  /** How many of the style's finished markers on this fabric the assumed utilisation was learnt from (0: the default; older plans: absent). */
  utilisationFromMarkers?: number;
  /** Every marker length of the plan is measured, or every one is an estimate (older plans: absent). */
  markerLengths?: 'measured' | 'estimated';
  /** Why measured markers were not used although some exist. */
  markerLengthsNote?: string;
  /** Rates of the money objective; null = least fabric, then fewest lays (older plans: absent). */
  rates?: CutPlanRates | null;
}

/**
 * The studio's rates for a plan: fabric at the fabric's price per metre; a lay at
 * {@link DEFAULT_LAY_MINUTES} and a ply at {@link DEFAULT_PLY_MINUTES} of the style's labour cost per
 * minute (its costing settings). Without a fabric price or a labour cost there is nothing to weigh, and
 * the plan is least fabric, then fewest lays.
 */
export function cutPlanRates(fabricPricePerMetreMinor: number, labourCostPerMinuteMinor: number, currency: string): CutPlanRates | null {
  if (!(fabricPricePerMetreMinor > 0) || !(labourCostPerMinuteMinor > 0)) return null;
  return {
    layCostMinor: Math.round(DEFAULT_LAY_MINUTES * labourCostPerMinuteMinor),
    plyCostMinor: Math.round(DEFAULT_PLY_MINUTES * labourCostPerMinuteMinor),
    fabricCostPerMetreMinor: fabricPricePerMetreMinor,
    basis: `${DEFAULT_LAY_MINUTES} min a lay and ${DEFAULT_PLY_MINUTES} min a ply at the style's labour cost per minute`,
    currency,
  };
}

/**
 * Spreading mode of a lay: one-way (napped or directional) fabric is spread face up, one way, so every
 * ply runs in one direction; otherwise face up both ways, because our markers already hold both halves
 * of every mirrored pair (a face-to-face spread is for half markers, where facing plies give the pairs).
 */
export function spreadingModeFor(fabric: Pick<FabricEntity, 'isDirectional'>): string {
  return fabric.isDirectional ? 'face-up-one-way' : 'face-up-both-ways';
}

/** Another plan took roll length between the solve and the save: solve again on what is free now. */
class StockMoved extends Error {}

/**
 * A batch has one main cut plan, on the style's self fabric: its lays make the sewing bundles and count the
 * garments cut. Each other material the style links to its own fabric (lining, contrast, interfacing) may have
 * a plan of its own beside it, with its own lays, rolls and marker list; those lays make no bundles (their
 * pieces join the self bundles of the same size at sewing, common practice). Without a self link every fabric
 * counts as main, so planning another one replaces the plan only when the owner says so.
 */
export function isMaterialFabric(materialFabrics: Record<string, number> | null | undefined, fabricId: number): boolean {
  const self = materialFabrics?.self;
  if (self === undefined || self === null || fabricId === self) return false;
  return Object.values(materialFabrics ?? {}).includes(fabricId);
}
const PLAN_ATTEMPTS = 3;

/**
 * Plans the cut of a batch: marker length per candidate ratio (a stored marker of that ratio on this
 * width, else the estimate above), the cut-order core for lays with its lower bound, then roll
 * allocation (shade lots kept apart) for the marker list per roll. Earlier unstarted plans of the batch
 * are superseded; a plan with a cut lay cannot be replaced.
 *
 * Roll allocation sees only free length: on hand less what other batches' plans hold. The new plan
 * holds what it allocates (one reservation per lay and roll) in the same transaction that releases the
 * batch's old holds; a hold is taken only while the length is still free, so when two plans race the
 * later one solves again on what is left (up to three times) rather than double-booking a roll.
 */
export async function planBatchCut(deps: CutPlanDeps, studioId: number, batchId: number, input: CreateCutPlanInput, now: Date = new Date()) {
  const { plans, fabrics, jobs } = deps;
  const batch = await deps.batches.get(studioId, batchId);
  if (!batch?.style) throw notFound('Batch');
  const sizes = batch.style.sizeRun;
  const fabric = await fabrics.get(studioId, input.fabricId);
  if (!fabric) throw badRequest('fabricId: no such fabric in this studio', { fabricId: 'No such fabric' });
  const all = await deps.cuttingPieces(studioId, batch.styleId);
  if (!Object.keys(all).length) throw conflict('This style has no graded pieces yet: grade it first');
  const pieces = piecesOnFabric(all, batch.style.materialFabrics, fabric);
  const links = batch.style.materialFabrics;
  const material = isMaterialFabric(links, fabric.id);
  // The plans this one replaces: the plan on this fabric, and for a main plan any other main plan (a change of
  // the self fabric). A material's plan (lining…) stands beside the main plan and never replaces it.
  const live = (await plans.livePlans(studioId, batchId)).filter((p) => p.fabricId === fabric.id || (!material && !isMaterialFabric(links, p.fabricId)));
  const cutLays = (await Promise.all(live.map((p) => plans.laysOf(studioId, p.id)))).flat().filter((l) => l.status === 'cut');
  // One main cut plan per batch (its lays make the sewing bundles): another fabric's plan is never dropped unasked.
  const other = live.find((p) => p.fabricId !== fabric.id);
  if (other) {
    const names = { other: (await fabrics.get(studioId, other.fabricId))?.name ?? `#${other.fabricId}`, fabric: fabric.name };
    if (cutLays.length) throw conflict(said('planOnOtherFabricCut', names), { fabricId: said('planOnOtherFabricField', names) });
    if (!input.replacePlan) throw conflict(said('planOnOtherFabric', names), { fabricId: said('planOnOtherFabricField', names) });
  }
  const remaining = remainingQuantities(batch.quantities, cutLays);
  if (Object.values(remaining).every((q) => q === 0)) throw conflict('Every garment of this batch is already cut');

  // Estimates grow with shrinkage as the nested pieces do: area × 1 ÷ ((1 − s_length)(1 − s_width)).
  const shrink = shrinkageAreaFactor(fabricShrinkage(fabric));
  const areas = Object.fromEntries(Object.entries(garmentAreas(pieces)).map(([size, a]) => [size, a * shrink]));
  const stored = new Map<string, { id: number; length: number; ratio: SizeRatio; zones: { near: number; far: number }[] }>();
  const done = await deps.markers.doneForStyle(studioId, batch.styleId, fabric.id, fabric.widthMm);
  const estimateAt = utilisationForEstimates(done);
  for (const m of done) {
    const k = ratioKey(m.ratio, sizes);
    const prev = stored.get(k);
    if (m.lengthMm && (!prev || m.lengthMm < prev.length)) {
      // Where the marker's pieces let a ply be joined: the only places a plan may splice rolls.
      const zones = storedMarkerSpliceZones(m.input as MarkerJobInput | null, m.result as { placements: { pieceId: string; rotation: number; mirrored: boolean; x: number; y: number }[] } | null, m.lengthMm);
      stored.set(k, { id: m.id, length: m.lengthMm, ratio: m.ratio, zones });
    }
  }
  const labour = await deps.labourCostPerMinute(studioId, batch.styleId);
  const rates = cutPlanRates(fabric.pricePerMetreMinor, labour, (await plans.studio(studioId)).currency);
  for (let attempt = 1; ; attempt++) {
    const rolls = await pickRolls(fabrics, studioId, fabric, input.rollIds);
    // Holds this plan gives back: those of the plans it replaces (and of retired batches), never those of the
    // batch's plans on other materials, which stand.
    const replacedIds = new Set(live.map((p) => p.id));
    const replaced = (await plans.stock.releasable(studioId, batchId)).filter((h) => h.batchId !== batchId || replacedIds.has(h.cutPlanId));
    const free = freeLengths(rolls, replaced);
    // The solve is pure: it runs here, or on a job worker when REDIS_URL is set (server/jobs).
    const solved = await jobs.run('cut-order', {
      order: {
        sizes, quantities: remaining, maxPlies: Math.min(input.maxPlies, fabric.maxPlies), maxGarmentsPerMarker: input.maxGarmentsPerMarker,
        maxMarkerLength: input.maxMarkerLengthMm === undefined ? undefined : mm(input.maxMarkerLengthMm),
        overcutPercent: input.overcutPercent, endAllowance: input.endAllowanceMm === undefined ? undefined : mm(input.endAllowanceMm),
      },
      measured: [...stored.values()].map((v) => ({ ratio: v.ratio, lengthMm: v.length, spliceZones: v.zones })),
      garmentAreasMm2: areas,
      widthMm: fabric.widthMm,
      assumedUtilisation: estimateAt.utilisation,
      rolls: rolls.filter((r) => (free.get(r.id) ?? 0) > 0).map((r) => ({ id: String(r.id), label: r.label, lengthMm: free.get(r.id)!, shadeLot: r.shadeLot, widthMm: r.widthMm })),
      ...(rates ? { costs: { layCost: rates.layCostMinor, plyCost: rates.plyCostMinor, fabricCostPerMetre: rates.fabricCostPerMetreMinor } } : {}),
    });
    if ('rangeError' in solved) throw badRequest(`maxMarkerLengthMm: ${solved.rangeError}`, { maxMarkerLengthMm: solved.rangeError });
    try {
      return await withStockLock(studioId, () => savePlan(plans, { studioId, batchId, fabric, input, live, cutLays, stored, sizes, rolls, replaced, now, rates, estimateAt }, solved));
    } catch (err) {
      if (!(err instanceof StockMoved)) throw err;
      if (attempt >= PLAN_ATTEMPTS) throw conflict('Roll stock kept changing while this plan was made; plan again');
    }
  }
}

/**
 * What a plan may count on from a roll: a roll still at its packing-list ticket length (never measured,
 * never cut from) less the short-length and flaw allowances; a measured roll as measured.
 */
export function onHandForPlanning(r: Pick<RollEntity, 'remainingMm' | 'lengthMm' | 'ticketLengthMm'>): number {
  const untouched = r.ticketLengthMm !== null && r.ticketLengthMm !== undefined && r.remainingMm === r.lengthMm;
  return untouched ? usableTicketLength(r.remainingMm) : r.remainingMm;
}

/** Free length per roll: on hand less what is held, plus what the plan being made will release. */
function freeLengths(rolls: RollEntity[], replaced: { rollId: number; lengthMm: number }[]) {
  const back = new Map<number, number>();
  for (const r of replaced) back.set(r.rollId, (back.get(r.rollId) ?? 0) + r.lengthMm);
  return new Map(rolls.map((r) => [r.id, Math.max(0, onHandForPlanning(r) - r.reservedMm + (back.get(r.id) ?? 0))]));
}

interface PlanContext {
  studioId: number;
  batchId: number;
  fabric: FabricEntity;
  input: CreateCutPlanInput;
  live: CutPlanEntity[];
  cutLays: LayEntity[];
  stored: Map<string, { id: number; length: number; ratio: SizeRatio }>;
  sizes: string[];
  rolls: RollEntity[];
  replaced: RollReservationEntity[];
  now: Date;
  rates: CutPlanRates | null;
  estimateAt: { utilisation: number; markers: number };
}

/** Length each roll gives each lay: the drop in the roll's remaining length over its segment, mm. */
function lengthsByLayAndRoll(allocation: ReturnType<typeof allocateRolls>) {
  const out: { lay: number; rollId: number; lengthMm: number }[] = [];
  for (const u of allocation.rolls) {
    let before = u.length;
    for (const s of u.segments) {
      out.push({ lay: s.lay, rollId: Number(u.id), lengthMm: before - s.remaining });
      before = s.remaining;
    }
  }
  return out;
}

async function savePlan(
  plans: CutPlanRepository,
  c: PlanContext,
  solved: { plan: CutOrderPlan; allocation: ReturnType<typeof allocateRolls>; markerLengths: 'measured' | 'estimated'; measuredRefused?: string },
) {
  const { studioId, batchId, fabric, input, live, cutLays, stored, sizes, rates } = c;
  const { plan, allocation, markerLengths } = solved;
  const lengthSources = plan.lays.map((l) => {
    const hit = markerLengths === 'measured' ? stored.get(ratioKey(l.ratio, sizes)) : undefined;
    return hit ? { ratio: l.ratio, source: 'marker' as const, markerId: hit.id } : { ratio: l.ratio, source: 'estimate' as const };
  });
  const result: StoredCutPlanResult = {
    plan, allocation, lengthSources, assumedUtilisation: c.estimateAt.utilisation, utilisationFromMarkers: c.estimateAt.markers, markerLengths, rates,
    ...(solved.measuredRefused ? { markerLengthsNote: solved.measuredRefused } : {}),
  };
  const byId = new Map(c.rolls.map((r) => [String(r.id), r]));
  const firstSeq = cutLays.reduce((a, l) => Math.max(a, l.seq), 0) + 1;
  // Lays are numbered in the order the rolls are spread: roll allocation serves the longest marker first
  // (planning/cut-orders/allocate-rolls.ts), and each lay's expected remnants assume that order, so lay 1
  // is the first spread and the remnants on a roll fall from lay to lay.
  const spreadOrder = plan.lays.map((_, i) => i).sort((a, b) => plan.lays[b].markerLength - plan.lays[a].markerLength || a - b);
  const seqOf = new Map(spreadOrder.map((lay, rank) => [lay, firstSeq + rank]));
  const waiting = (await Promise.all(live.map((p) => plans.laysOf(studioId, p.id)))).flat().filter((l) => l.status === 'planned');
  return plans.transaction(async (tx) => {
    await tx.stock.release(studioId, c.replaced, c.now);
    for (const p of live) await tx.supersedePlan(studioId, p.id);
    const saved = await tx.insertPlan({
      studioId, batchId, fabricId: fabric.id, input: { ...input, maxPlies: Math.min(input.maxPlies, fabric.maxPlies) }, result,
      fabricUsedMm: plan.fabricUsed, lowerBoundMm: plan.lowerBound, status: 'draft',
    });
    const fresh: LayEntity[] = [];
    const kept = new Set<number>();
    plan.lays.forEach((l, i) => {
      const lines: LayRollLine[] = allocation.rolls.flatMap((u) =>
        u.segments.filter((s) => s.lay === i).map((s) => {
          const r = byId.get(u.id)!;
          return { rollId: r.id, label: r.label, shadeLot: r.shadeLot, plies: s.plies, expectedRemnantMm: Math.round(s.remaining) };
        }),
      );
      const lay = tx.newLay({
        studioId, cutPlanId: saved.id, batchId, seq: seqOf.get(i)!, ratio: l.ratio, plies: l.plies, markerLengthMm: Math.round(l.markerLength),
        endAllowanceMm: plan.endAllowance, markerId: lengthSources[i].markerId ?? null, spreadingMode: spreadingModeFor(fabric),
        rolls: lines, status: 'planned', flaws: '', cutAt: null, corrections: null,
      });
      const same = waiting.find((w) => !kept.has(w.id) && sameLay(w, lay, sizes));
      if (same) {
        kept.add(same.id);
        fresh.push(Object.assign(same, { cutPlanId: saved.id, seq: seqOf.get(i)! }));
      } else fresh.push(lay);
    });
    // A lay that did not change keeps its id (and anything recorded on it); the others are retired, visibly.
    for (const w of waiting) if (!kept.has(w.id)) await tx.updateLay(studioId, w.id, { status: 'retired' });
    // Saved in spreading order too, so new lays' ids rise with their numbers; save fills in each entity's id.
    await tx.saveLays(spreadOrder.map((i) => fresh[i]));
    const savedLays = fresh;
    // The batch's old holds were released above; every lay of the new plan (kept or new) holds its length again.
    for (const h of lengthsByLayAndRoll(allocation)) {
      if (!(h.lengthMm > 0)) continue;
      const held = await tx.stock.reserve({ studioId, rollId: h.rollId, cutPlanId: saved.id, layId: savedLays[h.lay].id, batchId, lengthMm: h.lengthMm });
      if (!held) throw new StockMoved();
    }
    // Lays already cut move to the new plan unchanged; the new lays cover only what is left to cut.
    for (const l of cutLays) await tx.updateLay(studioId, l.id, { cutPlanId: saved.id });
    return saved;
  });
}

/** A waiting lay is unchanged when ratio, plies, marker, allowance, spreading and its rolls (and plies per roll) are. */
function sameLay(a: LayEntity, b: LayEntity, sizes: string[]): boolean {
  const rolls = (x: LayEntity) => x.rolls.map((r) => `${r.rollId}:${r.plies}`).join(',');
  return ratioKey(a.ratio, sizes) === ratioKey(b.ratio, sizes) && a.plies === b.plies && Math.round(a.markerLengthMm) === Math.round(b.markerLengthMm)
    && a.endAllowanceMm === b.endAllowanceMm && a.markerId === b.markerId && a.spreadingMode === b.spreadingMode && rolls(a) === rolls(b);
}

async function pickRolls(fabrics: CutPlanDeps['fabrics'], studioId: number, fabric: FabricEntity, rollIds?: number[]): Promise<RollEntity[]> {
  if (rollIds?.length) {
    const found = await fabrics.rollsById(studioId, rollIds);
    const fields: Record<string, string> = {};
    rollIds.forEach((id, i) => {
      const r = found.find((x) => x.id === id);
      if (!r) fields[`rollIds.${i}`] = 'No such roll';
      else if (r.fabricId !== fabric.id) fields[`rollIds.${i}`] = `Roll ${r.label} is another fabric`;
    });
    if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
    return found.filter((r) => r.remainingMm > 0);
  }
  return (await fabrics.rolls(studioId, fabric.id)).filter((r) => r.remainingMm > 0);
}

/** Garments still to cut: the order less what cut lays produced (plies actually spread where recorded). */
export function remainingQuantities(quantities: Record<string, number>, cutLays: Pick<LayEntity, 'ratio' | 'plies' | 'rolls'>[]): Record<string, number> {
  const out = { ...quantities };
  for (const l of cutLays) {
    const plies = l.rolls.reduce((a, r) => a + (r.actualPlies ?? r.plies), 0) || l.plies;
    for (const [s, n] of Object.entries(l.ratio)) out[s] = Math.max(0, (out[s] ?? 0) - n * plies);
  }
  return out;
}
