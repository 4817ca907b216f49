import { updateIfChanged } from '../../db/update-if-changed';
import type { DataSource } from 'typeorm';
import { createStatements } from '../../db/statements';
import { StudioEntity, UserEntity } from '../../entities';

export type UserRepository = ReturnType<typeof createUserRepository>;

/** People queries. Every read that a signed-in person triggers is scoped to their studio. */
export function createUserRepository(ds: DataSource) {
  const users = ds.getRepository(UserEntity);
  const sql = createStatements(ds);
  return {
    findByEmail: (email: string) => users.findOne({ where: { email } }),
    /** Unscoped lookup by id: only for the session layer, which owns the id it stored. */
    /** Read on every signed-in request, so one constant prepared statement (server/db/statements.ts). */
    findForSession: (id: number) => sql.first(UserEntity, 'SELECT * FROM "users" WHERE "id" = ?', [id]),
    get: (studioId: number, id: number) => users.findOne({ where: { studioId, id } }),
    list: (studioId: number) => users.find({ where: { studioId }, order: { role: 'ASC', name: 'ASC' } }),
    insert: (u: Partial<UserEntity>) => users.save(users.create(u)),
    update: async (studioId: number, id: number, patch: Partial<UserEntity>) => {
      // An empty patch is a no-op, not an error.
      await updateIfChanged(users, { studioId, id }, patch);
    },
    recordFailure: (id: number, failedLogins: number, lockedUntil: Date | null) =>
      users.update({ id }, { failedLogins, lockedUntil }),
    clearFailures: (id: number) => users.update({ id }, { failedLogins: 0, lockedUntil: null }),
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
  };
}
