import { Router } from 'express';
import { actorOf, requirePermission } from '../../auth/require';
import type { AuditRepository } from './audit.repository';

export function auditRoutes(audit: AuditRepository) {
  const r = Router();
  r.get('/', requirePermission('audit:read'), async (req, res) => {
    const rows = await audit.list(actorOf(req).studioId);
    res.json({
      entries: rows.map((e) => ({
        id: e.id,
        userName: e.userName,
        action: e.action,
        entity: e.entity,
        entityId: e.entityId,
        before: e.before,
        after: e.after,
        createdAt: new Date(e.createdAt).toISOString(),
      })),
    });
  });
  return r;
}
