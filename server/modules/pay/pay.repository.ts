import { updateIfChanged } from '../../db/update-if-changed';
import type { DataSource } from 'typeorm';
import { PayoutEntity, PayPeriodEntity, StudioEntity, UserEntity } from '../../entities';

export type PayRepository = ReturnType<typeof createPayRepository>;

/** Pay periods and payouts, always scoped to one studio. */
export function createPayRepository(ds: DataSource) {
  const periods = ds.getRepository(PayPeriodEntity);
  const payouts = ds.getRepository(PayoutEntity);
  return {
    periods: (studioId: number) => periods.find({ where: { studioId }, order: { fromDay: 'DESC', id: 'DESC' } }),
    period: (studioId: number, id: number) => periods.findOneBy({ studioId, id }),
    insertPeriod: (p: Partial<PayPeriodEntity>) => periods.save(periods.create(p)),
    markPeriodPaid: (studioId: number, id: number) => periods.update({ studioId, id }, { status: 'paid' }),
    payouts: (studioId: number, payPeriodId: number) => payouts.find({ where: { studioId, payPeriodId }, order: { id: 'ASC' } }),
    payout: (studioId: number, payPeriodId: number, userId: number) => payouts.findOneBy({ studioId, payPeriodId, userId }),
    insertPayout: (p: Partial<PayoutEntity>) => payouts.save(payouts.create(p)),
    updatePayout: async (studioId: number, id: number, patch: Partial<PayoutEntity>) => {
      await updateIfChanged(payouts, { studioId, id }, patch);
      return payouts.findOneByOrFail({ studioId, id });
    },
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
    userName: async (studioId: number, id: number) => (await ds.getRepository(UserEntity).findOneBy({ studioId, id }))?.name ?? '',
    payoutAccount: async (studioId: number, id: number) => (await ds.getRepository(UserEntity).findOneBy({ studioId, id }))?.payoutAccount ?? '',
  };
}
