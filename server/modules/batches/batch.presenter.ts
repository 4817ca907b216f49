import { batchTotal, type BatchDto } from '../../../shared/schemas/batches';
import type { BatchEntity } from '../../entities';

/** The code a batch goes by on every screen and document: B-0007. */
export const batchCode = (id: number) => `B-${String(id).padStart(4, '0')}`;

export const presentBatch = (b: BatchEntity): BatchDto => ({
  id: b.id,
  code: batchCode(b.id),
  styleId: b.styleId,
  styleCode: b.style?.code ?? '',
  styleName: b.style?.name ?? '',
  quantities: b.quantities,
  total: batchTotal(b.quantities),
  dueDate: b.dueDate,
  status: b.status,
  notes: b.notes,
  createdAt: new Date(b.createdAt).toISOString(),
});
