import { Between, In, Not, type DataSource } from 'typeorm';
import { createStatements } from '../../db/statements';
import {
  AttendanceEntity,
  BatchEntity,
  BundleEntity,
  CutPlanEntity,
  GradingSetEntity,
  LayEntity,
  OperationEntity,
  PayPeriodEntity,
  StudioEntity,
  UserEntity,
  WorkLogEntity,
} from '../../entities';

export type FloorRepository = ReturnType<typeof createFloorRepository>;

/** The text SQLite holds for a UTC datetime column ('YYYY-MM-DD HH:MM:SS.SSS'). */
const sqlTime = (d: Date) => d.toISOString().replace('T', ' ').replace('Z', '');

/** Floor queries: bundles, operations, work logs and attendance, always scoped to one studio. */
export function createFloorRepository(ds: DataSource) {
  const bundles = ds.getRepository(BundleEntity);
  const ops = ds.getRepository(OperationEntity);
  const logs = ds.getRepository(WorkLogEntity);
  const attendance = ds.getRepository(AttendanceEntity);
  const users = ds.getRepository(UserEntity);
  const batches = ds.getRepository(BatchEntity);
  // The statements a floor log runs every time are hand-written (see server/db/statements.ts).
  const sql = createStatements(ds);
  return {
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneBy({ id: studioId }),
    /** Lays of the batch's current cut plans, retired ones left out (read only: the cutting area owns them). */
    async liveLaysOfBatch(studioId: number, batchId: number) {
      const live = await ds.getRepository(CutPlanEntity).find({ where: { studioId, batchId, status: Not('superseded') }, select: { id: true } });
      if (!live.length) return [];
      return ds.getRepository(LayEntity).find({ where: { studioId, cutPlanId: In(live.map((p) => p.id)), status: Not('retired') }, select: { id: true, status: true } });
    },
    batch: (studioId: number, id: number) => batches.findOne({ where: { studioId, id }, relations: { style: true } }),
    /**
     * Bundles with this number: the one of `batchId` when given, else every one in the studio (more than one
     * only for bundles cut before numbers were studio-wide; the service refuses to guess between them).
     */
    bundlesByNumber(studioId: number, number: number, batchId?: number) {
      if (batchId) {
        return sql.all(BundleEntity, 'SELECT * FROM "bundles" WHERE "studioId" = ? AND "batchId" = ? AND "number" = ?', [studioId, batchId, number]);
      }
      return sql.all(BundleEntity, 'SELECT * FROM "bundles" WHERE "studioId" = ? AND "number" = ? ORDER BY "batchId" ASC', [studioId, number]);
    },
    /** A batch's status, read fresh on every log (planned … shipped, cancelled). */
    batchStatus: async (studioId: number, id: number) =>
      (await sql.value('SELECT "status" FROM "batches" WHERE "studioId" = ? AND "id" = ?', [studioId, id])) as string | undefined,
    batchesByIds: (studioId: number, ids: number[]) =>
      ids.length ? batches.find({ where: { studioId, id: In(ids) }, relations: { style: true }, order: { id: 'ASC' } }) : Promise.resolve([]),
    bundle: (studioId: number, id: number) => sql.first(BundleEntity, 'SELECT * FROM "bundles" WHERE "studioId" = ? AND "id" = ?', [studioId, id]),
    bundlesOfBatch: (studioId: number, batchId: number) => bundles.find({ where: { studioId, batchId }, order: { number: 'ASC' } }),
    saveReopened: (studioId: number, id: number, reopened: Record<string, number>) =>
      bundles.update({ studioId, id }, { reopened }),
    operationsOfStyle: (studioId: number, styleId: number) =>
      ops.find({ where: { studioId, styleId }, order: { seq: 'ASC', id: 'ASC' } }),
    operation: (studioId: number, id: number) => ops.findOneBy({ studioId, id }),
    logByKey: (studioId: number, idempotencyKey: string) =>
      sql.first(WorkLogEntity, 'SELECT * FROM "work_logs" WHERE "studioId" = ? AND "idempotencyKey" = ?', [studioId, idempotencyKey]),
    logAttempt: (studioId: number, bundleId: number, operationId: number, attempt: number) =>
      sql.first(WorkLogEntity, 'SELECT * FROM "work_logs" WHERE "studioId" = ? AND "bundleId" = ? AND "operationId" = ? AND "attempt" = ?', [studioId, bundleId, operationId, attempt]),
    log: (studioId: number, id: number) => logs.findOneBy({ studioId, id }),
    logsOfBundle: (studioId: number, bundleId: number) =>
      sql.all(WorkLogEntity, 'SELECT * FROM "work_logs" WHERE "studioId" = ? AND "bundleId" = ? ORDER BY "id" ASC', [studioId, bundleId]),
    logsOfBundles: (studioId: number, bundleIds: number[]) =>
      bundleIds.length ? logs.find({ where: { studioId, bundleId: In(bundleIds) }, order: { id: 'ASC' } }) : Promise.resolve([]),
    /** Logs stamped in [from, to); QueryBuilder because SQLite compares the stored UTC text, not Date objects. */
    logsBetween: (studioId: number, from: Date, to: Date, userId?: number) => {
      const q = logs
        .createQueryBuilder('l')
        .where('l.studioId = :studioId', { studioId })
        .andWhere('l.createdAt >= :from AND l.createdAt < :to', { from: sqlTime(from), to: sqlTime(to) });
      if (userId !== undefined) q.andWhere('l.userId = :userId', { userId });
      return q.orderBy('l.id', 'ASC').getMany();
    },
    /** One INSERT … RETURNING (no save(): that would wrap a transaction and re-select around it). */
    async insertLog(l: Omit<WorkLogEntity, 'id' | 'payPeriodId'>): Promise<WorkLogEntity> {
      return { ...l, payPeriodId: null, id: await sql.insert(WorkLogEntity, l) };
    },
    deleteLog: (studioId: number, id: number) => logs.delete({ studioId, id }),
    /** Active people of the floor (machinists, finishers, cutters) by name, for the attendance sheet. */
    floorPeople: (studioId: number) =>
      users.find({ where: { studioId, active: true, role: In(['machinist', 'finisher', 'cutter']) }, order: { name: 'ASC', id: 'ASC' } }),
    attendanceOn: (studioId: number, day: string) => attendance.find({ where: { studioId, day } }),
    /** Bundles with an operation sent back for rework (reopened not empty). */
    reopenedBundles: (studioId: number) =>
      bundles.createQueryBuilder('b').where('b.studioId = :studioId AND b.reopened <> :none', { studioId, none: '{}' }).orderBy('b.id', 'ASC').getMany(),
    /** A person's logs no pay period has taken yet, made before `before`. */
    unpaidLogsOf: (studioId: number, userId: number, before: Date) =>
      logs
        .createQueryBuilder('l')
        .where('l.studioId = :studioId AND l.userId = :userId AND l.payPeriodId IS NULL', { studioId, userId })
        .andWhere('l.createdAt < :before', { before: sqlTime(before) })
        .orderBy('l.id', 'ASC')
        .getMany(),
    /** The approved pay period ending last, if any. */
    lastPeriod: (studioId: number) => ds.getRepository(PayPeriodEntity).findOne({ where: { studioId }, order: { toDay: 'DESC', id: 'DESC' } }),
    /** The approved pay period covering `day`, if any (its attendance is frozen). */
    periodCovering: (studioId: number, day: string) =>
      ds.getRepository(PayPeriodEntity).createQueryBuilder('p').where('p.studioId = :studioId AND p.fromDay <= :day AND p.toDay >= :day', { studioId, day }).getOne(),
    /** Set each person's minutes on a day in one transaction (one row per person and day: unique index). */
    saveAttendance: (studioId: number, day: string, entries: { userId: number; minutes: number }[]) =>
      ds.transaction(async (m) => {
        const r = m.getRepository(AttendanceEntity);
        for (const e of entries) {
          const row = (await r.findOneBy({ studioId, userId: e.userId, day })) ?? r.create({ studioId, userId: e.userId, day });
          row.minutes = e.minutes;
          await r.save(row);
        }
      }),
    attendanceBetween: (studioId: number, fromDay: string, toDay: string) =>
      attendance.find({ where: { studioId, day: Between(fromDay, toDay) } }),
    usersByIds: (studioId: number, ids: number[]) =>
      ids.length ? users.find({ where: { studioId, id: In(ids) } }) : Promise.resolve([]),
    user: (studioId: number, id: number) => sql.first(UserEntity, 'SELECT * FROM "users" WHERE "studioId" = ? AND "id" = ?', [studioId, id]),
    gradingSet: (studioId: number, styleId: number) => ds.getRepository(GradingSetEntity).findOneBy({ studioId, styleId }),
  };
}
