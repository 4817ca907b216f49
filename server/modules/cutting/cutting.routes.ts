import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { correctLayInput, createCutPlanInput, cutLayInput, recordLayInput } from '../../../shared/schemas/cutting';
import { actorOf, requirePermission } from '../../auth/require';
import { sendDownload } from '../../middleware/download';
import { validate } from '../../middleware/validate';
import type { BatchDocument, CuttingService, LayDocument } from './cutting.service';

const BATCH_DOCUMENTS: BatchDocument[] = ['marker-list.xlsx', 'marker-list.pdf', 'bundle-register.xlsx', 'bundle-tickets.pdf'];
const LAY_DOCUMENTS: LayDocument[] = ['cut-ticket.pdf', 'marker-list.xlsx', 'marker-list.pdf', 'bundle-tickets.pdf'];

/** Cut plans of batches, the cutter's lays and their documents. */
export function cuttingRoutes(service: CuttingService) {
  const batches = Router();
  const lays = Router();

  batches.get('/:id/cut-plan', requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam }), async (req, res) => {
    res.json({ cutPlan: await service.cutPlan(actorOf(req), Number(req.params.id)) });
  });
  batches.post('/:id/cut-plan', requirePermission('cutplans:write'), validate({ params: idParam, body: createCutPlanInput }), async (req, res) => {
    res.status(201).json({ cutPlan: await service.planCut(actorOf(req), Number(req.params.id), req.body) });
  });
  for (const doc of BATCH_DOCUMENTS) {
    batches.get(`/:id/${doc}`, requirePermission('cutplans:write', 'cutting:work'), validate({ params: idParam }), async (req, res) => {
      sendDownload(res, await service.batchDocument(actorOf(req).studioId, Number(req.params.id), doc));
    });
  }
  batches.get('/:id/bundles', requirePermission('bundles:read'), validate({ params: idParam }), async (req, res) => {
    res.json({ bundles: await service.bundlesOfBatch(actorOf(req).studioId, Number(req.params.id)) });
  });

  lays.get('/', requirePermission('cutting:work'), async (req, res) => {
    res.json({ lays: await service.liveLays(actorOf(req).studioId) });
  });
  lays.get('/shortages', requirePermission('cutplans:write', 'cutting:work'), async (req, res) => {
    res.json({ shortages: await service.shortages(actorOf(req).studioId) });
  });
  lays.get('/:id', requirePermission('cutting:work'), validate({ params: idParam }), async (req, res) => {
    res.json(await service.lay(actorOf(req).studioId, Number(req.params.id)));
  });
  lays.put('/:id', requirePermission('cutting:work'), validate({ params: idParam, body: recordLayInput }), async (req, res) => {
    res.json({ lay: await service.recordLay(actorOf(req), Number(req.params.id), req.body) });
  });
  lays.post('/:id/cut', requirePermission('cutting:work'), validate({ params: idParam, body: cutLayInput }), async (req, res) => {
    res.json(await service.cutLay(actorOf(req), Number(req.params.id), req.body));
  });
  /** After the cut the record is closed; a correction carries its reason and is audited. */
  lays.post('/:id/correction', requirePermission('cutting:work'), validate({ params: idParam, body: correctLayInput }), async (req, res) => {
    res.json({ lay: await service.correctLay(actorOf(req), Number(req.params.id), req.body) });
  });
  for (const doc of LAY_DOCUMENTS) {
    lays.get(`/:id/${doc}`, requirePermission('cutting:work'), validate({ params: idParam }), async (req, res) => {
      sendDownload(res, await service.layDocument(actorOf(req).studioId, Number(req.params.id), doc));
    });
  }
  return { batches, lays };
}
