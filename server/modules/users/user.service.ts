import type { CreatePersonInput, SetPinInput, UpdatePersonInput } from '../../../shared/schemas/people';
import { hashSecret } from '../../auth/password';
import type { Actor } from '../../auth/require';
import { badRequest, conflict, notFound } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { UserRepository } from './user.repository';

export type UserService = ReturnType<typeof createUserService>;

export function createUserService(deps: { users: UserRepository; audit: AuditRepository }) {
  const { users, audit } = deps;
  return {
    list: (actor: Actor) => users.list(actor.studioId),

    async create(actor: Actor, input: CreatePersonInput) {
      if (await users.findByEmail(input.email)) {
        throw conflict('Someone already signs in with that email', { email: 'Already in use' });
      }
      const created = await users.insert({
        studioId: actor.studioId,
        name: input.name,
        email: input.email,
        role: input.role,
        // A PIN-only floor worker still gets an unusable random password hash.
        passwordHash: await hashSecret(input.temporaryPassword ?? crypto.randomUUID()),
        pinHash: input.pin ? await hashSecret(input.pin) : null,
        mustChangePassword: Boolean(input.temporaryPassword),
        active: true,
      });
      await audit.record(actor, 'create', 'user', created.id, undefined, { name: input.name, role: input.role });
      return created;
    },

    async update(actor: Actor, id: number, input: UpdatePersonInput) {
      const before = await users.get(actor.studioId, id);
      if (!before) throw notFound('Person');
      if (id === actor.id && (input.role && input.role !== 'owner' || input.active === false)) {
        throw badRequest('You cannot remove your own owner role or deactivate yourself', {
          [input.role ? 'role' : 'active']: 'Not for your own account',
        });
      }
      const patch: Record<string, unknown> = { ...input };
      if (input.active === false || (input.role && input.role !== before.role)) {
        patch.sessionVersion = before.sessionVersion + 1;
      }
      await users.update(actor.studioId, id, patch);
      const after = (await users.get(actor.studioId, id))!;
      await audit.record(actor, input.active === false ? 'deactivate' : 'update', 'user', id,
        { role: before.role, active: before.active, payoutAccount: before.payoutAccount, skills: before.skills },
        { role: after.role, active: after.active, payoutAccount: after.payoutAccount, skills: after.skills });
      return after;
    },

    /**
     * A new floor PIN from the owner (forgotten, or locked after wrong guesses): it replaces the old one, lifts
     * the PIN lock and ends the person's sessions, so a phone signed in with the old PIN asks again.
     */
    async setPin(actor: Actor, id: number, input: SetPinInput) {
      const before = await users.get(actor.studioId, id);
      if (!before) throw notFound('Person');
      await users.update(actor.studioId, id, { pinHash: await hashSecret(input.pin), pinFailures: 0, pinLockedUntil: null, sessionVersion: before.sessionVersion + 1 });
      await audit.record(actor, 'set_pin', 'user', id, { hadPin: Boolean(before.pinHash) }, { hasPin: true });
      return (await users.get(actor.studioId, id))!;
    },

    /** Lift the sign-in locks (PIN and password) without changing either secret. */
    async unlock(actor: Actor, id: number) {
      const before = await users.get(actor.studioId, id);
      if (!before) throw notFound('Person');
      await users.clearAllFailures(actor.studioId, id);
      await audit.record(actor, 'unlock', 'user', id, { pinLockedUntil: before.pinLockedUntil, lockedUntil: before.lockedUntil }, { pinLockedUntil: null, lockedUntil: null });
      return (await users.get(actor.studioId, id))!;
    },
  };
}
