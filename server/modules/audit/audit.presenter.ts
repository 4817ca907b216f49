import type { AuditEntryEntity } from '../../entities';

/** One line of the audit trail as the owner reads it (before and after as the recorded summaries). */
export const presentAuditEntry = (e: AuditEntryEntity) => ({
  id: e.id,
  userName: e.userName,
  action: e.action,
  entity: e.entity,
  entityId: e.entityId,
  before: e.before,
  after: e.after,
  createdAt: new Date(e.createdAt).toISOString(),
});
