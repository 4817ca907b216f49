import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { putCompositionInput } from '../../../shared/schemas/style-composition';
import { createStyleInput, updateStyleInput } from '../../../shared/schemas/styles';
import { actorOf, requirePermission } from '../../auth/require';
import { validated } from '../../middleware/validate';
import type { StyleService } from './style.service';

export function styleRoutes(service: StyleService) {
  const r = Router();
  const read = requirePermission('styles:read');
  const write = requirePermission('styles:write');
  r.get('/', read, async (req, res) => {
    res.json({ styles: await service.list(actorOf(req).studioId) });
  });
  r.get('/:id', read, ...validated({ params: idParam }, async ({ params }, req, res) => {
    res.json({ style: await service.get(actorOf(req).studioId, params.id) });
  }));
  r.post('/', write, ...validated({ body: createStyleInput }, async ({ body }, req, res) => {
    res.status(201).json({ style: await service.create(actorOf(req), body) });
  }));
  r.put('/:id', write, ...validated({ params: idParam, body: updateStyleInput }, async ({ params, body }, req, res) => {
    res.json({ style: await service.update(actorOf(req), params.id, body) });
  }));
  r.put('/:id/composition', write, ...validated({ params: idParam, body: putCompositionInput }, async ({ params, body }, req, res) => {
    res.json({ style: await service.putComposition(actorOf(req), params.id, body) });
  }));
  return r;
}
