import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { copyOperationsInput, linePlanQuery, operationParams, putOperationsInput, timeStudyInput, workingCalendarInput, type LinePlanQuery } from '../../../shared/schemas/line';
import { actorOf, requirePermission } from '../../auth/require';
import { validate } from '../../middleware/validate';
import type { LineService } from './line.service';
import { sendDownload } from '../../middleware/download';
import { uploadFile } from '../../middleware/upload';

const singleFile = uploadFile({ maxBytes: 1024 * 1024, tooLarge: 'field' });

/** /api/styles/:id/operations… (the table) — mounted on /styles. */
export function operationRoutes(service: LineService) {
  const r = Router();
  const plan = requirePermission('line:plan');
  const id = (p: unknown) => Number((p as { id: string }).id);
  r.get('/:id/operations', plan, validate({ params: idParam }), async (req, res) => {
    res.json({ operations: await service.list(actorOf(req), id(req.params)) });
  });
  r.put('/:id/operations', plan, validate({ params: idParam, body: putOperationsInput }), async (req, res) => {
    res.json({ operations: await service.put(actorOf(req), id(req.params), req.body.operations) });
  });
  // Owner only: 'line:plan' is the owner's (shared/auth/permissions.ts).
  r.put('/:id/operations/:operationId/time-study', plan, validate({ params: operationParams, body: timeStudyInput }), async (req, res) => {
    const p = req.params as unknown as { id: number; operationId: number };
    res.json({ operation: await service.timeStudy(actorOf(req), Number(p.id), Number(p.operationId), req.body) });
  });
  r.post('/:id/operations/copy', plan, validate({ params: idParam, body: copyOperationsInput }), async (req, res) => {
    res.json({ operations: await service.copy(actorOf(req), id(req.params), req.body.fromStyleId) });
  });
  r.get('/:id/operations/export', plan, validate({ params: idParam }), async (req, res) => {
    const f = await service.exportXlsx(actorOf(req), id(req.params));
    sendDownload(res, { body: f.body, type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', filename: f.filename });
  });
  r.post('/:id/operations/import', plan, singleFile, validate({ params: idParam }), async (req, res) => {
    res.json({ operations: await service.importXlsx(actorOf(req), id(req.params), req.file?.buffer) });
  });
  return r;
}

/** /api/line/batches/:id/plan — the balance, capacity and schedule of a batch. */
export function linePlanRoutes(service: LineService) {
  const r = Router();
  r.get('/calendar', requirePermission('line:plan'), async (req, res) => {
    res.json({ calendar: await service.calendar(actorOf(req)) });
  });
  r.put('/calendar', requirePermission('line:plan'), validate({ body: workingCalendarInput }), async (req, res) => {
    res.json({ calendar: await service.saveCalendar(actorOf(req), req.body) });
  });
  r.get('/batches/:id/plan', requirePermission('line:plan'), validate({ params: idParam, query: linePlanQuery }), async (req, res) => {
    res.json({ plan: await service.plan(actorOf(req), Number(req.params.id), req.query as unknown as LinePlanQuery) });
  });
  return r;
}
