import { z } from 'zod';
import { currencyCode } from './common';

export const updateStudioInput = z.object({
  name: z.string().trim().min(2, 'Studio name is required').max(120).optional(),
  currency: currencyCode.optional(),
  unitSystem: z.enum(['metric', 'imperial']).optional(),
  workingDayHours: z.number().min(1, 'At least 1 hour').max(16, 'At most 16 hours').optional(),
});
export type UpdateStudioInput = z.infer<typeof updateStudioInput>;

export interface StudioDto {
  id: number;
  name: string;
  currency: string;
  unitSystem: 'metric' | 'imperial';
  workingDayHours: number;
}
