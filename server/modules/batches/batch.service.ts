import type { z } from 'zod';
import type { createBatchInput, updateBatchInput } from '../../../shared/schemas/batches';
import type { Actor } from '../../auth/require';
import { badRequest, notFound } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { StyleRepository } from '../styles/style.repository';
import { presentBatch } from './batch.presenter';
import type { BatchRepository } from './batch.repository';

export type BatchService = ReturnType<typeof createBatchService>;

/** A studio's batches: quantities only in the style's size run (every size of it listed), each change audited. */
export function createBatchService(deps: { batches: BatchRepository; styles: Pick<StyleRepository, 'get'>; audit: AuditRepository }) {
  const { batches, styles, audit } = deps;
  return {
    list: async (studioId: number) => (await batches.list(studioId)).map(presentBatch),
    async get(studioId: number, id: number) {
      const b = await batches.get(studioId, id);
      if (!b) throw notFound('Batch');
      return presentBatch(b);
    },
    async create(actor: Actor, input: z.output<typeof createBatchInput>) {
      const style = await styles.get(actor.studioId, input.styleId);
      if (!style) throw badRequest('styleId: no such style in this studio', { styleId: 'No such style' });
      const quantities: Record<string, number> = {};
      const fields: Record<string, string> = {};
      for (const size of Object.keys(input.quantities)) {
        if (!style.sizeRun.includes(size)) fields[`quantities.${size}`] = `Size ${size} is not in the style's size run`;
      }
      if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
      for (const size of style.sizeRun) quantities[size] = input.quantities[size] ?? 0;
      const b = await batches.insert({ studioId: actor.studioId, styleId: style.id, quantities, dueDate: input.dueDate, notes: input.notes, status: 'planned' });
      const saved = (await batches.get(actor.studioId, b.id))!;
      await audit.record(actor, 'create', 'batch', b.id, undefined, presentBatch(saved));
      return presentBatch(saved);
    },
    async update(actor: Actor, id: number, input: z.output<typeof updateBatchInput>) {
      const before = await batches.get(actor.studioId, id);
      if (!before) throw notFound('Batch');
      const after = await batches.update(actor.studioId, id, input);
      await audit.record(actor, 'update', 'batch', id, presentBatch(before), presentBatch(after));
      return presentBatch(after);
    },
  };
}
