import { defaultSkills, type PersonDto } from '../../../shared/schemas/people';
import type { UserDto } from '../../../shared/schemas/auth';
import type { StudioEntity, UserEntity } from '../../entities';

export const presentPerson = (u: UserEntity): PersonDto => ({
  id: u.id,
  name: u.name,
  email: u.email,
  role: u.role,
  active: Boolean(u.active),
  hasPin: Boolean(u.pinHash),
  mustChangePassword: Boolean(u.mustChangePassword),
  payoutAccount: u.payoutAccount ?? '',
  skills: u.skills ?? defaultSkills(u.role),
  skillsSet: u.skills != null,
  pinLockedUntil: u.pinLockedUntil ? new Date(u.pinLockedUntil).toISOString() : null,
  passwordLockedUntil: u.lockedUntil ? new Date(u.lockedUntil).toISOString() : null,
});

export const presentMe = (u: UserEntity, studio: StudioEntity): UserDto => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  studioId: studio.id,
  studioName: studio.name,
  currency: studio.currency,
  unitSystem: studio.unitSystem,
  language: u.language ?? studio.language ?? 'en',
  ownLanguage: u.language ?? null,
  studioLanguage: studio.language ?? 'en',
  timeZone: studio.timeZone ?? 'UTC',
  mustChangePassword: Boolean(u.mustChangePassword),
});
