import { updateIfChanged } from '../../db/update-if-changed';
import { In, IsNull, Not, type DataSource } from 'typeorm';
import { createStatements } from '../../db/statements';
import { StudioEntity, UserEntity } from '../../entities';

export type UserRepository = ReturnType<typeof createUserRepository>;

/** Which sign-in a failure counts against: passwords and floor PINs lock apart. */
export type SecretKind = 'password' | 'pin';
const FAILURE_COLUMNS: Record<SecretKind, { count: string; until: string }> = {
  password: { count: 'failedLogins', until: 'lockedUntil' },
  pin: { count: 'pinFailures', until: 'pinLockedUntil' },
};

/** The text SQLite holds for a UTC datetime column ('YYYY-MM-DD HH:MM:SS.SSS'). */
const sqlTime = (d: Date) => d.toISOString().replace('T', ' ').replace('Z', '');

/** People queries. Every read that a signed-in person triggers is scoped to their studio. */
export function createUserRepository(ds: DataSource) {
  const users = ds.getRepository(UserEntity);
  const sql = createStatements(ds);
  const postgres = ds.options.type === 'postgres';
  const time = (d: Date) => (postgres ? d.toISOString() : sqlTime(d));
  /**
   * One conditional UPDATE per kind: an attempt is admitted only while the account is not locked, and is
   * counted as a failure before the slow hash check; the attempt that reaches the limit sets the lock. An
   * expired lock starts the count again. (OWASP ASVS V2.2: check and count in one statement.)
   */
  const admitText = Object.fromEntries(
    Object.entries(FAILURE_COLUMNS).map(([kind, { count: c, until: u }]) => {
      const next = `(CASE WHEN "${u}" IS NULL THEN "${c}" + 1 ELSE 1 END)`;
      const lockParam = postgres ? 'CAST(? AS timestamptz)' : '?';
      return [kind, `UPDATE "users" SET "${c}" = ${next}, "${u}" = CASE WHEN ${next} >= ? THEN ${lockParam} ELSE NULL END WHERE "id" = ? AND ("${u}" IS NULL OR "${u}" <= ?) RETURNING "${c}"`];
    }),
  ) as Record<SecretKind, string>;
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
    /** Count one attempt of `kind` before it is judged: the failures counted with it, or null when the account is locked for that kind. */
    async admitAttempt(id: number, kind: SecretKind, lockAfter: number, now: Date, lockUntil: Date): Promise<number | null> {
      const counted = await sql.value(admitText[kind], [lockAfter, time(lockUntil), id, time(now)]);
      return counted === undefined ? null : Number(counted);
    },
    /** The owner lifts both locks and their counts. */
    clearAllFailures: (studioId: number, id: number) =>
      users.update({ studioId, id }, { pinFailures: 0, pinLockedUntil: null, failedLogins: 0, lockedUntil: null }),
    /** A good sign-in of `kind` clears that kind's count and lock only. */
    clearFailures: (id: number, kind: SecretKind) =>
      users.update({ id }, kind === 'pin' ? { pinFailures: 0, pinLockedUntil: null } : { failedLogins: 0, lockedUntil: null }),
    /** The studio's floor list: active machinists and finishers who have a PIN, by name. */
    floorPeople: (studioId: number) =>
      users.find({
        where: { studioId, active: true, role: In(['machinist', 'finisher']), pinHash: Not(IsNull()) },
        order: { name: 'ASC', id: 'ASC' },
      }),
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
  };
}
