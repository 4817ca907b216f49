import { Router, type Request } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { correctLayInput, createCutPlanInput, cutLayInput, cutPlanQuery, recordLayInput } from '../../../shared/schemas/cutting';
import { actorOf, requirePermission } from '../../auth/require';
import { sendDownload } from '../../middleware/download';
import { validated } from '../../middleware/validate';
import type { BatchDocument, CuttingService, LayDocument } from './cutting.service';
import { materialTicketQuery } from './material-cut-ticket';
import { translate } from '../../../shared/i18n/speak';

const BATCH_DOCUMENTS: BatchDocument[] = ['marker-list.xlsx', 'marker-list.pdf', 'bundle-register.xlsx', 'bundle-tickets.pdf'];
const LAY_DOCUMENTS: LayDocument[] = ['cut-ticket.pdf', 'marker-list.xlsx', 'marker-list.pdf', 'bundle-tickets.pdf'];

/** A plan's refused rolls (a roll narrower than its marker) in the person's language, widths in the studio's units. */
async function spokenPlan<T extends { rollRefusals?: string[] } | null>(req: Request, plan: T): Promise<T> {
  if (!plan?.rollRefusals?.length) return plan;
  const who = await req.speaker?.();
  return who ? { ...plan, rollRefusals: plan.rollRefusals.map((m) => translate(m, who) ?? m) } : plan;
}

/** Cut plans of batches, the cutter's lays and their documents. */
export function cuttingRoutes(service: CuttingService) {
  const batches = Router();
  const lays = Router();
  const planner = requirePermission('cutplans:write');
  const plannerOrCutter = requirePermission('cutplans:write', 'cutting:work');
  const cutter = requirePermission('cutting:work');

  batches.get('/:id/cut-plan', plannerOrCutter, ...validated({ params: idParam, query: cutPlanQuery }, async ({ params, query }, req, res) => {
    res.json({ cutPlan: await spokenPlan(req, await service.cutPlan(actorOf(req), params.id, query.fabricId)) });
  }));
  batches.post('/:id/cut-plan', planner, ...validated({ params: idParam, body: createCutPlanInput }, async ({ params, body }, req, res) => {
    res.status(201).json({ cutPlan: await spokenPlan(req, await service.planCut(actorOf(req), params.id, body)) });
  }));
  for (const doc of BATCH_DOCUMENTS) {
    batches.get(`/:id/${doc}`, plannerOrCutter, ...validated({ params: idParam, query: cutPlanQuery }, async ({ params, query }, req, res) => {
      sendDownload(res, await service.batchDocument(actorOf(req).studioId, params.id, doc, query.fabricId));
    }));
  }
  batches.get('/:id/bundles', requirePermission('bundles:read'), ...validated({ params: idParam }, async ({ params }, req, res) => {
    res.json({ bundles: await service.bundlesOfBatch(actorOf(req).studioId, params.id) });
  }));

  /** One material's cut ticket (self, lining, contrast…): its pieces, sizes and copies to cut. */
  batches.get('/:id/material-cut-ticket.pdf', plannerOrCutter, ...validated({ params: idParam, query: materialTicketQuery }, async ({ params, query }, req, res) => {
    sendDownload(res, await service.materialCutTicket(actorOf(req).studioId, params.id, query.material));
  }));

  lays.get('/', cutter, async (req, res) => {
    res.json({ lays: await service.liveLays(actorOf(req).studioId) });
  });
  lays.get('/shortages', plannerOrCutter, async (req, res) => {
    res.json({ shortages: await service.shortages(actorOf(req).studioId) });
  });
  lays.get('/:id', cutter, ...validated({ params: idParam }, async ({ params }, req, res) => {
    res.json(await service.lay(actorOf(req).studioId, params.id));
  }));
  lays.put('/:id', cutter, ...validated({ params: idParam, body: recordLayInput }, async ({ params, body }, req, res) => {
    res.json({ lay: await service.recordLay(actorOf(req), params.id, body) });
  }));
  lays.post('/:id/cut', cutter, ...validated({ params: idParam, body: cutLayInput }, async ({ params, body }, req, res) => {
    res.json(await service.cutLay(actorOf(req), params.id, body));
  }));
  /** After the cut the record is closed; a correction carries its reason and is audited. */
  lays.post('/:id/correction', cutter, ...validated({ params: idParam, body: correctLayInput }, async ({ params, body }, req, res) => {
    res.json({ lay: await service.correctLay(actorOf(req), params.id, body) });
  }));
  for (const doc of LAY_DOCUMENTS) {
    lays.get(`/:id/${doc}`, cutter, ...validated({ params: idParam }, async ({ params }, req, res) => {
      sendDownload(res, await service.layDocument(actorOf(req).studioId, params.id, doc));
    }));
  }
  return { batches, lays };
}
