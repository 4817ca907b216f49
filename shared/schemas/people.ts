import { z } from 'zod';
import { ROLES } from '../auth/permissions';

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
    pin: z.string().regex(/^\d{4,6}$/, 'PIN is 4 to 6 digits').optional(),
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

export const updatePersonInput = z.object({
  role: z.enum(ROLES).optional(),
  active: z.boolean().optional(),
  name: z.string().trim().min(1).max(120).optional(),
  payoutAccount: payoutAccountField.optional(),
});
export type UpdatePersonInput = z.infer<typeof updatePersonInput>;

export const personSchema = z.object({
  id: z.number(),
  name: z.string(),
  email: z.string(),
  role: z.enum(ROLES),
  active: z.boolean(),
  hasPin: z.boolean(),
  mustChangePassword: z.boolean(),
  payoutAccount: z.string(),
});
export type PersonDto = z.infer<typeof personSchema>;
