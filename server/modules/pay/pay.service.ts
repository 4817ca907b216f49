import { randomUUID } from 'node:crypto';
import { computePeriodPay, formatRate, isWorkingDay, rateMillionths, zonedDay, zonedDayStart, type WorkingCalendar } from '@planning';
import { PAY_RULES_CAUTION, type MyPayDto, type PayoutDto, type PayPeriodDto, type PayPeriodLine, type PayPeriodRules, type PayPersonLine, type PayPreviewDto, type PayRulesDto, type PayRulesInput } from '../../../shared/schemas/pay';
import type { Actor } from '../../auth/require';
import type { PayoutEntity, PayPeriodEntity, WorkLogEntity } from '../../entities';
import { badRequest, conflict, notFound } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { FloorProgressService, PayLine } from '../floor/floor-progress.service';
import { logRate } from '../floor/floor-math';
import { dayOf } from '../floor/floor.service';
import { isUniqueViolation } from '../../db/data-source';
import type { PaymentsClient, TransferOutcome } from './payments-client';
import type { PayRepository } from './pay.repository';

export type PayService = ReturnType<typeof createPayService>;

/** The account a test payout goes to when the owner has not set the person's own (test mode only). */
export const payeeAccount = (studioId: number, userId: number) => `acct_seamrun_${studioId}_${userId}`;

const DAY_MS = 86_400_000;

/**
 * The real calendar day a stored YYYY-MM-DD stands for. Schemas refuse impossible dates now; a period saved
 * before that (say 2026-10-32) was counted as the day the date rolls into (1 November), so it is judged so.
 */
export function realDay(text: string): string {
  const [y, m, d] = text.split('-').map(Number);
  return dayOf(new Date(Date.UTC(y, m - 1, d)));
}

/** True when the approved period covers `day` (YYYY-MM-DD), on real dates. */
const covers = (p: Pick<PayPeriodEntity, 'fromDay' | 'toDay'>, day: string) => realDay(p.fromDay) <= day && day <= realDay(p.toDay);

/** One key per intended payout, made once and stored before the first call. */
const newPayoutKey = () => `seamrun-payout-${randomUUID()}`;

/** Groups every transfer of one (period, person) at the payments service; stable for the period's life. */
export const transferGroupOf = (p: Pick<PayoutEntity, 'studioId' | 'payPeriodId' | 'userId'>, periodCreatedAt: Date) =>
  `seamrun-${p.studioId}-${p.payPeriodId}-${p.userId}-${new Date(periodCreatedAt).getTime()}`;

/** The person for start-up checks in the audit trail. */
const systemActor = (studioId: number) => ({ id: 0, studioId, name: 'Seamrun start-up check' });

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

/** Every day from `fromDay` to `toDay`, both included (calendar dates, no time zone). */
export function daysBetween(fromDay: string, toDay: string): string[] {
  const out: string[] = [];
  for (let t = Date.parse(`${fromDay}T00:00:00Z`); out.length < 400 && dayOf(new Date(t)) <= toDay; t += DAY_MS) out.push(dayOf(new Date(t)));
  return out;
}

/** Scheduled minutes per day of [fromDay, toDay]: the calendar's minutes on its working days; other days are left out (0). */
export function scheduledMinutesOf(calendar: WorkingCalendar, fromDay: string, toDay: string): Record<string, number> {
  return Object.fromEntries(daysBetween(fromDay, toDay).filter((d) => isWorkingDay(calendar, d)).map((d) => [d, calendar.minutesPerDay]));
}

