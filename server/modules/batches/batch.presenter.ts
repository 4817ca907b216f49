import { batchCode, batchTotal, type BatchDto } from '../../../shared/schemas/batches';
import type { BatchEntity } from '../../entities';

export const presentBatch = (b: BatchEntity): BatchDto => ({
  id: b.id,
  number: b.number,
  code: batchCode(b),
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
