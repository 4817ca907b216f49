import { z } from 'zod';
import { currencyCode } from './common';

/** The studio's machines by type (`{ lockstitch: 4, overlock: 2 }`); a type not listed is not limited. */
export const machinesField = z
  .record(
    z.string().trim().min(1, 'Machine type is required').max(24, 'At most 24 characters'),
    z.number({ error: 'Give a count' }).int('Whole machines only').min(0, 'Cannot be negative').max(999, 'At most 999'),
  )
  .refine((v) => Object.keys(v).length <= 30, 'At most 30 machine types');

export const updateStudioInput = z.object({
  name: z.string().trim().min(2, 'Studio name is required').max(120).optional(),
  currency: currencyCode.optional(),
  unitSystem: z.enum(['metric', 'imperial']).optional(),
  workingDayHours: z.number().min(1, 'At least 1 hour').max(16, 'At most 16 hours').optional(),
  machines: machinesField.optional(),
});
export type UpdateStudioInput = z.infer<typeof updateStudioInput>;

export interface StudioDto {
  id: number;
  name: string;
  currency: string;
  unitSystem: 'metric' | 'imperial';
  workingDayHours: number;
  machines: Record<string, number>;
}
