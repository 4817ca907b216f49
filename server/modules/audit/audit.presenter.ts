import { batchCode } from '../../../shared/schemas/batches';
import { poNumber } from '../../../shared/schemas/purchasing';
import type { AuditEntryEntity } from '../../entities';

/** What people call a numbered record (B-0003, PO-0002, pay period 4); null for records known by their name. */
function recordCode(entity: string, number: number | undefined): string | null {
  if (number === undefined) return null;
  if (entity === 'batch') return batchCode({ number });
  if (entity === 'purchase_order') return poNumber({ number });
  if (entity === 'pay_period') return String(number);
  return null;
}

/**
 * One line of the trail as the owner reads it (before and after as the recorded summaries). `number` is the
 * record's number in the studio for batches, orders and pay periods, which people know by that, not by id.
 */
export const presentAuditEntry = (e: AuditEntryEntity, number?: number) => ({
  id: e.id,
  userName: e.userName,
  action: e.action,
  entity: e.entity,
  entityId: e.entityId,
  record: recordCode(e.entity, number),
  before: e.before,
  after: e.after,
  createdAt: new Date(e.createdAt).toISOString(),
});
