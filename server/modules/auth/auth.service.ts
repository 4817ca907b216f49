import type { ChangePasswordInput, CreateStudioInput } from '../../../shared/schemas/auth';
import type { UserEntity } from '../../entities';
import { hashSecret, verifySecret } from '../../auth/password';
import type { Actor } from '../../auth/require';
import { AppError, badRequest, conflict } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { StudioRepository } from '../studios/studio.repository';
import type { SecretKind, UserRepository } from '../users/user.repository';
import { normaliseEmail } from '../../../shared/schemas/auth';

export type AuthService = ReturnType<typeof createAuthService>;

const LOCK_MS = 15 * 60 * 1000;

export function createAuthService(deps: {
  users: UserRepository;
  studios: Pick<StudioRepository, 'open'>;
  audit: AuditRepository;
  lockAfter: number;
  now: () => Date;
}) {
  const { users, studios, audit, lockAfter, now } = deps;

  /**
   * The actor of a session. A temporary password must be replaced before anything else, but only in a
   * session opened with that password: a floor PIN is the person's own secret, so a machinist signed in
   * with a PIN is never sent to change a password they may never use (common practice on shared tablets).
   */
  const toActor = (u: UserEntity, signedInWith: SecretKind = 'password') => ({
    id: u.id,
    studioId: u.studioId,
    role: u.role,
    name: u.name,
    email: u.email,
    sessionVersion: u.sessionVersion,
    signedInWith,
    mustChangePassword: signedInWith === 'password' && Boolean(u.mustChangePassword),
    language: u.language,
  });

  /**
   * Judge one secret of `user` (null: no such account). The attempt is counted before the slow hash
   * check, in one statement, so parallel guesses cannot all be judged before the lock; a locked account
   * is refused without judging. Password and PIN failures count and lock apart. Never says which part was wrong.
   */
  async function judgeCounted(user: UserEntity | null, secret: string, kind: SecretKind) {
    if (!user || !user.active) {
      await hashSecret(secret); // similar timing whether or not the account exists
      return { actor: false as const, left: null };
    }
    const at = now();
    const failures = await users.admitAttempt(user.id, kind, lockAfter, at, new Date(at.getTime() + LOCK_MS));
    if (failures === null) throw new AppError(429, 'locked', 'Too many failed attempts; try again in 15 minutes');
    const ok = await verifySecret(secret, kind === 'pin' ? user.pinHash : user.passwordHash);
    // The attempt was counted as a failure before the check: `left` wrong tries remain before the lock.
    if (!ok) return { actor: false as const, left: Math.max(0, lockAfter - failures) };
    await users.clearFailures(user.id, kind);
    return { actor: toActor(user, kind), left: null };
  }
  const judge = async (user: UserEntity | null, secret: string, kind: SecretKind) => (await judgeCounted(user, secret, kind)).actor;

  const byEmail = (email: string) => users.findByEmail(normaliseEmail(email));

  return {
    verifyPassword: async (email: string, password: string) => judge(await byEmail(email), password, 'password'),
    verifyPin: async (email: string, pin: string) => judge(await byEmail(email), pin, 'pin'),

    /** PIN sign-in on a studio tablet: the person is picked from that studio's floor list, no e-mail. */
    /**
     * On a floor tablet the name is picked from the studio's own list, so saying how many tries are left
     * tells nothing new: `left` is the wrong PINs still allowed before the 15-minute lock (null on success).
     */
    async verifyFloorPin(studioId: number, userId: number, pin: string) {
      const user = await users.get(studioId, userId);
      const onFloor = user && (user.role === 'machinist' || user.role === 'finisher') ? user : null;
      return judgeCounted(onFloor, pin, 'pin');
    },

    /** Names (never e-mails) of the studio's active machinists and finishers, for a bound tablet. */
    async floorList(studioId: number) {
      const [studio, people] = await Promise.all([users.studio(studioId), users.floorPeople(studioId)]);
      return {
        studioName: studio.name,
        people: people.map((p) => ({ id: p.id, name: p.name, role: p.role as 'machinist' | 'finisher' })),
      };
    },

    async actorForSession(id: number, version: number, signedInWith: SecretKind = 'password'): Promise<Actor | null> {
      const u = await users.findForSession(id);
      if (!u || !u.active || u.sessionVersion !== version) return null;
      return toActor(u, signedInWith);
    },

    async me(actor: Actor) {
      const u = await users.get(actor.studioId, actor.id);
      return { user: u!, studio: await users.studio(actor.studioId) };
    },

    async changePassword(actor: Actor, input: ChangePasswordInput) {
      const u = await users.get(actor.studioId, actor.id);
      if (!u || !(await verifySecret(input.currentPassword, u.passwordHash))) {
        throw badRequest('Current password is wrong', { currentPassword: 'Does not match' });
      }
      // Checked against the stored hash, not only the typed current password: a temporary password the
      // owner handed over must be replaced by one only its holder knows.
      if (await verifySecret(input.newPassword, u.passwordHash)) {
        throw badRequest('newPassword: choose a password different from the current one', { newPassword: 'Must differ from the current password' });
      }
      const sessionVersion = u.sessionVersion + 1;
      await users.update(actor.studioId, actor.id, {
        passwordHash: await hashSecret(input.newPassword),
        mustChangePassword: false,
        sessionVersion,
      });
      await audit.record(actor, 'change_password', 'user', actor.id);
      return { ...toActor(u, 'password'), sessionVersion, mustChangePassword: false };
    },

    /** The person's own language, or null to follow the studio's. */
    async setLanguage(actor: Actor, language: 'en' | 'fr' | null) {
      await users.update(actor.studioId, actor.id, { language });
      await audit.record(actor, 'update', 'user', actor.id, undefined, { language });
    },

    /** Anyone may open a new studio; they become its owner. */
    async createStudio(input: CreateStudioInput) {
      if (await byEmail(input.email)) {
        throw conflict('Someone already signs in with that email', { email: 'Already in use' });
      }
      const passwordHash = await hashSecret(input.password);
      const owner = await studios.open(
        { name: input.studioName, currency: input.currency, unitSystem: input.unitSystem, language: input.language ?? 'en', timeZone: input.timeZone ?? 'UTC', workingDayHours: 8 },
        { name: input.ownerName, email: input.email, passwordHash },
      );
      return toActor(owner);
    },
  };
}
