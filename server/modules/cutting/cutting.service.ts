import type { GradingSetRepository } from '../grading/grading-set.repository';
import { materialCutTicketInput } from './material-cut-ticket';
import { can, type Role } from '../../../shared/auth/permissions';
import type { CorrectLayInput, CreateCutPlanInput, RecordLayInput, ShortageDto } from '../../../shared/schemas/cutting';
import type { Actor } from '../../auth/require';
import type { BatchEntity, LayEntity } from '../../entities';
import { conflict, notFound } from '../../errors';
import type { Download } from '../../middleware/download';
import type { AuditRepository } from '../audit/audit.repository';
import { batchCode } from '../../../shared/schemas/batches';
import { presentBundle, presentCutPlan, presentLay, presentLayFabric } from './cut-plan.presenter';
import { isMaterialFabric, planBatchCut, type CutPlanDeps } from './cut-plan.service';
import { bundleRegisterInput, markerListInput, withQr } from './cutting-documents';
import { correctLay, markLayCut, recordLay } from './lay.service';
import { layShortages } from './shortage';

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
const PDF = 'application/pdf';

export interface CuttingServiceDeps extends CutPlanDeps {
  batches: CutPlanDeps['batches'] & { list(studioId: number): Promise<{ id: number; number: number; status: string }[]> };
  audit: AuditRepository;
  now: () => Date;
  /** The styles' stored pieces, for a material's cut ticket. */
  gradingSets: Pick<GradingSetRepository, 'byStyle'>;
}

export type CuttingService = ReturnType<typeof createCuttingService>;

/** Batch documents the cutting area builds (each through the job runner). */
export type BatchDocument = 'marker-list.xlsx' | 'marker-list.pdf' | 'bundle-register.xlsx' | 'bundle-tickets.pdf';
/** Documents of one lay. */
export type LayDocument = 'cut-ticket.pdf' | 'marker-list.xlsx' | 'marker-list.pdf' | 'bundle-tickets.pdf';

