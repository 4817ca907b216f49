import { Router } from 'express';
import { updateStudioInput } from '../../../shared/schemas/studio';
import { actorOf, requireAuth, requirePermission } from '../../auth/require';
import { validate } from '../../middleware/validate';
import type { StudioService } from './studio.service';

export function studioRoutes(service: StudioService) {
  const r = Router();
  r.get('/', requireAuth, async (req, res) => {
    res.json({ studio: await service.get(actorOf(req).studioId) });
  });
  r.patch('/', requirePermission('studio:manage'), validate({ body: updateStudioInput }), async (req, res) => {
    res.json({ studio: await service.update(actorOf(req), req.body) });
  });
  return r;
}
