import { code as iso4217 } from 'currency-codes';
import { z } from 'zod';

export const idParam = z.object({ id: z.coerce.number().int().positive() });
export const currencyCode = z
  .string()
  .regex(/^[A-Z]{3}$/, 'Use a three-letter ISO 4217 code, e.g. KES')
  // The same ISO 4217 list that gives each currency its minor-unit digits (shared/units/money.ts).
  .refine((c) => iso4217(c) !== undefined, 'Not an ISO 4217 currency code');
export const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date as YYYY-MM-DD');
export const sizeLabel = z.string().trim().min(1, 'Size label is required').max(12, 'At most 12 characters');
export const safeText = (max: number) => z.string().trim().max(max, `At most ${max} characters`);
