import { Router } from 'express';
import { actorOf, requirePermission } from '../../auth/require';
import { presentAuditEntry } from './audit.presenter';
import type { AuditRepository } from './audit.repository';

export function auditRoutes(audit: Pick<AuditRepository, 'list'>) {
  const r = Router();
  r.get('/', requirePermission('audit:read'), async (req, res) => {
    res.json({ entries: (await audit.list(actorOf(req).studioId)).map(presentAuditEntry) });
  });
  return r;
}
