import { can, canLogSection, ROLE_LABELS } from '../../../shared/auth/permissions';
import { computePeriodPay, zonedDay, zonedDayStart } from '@planning';
import type { BundleChoiceDto, BundleDto, BundleOperationState, LogWorkInput, LogWorkResult, MyFiguresDto, MySummaryDto, ReworkDto, TodayDto } from '../../../shared/schemas/floor';
import { idempotencyKeyAuthor, logDate, UNDO_WINDOW_MS } from '../../../shared/schemas/floor';
import type { Actor } from '../../auth/require';
import type { BatchEntity, BundleEntity, OperationEntity, WorkLogEntity } from '../../entities';
import { AppError, badRequest, conflict, forbidden, notFound } from '../../errors';
import { said } from '../../../shared/i18n/speak';
import type { AuditRepository } from '../audit/audit.repository';
import { logEarnedMinutes, logPayMinor, logRate, operationRate } from './floor-math';
import { isCheckOperation, presentLog, presentOperation } from './floor.presenter';
import { isUniqueViolation } from '../../db/data-source';
import { batchCode } from '../../../shared/schemas/batches';
import type { FloorRepository } from './floor.repository';

export type FloorService = ReturnType<typeof createFloorService>;

/** Start of the UTC day holding `d`. Days are UTC calendar days (the server runs TZ=UTC). */
export const dayStart = (d: Date) => new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
export const dayOf = (d: Date | string) => new Date(d).toISOString().slice(0, 10);

/** A tiny time-boxed memo: operations and batches are read on every log, but change rarely. */
function memo<K, V>(ttlMs: number, now: () => number) {
  const m = new Map<K, { at: number; v: Promise<V> }>();
  return (key: K, load: () => Promise<V>) => {
    const hit = m.get(key);
    if (hit && now() - hit.at < ttlMs) return hit.v;
    const v = load();
    m.set(key, { at: now(), v });
    v.catch(() => m.delete(key));
    return v;
  };
}

/** The current attempt of an operation on a bundle: how many times it was sent back. */
export const attemptOf = (b: Pick<BundleEntity, 'reopened'>, opId: number) => b.reopened?.[String(opId)] ?? 0;

/** The log of the attempt before `attempt` of an operation on a bundle: whoever did it owns the rework. */
export function reworkOwner(logs: WorkLogEntity[], opId: number, attempt: number): WorkLogEntity | null {
  return logs.filter((l) => l.operationId === opId && l.attempt < attempt).sort((a, b) => b.attempt - a.attempt)[0] ?? null;
}

/** Which operations are done on a bundle now, from its logs (only the current attempt counts). */
export function doneMap(bundle: BundleEntity, logs: WorkLogEntity[]) {
  const done = new Map<number, WorkLogEntity>();
  for (const l of logs) if (l.bundleId === bundle.id && l.attempt === attemptOf(bundle, l.operationId)) done.set(l.operationId, l);
  return done;
}

/** The day after `day` (calendar dates). */
const nextDay = (day: string) => dayOf(new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000));

/** Count and earnings of some logs: first-attempt pieces, every log as a bundle operation, pay rounded once per operation line. */
function figuresOf(logs: WorkLogEntity[], fromDay: string, toDay: string): MyFiguresDto {
  const first = logs.filter((l) => l.attempt === 0);
  const pay = computePeriodPay({
    work: first.map((l) => ({ personId: 'me', operationId: String(l.operationId), pieces: l.pieces, rate: logRate(l) })),
    attendance: [],
    scheduledMinutes: {},
    rules: { minimumHourlyMinor: null, overtimePremiumPercent: null },
  });
  return { fromDay, toDay, pieces: first.reduce((a, l) => a + l.pieces, 0), bundleOps: logs.length, earningsMinor: pay[0]?.pieceMinor ?? 0 };
}

