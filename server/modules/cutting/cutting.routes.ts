import { Router, type Response } from 'express';
import type { DataSource } from 'typeorm';
import type { JobRunner } from '../../jobs/job-runner';
import { can, type Role } from '../../../shared/auth/permissions';
import { idParam } from '../../../shared/schemas/common';
import { createCutPlanInput, cutLayInput, recordLayInput, type ShortageDto } from '../../../shared/schemas/cutting';
import { actorOf, requirePermission } from '../../auth/require';
import { conflict, notFound } from '../../errors';
import { validate } from '../../middleware/validate';
import type { AuditRepository } from '../audit/audit.repository';
import { createBatchRepository } from '../batches/batch.repository';
import { batchCode } from '../batches/batch.routes';
import { presentBundle, presentCutPlan, presentLay } from './cut-plan.presenter';
import type { CutPlanRepository } from './cut-plan.repository';
import { planBatchCut } from './cut-plan.service';
import { bundleRegisterInput, markerListInput, withQr } from './cutting-documents';
import type { FabricRepository } from './fabric.repository';
import { markLayCut, recordLay } from './lay.service';
import { layShortages } from './shortage';
import type { LayEntity } from '../../entities';
import { sendDownload } from '../../middleware/download';
import { materialCutTicketInput, materialTicketQuery } from './material-cut-ticket';
import { createGradingSetRepository } from '../grading/grading-set.repository';

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
const send = (res: Response, bytes: Buffer, type: string, name: string) => sendDownload(res, { body: bytes, type, filename: name });

