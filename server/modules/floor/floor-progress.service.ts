import type { OperationProgress, PersonEfficiency, ProgressDto, SectionProgress } from '../../../shared/schemas/floor';
import { OPERATION_SECTIONS } from '../../../shared/schemas/floor';
import type { OperationEntity, WorkLogEntity } from '../../entities';
import { notFound } from '../../errors';
import { batchCode } from '../../../shared/schemas/batches';
import { computePeriodPay } from '@planning';
import { efficiencyPercent, logRate } from './floor-math';
import type { FloorRepository } from './floor.repository';
import { dayOf, dayStart, doneMap, type FloorService } from './floor.service';

export type FloorProgressService = ReturnType<typeof createFloorProgressService>;

/** Pieces × exact rate per person, operation and rate in a period, rounded once; rework (attempt > 0) carries no pay. */
export interface PayLine {
  userId: number;
  name: string;
  operationCode: string;
  operationName: string;
  pieces: number;
  rateMinor: number;
  amountMinor: number;
}

/** The last operation of the style (packing when there is one): a bundle is finished when it is done. */
const finalOperation = (ops: OperationEntity[]) =>
  ops.find((o) => /pack/i.test(o.name)) ?? [...ops].sort((a, b) => a.seq - b.seq).at(-1);

const DAY_MS = 86_400_000;