export function createFloorService(deps: { repo: FloorRepository; audit: AuditRepository; now: () => Date; timeZone?: (studioId: number) => Promise<string> }) {
  const { repo, audit, now } = deps;
  const clock = () => now().getTime();
  const opsMemo = memo<number, OperationEntity[]>(2000, clock);
  const batchMemo = memo<number, BatchEntity | null>(2000, clock);
  const currencyMemo = memo<number, string>(10000, clock);
  const reopenLocks = new Map<number, Promise<unknown>>();

  const styleOps = (studioId: number, styleId: number) => opsMemo(styleId, () => repo.operationsOfStyle(studioId, styleId));
  const batchOf = (studioId: number, batchId: number) => batchMemo(batchId, () => repo.batch(studioId, batchId));
  const currency = (studioId: number) => currencyMemo(studioId, async () => (await repo.studio(studioId))?.currency ?? 'KES');

  /** Every bundle a number (with its batch, when given) may mean, with its batch and style for the choice. */
  async function matches(studioId: number, number: number, batchId?: number): Promise<BundleChoiceDto[]> {
    const found = await repo.bundlesByNumber(studioId, number, batchId);
    const batches = new Map((await repo.batchesByIds(studioId, [...new Set(found.map((b) => b.batchId))])).map((b) => [b.id, b]));
    return found.map((b) => {
      const batch = batches.get(b.batchId);
      return {
        batchId: b.batchId,
        batchCode: batch ? batchCode(batch) : '',
        number: b.number,
        size: b.size,
        styleName: batch?.style?.name ?? '',
        batchStatus: batch?.status ?? '',
      };
    });
  }

  /**
   * The one bundle a typed or scanned number means. A number in more than one batch (bundles cut before
   * numbers were studio-wide) is refused with the choices, never guessed: the ticket's batch decides.
   */
  async function findBundle(studioId: number, number: number, batchId?: number) {
    const found = await repo.bundlesByNumber(studioId, number, batchId);
    if (!found.length) throw new AppError(404, 'not_found', `Bundle ${number} not found`, { bundleNumber: 'No such bundle' });
    if (found.length > 1) {
      const choices = (await matches(studioId, number)).map((c) => `${c.batchCode} (${c.styleName}, size ${c.size})`).join(', ');
      throw conflict(`Bundle ${number} is in more than one batch: ${choices}. Scan the ticket or pick its batch.`, {
        batchId: 'Pick the batch printed on the ticket',
      });
    }
    const bundle = found[0];
    const batch = await batchOf(studioId, bundle.batchId);
    if (!batch) throw notFound('Batch');
    return { bundle, batch, ops: await styleOps(studioId, batch.styleId) };
  }

  function missingPredecessors(op: OperationEntity, ops: OperationEntity[], done: Map<number, WorkLogEntity>) {
    const byCode = new Map(ops.map((o) => [o.code, o]));
    return op.predecessors
      .map((c) => byCode.get(c))
      .filter((p): p is OperationEntity => Boolean(p) && !done.has(p!.id))
      .map((p) => `${p.code} ${p.name} is not logged yet on this bundle`);
  }

  async function userName(studioId: number, userId: number, actor: Actor) {
    if (userId === actor.id) return actor.name;
    return (await repo.user(studioId, userId))?.name ?? 'someone';
  }

  async function alreadyLogged(actor: Actor, existing: WorkLogEntity, bundle: BundleEntity, op: OperationEntity) {
    const who = await userName(actor.studioId, existing.userId, actor);
    const at = new Date(existing.createdAt).toISOString().slice(11, 16);
    // English keeps its UTC clock time; French gives the time in the studio's zone, from the instant itself.
    const operation = `${op.code} ${op.name}`;
    return conflict(
      { ...said('alreadyLogged', { number: bundle.number, operation, who, at: new Date(existing.createdAt).toISOString() }), english: `Bundle ${bundle.number} · ${operation} was already logged by ${who} at ${at} UTC` },
      { operationId: `Logged by ${who}` },
    );
  }

  /** The saved log as the original response gave it, for a retried idempotency key. */
  async function replay(actor: Actor, log: WorkLogEntity): Promise<LogWorkResult> {
    if (log.userId !== actor.id) throw conflict('This idempotency key belongs to another log', { idempotencyKey: 'Already used' });
    const bundle = (await repo.bundle(actor.studioId, log.bundleId))!;
    const batch = (await batchOf(actor.studioId, bundle.batchId))!;
    const ops = await styleOps(actor.studioId, batch.styleId);
    const op = ops.find((o) => o.id === log.operationId) ?? (await repo.operation(actor.studioId, log.operationId))!;
    const earlier = (await repo.logsOfBundle(actor.studioId, bundle.id)).filter((l) => l.id < log.id);
    const warnings = missingPredecessors(op, ops, doneMap(bundle, earlier));
    return { log: presentLog(log, bundle, op, actor.name, await currency(actor.studioId)), warnings };
  }

  /** Work is logged (and paid) only in the person's own section, and only on a batch still in work. */
  async function checkMayLog(actor: Actor, op: OperationEntity, bundle: BundleEntity) {
    if (!canLogSection(actor.role, op.section)) {
      const who = ROLE_LABELS[actor.role];
      throw new AppError(403, 'forbidden', `${op.code} ${op.name} is ${op.section} work; a ${who.toLowerCase()} cannot log it`, { operationId: `Not ${who.toLowerCase()} work` });
    }
    // Read fresh, not from the batch memo: a batch shipped a moment ago takes no more work.
    const status = await repo.batchStatus(actor.studioId, bundle.batchId);
    if (status === 'shipped' || status === 'cancelled') {
      // The code from the memo is fine here: a batch's number never changes.
      const batch = await batchOf(actor.studioId, bundle.batchId);
      throw conflict(`Batch ${batch ? batchCode(batch) : ''} is ${status}; nothing more is logged on it`, { bundleNumber: `Batch ${status}` });
    }
  }

  /** Serialise read-modify-write of one bundle's reopened map. */
  async function withBundleLock<T>(bundleId: number, fn: () => Promise<T>): Promise<T> {
    const prev = reopenLocks.get(bundleId) ?? Promise.resolve();
    const run = prev.then(fn, fn);
    reopenLocks.set(bundleId, run.catch(() => undefined));
    return run;
  }

  async function reopen(studioId: number, bundleId: number, opIds: number[]) {
    await withBundleLock(bundleId, async () => {
      const b = (await repo.bundle(studioId, bundleId))!;
      const reopened = { ...(b.reopened ?? {}) };
      for (const id of opIds) reopened[String(id)] = (reopened[String(id)] ?? 0) + 1;
      await repo.saveReopened(studioId, bundleId, reopened);
    });
  }

  return {
    styleOps,
    batchOf,
    currency,

    /** Every bundle with this number, for the floor to pick from when a typed number is in more than one batch. */
    matches: (actor: Actor, number: number) => matches(actor.studioId, number),

    /** A bundle with this person's operations first and each operation's state. */
    async lookup(actor: Actor, number: number, batchId?: number): Promise<BundleDto> {
      const { bundle, batch, ops } = await findBundle(actor.studioId, number, batchId);
      const logs = await repo.logsOfBundle(actor.studioId, bundle.id);
      const done = doneMap(bundle, logs);
      const names = new Map((await repo.usersByIds(actor.studioId, [...new Set(logs.map((l) => l.userId))])).map((u) => [u.id, u.name]));
      const mineSection = actor.role === 'finisher' ? 'finishing' : actor.role === 'machinist' ? 'sewing' : null;
      const loggedBefore = new Set(logs.filter((l) => l.userId === actor.id).map((l) => l.operationId));
      const operations = ops
        .map((o) => presentOperation(o, o.section === mineSection || loggedBefore.has(o.id)))
        .sort((a, b) => Number(b.isMine) - Number(a.isMine));
      const states: BundleOperationState[] = ops.map((o) => {
        const l = done.get(o.id);
        return { operationId: o.id, done: Boolean(l), attempt: attemptOf(bundle, o.id), doneBy: l ? (names.get(l.userId) ?? '') : null, doneAt: l ? new Date(l.createdAt).toISOString() : null };
      });
      return {
        id: bundle.id,
        batchId: bundle.batchId,
        batchCode: batchCode(batch),
        number: bundle.number,
        size: bundle.size,
        shadeLot: bundle.shadeLot,
        plyFrom: bundle.plyFrom,
        plyTo: bundle.plyTo,
        pieces: bundle.pieces,
        styleName: batch.style?.name ?? '',
        operations,
        states,
        specNotes: await specNotes(repo, actor.studioId, batch.styleId, bundle.size),
      };
    },

    /**
     * Log an operation done on a bundle, once. The same idempotency key replays the first answer; a second
     * log of the same bundle operation is refused with who logged it; missing predecessors only warn.
     */
    async log(actor: Actor, input: LogWorkInput): Promise<{ status: 200 | 201; result: LogWorkResult }> {
      // A log queued on a shared phone carries its author in its key; it is never credited to whoever sends it.
      const author = idempotencyKeyAuthor(input.idempotencyKey);
      if (author !== null && author !== actor.id) {
        throw conflict('This log was made by someone else on this device; it is sent when they sign in', {
          idempotencyKey: 'Belongs to another person',
        });
      }
      const { bundle, ops } = await findBundle(actor.studioId, input.bundleNumber, input.batchId);
      const op = ops.find((o) => o.id === input.operationId);
      if (!op) throw badRequest('operationId: not an operation of this style', { operationId: 'Not an operation of this bundle’s style' });
      await checkMayLog(actor, op, bundle);
      const isCheck = isCheckOperation(op);
      if (isCheck && !can(actor.role, 'quality:check')) throw forbidden('Quality checks are logged by finishers');
      if (isCheck && !input.outcome) throw badRequest('outcome: say pass or fail', { outcome: 'Say pass or fail' });
      if (!isCheck && input.outcome) throw badRequest('outcome: only a quality check passes or fails', { outcome: 'Only for a quality check' });
      const rework = input.outcome === 'fail' ? ops.find((o) => o.id === input.reworkOperationId) : undefined;
      if (input.outcome === 'fail' && !rework) throw badRequest('reworkOperationId: not an operation of this style', { reworkOperationId: 'Not an operation of this style' });

      const attempt = attemptOf(bundle, op.id);
      const logs = await repo.logsOfBundle(actor.studioId, bundle.id);
      // A retried key replays its first answer. The usual retry is of this bundle's log, found here; a key
      // already used elsewhere is caught by its unique index at the insert below. One query fewer per log.
      const prior = logs.find((l) => l.idempotencyKey === input.idempotencyKey);
      if (prior) return { status: 201, result: await replay(actor, prior) };
      const existing = logs.find((l) => l.operationId === op.id && l.attempt === attempt);
      if (existing) throw await alreadyLogged(actor, existing, bundle, op);
      // Rework goes back to the person who did the operation: only they (or the owner) redo it, and it is not paid again.
      const sewnBy = attempt > 0 && !isCheck ? reworkOwner(logs, op.id, attempt) : null;
      if (sewnBy && sewnBy.userId !== actor.id && actor.role !== 'owner') {
        const who = await userName(actor.studioId, sewnBy.userId, actor);
        throw new AppError(403, 'forbidden', `Bundle ${bundle.number} · ${op.code} ${op.name} went back for rework to ${who}, who did it`, { operationId: `Rework for ${who}` });
      }
      const warnings = missingPredecessors(op, ops, doneMap(bundle, logs));

      let saved: WorkLogEntity;
      try {
        saved = await repo.insertLog({
          studioId: actor.studioId,
          bundleId: bundle.id,
          operationId: op.id,
          attempt,
          userId: actor.id,
          pieces: bundle.pieces,
          earnedMinutes: logEarnedMinutes(bundle.pieces, op.sam, attempt),
          payMinor: logPayMinor(bundle.pieces, operationRate(op), attempt),
          pieceRate: attempt > 0 ? '' : operationRate(op),
          idempotencyKey: input.idempotencyKey,
          outcome: input.outcome ?? '',
          defect: input.outcome === 'fail' ? (input.defect ?? '') : '',
          // A log that waited offline keeps the time it was done (within bounds), so it counts on its own day.
          createdAt: logDate(input.doneAt, now()),
        });
      } catch (e) {
        if (!isUniqueViolation(e)) throw e;
        // Lost a race: the same key (a retry) replays, another key for the same bundle operation is refused.
        const sameKey = await repo.logByKey(actor.studioId, input.idempotencyKey);
        if (sameKey) return { status: 201, result: await replay(actor, sameKey) };
        const winner = await repo.logAttempt(actor.studioId, bundle.id, op.id, attempt);
        if (winner) throw await alreadyLogged(actor, winner, bundle, op);
        throw e;
      }
      if (rework) {
        await reopen(actor.studioId, bundle.id, [...new Set([rework.id, op.id])]);
        const sewer = reworkOwner(logs, rework.id, attemptOf(bundle, rework.id) + 1);
        if (sewer) warnings.push(`Sent back to ${await userName(actor.studioId, sewer.userId, actor)} for rework of ${rework.code} ${rework.name} (not paid again)`);
      }
      const dto = presentLog(saved, bundle, op, actor.name, await currency(actor.studioId));
      // The work log is itself the record of who did what and when; the audit trail adds the exceptions
      // (a failed check that sent work back, an undo), so hundreds of logs a day do not bury them.
      if (rework) {
        await audit.record(actor, 'fail-check', 'work_log', saved.id, undefined, {
          bundle: bundle.number,
          operation: op.code,
          attempt,
          outcome: saved.outcome,
          defect: saved.defect,
          rework: rework.code,
        });
      }
      return { status: 201, result: { log: dto, warnings } };
    },

    /** Undo one's own log within the undo window. A failed check that reopened work cannot be undone here. */
    async undo(actor: Actor, id: number) {
      const log = await repo.log(actor.studioId, id);
      if (!log) throw notFound('Log');
      if (log.userId !== actor.id) throw forbidden('You can undo only your own logs');
      if (clock() - new Date(log.createdAt).getTime() > UNDO_WINDOW_MS) throw conflict('The undo window has passed; ask the owner');
      if (log.outcome === 'fail') throw conflict('A failed check sent work back for rework; ask the owner to correct it');
      await repo.deleteLog(actor.studioId, id);
      await audit.record(actor, 'undo', 'work_log', id, { bundleId: log.bundleId, operationId: log.operationId, attempt: log.attempt }, undefined);
    },

    /**
     * The signed-in person's own count and earnings today, this week (Monday to today) and in the pay period not yet
     * approved (their logs no period has taken), on the studio's days in its time zone.
     */
    async summary(actor: Actor): Promise<MySummaryDto> {
      const tz = deps.timeZone ? await deps.timeZone(actor.studioId) : 'UTC';
      const today = zonedDay(now(), tz);
      const weekday = new Date(`${today}T00:00:00Z`).getUTCDay();
      const monday = dayOf(new Date(Date.parse(`${today}T00:00:00Z`) - ((weekday + 6) % 7) * 86_400_000));
      const end = zonedDayStart(nextDay(today), tz);
      const todayStart = zonedDayStart(today, tz).getTime();
      const week = await repo.logsBetween(actor.studioId, zonedDayStart(monday, tz), end, actor.id);
      const unpaid = await repo.unpaidLogsOf(actor.studioId, actor.id, end);
      const last = await repo.lastPeriod(actor.studioId);
      const firstUnpaid = unpaid.length ? zonedDay(new Date(unpaid[0].createdAt), tz) : today;
      const periodFrom = last && nextDay(last.toDay) <= today ? nextDay(last.toDay) : firstUnpaid < today ? firstUnpaid : today;
      return {
        currency: await currency(actor.studioId),
        today: figuresOf(week.filter((l) => new Date(l.createdAt).getTime() >= todayStart), today, today),
        week: figuresOf(week, monday, today),
        payPeriod: figuresOf(unpaid, periodFrom, today),
      };
    },

    /** Bundle operations sent back for rework to the signed-in person (they did the attempt before), oldest first. */
    async rework(actor: Actor): Promise<ReworkDto[]> {
      const out: ReworkDto[] = [];
      for (const bundle of await repo.reopenedBundles(actor.studioId)) {
        const batch = await batchOf(actor.studioId, bundle.batchId);
        if (!batch || batch.status === 'shipped' || batch.status === 'cancelled') continue;
        const ops = await styleOps(actor.studioId, batch.styleId);
        const logs = await repo.logsOfBundle(actor.studioId, bundle.id);
        const failed = logs.filter((l) => l.outcome === 'fail').sort((a, b) => b.id - a.id)[0];
        for (const op of ops) {
          const attempt = attemptOf(bundle, op.id);
          if (attempt === 0 || isCheckOperation(op) || logs.some((l) => l.operationId === op.id && l.attempt === attempt)) continue;
          if (reworkOwner(logs, op.id, attempt)?.userId !== actor.id) continue;
          out.push({
            bundleNumber: bundle.number,
            batchId: bundle.batchId,
            batchCode: batchCode(batch),
            operationId: op.id,
            operationCode: op.code,
            operationName: op.name,
            attempt,
            defect: failed?.defect ?? '',
            checkedBy: failed ? await userName(actor.studioId, failed.userId, actor) : '',
            checkedAt: failed ? new Date(failed.createdAt).toISOString() : null,
          });
        }
      }
      return out;
    },

    /** Today's logs, pieces and earnings of the signed-in person only. */
    async today(actor: Actor): Promise<TodayDto> {
      // The studio's day, in its time zone (UTC until a working calendar says otherwise).
      const tz = deps.timeZone ? await deps.timeZone(actor.studioId) : 'UTC';
      const day = zonedDay(now(), tz);
      const from = zonedDayStart(day, tz);
      const to = zonedDayStart(nextDay(day), tz);
      const logs = (await repo.logsBetween(actor.studioId, from, to, actor.id)).reverse();
      const cur = await currency(actor.studioId);
      const dtos = [];
      for (const l of logs) {
        const bundle = await repo.bundle(actor.studioId, l.bundleId);
        const batch = bundle ? await batchOf(actor.studioId, bundle.batchId) : null;
        const op = batch ? (await styleOps(actor.studioId, batch.styleId)).find((o) => o.id === l.operationId) : undefined;
        dtos.push(presentLog(l, bundle ?? { number: 0, batchId: 0 }, op ?? { code: '?', name: 'Operation removed' }, actor.name, cur));
      }
      return {
        day,
        logs: dtos,
        pieces: logs.reduce((a, l) => a + l.pieces, 0),
        bundleOps: logs.length,
        earningsMinor: logs.reduce((a, l) => a + l.payMinor, 0),
        currency: cur,
      };
    },
  };
}

/** Points of measure of the bundle's size from the style's size chart, for the checker; empty without one. */
async function specNotes(repo: FloorRepository, studioId: number, styleId: number, size: string): Promise<string[]> {
  const set = await repo.gradingSet(studioId, styleId);
  const chart = set?.sizeChart as { sizes?: string[]; values?: Record<string, number[]> } | undefined;
  const i = chart?.sizes?.indexOf(size) ?? -1;
  if (!chart?.values || i < 0) return [];
  return Object.entries(chart.values)
    .filter(([, v]) => Array.isArray(v) && typeof v[i] === 'number')
    .map(([pom, v]) => `${pom.replace(/[-_]/g, ' ')}: ${(v[i] / 10).toFixed(1)} cm`);
}