export function createPayService(deps: {
  /** The studio's IANA time zone: pay days are its days. */
  timeZone?: (studioId: number) => Promise<string>;
  /** The studio's working calendar (working days, minutes a day, holidays), for overtime. */
  calendar: (studioId: number) => Promise<WorkingCalendar>;
  repo: PayRepository;
  audit: AuditRepository;
  floor: () => FloorProgressService;
  payments: () => Promise<PaymentsClient>;
  /** Live keys: money moves, so every person needs their own account set. */
  live?: boolean;
}) {
  const { repo, audit, floor } = deps;
  const inFlight = new Map<string, Promise<PayoutDto>>();

  /**
   * The logs approving [fromDay, toDay] would pay: those made in these days that no period took, and those made
   * on an already-approved day after its approval (a period closes its days; late work goes to the next one).
   */
  async function claimable(studioId: number, fromDay: string, toDay: string, periods: PayPeriodEntity[]) {
    // Days are the studio's own, in its time zone (UTC until its working calendar names one).
    const tz = deps.timeZone ? await deps.timeZone(studioId) : 'UTC';
    const from = zonedDayStart(fromDay, tz);
    const to = zonedDayStart(realDay(dayOf(new Date(Date.parse(`${toDay}T00:00:00Z`) + DAY_MS))), tz);
    const open = await repo.unclaimedLogsBefore(studioId, to);
    const inDays = (l: WorkLogEntity) => new Date(l.createdAt).getTime() >= from.getTime();
    const late = open.filter((l) => !inDays(l) && periods.some((p) => covers(p, zonedDay(new Date(l.createdAt), tz))));
    return { logs: [...open.filter(inDays), ...late], carried: late.length };
  }

  function personLines(lines: PayLine[]) {
    const byPerson = new Map<number, PayLine[]>();
    for (const l of lines) byPerson.set(l.userId, [...(byPerson.get(l.userId) ?? []), l]);
    return byPerson;
  }

  /** The rules a period approved now would take: the studio's pay rules and its calendar's minutes for these days. */
  async function currentRules(studioId: number, fromDay: string, toDay: string): Promise<PayPeriodRules> {
    const row = await repo.workRules(studioId);
    const hourly = row?.minimumWageOn && row.minimumHourlyMinor ? row.minimumHourlyMinor : null;
    return { minimumHourlyMinor: hourly, overtimePremiumPercent: row?.overtimePremiumPercent ?? 0, scheduledMinutes: scheduledMinutesOf(await deps.calendar(studioId), fromDay, toDay) };
  }

  /**
   * Each person's pay for these logs and the attendance of [fromDay, toDay] under these rules (planning/pay
   * computePeriodPay: each operation line rounded once, then overtime premium and minimum-wage top-up).
   */
  async function periodLines(studioId: number, logs: WorkLogEntity[], fromDay: string, toDay: string, rules: PayPeriodRules | null) {
    const first = logs.filter((l) => l.attempt === 0);
    const attendance = rules ? await repo.attendanceBetween(studioId, fromDay, toDay) : [];
    const pay = computePeriodPay({
      work: first.map((l) => ({ personId: String(l.userId), operationId: String(l.operationId), pieces: l.pieces, rate: logRate(l) })),
      attendance: attendance.map((a) => ({ personId: String(a.userId), day: a.day, minutes: Math.round(a.minutes) })),
      scheduledMinutes: rules?.scheduledMinutes ?? {},
      rules: { minimumHourlyMinor: rules?.minimumHourlyMinor ?? null, overtimePremiumPercent: rules?.overtimePremiumPercent || null },
    });
    const names = new Map<number, string>();
    for (const p of pay) names.set(Number(p.personId), await repo.userName(studioId, Number(p.personId)));
    return pay
      .map((p): PayPeriodLine & { ops: PayLine[] } => ({
        userId: Number(p.personId),
        name: names.get(Number(p.personId)) ?? '',
        pieces: p.pieces,
        amountMinor: p.totalMinor,
        pieceMinor: p.pieceMinor,
        overtimeMinor: p.overtimeMinor,
        topUpMinor: p.topUpMinor,
        attendedMinutes: p.attendedMinutes,
        overtimeMinutes: p.overtimeMinutes,
        ops: [],
      }))
      .filter((l) => l.amountMinor > 0 || l.pieces > 0)
      .sort((a, b) => a.name.localeCompare(b.name) || a.userId - b.userId);
  }

  const stripOps = ({ ops: _ops, ...line }: PayPeriodLine & { ops: PayLine[] }): PayPeriodLine => line;

  async function preview(studioId: number, fromDay: string, toDay: string): Promise<PayPreviewDto> {
    const [people, studio, periods] = await Promise.all([floor().people(studioId, fromDay, toDay), repo.studio(studioId), repo.periods(studioId)]);
    const { logs, carried } = await claimable(studioId, fromDay, toDay, periods);
    const byPerson = personLines(await floor().payLinesOf(studioId, logs));
    const lines = await periodLines(studioId, logs, fromDay, toDay, await currentRules(studioId, fromDay, toDay));
    const result: PayPersonLine[] = lines.map((line) => {
      const p = people.find((x) => x.userId === line.userId);
      const ops = byPerson.get(line.userId) ?? [];
      return {
        userId: line.userId,
        name: line.name,
        pieces: line.pieces,
        amountMinor: line.amountMinor,
        pieceMinor: line.pieceMinor ?? 0,
        overtimeMinor: line.overtimeMinor ?? 0,
        topUpMinor: line.topUpMinor ?? 0,
        overtimeMinutes: line.overtimeMinutes ?? 0,
        earnedMinutes: p?.earnedMinutes ?? 0,
        attendedMinutes: p?.attendedMinutes ?? 0,
        efficiencyPercent: p?.efficiencyPercent ?? null,
        operations: ops.map((l) => ({ code: l.operationCode, name: l.operationName, pieces: l.pieces, rateMinor: l.rateMinor, amountMinor: l.amountMinor })),
      };
    });
    const overlap = periods.find((p) => realDay(p.fromDay) <= toDay && fromDay <= realDay(p.toDay));
    return {
      fromDay,
      toDay,
      currency: studio.currency,
      people: result,
      totalMinor: result.reduce((a, p) => a + p.amountMinor, 0),
      overlapsPeriodId: overlap?.id ?? null,
      overlapsPeriodNumber: overlap?.number ?? null,
      carriedLogs: carried,
    };
  }

  async function presentPeriod(studioId: number, p: PayPeriodEntity): Promise<PayPeriodDto> {
    const studio = await repo.studio(studioId);
    const payouts = await repo.payouts(studioId, p.id);
    const name = (id: number) => p.lines.find((l) => l.userId === id)?.name ?? '';
    return {
      id: p.id,
      number: p.number,
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

  /**
   * Find or create the one payout row of a person in a period (unique payPeriodId + userId). The key, the
   * account and the description are frozen here, before the first call, and every retry sends them unchanged.
   */
  async function payoutRow(actor: Actor, period: PayPeriodEntity, line: PayPeriodEntity['lines'][number], currency: string) {
    const existing = await repo.payout(actor.studioId, period.id, line.userId);
    if (existing) return existing;
    try {
      return await repo.insertPayout({
        studioId: actor.studioId,
        payPeriodId: period.id,
        userId: line.userId,
        amountMinor: line.amountMinor,
        currency,
        status: 'pending',
        idempotencyKey: newPayoutKey(),
        destination: await accountOf(actor.studioId, line.userId),
        description: `Piece-rate pay ${period.fromDay} to ${period.toDay}: ${line.name}`,
        attempts: 0,
      });
    } catch (e) {
      if (!isUniqueViolation(e)) throw e;
      return (await repo.payout(actor.studioId, period.id, line.userId))!;
    }
  }

  async function accountOf(studioId: number, userId: number) {
    return (await repo.payoutAccount(studioId, userId)) || payeeAccount(studioId, userId);
  }

  /** Record what the payments service holds for a payout; marks the period paid once everyone is. */
  async function settle(actor: Pick<Actor, 'id' | 'studioId' | 'name'>, period: PayPeriodEntity, row: PayoutEntity, patch: Partial<PayoutEntity>, action: string) {
    const after = await repo.updatePayout(actor.studioId, row.id, patch);
    await audit.record(actor, action, 'payout', after.id, { status: row.status }, { status: after.status, amountMinor: after.amountMinor, error: after.error, ref: after.providerRef });
    const all = await repo.payouts(actor.studioId, period.id);
    const payable = period.lines.filter((l) => l.amountMinor > 0);
    if (payable.every((l) => all.some((p) => p.userId === l.userId && p.status === 'paid'))) await repo.markPeriodPaid(actor.studioId, period.id);
    return after;
  }

  const outcomePatch = (row: PayoutEntity, outcome: TransferOutcome): Partial<PayoutEntity> =>
    outcome.ok
      ? { status: 'paid', providerRef: outcome.id, error: '', attempts: row.attempts + 1 }
      : outcome.definitive
        ? { status: 'failed', error: outcome.message, attempts: row.attempts + 1 }
        : {
            status: 'to_check',
            error: `No clear answer from the payments service (${outcome.message}). It may have paid: press Pay to check; it asks the service first and resends only the same request with the same key`,
            attempts: row.attempts + 1,
          };

  async function payOnce(actor: Actor, periodId: number, userId: number): Promise<PayoutDto> {
    const period = await getPeriod(actor.studioId, periodId);
    const line = period.lines.find((l) => l.userId === userId);
    if (!line || line.amountMinor <= 0) throw badRequest('userId: nothing to pay this person in this period', { userId: 'Nothing to pay in this period' });
    const existing = await repo.payout(actor.studioId, period.id, userId);
    if (!existing && deps.live && !(await repo.payoutAccount(actor.studioId, userId))) {
      throw badRequest(`payoutAccount: ${line.name} has no payments account yet; add it on the People page`, { payoutAccount: 'Not set for this person' });
    }
    const studio = await repo.studio(actor.studioId);
    let row = existing ?? (await payoutRow(actor, period, line, studio.currency));
    if (row.status === 'paid') return presentPayout(row, line.name);
    const payments = await deps.payments();
    const group = transferGroupOf(row, period.createdAt);
    if (existing) {
      // Ask before sending again: an earlier attempt may have paid even if its answer was lost or unclear.
      const found = await payments.findTransfer(group);
      if (found.ok && found.id) return presentPayout(await settle(actor, period, row, { status: 'paid', providerRef: found.id, error: '' }, 'pay'), line.name);
    }
    if (row.status === 'failed') {
      // The service refused the last request outright and holds no transfer for this payout (asked just above):
      // only here may a new key carry the account as it is now (the owner fixed it after the refusal).
      row = await repo.updatePayout(actor.studioId, row.id, { idempotencyKey: newPayoutKey(), destination: await accountOf(actor.studioId, userId), status: 'pending' });
    } else if (!row.destination) {
      // A payout row saved before accounts were frozen: freeze the account now, once.
      row = await repo.updatePayout(actor.studioId, row.id, { destination: await accountOf(actor.studioId, userId), description: `Piece-rate pay ${period.fromDay} to ${period.toDay}: ${line.name}` });
    }
    const outcome = await payments.transfer({
      amountMinor: row.amountMinor,
      currency: row.currency,
      destination: row.destination,
      description: row.description,
      transferGroup: group,
      idempotencyKey: row.idempotencyKey,
    });
    const after = await settle(actor, period, row, outcomePatch(row, outcome), outcome.ok ? 'pay' : 'pay-failed');
    return presentPayout(after, line.name);
  }

  /** Start-up: ask the payments service about every payout left pending or unclear (a crash mid-batch). */
  async function reconcile() {
    const rows = await repo.unsettledPayouts();
    if (!rows.length) return { checked: 0, paid: 0 };
    const payments = await deps.payments();
    let paid = 0;
    for (const row of rows) {
      const period = await repo.period(row.studioId, row.payPeriodId);
      if (!period) continue;
      const found = await payments.findTransfer(transferGroupOf(row, period.createdAt));
      const actor = systemActor(row.studioId);
      if (found.ok && found.id) {
        await settle(actor, period, row, { status: 'paid', providerRef: found.id, error: '' }, 'pay-reconciled');
        paid += 1;
      } else if (found.ok) {
        await settle(actor, period, row, { status: 'to_check', error: 'The server stopped before this payout was settled; the payments service holds no transfer for it. Press Pay to send it with the same key' }, 'pay-reconciled');
      } else {
        await settle(actor, period, row, { status: 'to_check', error: `Could not ask the payments service at start-up (${found.message}); press Pay to check again` }, 'pay-reconciled');
      }
    }
    return { checked: rows.length, paid };
  }

  /** Approvals of one studio run one after another, so two cannot both take the same days. */
  const approving = new Map<number, Promise<unknown>>();
  function oneAtATime<T>(studioId: number, fn: () => Promise<T>): Promise<T> {
    const run = (approving.get(studioId) ?? Promise.resolve()).then(fn, fn);
    approving.set(studioId, run.catch(() => undefined));
    return run;
  }

  async function approveNow(actor: Actor, fromDay: string, toDay: string) {
    const periods = await repo.periods(actor.studioId);
    const overlap = periods.find((p) => realDay(p.fromDay) <= toDay && fromDay <= realDay(p.toDay));
    if (overlap) throw conflict(`These days overlap pay period ${overlap.number}, already approved`, { fromDay: 'Overlaps an approved period' });
    const { logs } = await claimable(actor.studioId, fromDay, toDay, periods);
    if (!logs.some((l) => l.attempt === 0 && l.pieces > 0)) throw badRequest('fromDay: no logged work in these days', { fromDay: 'No logged work in these days' });
    const rules = await currentRules(actor.studioId, fromDay, toDay);
    const saved = await repo.insertPeriod({ studioId: actor.studioId, fromDay, toDay, status: 'approved', approvedBy: actor.id, lines: [], rules });
    await repo.claimLogs(actor.studioId, saved.id, logs.map((l) => l.id));
    // The lines are what this period really took: a log another request took meanwhile is not paid twice.
    const lines = (await periodLines(actor.studioId, await repo.logsOfPeriod(actor.studioId, saved.id), fromDay, toDay, rules)).map(stripOps);
    await repo.setPeriodLines(actor.studioId, saved.id, lines);
    saved.lines = lines;
    await audit.record(actor, 'approve', 'pay_period', saved.id, undefined, { fromDay, toDay, totalMinor: lines.reduce((a, l) => a + l.amountMinor, 0) });
    return presentPeriod(actor.studioId, saved);
  }

  return {
    preview,
    async periods(studioId: number) {
      return Promise.all((await repo.periods(studioId)).map((p) => presentPeriod(studioId, p)));
    },
    async period(studioId: number, id: number) {
      return presentPeriod(studioId, await getPeriod(studioId, id));
    },
    /**
     * Approve a period: it takes the logs of its days no period took yet, and late logs of days already
     * approved, and freezes each person's pieces and amount. Overlapping an approved period is refused.
     */
    approve(actor: Actor, fromDay: string, toDay: string) {
      return oneAtATime(actor.studioId, () => approveNow(actor, fromDay, toDay));
    },
    reconcile,
    /** Pay one person for a period. A double click or retry shares one payment: never pays twice. */
    pay(actor: Actor, periodId: number, userId: number) {
      const key = `${actor.studioId}:${periodId}:${userId}`;
      const running = inFlight.get(key);
      if (running) return running;
      const run = payOnce(actor, periodId, userId).finally(() => inFlight.delete(key));
      inFlight.set(key, run);
      return run;
    },
    /**
     * The period's lines computed again from its own logs, the attendance of its days and the rules it was approved
     * with: the same as the stored lines (a re-run never changes money). `same` says whether they agree.
     */
    async recompute(studioId: number, id: number) {
      const period = await getPeriod(studioId, id);
      const lines = (await periodLines(studioId, await repo.logsOfPeriod(studioId, period.id), period.fromDay, period.toDay, period.rules)).map(stripOps);
      const stored = period.rules ? period.lines : period.lines.map((l) => ({ userId: l.userId, name: l.name, pieces: l.pieces, amountMinor: l.amountMinor }));
      const comparable = period.rules ? lines : lines.map((l) => ({ userId: l.userId, name: l.name, pieces: l.pieces, amountMinor: l.amountMinor }));
      return { lines, same: JSON.stringify(comparable) === JSON.stringify(stored) };
    },
    /** The studio's pay rules, with the caution that local law decides. */
    async rules(studioId: number): Promise<PayRulesDto> {
      const row = await repo.workRules(studioId);
      const studio = await repo.studio(studioId);
      return {
        minimumWageOn: row?.minimumWageOn ?? false,
        minimumHourlyMinor: row?.minimumHourlyMinor ? Number(row.minimumHourlyMinor) : null,
        overtimePremiumPercent: row?.overtimePremiumPercent ?? 0,
        currency: studio.currency,
        caution: PAY_RULES_CAUTION,
      };
    },
    /** Save the pay rules; approved periods keep the rules they were approved with. */
    async saveRules(actor: Actor, input: PayRulesInput): Promise<PayRulesDto> {
      const before = await repo.workRules(actor.studioId);
      const hourly = input.minimumHourlyMinor == null ? null : rateMillionths(input.minimumHourlyMinor);
      if (input.minimumHourlyMinor != null && hourly == null) throw badRequest('minimumHourlyMinor: at most 6 decimals', { minimumHourlyMinor: 'At most 6 decimals of a minor unit' });
      const patch = { minimumWageOn: input.minimumWageOn, minimumHourlyMinor: hourly == null ? '' : formatRate(hourly), overtimePremiumPercent: input.overtimePremiumPercent };
      await repo.saveWorkRules(actor.studioId, patch);
      await audit.record(actor, 'pay_rules', 'studio', actor.studioId, before ? { minimumWageOn: before.minimumWageOn, minimumHourlyMinor: before.minimumHourlyMinor, overtimePremiumPercent: before.overtimePremiumPercent } : undefined, patch);
      return this.rules(actor.studioId);
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
      const own = await repo.logsOfPeriod(studioId, period.id);
      // A period approved before logs were given to periods has none of its own: its days hold its logs.
      const lines = own.length ? await floor().payLinesOf(studioId, own) : await floor().payLines(studioId, period.fromDay, period.toDay);
      const approver = await repo.userName(studioId, period.approvedBy);
      return { period, studio, lines, approver };
    },
  };
}