export function createFloorProgressService(deps: { repo: FloorRepository; floor: FloorService; now: () => Date }) {
  const { repo, floor, now } = deps;

  /** Efficiency (earned ÷ attended minutes) and pay per person over [fromDay, toDay], both UTC days. */
  async function people(studioId: number, fromDay: string, toDay: string): Promise<PersonEfficiency[]> {
    const from = new Date(`${fromDay}T00:00:00Z`);
    const to = new Date(new Date(`${toDay}T00:00:00Z`).getTime() + DAY_MS);
    const logs = await repo.logsBetween(studioId, from, to);
    const attendance = await repo.attendanceBetween(studioId, fromDay, toDay);
    const ids = [...new Set([...logs.map((l) => l.userId), ...attendance.map((a) => a.userId)])];
    const users = await repo.usersByIds(studioId, ids);
    return users
      .map((u) => {
        const mine = logs.filter((l) => l.userId === u.id);
        const earned = mine.reduce((a, l) => a + l.earnedMinutes, 0);
        const attended = attendance.filter((a) => a.userId === u.id).reduce((a, r) => a + r.minutes, 0);
        return {
          userId: u.id,
          name: u.name,
          role: u.role,
          pieces: mine.filter((l) => l.attempt === 0).reduce((a, l) => a + l.pieces, 0),
          earnedMinutes: Math.round(earned * 100) / 100,
          attendedMinutes: attended,
          efficiencyPercent: efficiencyPercent(earned, attended),
          payMinor: mine.reduce((a, l) => a + l.payMinor, 0),
        };
      })
      .sort((a, b) => a.name.localeCompare(b.name));
  }

  /** Pay lines of the logs made in [fromDay, toDay], people by name, operations by code. */
  async function payLines(studioId: number, fromDay: string, toDay: string, onlyUserId?: number): Promise<PayLine[]> {
    const from = new Date(`${fromDay}T00:00:00Z`);
    const to = new Date(new Date(`${toDay}T00:00:00Z`).getTime() + DAY_MS);
    return payLinesOf(studioId, await repo.logsBetween(studioId, from, to, onlyUserId));
  }

  /**
   * Pay lines of these logs (a pay period's own), people by name, operations by code; rework is left out. One line
   * per person, operation and exact rate, Σ pieces × rate rounded once (planning/pay computePeriodPay).
   */
  async function payLinesOf(studioId: number, all: WorkLogEntity[]): Promise<PayLine[]> {
    const logs = all.filter((l) => l.attempt === 0);
    const users = new Map((await repo.usersByIds(studioId, [...new Set(logs.map((l) => l.userId))])).map((u) => [u.id, u.name]));
    const ops = new Map<number, OperationEntity | null>();
    for (const id of new Set(logs.map((l) => l.operationId))) ops.set(id, await repo.operation(studioId, id));
    const pay = computePeriodPay({
      work: logs.map((l) => ({ personId: String(l.userId), operationId: String(l.operationId), pieces: l.pieces, rate: logRate(l) })),
      attendance: [],
      scheduledMinutes: {},
      rules: { minimumHourlyMinor: null, overtimePremiumPercent: null },
    });
    return pay
      .flatMap((p) =>
        p.lines.map((line) => {
          const op = ops.get(Number(line.operationId));
          return {
            userId: Number(p.personId),
            name: users.get(Number(p.personId)) ?? '',
            operationCode: op?.code ?? '?',
            operationName: op?.name ?? 'Operation removed',
            pieces: line.pieces,
            rateMinor: Number(line.rate),
            amountMinor: line.amountMinor,
          };
        }),
      )
      .sort((a, b) => a.name.localeCompare(b.name) || a.operationCode.localeCompare(b.operationCode) || a.rateMinor - b.rateMinor);
  }

  async function batchState(studioId: number, batchId: number) {
    const batch = await repo.batch(studioId, batchId);
    if (!batch) throw notFound('Batch');
    const ops = await floor.styleOps(studioId, batch.styleId);
    const bundles = await repo.bundlesOfBatch(studioId, batchId);
    const logs = await repo.logsOfBundles(studioId, bundles.map((b) => b.id));
    return { batch, ops, bundles, logs };
  }

  /** Pieces finished (final operation first done) per UTC day. */
  function finishedByDay(ops: OperationEntity[], logs: WorkLogEntity[]) {
    const last = finalOperation(ops);
    const byDay = new Map<string, number>();
    for (const l of logs) {
      if (!last || l.operationId !== last.id || l.attempt !== 0) continue;
      const d = dayOf(l.createdAt);
      byDay.set(d, (byDay.get(d) ?? 0) + l.pieces);
    }
    return byDay;
  }

  return {
    people,
    payLines,
    payLinesOf,

    /** Output per day of one batch: pieces whose final operation was done that day, oldest first. */
    async daily(studioId: number, batchId: number) {
      const { ops, logs } = await batchState(studioId, batchId);
      const byDay = finishedByDay(ops, logs);
      return { days: [...byDay.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([day, pieces]) => ({ day, pieces })) };
    },

    async progress(studioId: number, batchId: number): Promise<ProgressDto> {
      const { batch, ops, bundles, logs } = await batchState(studioId, batchId);
      const totalPieces = bundles.reduce((a, b) => a + b.pieces, 0);
      const done = new Map(bundles.map((b) => [b.id, doneMap(b, logs)]));
      const byCode = new Map(ops.map((o) => [o.code, o]));
      const operations: OperationProgress[] = ops.map((o) => {
        let bundlesDone = 0, piecesDone = 0, bundlesReady = 0;
        for (const b of bundles) {
          const d = done.get(b.id)!;
          if (d.has(o.id)) {
            bundlesDone += 1;
            piecesDone += b.pieces;
          } else if (o.predecessors.every((c) => !byCode.has(c) || d.has(byCode.get(c)!.id))) bundlesReady += 1;
        }
        return { operationId: o.id, code: o.code, name: o.name, section: o.section, bundlesDone, piecesDone, bundlesReady, bundlesTotal: bundles.length };
      });
      const sections: SectionProgress[] = OPERATION_SECTIONS.map((section) => {
        const mine = operations.filter((o) => o.section === section);
        const piecesDone = mine.reduce((a, o) => a + o.piecesDone, 0);
        const piecesTotal = totalPieces * mine.length;
        return { section, piecesDone, piecesTotal, percent: piecesTotal ? Math.round((piecesDone / piecesTotal) * 1000) / 10 : 0 };
      }).filter((s) => s.piecesTotal > 0);
      // Cutting is done lay by lay: with a cut plan, its progress is the share of lays cut (bundles
      // appear only when a lay is cut, so cutting operations logged on them would always lag).
      const lays = await repo.liveLaysOfBatch(studioId, batchId);
      if (lays.length) {
        const laysDone = lays.filter((l) => l.status === 'cut').length;
        const cutting: SectionProgress = {
          section: 'cutting', piecesDone: sections.find((s) => s.section === 'cutting')?.piecesDone ?? 0, piecesTotal: sections.find((s) => s.section === 'cutting')?.piecesTotal ?? 0,
          percent: Math.round((laysDone / lays.length) * 1000) / 10, laysDone, laysTotal: lays.length,
        };
        const at = sections.findIndex((s) => s.section === 'cutting');
        if (at >= 0) sections[at] = cutting;
        else sections.unshift(cutting);
      }
      const last = finalOperation(ops);
      const sewing = ops.filter((o) => o.section === 'sewing');
      const finishing = ops.filter((o) => o.section === 'finishing');
      const stageOf = (bundleId: number) => {
        const d = done.get(bundleId)!;
        if (last && d.has(last.id)) return 'packed' as const;
        if (finishing.some((o) => d.has(o.id)) || (sewing.length > 0 && sewing.every((o) => d.has(o.id)))) return 'finishing' as const;
        if (sewing.some((o) => d.has(o.id))) return 'sewing' as const;
        return 'cut' as const;
      };
      const stages = (['cut', 'sewing', 'finishing', 'packed'] as const).map((stage) => ({ stage, bundles: bundles.filter((b) => stageOf(b.id) === stage).length }));

      const byDay = finishedByDay(ops, logs);
      const today = dayOf(now());
      const firstDay = [...byDay.keys(), ...logs.map((l) => dayOf(l.createdAt))].sort()[0] ?? today;
      const days: string[] = [];
      for (let t = dayStart(new Date(`${firstDay}T00:00:00Z`)).getTime(); dayOf(new Date(t)) <= today && days.length < 90; t += DAY_MS) days.push(dayOf(new Date(t)));
      // The plan spreads the batch evenly over the working days (Mon–Fri) from the first day to the due date.
      const workDays = countWorkDays(firstDay, batch.dueDate);
      const perDay = workDays ? Math.ceil(totalPieces / workDays) : totalPieces;
      const daily = days.map((day) => ({ day, pieces: byDay.get(day) ?? 0, planned: isWorkDay(day) ? perDay : 0 }));
      const people = await this.peopleOfBatch(studioId, logs, firstDay, today);
      return {
        batchId,
        batchCode: batchCode(batch),
        totalPieces,
        bundles: bundles.length,
        operations,
        sections,
        stages,
        daily,
        people,
        packedPieces: [...byDay.values()].reduce((a, b) => a + b, 0),
      };
    },

    /** People who worked on this batch, with their efficiency over the batch's days. */
    async peopleOfBatch(studioId: number, logs: WorkLogEntity[], fromDay: string, toDay: string) {
      const ids = new Set(logs.map((l) => l.userId));
      return (await people(studioId, fromDay, toDay)).filter((p) => ids.has(p.userId));
    },
  };
}

const isWorkDay = (day: string) => {
  const wd = new Date(`${day}T00:00:00Z`).getUTCDay();
  return wd !== 0 && wd !== 6;
};

function countWorkDays(fromDay: string, toDay: string) {
  let n = 0;
  for (let t = new Date(`${fromDay}T00:00:00Z`).getTime(); t <= new Date(`${toDay}T00:00:00Z`).getTime() && n < 1000; t += DAY_MS) {
    if (isWorkDay(dayOf(new Date(t)))) n += 1;
  }
  return n;
}
