import { LessThan, type DataSource } from 'typeorm';
import { createStatements } from '../../db/statements';
import { SessionEntity } from '../../entities';

export type SessionRepository = ReturnType<typeof createSessionRepository>;

export function createSessionRepository(ds: DataSource) {
  const repo = ds.getRepository(SessionEntity);
  const sql = createStatements(ds);
  return {
    /** Read on every signed-in request, so one constant prepared statement (server/db/statements.ts). */
    async find(id: string, now: number): Promise<string | null> {
      const data = await sql.value('SELECT "data" FROM "sessions" WHERE "id" = ? AND "expiresAt" > ?', [id, now]);
      return typeof data === 'string' ? data : null;
    },
    /** One INSERT … ON CONFLICT statement (SQLite and PostgreSQL), not a read-then-write. */
    async save(id: string, data: string, expiresAt: number) {
      await repo.upsert({ id, data, expiresAt }, ['id']);
    },
    /** Rewrites a session that exists; never creates one (a late write must not bring back a signed-out session). */
    async replace(id: string, data: string, expiresAt: number) {
      await repo.update({ id }, { data, expiresAt });
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
