import type { DataSource } from 'typeorm';
import type { ChangePasswordInput, CreateStudioInput } from '../../../shared/schemas/auth';
import { StudioEntity, UserEntity } from '../../entities';
import { hashSecret, verifySecret } from '../../auth/password';
import type { Actor } from '../../auth/require';
import { AppError, badRequest, conflict } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { UserRepository } from '../users/user.repository';

export type AuthService = ReturnType<typeof createAuthService>;

const LOCK_MS = 15 * 60 * 1000;

export function createAuthService(deps: {
  ds: DataSource;
  users: UserRepository;
  audit: AuditRepository;
  lockAfter: number;
  now: () => Date;
}) {
  const { ds, users, audit, lockAfter, now } = deps;

  const toActor = (u: UserEntity) => ({
    id: u.id,
    studioId: u.studioId,
    role: u.role,
    name: u.name,
    email: u.email,
    sessionVersion: u.sessionVersion,
    mustChangePassword: Boolean(u.mustChangePassword),
  });

  /** Shared check for password and PIN: lock after repeated failures, never say which part was wrong. */
  async function verify(email: string, secret: string, kind: 'password' | 'pin') {
    const user = await users.findByEmail(email.trim().toLowerCase());
    if (!user || !user.active) {
      await hashSecret(secret); // similar timing whether or not the account exists
      return false as const;
    }
    if (user.lockedUntil && new Date(user.lockedUntil) > now()) {
      throw new AppError(429, 'locked', 'Too many failed attempts; try again in 15 minutes');
    }
    const ok = await verifySecret(secret, kind === 'pin' ? user.pinHash : user.passwordHash);
    if (!ok) {
      const failures = user.failedLogins + 1;
      await users.recordFailure(user.id, failures, failures >= lockAfter ? new Date(now().getTime() + LOCK_MS) : null);
      return false as const;
    }
    if (user.failedLogins) await users.clearFailures(user.id);
    return toActor(user);
  }

  return {
    verifyPassword: (email: string, password: string) => verify(email, password, 'password'),
    verifyPin: (email: string, pin: string) => verify(email, pin, 'pin'),

    async actorForSession(id: number, version: number): Promise<Actor | null> {
      const u = await users.findForSession(id);
      if (!u || !u.active || u.sessionVersion !== version) return null;
      return toActor(u);
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
      return { ...toActor(u), sessionVersion, mustChangePassword: false };
    },

    /** Anyone may open a new studio; they become its owner. */
    async createStudio(input: CreateStudioInput) {
      if (await users.findByEmail(input.email)) {
        throw conflict('Someone already signs in with that email', { email: 'Already in use' });
      }
      const passwordHash = await hashSecret(input.password);
      const owner = await ds.transaction(async (m) => {
        const studio = await m.getRepository(StudioEntity).save({
          name: input.studioName,
          currency: input.currency,
          unitSystem: input.unitSystem,
          workingDayHours: 8,
        });
        const user = await m.getRepository(UserEntity).save({
          studioId: studio.id,
          name: input.ownerName,
          email: input.email,
          role: 'owner',
          passwordHash,
          active: true,
        });
        await audit.record({ id: user.id, studioId: studio.id, name: user.name }, 'create', 'studio', studio.id, undefined, { name: studio.name }, m);
        return user;
      });
      return toActor(owner);
    },
  };
}
