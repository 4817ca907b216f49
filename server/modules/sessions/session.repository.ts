import { LessThan, MoreThan, type DataSource } from 'typeorm';
import { SessionEntity } from '../../entities';

export type SessionRepository = ReturnType<typeof createSessionRepository>;

export function createSessionRepository(ds: DataSource) {
  const repo = ds.getRepository(SessionEntity);
  return {
    async find(id: string, now: number): Promise<string | null> {
      const row = await repo.findOne({ where: { id, expiresAt: MoreThan(now) } });
      return row?.data ?? null;
    },
    async save(id: string, data: string, expiresAt: number) {
      await repo.save({ id, data, expiresAt });
    },
    async remove(id: string) {
      await repo.delete({ id });
    },
    async purgeExpired(now: number) {
      await repo.delete({ expiresAt: LessThan(now) });
    },
  };
}
