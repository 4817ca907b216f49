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
    /** One INSERT … ON CONFLICT statement (SQLite and PostgreSQL), not a read-then-write. */
    async save(id: string, data: string, expiresAt: number) {
      await repo.upsert({ id, data, expiresAt }, ['id']);
    },
    async extend(id: string, expiresAt: number) {
      await repo.update({ id }, { expiresAt });
    },
    async remove(id: string) {
      await repo.delete({ id });
    },
    async purgeExpired(now: number) {
      await repo.delete({ expiresAt: LessThan(now) });
    },
  };
}
