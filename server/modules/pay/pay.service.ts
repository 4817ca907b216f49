import type { MyPayDto, PayoutDto, PayPeriodDto, PayPersonLine, PayPreviewDto } from '../../../shared/schemas/pay';
import type { Actor } from '../../auth/require';
import type { PayoutEntity, PayPeriodEntity } from '../../entities';
import { badRequest, conflict, notFound } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { FloorProgressService } from '../floor/floor-progress.service';
import { isUniqueViolation } from '../../db/data-source';
import type { PaymentsClient } from './payments-client';
import type { PayRepository } from './pay.repository';

export type PayService = ReturnType<typeof createPayService>;

/** The account a test payout goes to when the owner has not set the person's own (test mode only). */
export const payeeAccount = (studioId: number, userId: number) => `acct_seamrun_${studioId}_${userId}`;

const presentPayout = (p: PayoutEntity, name: string): PayoutDto => ({
  id: p.id,
  userId: p.userId,
  name,
  amountMinor: p.amountMinor,
  currency: p.currency,
  status: p.status,
  providerRef: p.providerRef,
  error: p.error,
  attempts: p.attempts,
  updatedAt: new Date(p.updatedAt).toISOString(),
});

export function createPayService(deps: {
  repo: PayRepository;
  audit: AuditRepository;
  floor: () => FloorProgressService;
  payments: () => Promise<PaymentsClient>;
  /** Live keys: money moves, so every person needs their own account set. */
  live?: boolean;
}) {
  const { repo, audit, floor } = deps;
  const inFlight = new Map<string, Promise<PayoutDto>>();

  async function preview(studioId: number, fromDay: string, toDay: string): Promise<PayPreviewDto> {
    const [lines, people, studio, periods] = await Promise.all([
      floor().payLines(studioId, fromDay, toDay),
      floor().people(studioId, fromDay, toDay),
      repo.studio(studioId),
      repo.periods(studioId),
    ]);
    const result: PayPersonLine[] = people
      .filter((p) => p.pieces > 0 || p.payMinor > 0)
      .map((p) => {
        const ops = lines.filter((l) => l.userId === p.userId);
        return {
          userId: p.userId,
          name: p.name,
          pieces: ops.reduce((a, l) => a + l.pieces, 0),
          amountMinor: ops.reduce((a, l) => a + l.amountMinor, 0),
          earnedMinutes: p.earnedMinutes,
          attendedMinutes: p.attendedMinutes,
          efficiencyPercent: p.efficiencyPercent,
          operations: ops.map((l) => ({ code: l.operationCode, name: l.operationName, pieces: l.pieces, rateMinor: l.rateMinor, amountMinor: l.amountMinor })),
        };
      });
    const overlap = periods.find((p) => p.fromDay <= toDay && fromDay <= p.toDay);
    return { fromDay, toDay, currency: studio.currency, people: result, totalMinor: result.reduce((a, p) => a + p.amountMinor, 0), overlapsPeriodId: overlap?.id ?? null };
  }

  async function presentPeriod(studioId: number, p: PayPeriodEntity): Promise<PayPeriodDto> {
    const studio = await repo.studio(studioId);
    const payouts = await repo.payouts(studioId, p.id);
    const name = (id: number) => p.lines.find((l) => l.userId === id)?.name ?? '';
    return {
      id: p.id,
      fromDay: p.fromDay,
      toDay: p.toDay,
      status: p.status,
      approvedBy: await repo.userName(studioId, p.approvedBy),
      createdAt: new Date(p.createdAt).toISOString(),
      currency: studio.currency,
      totalMinor: p.lines.reduce((a, l) => a + l.amountMinor, 0),
      lines: p.lines,
      payouts: payouts.map((x) => presentPayout(x, name(x.userId))),
    };
  }

  async function getPeriod(studioId: number, id: number) {
    const p = await repo.period(studioId, id);
    if (!p) throw notFound('Pay period');
    return p;
  }

  /** Find or create the one payout row of a person in a period (unique payPeriodId + userId). */
  async function payoutRow(actor: Actor, period: PayPeriodEntity, userId: number, amountMinor: number, currency: string) {
    const existing = await repo.payout(actor.studioId, period.id, userId);
    if (existing) return existing;
    try {
      return await repo.insertPayout({
        studioId: actor.studioId,
        payPeriodId: period.id,
        userId,
        amountMinor,
        currency,
        status: 'pending',
        idempotencyKey: `seamrun-payout-${actor.studioId}-${period.id}-${userId}-0`,
        attempts: 0,
      });
    } catch (e) {
      if (!isUniqueViolation(e)) throw e;
      return (await repo.payout(actor.studioId, period.id, userId))!;
    }
  }

  async function payOnce(actor: Actor, periodId: number, userId: number): Promise<PayoutDto> {
    const period = await getPeriod(actor.studioId, periodId);
    const line = period.lines.find((l) => l.userId === userId);
    if (!line || line.amountMinor <= 0) throw badRequest('userId: nothing to pay this person in this period', { userId: 'Nothing to pay in this period' });
    const account = await repo.payoutAccount(actor.studioId, userId);
    if (!account && deps.live) {
      throw badRequest(`payoutAccount: ${line.name} has no payments account yet; add it on the People page`, { payoutAccount: 'Not set for this person' });
    }
    const studio = await repo.studio(actor.studioId);
    let row = await payoutRow(actor, period, userId, line.amountMinor, studio.currency);
    if (row.status === 'paid') return presentPayout(row, line.name);
    if (row.status === 'failed') {
      // The service refused the last key outright, so nothing was paid: a fresh key is safe for the retry.
      row = await repo.updatePayout(actor.studioId, row.id, { idempotencyKey: `seamrun-payout-${actor.studioId}-${period.id}-${userId}-${row.attempts}`, status: 'pending' });
    }
    const payments = await deps.payments();
    const outcome = await payments.transfer({
      amountMinor: row.amountMinor,
      currency: row.currency,
      destination: account || payeeAccount(actor.studioId, userId),
      description: `Piece-rate pay ${period.fromDay} to ${period.toDay}: ${line.name}`,
      idempotencyKey: row.idempotencyKey,
    });
    const patch: Partial<PayoutEntity> = outcome.ok
      ? { status: 'paid', providerRef: outcome.id, error: '', attempts: row.attempts + 1 }
      : outcome.definitive
        ? { status: 'failed', error: outcome.message, attempts: row.attempts + 1 }
        : { status: 'pending', error: `No clear answer from the payments service (${outcome.message}); retrying is safe, it uses the same key`, attempts: row.attempts + 1 };
    const after = await repo.updatePayout(actor.studioId, row.id, patch);
    await audit.record(actor, outcome.ok ? 'pay' : 'pay-failed', 'payout', after.id, { status: row.status }, { status: after.status, amountMinor: after.amountMinor, error: after.error, ref: after.providerRef });
    const all = await repo.payouts(actor.studioId, period.id);
    const payable = period.lines.filter((l) => l.amountMinor > 0);
    if (payable.every((l) => all.some((p) => p.userId === l.userId && p.status === 'paid'))) await repo.markPeriodPaid(actor.studioId, period.id);
    return presentPayout(after, line.name);
  }

  return {
    preview,
    async periods(studioId: number) {
      return Promise.all((await repo.periods(studioId)).map((p) => presentPeriod(studioId, p)));
    },
    async period(studioId: number, id: number) {
      return presentPeriod(studioId, await getPeriod(studioId, id));
    },
    /** Approve a period: freezes each person's pieces and amount. Overlapping an approved period is refused. */
    async approve(actor: Actor, fromDay: string, toDay: string) {
      const p = await preview(actor.studioId, fromDay, toDay);
      if (p.overlapsPeriodId) throw conflict(`These days overlap pay period ${p.overlapsPeriodId}, already approved`, { fromDay: 'Overlaps an approved period' });
      if (!p.people.length) throw badRequest('fromDay: no logged work in these days', { fromDay: 'No logged work in these days' });
      const saved = await repo.insertPeriod({
        studioId: actor.studioId,
        fromDay,
        toDay,
        status: 'approved',
        approvedBy: actor.id,
        lines: p.people.map((x) => ({ userId: x.userId, name: x.name, pieces: x.pieces, amountMinor: x.amountMinor })),
      });
      await audit.record(actor, 'approve', 'pay_period', saved.id, undefined, { fromDay, toDay, totalMinor: p.totalMinor });
      return presentPeriod(actor.studioId, saved);
    },
    /** Pay one person for a period. A double click or retry shares one payment: never pays twice. */
    pay(actor: Actor, periodId: number, userId: number) {
      const key = `${actor.studioId}:${periodId}:${userId}`;
      const running = inFlight.get(key);
      if (running) return running;
      const run = payOnce(actor, periodId, userId).finally(() => inFlight.delete(key));
      inFlight.set(key, run);
      return run;
    },
    /** The signed-in person's own pay in a period. */
    async mine(actor: Actor, fromDay: string, toDay: string): Promise<MyPayDto> {
      const lines = await floor().payLines(actor.studioId, fromDay, toDay, actor.id);
      const studio = await repo.studio(actor.studioId);
      return {
        fromDay,
        toDay,
        currency: studio.currency,
        pieces: lines.reduce((a, l) => a + l.pieces, 0),
        amountMinor: lines.reduce((a, l) => a + l.amountMinor, 0),
        operations: lines.map((l) => ({ code: l.operationCode, name: l.operationName, pieces: l.pieces, amountMinor: l.amountMinor })),
      };
    },
    /** Inputs of the pay sheet for an approved period. */
    async sheetInput(studioId: number, id: number) {
      const period = await getPeriod(studioId, id);
      const studio = await repo.studio(studioId);
      const lines = await floor().payLines(studioId, period.fromDay, period.toDay);
      const approver = await repo.userName(studioId, period.approvedBy);
      return { period, studio, lines, approver };
    },
  };
}
