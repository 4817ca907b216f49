import { translate } from '../../../shared/i18n/speak';
import { Router } from 'express';
import { attendanceQuery, batchIdParam, bundleLookupQuery, bundleMatchesQuery, logWorkInput, putAttendanceInput } from '../../../shared/schemas/floor';
import { idParam } from '../../../shared/schemas/common';
import { actorOf, requirePermission } from '../../auth/require';
import { validate } from '../../middleware/validate';
import type { AttendanceService } from './attendance.service';
import type { FloorProgressService } from './floor-progress.service';
import type { FloorService } from './floor.service';

/** Routes under /api/floor: logging from the floor, and the owner's progress. */
export function floorRoutes(floor: FloorService, progress: FloorProgressService, attendance: AttendanceService) {
  const r = Router();
  // Attendance is the owner's to record ('people:manage'): who is in on a day and for how long.
  r.get('/attendance', requirePermission('people:manage'), validate({ query: attendanceQuery }), async (req, res) => {
    res.json(await attendance.day(actorOf(req).studioId, (req.query as { day?: string }).day));
  });
  r.put('/attendance', requirePermission('people:manage'), validate({ body: putAttendanceInput }), async (req, res) => {
    res.json(await attendance.save(actorOf(req), req.body));
  });
  r.get('/bundles/lookup', requirePermission('bundles:log'), validate({ query: bundleLookupQuery }), async (req, res) => {
    const q = req.query as unknown as { number: number; batchId?: number };
    res.json({ bundle: await floor.lookup(actorOf(req), q.number, q.batchId) });
  });
  r.get('/bundles', requirePermission('bundles:log'), validate({ query: bundleMatchesQuery }), async (req, res) => {
    const q = req.query as unknown as { number: number };
    res.json({ bundles: await floor.matches(actorOf(req), q.number) });
  });
  r.post('/logs', requirePermission('bundles:log'), validate({ body: logWorkInput }), async (req, res) => {
    const { status, result } = await floor.log(actorOf(req), req.body);
    if (result.warnings.length) {
      const who = await req.speaker?.();
      if (who) result.warnings = result.warnings.map((w) => translate(w, who) ?? w);
    }
    res.status(status).json(result);
  });
  r.delete('/logs/:id', requirePermission('bundles:log'), validate({ params: idParam }), async (req, res) => {
    await floor.undo(actorOf(req), Number(req.params.id));
    res.status(204).end();
  });
  r.get('/me/rework', requirePermission('bundles:log'), async (req, res) => {
    res.json({ rework: await floor.rework(actorOf(req)) });
  });
  r.get('/me/summary', requirePermission('pay:own'), async (req, res) => {
    res.json(await floor.summary(actorOf(req)));
  });
  r.get('/me/today', requirePermission('pay:own'), async (req, res) => {
    res.json(await floor.today(actorOf(req)));
  });
  r.get('/progress/:batchId', requirePermission('progress:read'), validate({ params: batchIdParam }), async (req, res) => {
    res.json({ progress: await progress.progress(actorOf(req).studioId, Number(req.params.batchId)) });
  });
  r.get('/progress/:batchId/daily', requirePermission('progress:read'), validate({ params: batchIdParam }), async (req, res) => {
    res.json(await progress.daily(actorOf(req).studioId, Number(req.params.batchId)));
  });
  return r;
}
