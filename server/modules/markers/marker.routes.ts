import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { createMarkerInput, markerListQuery, markerQuery } from '../../../shared/schemas/markers';
import { actorOf, requirePermission } from '../../auth/require';
import { sendDownload } from '../../middleware/download';
import { validated } from '../../middleware/validate';
import type { MarkerService } from './marker.service';

export function markerRoutes(service: MarkerService) {
  const r = Router();
  const read = requirePermission('markers:read');
  const write = requirePermission('markers:write');
  r.get('/', read, ...validated({ query: markerListQuery }, async ({ query }, req, res) => {
    res.json({ markers: await service.list(actorOf(req).studioId, query) });
  }));
  r.post('/', write, ...validated({ body: createMarkerInput }, async ({ body }, req, res) => {
    const { marker, reused } = await service.create(actorOf(req), body);
    res.status(reused ? 200 : 202).json({ marker, reused });
  }));
  r.get('/:id', read, ...validated({ params: idParam, query: markerQuery }, async ({ params, query }, req, res) => {
    res.json({ marker: (await service.get(actorOf(req).studioId, params.id, query.drawing)).dto });
  }));
  r.post('/:id/cancel', write, ...validated({ params: idParam }, async ({ params }, req, res) => {
    res.json({ marker: await service.cancel(actorOf(req), params.id) });
  }));
  r.get('/:id/svg', read, ...validated({ params: idParam }, async ({ params }, req, res) => {
    sendDownload(res, await service.file(actorOf(req).studioId, params.id, 'svg'));
  }));
  /** The whole marker at 1:1 for a plotter or cutting table (DXF, millimetres), the batch in its name. */
  r.get('/:id/dxf', read, ...validated({ params: idParam }, async ({ params }, req, res) => {
    sendDownload(res, await service.file(actorOf(req).studioId, params.id, 'dxf'));
  }));
  /** The whole marker at 1:1 as a PDF for a plotter: page width = marker width, panels along the length. */
  r.get('/:id/plot.pdf', read, ...validated({ params: idParam }, async ({ params }, req, res) => {
    sendDownload(res, await service.file(actorOf(req).studioId, params.id, 'pdf'));
  }));
  return r;
}
