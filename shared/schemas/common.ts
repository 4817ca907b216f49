import { code as iso4217 } from 'currency-codes';
import { z } from 'zod';

export const idParam = z.object({ id: z.coerce.number().int().positive() });
export const currencyCode = z
  .string()
  .regex(/^[A-Z]{3}$/, 'Use a three-letter ISO 4217 code, e.g. KES')
  // The same ISO 4217 list that gives each currency its minor-unit digits (shared/units/money.ts).
  .refine((c) => iso4217(c) !== undefined, 'Not an ISO 4217 currency code');
/**
 * True when `text` is YYYY-MM-DD and that day exists in the Gregorian calendar (`2026-11-31` and
 * `2026-13-45` do not). A pattern alone lets them through, and `new Date` then rolls them into the next month.
 */
export function isCalendarDate(text: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const t = new Date(Date.UTC(y, mo - 1, d));
  return y >= 1 && t.getUTCFullYear() === y && t.getUTCMonth() === mo - 1 && t.getUTCDate() === d;
}

/** A calendar date as YYYY-MM-DD that really exists; every date field of every schema uses this one. */
export const calendarDate = z
  .string({ error: 'Use a date as YYYY-MM-DD' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date as YYYY-MM-DD')
  .refine(isCalendarDate, { message: 'Not a real date: that day does not exist in the calendar' });
/** @deprecated The same schema as `calendarDate`, kept so older imports still refuse impossible dates. */
export const isoDate = calendarDate;
export const sizeLabel = z.string().trim().min(1, 'Size label is required').max(12, 'At most 12 characters');
export const safeText = (max: number) => z.string().trim().max(max, `At most ${max} characters`);
