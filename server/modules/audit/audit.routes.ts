import { Router } from 'express';
import { actorOf, requirePermission } from '../../auth/require';
import { presentAuditEntry } from './audit.presenter';
import type { AuditRepository } from './audit.repository';

export function auditRoutes(audit: Pick<AuditRepository, 'list' | 'numbersOf'>) {
  const r = Router();
  r.get('/', requirePermission('audit:read'), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const entries = await audit.list(studioId);
    const numbers = await audit.numbersOf(studioId, entries);
    res.json({ entries: entries.map((e) => presentAuditEntry(e, numbers.get(`${e.entity}:${e.entityId}`))) });
  });
  return r;
}
