import { insertWithStudioNumber } from '../../db/studio-number';
import { updateIfChanged } from '../../db/update-if-changed';
import type { DataSource } from 'typeorm';
import { Between, In, IsNull } from 'typeorm';
import { AttendanceEntity, PayoutEntity, PayPeriodEntity, StudioEntity, StudioWorkRulesEntity, UserEntity, WorkLogEntity } from '../../entities';

export type PayRepository = ReturnType<typeof createPayRepository>;

/** The text SQLite holds for a UTC datetime column ('YYYY-MM-DD HH:MM:SS.SSS'). */
const sqlTime = (d: Date) => d.toISOString().replace('T', ' ').replace('Z', '');

/** Pay periods, payouts and which period pays each work log, always scoped to one studio. */
export function createPayRepository(ds: DataSource) {
  const periods = ds.getRepository(PayPeriodEntity);
  const payouts = ds.getRepository(PayoutEntity);
  const logs = ds.getRepository(WorkLogEntity);
  return {
    /** Logs no period has paid yet, made before `before`; QueryBuilder because SQLite compares the stored UTC text. */
    unclaimedLogsBefore: (studioId: number, before: Date) =>
      logs
        .createQueryBuilder('l')
        .where('l.studioId = :studioId AND l.payPeriodId IS NULL', { studioId })
        .andWhere('l.createdAt < :before', { before: sqlTime(before) })
        .orderBy('l.id', 'ASC')
        .getMany(),
    /** Give these logs to a period; a log another period took meanwhile stays with it. */
    async claimLogs(studioId: number, payPeriodId: number, ids: number[]) {
      for (let i = 0; i < ids.length; i += 500) {
        await logs.update({ studioId, id: In(ids.slice(i, i + 500)), payPeriodId: IsNull() }, { payPeriodId });
      }
    },
    logsOfPeriod: (studioId: number, payPeriodId: number) => logs.find({ where: { studioId, payPeriodId }, order: { id: 'ASC' } }),
    setPeriodLines: (studioId: number, id: number, lines: PayPeriodEntity['lines']) => periods.update({ studioId, id }, { lines }),
    /** Payouts of every studio whose outcome is not known (checked against the payments service at start-up). */
    unsettledPayouts: () => payouts.find({ where: { status: In(['pending', 'to_check']) }, order: { id: 'ASC' } }),
    periods: (studioId: number) => periods.find({ where: { studioId }, order: { fromDay: 'DESC', id: 'DESC' } }),
    period: (studioId: number, id: number) => periods.findOneBy({ studioId, id }),
    /** A new period takes the studio's next number (1 for its first). */
    async insertPeriod(p: Omit<Partial<PayPeriodEntity>, 'id' | 'number'> & { studioId: number }) {
      const id = await insertWithStudioNumber(ds, PayPeriodEntity, p);
      return periods.findOneByOrFail({ studioId: p.studioId, id });
    },
    markPeriodPaid: (studioId: number, id: number) => periods.update({ studioId, id }, { status: 'paid' }),
    payouts: (studioId: number, payPeriodId: number) => payouts.find({ where: { studioId, payPeriodId }, order: { id: 'ASC' } }),
    payout: (studioId: number, payPeriodId: number, userId: number) => payouts.findOneBy({ studioId, payPeriodId, userId }),
    insertPayout: (p: Partial<PayoutEntity>) => payouts.save(payouts.create(p)),
    updatePayout: async (studioId: number, id: number, patch: Partial<PayoutEntity>) => {
      await updateIfChanged(payouts, { studioId, id }, patch);
      return payouts.findOneByOrFail({ studioId, id });
    },
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
    /** Attended minutes per person and day over [fromDay, toDay] (the studio's days). */
    attendanceBetween: (studioId: number, fromDay: string, toDay: string) =>
      ds.getRepository(AttendanceEntity).find({ where: { studioId, day: Between(fromDay, toDay) }, order: { day: 'ASC', userId: 'ASC' } }),
    /** The studio's pay rules row; null until first saved. */
    workRules: (studioId: number) => ds.getRepository(StudioWorkRulesEntity).findOneBy({ studioId }),
    /** Save the pay rules, making the studio's row on first save (one row per studio: unique index). */
    async saveWorkRules(studioId: number, patch: Partial<StudioWorkRulesEntity>) {
      const repo = ds.getRepository(StudioWorkRulesEntity);
      const row = (await repo.findOneBy({ studioId })) ?? repo.create({ studioId });
      return repo.save(Object.assign(row, patch));
    },
    setPeriodRules: (studioId: number, id: number, rules: PayPeriodEntity['rules']) => periods.update({ studioId, id }, { rules }),
    userName: async (studioId: number, id: number) => (await ds.getRepository(UserEntity).findOneBy({ studioId, id }))?.name ?? '',
    payoutAccount: async (studioId: number, id: number) => (await ds.getRepository(UserEntity).findOneBy({ studioId, id }))?.payoutAccount ?? '',
  };
}
