import { batchTotal, type BatchDto } from '../../../shared/schemas/batches';
import type { BatchEntity } from '../../entities';

/** The code a batch goes by on every screen and document: B-0007, from its number in its studio (never its id). */
export const batchCode = (batch: { number: number }) => `B-${String(batch.number).padStart(4, '0')}`;

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
