import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { createMarkerInput, markerListQuery } from '../../../shared/schemas/markers';
import { actorOf, requirePermission } from '../../auth/require';
import { sendDownload } from '../../middleware/download';
import { validate } from '../../middleware/validate';
import type { MarkerService } from './marker.service';

export function markerRoutes(service: MarkerService) {
  const r = Router();
  r.get('/', requirePermission('markers:read'), validate({ query: markerListQuery }), async (req, res) => {
    const q = req.query as { styleId?: number; batchId?: number };
    res.json({ markers: await service.list(actorOf(req).studioId, q) });
  });
  r.post('/', requirePermission('markers:write'), validate({ body: createMarkerInput }), async (req, res) => {
    const { marker, reused } = await service.create(actorOf(req), req.body);
    res.status(reused ? 200 : 202).json({ marker, reused });
  });
  r.get('/:id', requirePermission('markers:read'), validate({ params: idParam }), async (req, res) => {
    const withDrawing = req.query.drawing !== 'false';
    res.json({ marker: (await service.get(actorOf(req).studioId, Number(req.params.id), withDrawing)).dto });
  });
  r.post('/:id/cancel', requirePermission('markers:write'), validate({ params: idParam }), async (req, res) => {
    res.json({ marker: await service.cancel(actorOf(req), Number(req.params.id)) });
  });
  r.get('/:id/svg', requirePermission('markers:read'), validate({ params: idParam }), async (req, res) => {
    sendDownload(res, await service.file(actorOf(req).studioId, Number(req.params.id), 'svg'));
  });
  /** The whole marker at 1:1 for a plotter or cutting table (DXF, millimetres), the batch in its name. */
  r.get('/:id/dxf', requirePermission('markers:read'), validate({ params: idParam }), async (req, res) => {
    sendDownload(res, await service.file(actorOf(req).studioId, Number(req.params.id), 'dxf'));
  });
  /** The whole marker at 1:1 as a PDF for a plotter: page width = marker width, panels along the length. */
  r.get('/:id/plot.pdf', requirePermission('markers:read'), validate({ params: idParam }), async (req, res) => {
    sendDownload(res, await service.file(actorOf(req).studioId, Number(req.params.id), 'pdf'));
  });
  return r;
}
