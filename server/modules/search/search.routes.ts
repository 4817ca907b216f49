import { Router } from 'express';
import { searchQuery } from '../../../shared/schemas/search';
import { actorOf, requirePermission } from '../../auth/require';
import { validate } from '../../middleware/validate';
import type { SearchService } from './search.service';

/** GET /api/search?q=…: for the roles that read bundles (owner, cutter); each kind is checked again per role. */
export function searchRoutes(service: SearchService) {
  const r = Router();
  r.get('/', requirePermission('bundles:read'), validate({ query: searchQuery }), async (req, res) => {
    res.json({ hits: await service.search(actorOf(req), String(req.query.q)) });
  });
  return r;
}
