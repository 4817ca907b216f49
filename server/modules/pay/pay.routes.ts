import { documentSettings } from '../studios/document-settings';
import { Router } from 'express';
import type { JobRunner } from '../../jobs/job-runner';
import { periodQuery } from '../../../shared/schemas/floor';
import { approvePayPeriodInput, payoutParams, payPersonInput, payRulesInput, type PayModeDto } from '../../../shared/schemas/pay';
import { actorOf, requirePermission } from '../../auth/require';
import { validate } from '../../middleware/validate';
import type { PayService } from './pay.service';
import { sendDownload } from '../../middleware/download';

/** Routes under /api/pay: the owner's pay periods and payouts, and each person's own pay. */
export function payRoutes(pay: PayService, mode: () => PayModeDto, jobs: JobRunner) {
  const r = Router();
  r.get('/mode', requirePermission('pay:manage'), (_req, res) => {
    res.json(mode());
  });
  r.get('/me', requirePermission('pay:own'), validate({ query: periodQuery }), async (req, res) => {
    const q = req.query as unknown as { from: string; to: string };
    res.json({ pay: await pay.mine(actorOf(req), q.from, q.to) });
  });
  r.get('/preview', requirePermission('pay:manage'), validate({ query: periodQuery }), async (req, res) => {
    const q = req.query as unknown as { from: string; to: string };
    res.json({ preview: await pay.preview(actorOf(req).studioId, q.from, q.to) });
  });
  r.get('/rules', requirePermission('pay:manage'), async (req, res) => {
    res.json({ rules: await pay.rules(actorOf(req).studioId) });
  });
  r.put('/rules', requirePermission('pay:manage'), validate({ body: payRulesInput }), async (req, res) => {
    res.json({ rules: await pay.saveRules(actorOf(req), req.body) });
  });
  r.get('/periods/:id/recompute', requirePermission('pay:manage'), validate({ params: payoutParams }), async (req, res) => {
    res.json(await pay.recompute(actorOf(req).studioId, Number(req.params.id)));
  });
  r.get('/periods', requirePermission('pay:manage'), async (req, res) => {
    res.json({ periods: await pay.periods(actorOf(req).studioId) });
  });
  r.post('/periods', requirePermission('pay:manage'), validate({ body: approvePayPeriodInput }), async (req, res) => {
    res.status(201).json({ period: await pay.approve(actorOf(req), req.body.fromDay, req.body.toDay) });
  });
  r.get('/periods/:id', requirePermission('pay:manage'), validate({ params: payoutParams }), async (req, res) => {
    res.json({ period: await pay.period(actorOf(req).studioId, Number(req.params.id)) });
  });
  r.post('/periods/:id/payouts', requirePermission('pay:manage'), validate({ params: payoutParams, body: payPersonInput }), async (req, res) => {
    res.json({ payout: await pay.pay(actorOf(req), Number(req.params.id), req.body.userId) });
  });
  r.get('/periods/:id/sheet.xlsx', requirePermission('pay:manage'), validate({ params: payoutParams }), async (req, res) => {
    const { period, studio, lines, approver } = await pay.sheetInput(actorOf(req).studioId, Number(req.params.id));
    const bytes = await jobs.run('pay-sheet.xlsx', {
      studioName: studio.name,
      dateIso: new Date(period.createdAt).toISOString(),
      ...documentSettings(studio),
      currency: studio.currency,
      periodStartIso: period.fromDay,
      periodEndIso: period.toDay,
      entries: lines.map((l) => ({ person: l.name, operation: `${l.operationCode} ${l.operationName}`, pieces: l.pieces, ratePerPieceMinor: l.rateMinor as never })),
      approvedBy: approver,
      approvedAtIso: new Date(period.createdAt).toISOString(),
    });
    sendDownload(res, { body: bytes, type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', filename: `pay-${period.fromDay}-to-${period.toDay}.xlsx` });
  });
  return r;
}
