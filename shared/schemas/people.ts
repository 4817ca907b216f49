import { z } from 'zod';
import { ROLES } from '../auth/permissions';

/**
 * A floor PIN: 4 to 6 digits, and not one of the PINs tried first (one digit repeated, or a straight run up or
 * down such as 1234 or 9876): NIST SP 800-63B §5.1.1.2 asks that a chosen secret be checked against values
 * known to be commonly used. The sign-in lock after a few failures does the rest.
 */
export const pinField = z
  .string()
  .regex(/^\d{4,6}$/, 'PIN is 4 to 6 digits')
  .refine((pin) => !isObviousPin(pin), 'Too easy to guess: not one digit repeated or a run like 1234');

/** One digit repeated (0000) or each digit one more, or one less, than the last (1234, 6543, 012345). */
export function isObviousPin(pin: string): boolean {
  if (!/^\d+$/.test(pin) || pin.length < 2) return false;
  const steps = new Set([...pin].slice(1).map((c, i) => Number(c) - Number(pin[i])));
  return steps.size === 1 && [0, 1, -1].includes([...steps][0]);
}

export const createPersonInput = z
  .object({
    name: z.string().trim().min(1, 'Name is required').max(120),
    email: z
      .string()
      .trim()
      .toLowerCase()
      .min(3, 'Email or username is required')
      .max(200)
      .regex(/^[a-z0-9._%+@-]+$/, 'Letters, digits and . _ % + - @ only'),
    role: z.enum(ROLES),
    temporaryPassword: z.string().min(10, 'At least 10 characters').max(200).optional(),
    pin: pinField.optional(),
  })
  .refine((v) => v.temporaryPassword || v.pin, {
    message: 'Give a temporary password or a PIN',
    path: ['temporaryPassword'],
  });
export type CreatePersonInput = z.infer<typeof createPersonInput>;

/** A payments-service connected account id: letters, digits and _ (e.g. acct_1AbC…); empty clears it. */
export const payoutAccountField = z
  .string()
  .trim()
  .max(64, 'At most 64 characters')
  .regex(/^([A-Za-z0-9_]{3,64})?$/, 'Letters, digits and _ only, as the payments service gives it');

/** A machine type name, as in the operations table (free text up to 24 characters). */
const machineTypeKey = z.string().trim().min(1, 'Machine type is required').max(24, 'At most 24 characters');

/**
 * A person's skills: machine type → pace against standard minutes (1.0 = standard, 0.8 = 25 % slower, 1.2 =
 * faster). A machine type left out is one the person does not run.
 */
export const skillsField = z
  .record(machineTypeKey, z.number({ error: 'Give a pace such as 1.0' }).min(0.1, 'At least 0.1').max(2, 'At most 2'))
  .refine((v) => Object.keys(v).length <= 20, 'At most 20 machine types');
export type Skills = z.infer<typeof skillsField>;

/**
 * Skills a person has until the owner edits them (common practice in small studios, not a published table):
 * a machinist runs every sewing machine at standard pace, a cutter cuts, a finisher does hand work, pressing,
 * buttons and inspection, an owner is not planned on the line.
 */
export function defaultSkills(role: (typeof ROLES)[number]): Skills {
  switch (role) {
    case 'machinist':
      return { lockstitch: 1, overlock: 1, coverstitch: 1, buttonhole: 1, 'button sew': 1, 'hand work': 1, pressing: 1 };
    case 'cutter':
      return { cutting: 1 };
    case 'finisher':
      return { 'hand work': 1, pressing: 1, 'button sew': 1, inspection: 1 };
    default:
      return {};
  }
}

export const updatePersonInput = z.object({
  role: z.enum(ROLES).optional(),
  active: z.boolean().optional(),
  name: z.string().trim().min(1).max(120).optional(),
  payoutAccount: payoutAccountField.optional(),
  /** Null puts the person back on the defaults for their role. */
  skills: skillsField.nullable().optional(),
});
export type UpdatePersonInput = z.infer<typeof updatePersonInput>;

/** The owner gives someone a new floor PIN (a forgotten or locked one). */
export const setPinInput = z.object({ pin: pinField });
export type SetPinInput = z.infer<typeof setPinInput>;

export const personSchema = z.object({
  id: z.number(),
  name: z.string(),
  email: z.string(),
  role: z.enum(ROLES),
  active: z.boolean(),
  hasPin: z.boolean(),
  mustChangePassword: z.boolean(),
  payoutAccount: z.string(),
  /** The skills the line plan uses: the person's own, or the defaults for their role when `skillsSet` is false. */
  skills: z.record(z.string(), z.number()),
  skillsSet: z.boolean(),
  /** Until when PIN sign-in is locked after too many wrong PINs (ISO), or null. */
  pinLockedUntil: z.string().nullable(),
  /** Until when password sign-in is locked, or null. */
  passwordLockedUntil: z.string().nullable(),
});
export type PersonDto = z.infer<typeof personSchema>;