/** Cut plans of batches, the cutter's lays, their bundles and documents. */
export function createCuttingService(deps: CuttingServiceDeps) {
  const { plans, fabrics, jobs, audit, now } = deps;

  const loadBatch = async (studioId: number, id: number) => {
    const b = await deps.batches.get(studioId, id);
    if (!b) throw notFound('Batch');
    return b;
  };
  /** The batches of these lays by id, for the batch code each lay is shown with. */
  const batchesOf = async (studioId: number, list: LayEntity[]) => {
    const ids = new Set(list.map((l) => l.batchId));
    return new Map((await deps.batches.list(studioId)).filter((b) => ids.has(b.id)).map((b) => [b.id, b]));
  };
  const shortagesOf = async (studioId: number, list: LayEntity[]) =>
    layShortages(list, await plans.stock.rolls(studioId, [...new Set(list.flatMap((l) => l.rolls.map((r) => r.rollId)))]));
  /** The batch's plan on `fabricId`, or its main plan (on the style's self fabric). */
  const planOf = (batch: BatchEntity, fabricId?: number) => plans.currentPlan(batch.studioId, batch.id, { fabricId, main: batch.style?.materialFabrics?.self ?? null });
  const planDto = async (studioId: number, batchId: number, role: Role, fabricId?: number) => {
    const batch = await loadBatch(studioId, batchId);
    const p = await planOf(batch, fabricId);
    if (!p) return null;
    const list = await plans.laysOf(studioId, p.id);
    const fabric = await fabrics.get(studioId, p.fabricId);
    const links = batch.style?.materialFabrics;
    const live = await plans.livePlans(studioId, batchId);
    const others = await Promise.all(
      live.map(async (x) => ({ fabricId: x.fabricId, fabricName: (await fabrics.get(studioId, x.fabricId))?.name ?? '', material: isMaterialFabric(links, x.fabricId) })),
    );
    const dto = presentCutPlan(p, batch, fabric?.name ?? '', list, await plans.bundleCounts(studioId, list.map((l) => l.id)), await shortagesOf(studioId, list), can(role, 'costs:read'));
    return { ...dto, material: isMaterialFabric(links, p.fabricId), plans: others.sort((a, b) => Number(a.material) - Number(b.material) || a.fabricId - b.fabricId) };
  };
  const markerListFor = async (studioId: number, batchId: number, only?: number, fabricId?: number) => {
    const batch = await loadBatch(studioId, batchId);
    const p = await planOf(batch, fabricId);
    if (!p) throw notFound('Cut plan');
    const fabric = await fabrics.get(studioId, p.fabricId);
    if (!fabric) throw notFound('Fabric');
    const list = (await plans.laysOf(studioId, p.id)).filter((l) => only === undefined || l.id === only);
    const rolls = await plans.stock.rolls(studioId, [...new Set(list.flatMap((l) => l.rolls.map((r) => r.rollId)))]);
    return markerListInput(await plans.studio(studioId), batch, fabric, list, now(), rolls);
  };
  const registerFor = async (studioId: number, batchId: number, layId?: number) => {
    const batch = await loadBatch(studioId, batchId);
    const all = await plans.bundlesOfBatch(studioId, batchId);
    const p = await planOf(batch);
    const list = p ? await plans.laysOf(studioId, p.id) : [];
    const chosen = layId === undefined ? all : all.filter((b) => b.layId === layId);
    return bundleRegisterInput(await plans.studio(studioId), batch, chosen, list, await plans.operations(studioId, batch.styleId), now());
  };
  /** The width a lay's marker was made on: its plan's fabric's cuttable width. */
  const markerWidthOf = async (studioId: number, lay: LayEntity | null) => {
    const plan = lay ? await plans.getPlan(studioId, lay.cutPlanId) : null;
    return plan ? (await fabrics.get(studioId, plan.fabricId))?.widthMm : undefined;
  };
  const loadLay = async (studioId: number, id: number) => {
    const lay = await plans.getLay(studioId, id);
    if (!lay) throw notFound('Lay');
    return lay;
  };

  return {
    async cutPlan(actor: Actor, batchId: number, fabricId?: number) {
      return planDto(actor.studioId, batchId, actor.role, fabricId);
    },
    async planCut(actor: Actor, batchId: number, input: CreateCutPlanInput) {
      const saved = await planBatchCut(deps, actor.studioId, batchId, input, now());
      const dto = (await planDto(actor.studioId, batchId, actor.role, input.fabricId))!;
      await audit.record(actor, 'create', 'cut-plan', saved.id, undefined, { batchId, lays: dto.lays.length, fabricUsedMm: dto.fabricUsedMm, lowerBoundMm: dto.lowerBoundMm });
      return dto;
    },
    async bundlesOfBatch(studioId: number, batchId: number) {
      await loadBatch(studioId, batchId);
      return (await plans.bundlesOfBatch(studioId, batchId)).map(presentBundle);
    },
    async batchDocument(studioId: number, batchId: number, doc: BatchDocument, fabricId?: number): Promise<Download> {
      if (doc === 'marker-list.xlsx' || doc === 'marker-list.pdf') {
        const input = await markerListFor(studioId, batchId, undefined, fabricId);
        // A material's list says which fabric in its name; the main list keeps the name it always had.
        const which = fabricId === undefined ? '' : `-fabric-${fabricId}`;
        return { body: await jobs.run(doc, input), type: doc.endsWith('.pdf') ? PDF : XLSX, filename: `marker-list-${input.batch.code}${which}.${doc.split('.')[1]}` };
      }
      const input = await registerFor(studioId, batchId);
      if (doc === 'bundle-register.xlsx') return { body: await jobs.run(doc, input), type: XLSX, filename: `bundle-register-${input.batch.code}.xlsx` };
      return { body: await jobs.run(doc, withQr(input, batchId)), type: PDF, filename: `bundle-tickets-${input.batch.code}.pdf` };
    },
    /** One material's cut ticket (self, lining, contrast…) of a batch. */
    async materialCutTicket(studioId: number, batchId: number, material: string): Promise<Download> {
      const batch = await loadBatch(studioId, batchId);
      const input = await materialCutTicketInput(deps.gradingSets, fabrics, await plans.studio(studioId), batch, material, now());
      return { body: await jobs.run('material-cut-ticket.pdf', input), type: PDF, filename: `cut-ticket-${input.batch.code}-${input.material.replace(/[^A-Za-z0-9-]+/g, '-')}.pdf` };
    },
    async liveLays(studioId: number) {
      const list = await plans.liveLays(studioId);
      const counts = await plans.bundleCounts(studioId, list.map((l) => l.id));
      const short = await shortagesOf(studioId, list);
      const batches = await batchesOf(studioId, list);
      // Each lay names its fabric: a lined batch has shell lays and lining lays, each numbered from 1.
      const fabricOfPlan = new Map<number, string>();
      for (const planId of new Set(list.map((l) => l.cutPlanId))) {
        const p = await plans.getPlan(studioId, planId);
        fabricOfPlan.set(planId, p ? ((await fabrics.get(studioId, p.fabricId))?.name ?? '') : '');
      }
      return list.map((l) => ({ ...presentLay(l, batches.get(l.batchId)!, counts.get(l.id) ?? 0, short.get(l.id) ?? null), fabricName: fabricOfPlan.get(l.cutPlanId) ?? '' }));
    },
    /** Planned lays of open batches that stock cannot cover: the owner's Today and the cutter see them before spreading. */
    async shortages(studioId: number): Promise<ShortageDto[]> {
      const open = new Map((await deps.batches.list(studioId)).filter((b) => b.status !== 'shipped' && b.status !== 'cancelled').map((b) => [b.id, b]));
      const list = (await plans.liveLays(studioId)).filter((l) => open.has(l.batchId));
      const short = await shortagesOf(studioId, list);
      return list.filter((l) => short.has(l.id)).map((l) => ({ layId: l.id, batchId: l.batchId, batchCode: batchCode(open.get(l.batchId)!), seq: l.seq, ...short.get(l.id)! }));
    },
    async lay(studioId: number, id: number) {
      const lay = await loadLay(studioId, id);
      const plan = await plans.getPlan(studioId, lay.cutPlanId);
      const fabric = plan ? await fabrics.get(studioId, plan.fabricId) : null;
      const bundles = await plans.bundlesOfLay(studioId, lay.id);
      const batch = await loadBatch(studioId, lay.batchId);
      return {
        lay: presentLay(lay, batch, bundles.length, (await shortagesOf(studioId, [lay])).get(lay.id) ?? null),
        fabric: fabric ? presentLayFabric(fabric) : null,
        bundles: bundles.map(presentBundle),
        // The style's materials, each with its own cut ticket (lining, contrast… are cut from those, not from lays).
        materials: [...new Set(['self', ...Object.keys(batch.style?.materialFabrics ?? {})])],
      };
    },
    async recordLay(actor: Actor, id: number, input: RecordLayInput) {
      const before = await plans.getLay(actor.studioId, id);
      const after = await recordLay(plans, actor.studioId, id, input, await markerWidthOf(actor.studioId, before));
      const batch = await loadBatch(actor.studioId, after.batchId);
      await audit.record(actor, 'record', 'lay', after.id, before ? presentLay(before, batch) : undefined, presentLay(after, batch));
      return presentLay(after, batch);
    },
    async cutLay(actor: Actor, id: number, body: Partial<RecordLayInput> | undefined) {
      const recorded = body && Array.isArray(body.rolls) ? { rolls: body.rolls, flaws: body.flaws ?? '' } : undefined;
      const markerWidthMm = await markerWidthOf(actor.studioId, await plans.getLay(actor.studioId, id));
      const { lay, bundles } = await markLayCut(plans, actor.studioId, id, recorded, now(), { markerWidthMm });
      await audit.record(actor, 'cut', 'lay', lay.id, { status: 'planned' }, { status: 'cut', bundles });
      return { lay: presentLay(lay, await loadBatch(actor.studioId, lay.batchId), bundles), bundles: (await plans.bundlesOfLay(actor.studioId, lay.id)).map(presentBundle) };
    },
    /** The audited correction of a cut lay's record: the audit log keeps the figures before and after, and why. */
    async correctLay(actor: Actor, id: number, input: CorrectLayInput) {
      const before = await loadLay(actor.studioId, id);
      const after = await correctLay(plans, actor.studioId, id, input, actor, now());
      const batch = await loadBatch(actor.studioId, after.batchId);
      await audit.record(actor, 'correct', 'lay', after.id, presentLay(before, batch), { ...presentLay(after, batch), reason: input.reason });
      return presentLay(after, batch, (await plans.bundlesOfLay(actor.studioId, id)).length);
    },
    async layDocument(studioId: number, id: number, doc: LayDocument): Promise<Download> {
      const lay = await loadLay(studioId, id);
      if (doc === 'bundle-tickets.pdf') {
        const input = await registerFor(studioId, lay.batchId, lay.id);
        return { body: await jobs.run(doc, withQr(input, lay.batchId)), type: PDF, filename: `bundle-tickets-${input.batch.code}-lay-${lay.seq}.pdf` };
      }
      // A retired lay is in no current plan: no ticket or marker list that a cutter could spread from.
      if (lay.status === 'retired') throw conflict('This lay was retired when the batch was planned again: use the current plan’s documents');
      const input = await markerListFor(studioId, lay.batchId, lay.id);
      const [name, ext] = doc.split('.');
      return { body: await jobs.run(doc, input), type: ext === 'pdf' ? PDF : XLSX, filename: `${name}-${input.batch.code}-lay-${lay.seq}.${ext}` };
    },
    /** The completion hook the marker queue calls: a finished marker becomes the drawn marker of matching planned lays. */
    onMarkerDone: (studioId: number, markerId: number) => plans.linkMarkerToLays(studioId, markerId),
  };
}
