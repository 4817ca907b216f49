import type { Router } from 'express';
import type { DataSource } from 'typeorm';
import { createAuditRepository } from './audit.repository';
import { auditRoutes } from './audit.routes';

/**
 * The audit trail: every area records who did what through `audit`; the owner reads it at /api/audit.
 * Built before every other module (their context carries `audit`), so it takes the data source alone and
 * imports nothing of module.ts, whose context names its repository.
 */
export function createAuditModule(ds: DataSource) {
  const audit = createAuditRepository(ds);
  return {
    name: 'audit',
    services: { audit },
    mount(api: Router) {
      api.use('/audit', auditRoutes(audit));
    },
  };
}
