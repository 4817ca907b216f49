import { Router } from 'express';
import { createBatchInput, updateBatchInput } from '../../../shared/schemas/batches';
import { idParam } from '../../../shared/schemas/common';
import { actorOf, requirePermission } from '../../auth/require';
import { badRequest, notFound } from '../../errors';
import { validate } from '../../middleware/validate';
import type { AuditRepository } from '../audit/audit.repository';
import type { StyleRepository } from '../styles/style.repository';
import { presentBatch } from './batch.presenter';
import type { BatchRepository } from './batch.repository';

/** Kept for the floor area's import until it takes batchCode from batch.presenter.ts. */
export { batchCode, presentBatch } from './batch.presenter';

export function batchRoutes(batches: BatchRepository, styles: StyleRepository, audit: AuditRepository) {
  const r = Router();
  r.get('/', requirePermission('batches:read'), async (req, res) => {
    res.json({ batches: (await batches.list(actorOf(req).studioId)).map(presentBatch) });
  });
  r.get('/:id', requirePermission('batches:read'), validate({ params: idParam }), async (req, res) => {
    const b = await batches.get(actorOf(req).studioId, Number(req.params.id));
    if (!b) throw notFound('Batch');
    res.json({ batch: presentBatch(b) });
  });
  r.post('/', requirePermission('batches:write'), validate({ body: createBatchInput }), async (req, res) => {
    const actor = actorOf(req);
    const style = await styles.get(actor.studioId, req.body.styleId);
    if (!style) throw badRequest('styleId: no such style in this studio', { styleId: 'No such style' });
    const quantities: Record<string, number> = {};
    const fields: Record<string, string> = {};
    for (const size of Object.keys(req.body.quantities)) {
      if (!style.sizeRun.includes(size)) fields[`quantities.${size}`] = `Size ${size} is not in the style's size run`;
    }
    if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
    for (const size of style.sizeRun) quantities[size] = req.body.quantities[size] ?? 0;
    const b = await batches.insert({
      studioId: actor.studioId,
      styleId: style.id,
      quantities,
      dueDate: req.body.dueDate,
      notes: req.body.notes,
      status: 'planned',
    });
    const saved = (await batches.get(actor.studioId, b.id))!;
    await audit.record(actor, 'create', 'batch', b.id, undefined, presentBatch(saved));
    res.status(201).json({ batch: presentBatch(saved) });
  });
  r.patch('/:id', requirePermission('batches:write'), validate({ params: idParam, body: updateBatchInput }), async (req, res) => {
    const actor = actorOf(req);
    const id = Number(req.params.id);
    const before = await batches.get(actor.studioId, id);
    if (!before) throw notFound('Batch');
    const after = await batches.update(actor.studioId, id, req.body);
    await audit.record(actor, 'update', 'batch', id, presentBatch(before), presentBatch(after));
    res.json({ batch: presentBatch(after) });
  });
  return r;
}
