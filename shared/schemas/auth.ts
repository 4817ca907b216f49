import { z } from 'zod';
import { ROLES } from '../auth/permissions';
import { currencyCode } from './common';
import { languageField, timeZoneField } from './studio';

/** The one form of a sign-in e-mail, for the account lookup and the rate limiter alike. */
export const normaliseEmail = (email: unknown) => String(email ?? '').trim().toLowerCase();

export const loginInput = z.object({
  email: z.string().trim().toLowerCase().min(1, 'Email is required').max(200),
  password: z.string().min(1, 'Password is required').max(200),
});
export type LoginInput = z.infer<typeof loginInput>;

export const pinLoginInput = z.object({
  email: z.string().trim().toLowerCase().min(1, 'Email is required').max(200),
  pin: z.string().regex(/^\d{4,6}$/, 'PIN is 4 to 6 digits'),
});
export type PinLoginInput = z.infer<typeof pinLoginInput>;

/** PIN sign-in on a studio tablet: the person picked from the floor list, then the PIN. */
export const floorPinLoginInput = z.object({
  userId: z.number({ error: 'Pick your name' }).int().positive('Pick your name'),
  pin: z.string().regex(/^\d{4,6}$/, 'PIN is 4 to 6 digits'),
});
export type FloorPinLoginInput = z.infer<typeof floorPinLoginInput>;

export const bindFloorDeviceInput = z.object({
  label: z.string().trim().max(80, 'At most 80 characters').optional(),
});

/** What a bound studio tablet shows before anyone signs in: names only, never e-mails. */
export interface FloorListDto {
  studioName: string;
  people: { id: number; name: string; role: 'machinist' | 'finisher' }[];
}

export const passwordRule = z
  .string()
  .min(10, 'At least 10 characters')
  .max(200, 'At most 200 characters');

export const changePasswordInput = z
  .object({
    currentPassword: z.string().min(1, 'Current password is required').max(200),
    newPassword: passwordRule,
  })
  .refine((v) => v.newPassword !== v.currentPassword, { path: ['newPassword'], message: 'Must differ from the current password' });
export type ChangePasswordInput = z.infer<typeof changePasswordInput>;

export const createStudioInput = z.object({
  studioName: z.string().trim().min(2, 'Studio name is required').max(120),
  currency: currencyCode,
  unitSystem: z.enum(['metric', 'imperial']),
  language: languageField.optional(),
  timeZone: timeZoneField.optional(),
  ownerName: z.string().trim().min(1, 'Your name is required').max(120),
  email: z.string().trim().toLowerCase().email('Enter a valid email').max(200),
  password: passwordRule,
});
export type CreateStudioInput = z.infer<typeof createStudioInput>;

export const userSchema = z.object({
  id: z.number(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
});
export type UserDto = z.infer<typeof userSchema> & {
  studioId: number;
  studioName: string;
  currency: string;
  unitSystem: 'metric' | 'imperial';
  /** The language this person reads: their own choice, else the studio's. */
  language: 'en' | 'fr';
  /** The person's own choice; null when they follow the studio. */
  ownLanguage: 'en' | 'fr' | null;
  studioLanguage: 'en' | 'fr';
  timeZone: string;
  mustChangePassword: boolean;
};

/** A person's own settings: their language, or null to follow the studio's. */
export const updateMeInput = z.object({ language: languageField.nullable() });
export type UpdateMeInput = z.infer<typeof updateMeInput>;
