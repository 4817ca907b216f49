import { Router } from 'express';
import { createBatchInput, updateBatchInput } from '../../../shared/schemas/batches';
import { idParam } from '../../../shared/schemas/common';
import { actorOf, requirePermission } from '../../auth/require';
import { validated } from '../../middleware/validate';
import type { BatchService } from './batch.service';

export function batchRoutes(service: BatchService) {
  const r = Router();
  const read = requirePermission('batches:read');
  const write = requirePermission('batches:write');
  r.get('/', read, async (req, res) => {
    res.json({ batches: await service.list(actorOf(req).studioId) });
  });
  r.get('/:id', read, ...validated({ params: idParam }, async ({ params }, req, res) => {
    res.json({ batch: await service.get(actorOf(req).studioId, params.id) });
  }));
  r.post('/', write, ...validated({ body: createBatchInput }, async ({ body }, req, res) => {
    res.status(201).json({ batch: await service.create(actorOf(req), body) });
  }));
  r.patch('/:id', write, ...validated({ params: idParam, body: updateBatchInput }, async ({ params, body }, req, res) => {
    res.json({ batch: await service.update(actorOf(req), params.id, body) });
  }));
  return r;
}