/** Cut plans of batches, the cutter's lays and their documents. */
export function cuttingRoutes(ds: DataSource, jobs: JobRunner, plans: CutPlanRepository, fabrics: FabricRepository, audit: AuditRepository, now: () => Date) {
  const batches = Router();
  const lays = Router();
  const batchRepo = createBatchRepository(ds);
  const loadBatch = async (studioId: number, id: number) => {
    const b = await batchRepo.get(studioId, id);
    if (!b) throw notFound('Batch');
    return b;
  };
  const shortagesOf = async (studioId: number, list: LayEntity[]) =>
    layShortages(list, await plans.stock.rolls(studioId, [...new Set(list.flatMap((l) => l.rolls.map((r) => r.rollId)))]));
  const planDto = async (studioId: number, batchId: number, role: Role) => {
    const p = await plans.currentPlan(studioId, batchId);
    if (!p) return null;
    const list = await plans.laysOf(studioId, p.id);
    const fabric = await fabrics.get(studioId, p.fabricId);
    return presentCutPlan(p, fabric?.name ?? '', list, await plans.bundleCounts(studioId, list.map((l) => l.id)), await shortagesOf(studioId, list), can(role, 'costs:read'));
  };
  const docsFor = async (studioId: number, batchId: number, only?: number) => {
    const batch = await loadBatch(studioId, batchId);
    const p = await plans.currentPlan(studioId, batchId);
    if (!p) throw notFound('Cut plan');
    const fabric = await fabrics.get(studioId, p.fabricId);
    if (!fabric) throw notFound('Fabric');
    const list = (await plans.laysOf(studioId, p.id)).filter((l) => only === undefined || l.id === only);
    return markerListInput(await plans.studio(studioId), batch, fabric, list, now());
  };

  batches.get('/:id/cut-plan', requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam }), async (req, res) => {
    const studioId = actorOf(req).studioId;
    await loadBatch(studioId, Number(req.params.id));
    res.json({ cutPlan: await planDto(studioId, Number(req.params.id), actorOf(req).role) });
  });
  batches.post('/:id/cut-plan', requirePermission('cutplans:write'), validate({ params: idParam, body: createCutPlanInput }), async (req, res) => {
    const actor = actorOf(req);
    const batchId = Number(req.params.id);
    const saved = await planBatchCut(ds, jobs, plans, actor.studioId, batchId, req.body, now());
    const dto = (await planDto(actor.studioId, batchId, actor.role))!;
    await audit.record(actor, 'create', 'cut-plan', saved.id, undefined, { batchId, lays: dto.lays.length, fabricUsedMm: dto.fabricUsedMm, lowerBoundMm: dto.lowerBoundMm });
    res.status(201).json({ cutPlan: dto });
  });
  batches.get('/:id/marker-list.xlsx', requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam }), async (req, res) => {
    const input = await docsFor(actorOf(req).studioId, Number(req.params.id));
    send(res, await jobs.run('marker-list.xlsx', input), XLSX, `marker-list-${input.batch.code}.xlsx`);
  });
  batches.get('/:id/marker-list.pdf', requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam }), async (req, res) => {
    const input = await docsFor(actorOf(req).studioId, Number(req.params.id));
    send(res, await jobs.run('marker-list.pdf', input), 'application/pdf', `marker-list-${input.batch.code}.pdf`);
  });
  batches.get('/:id/bundles', requirePermission('bundles:read'), validate({ params: idParam }), async (req, res) => {
    const studioId = actorOf(req).studioId;
    await loadBatch(studioId, Number(req.params.id));
    res.json({ bundles: (await plans.bundlesOfBatch(studioId, Number(req.params.id))).map(presentBundle) });
  });
  const registerFor = async (studioId: number, batchId: number, layId?: number) => {
    const batch = await loadBatch(studioId, batchId);
    const all = await plans.bundlesOfBatch(studioId, batchId);
    const p = await plans.currentPlan(studioId, batchId);
    const list = p ? await plans.laysOf(studioId, p.id) : [];
    const chosen = layId === undefined ? all : all.filter((b) => b.layId === layId);
    return bundleRegisterInput(await plans.studio(studioId), batch, chosen, list, await plans.operations(studioId, batch.styleId), now());
  };
  batches.get('/:id/bundle-register.xlsx', requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam }), async (req, res) => {
    const input = await registerFor(actorOf(req).studioId, Number(req.params.id));
    send(res, await jobs.run('bundle-register.xlsx', input), XLSX, `bundle-register-${input.batch.code}.xlsx`);
  });
  batches.get('/:id/bundle-tickets.pdf', requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam }), async (req, res) => {
    const batchId = Number(req.params.id);
    const input = await registerFor(actorOf(req).studioId, batchId);
    send(res, await jobs.run('bundle-tickets.pdf', withQr(input, batchId)), 'application/pdf', `bundle-tickets-${input.batch.code}.pdf`);
  });

  /** One material's cut ticket (self, lining, contrast…): its pieces, sizes and copies to cut. */
  batches.get('/:id/material-cut-ticket.pdf', requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam, query: materialTicketQuery }), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const batch = await loadBatch(studioId, Number(req.params.id));
    const input = await materialCutTicketInput(createGradingSetRepository(ds), fabrics, await plans.studio(studioId), batch, (req.query as { material: string }).material, now());
    send(res, await jobs.run('material-cut-ticket.pdf', input), 'application/pdf', `cut-ticket-${input.batch.code}-${input.material.replace(/[^A-Za-z0-9-]+/g, '-')}.pdf`);
  });

  lays.get('/', requirePermission('cutting:work'), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const list = await plans.liveLays(studioId);
    const counts = await plans.bundleCounts(studioId, list.map((l) => l.id));
    const short = await shortagesOf(studioId, list);
    res.json({ lays: list.map((l) => presentLay(l, counts.get(l.id) ?? 0, short.get(l.id) ?? null)) });
  });
  /** Planned lays of open batches that stock cannot cover: the owner's Today and the cutter see them before spreading. */
  lays.get('/shortages', requirePermission('cutplans:write', 'cutting:work'), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const open = new Set((await batchRepo.list(studioId)).filter((b) => b.status !== 'shipped' && b.status !== 'cancelled').map((b) => b.id));
    const list = (await plans.liveLays(studioId)).filter((l) => open.has(l.batchId));
    const short = await shortagesOf(studioId, list);
    const shortages: ShortageDto[] = list.filter((l) => short.has(l.id)).map((l) => ({ layId: l.id, batchId: l.batchId, batchCode: batchCode(l.batchId), seq: l.seq, ...short.get(l.id)! }));
    res.json({ shortages });
  });
  lays.get('/:id', requirePermission('cutting:work'), validate({ params: idParam }), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const lay = await plans.getLay(studioId, Number(req.params.id));
    if (!lay) throw notFound('Lay');
    const plan = await plans.getPlan(studioId, lay.cutPlanId);
    const fabric = plan ? await fabrics.get(studioId, plan.fabricId) : null;
    const bundles = await plans.bundlesOfLay(studioId, lay.id);
    res.json({
      lay: presentLay(lay, bundles.length, (await shortagesOf(studioId, [lay])).get(lay.id) ?? null),
      fabric: fabric ? { id: fabric.id, name: fabric.name, composition: fabric.composition, widthMm: fabric.widthMm, isDirectional: fabric.isDirectional, maxPlies: fabric.maxPlies } : null,
      bundles: bundles.map(presentBundle),
    });
  });
  lays.put('/:id', requirePermission('cutting:work'), validate({ params: idParam, body: recordLayInput }), async (req, res) => {
    const actor = actorOf(req);
    const before = await plans.getLay(actor.studioId, Number(req.params.id));
    const after = await recordLay(plans, actor.studioId, Number(req.params.id), req.body);
    await audit.record(actor, 'record', 'lay', after.id, before ? presentLay(before) : undefined, presentLay(after));
    res.json({ lay: presentLay(after) });
  });
  lays.post('/:id/cut', requirePermission('cutting:work'), validate({ params: idParam, body: cutLayInput }), async (req, res) => {
    const actor = actorOf(req);
    const hasBody = req.body && Array.isArray(req.body.rolls);
    const { lay, bundles } = await markLayCut(plans, actor.studioId, Number(req.params.id), hasBody ? { rolls: req.body.rolls, flaws: req.body.flaws ?? '' } : undefined, now());
    await audit.record(actor, 'cut', 'lay', lay.id, { status: 'planned' }, { status: 'cut', bundles });
    res.json({ lay: presentLay(lay, bundles), bundles: (await plans.bundlesOfLay(actor.studioId, lay.id)).map(presentBundle) });
  });
  const layDoc = async (studioId: number, id: number) => {
    const lay = await plans.getLay(studioId, id);
    if (!lay) throw notFound('Lay');
    // A retired lay is in no current plan: no ticket or marker list that a cutter could spread from.
    if (lay.status === 'retired') throw conflict('This lay was retired when the batch was planned again: use the current plan’s documents');
    return { lay, input: await docsFor(studioId, lay.batchId, lay.id) };
  };
  lays.get('/:id/cut-ticket.pdf', requirePermission('cutting:work'), validate({ params: idParam }), async (req, res) => {
    const { lay, input } = await layDoc(actorOf(req).studioId, Number(req.params.id));
    send(res, await jobs.run('cut-ticket.pdf', input), 'application/pdf', `cut-ticket-${input.batch.code}-lay-${lay.seq}.pdf`);
  });
  lays.get('/:id/marker-list.xlsx', requirePermission('cutting:work'), validate({ params: idParam }), async (req, res) => {
    const { lay, input } = await layDoc(actorOf(req).studioId, Number(req.params.id));
    send(res, await jobs.run('marker-list.xlsx', input), XLSX, `marker-list-${input.batch.code}-lay-${lay.seq}.xlsx`);
  });
  lays.get('/:id/marker-list.pdf', requirePermission('cutting:work'), validate({ params: idParam }), async (req, res) => {
    const { lay, input } = await layDoc(actorOf(req).studioId, Number(req.params.id));
    send(res, await jobs.run('marker-list.pdf', input), 'application/pdf', `marker-list-${input.batch.code}-lay-${lay.seq}.pdf`);
  });
  lays.get('/:id/bundle-tickets.pdf', requirePermission('cutting:work'), validate({ params: idParam }), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const lay = await plans.getLay(studioId, Number(req.params.id));
    if (!lay) throw notFound('Lay');
    const input = await registerFor(studioId, lay.batchId, lay.id);
    send(res, await jobs.run('bundle-tickets.pdf', withQr(input, lay.batchId)), 'application/pdf', `bundle-tickets-${input.batch.code}-lay-${lay.seq}.pdf`);
  });
  return { batches, lays };
}
