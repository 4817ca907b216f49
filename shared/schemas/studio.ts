import { z } from 'zod';
import { currencyCode } from './common';
import { isTimeZone, LANGUAGES } from '../format/studio-format';

/** A language Seamrun speaks. */
export const languageField = z.enum(LANGUAGES, { error: 'Choose English or French' });
/** An IANA time zone name the runtime knows (`Africa/Nairobi`). */
export const timeZoneField = z.string().trim().max(64).refine(isTimeZone, 'Not a time zone this server knows (e.g. Africa/Nairobi)');

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
  language: languageField.optional(),
  timeZone: timeZoneField.optional(),
  workingDayHours: z.number().min(1, 'At least 1 hour').max(16, 'At most 16 hours').optional(),
  machines: machinesField.optional(),
});
export type UpdateStudioInput = z.infer<typeof updateStudioInput>;

export interface StudioDto {
  id: number;
  name: string;
  currency: string;
  unitSystem: 'metric' | 'imperial';
  language: 'en' | 'fr';
  timeZone: string;
  workingDayHours: number;
  machines: Record<string, number>;
}
