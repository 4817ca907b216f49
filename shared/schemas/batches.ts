import { z } from 'zod';
import { calendarDate, safeText } from './common';

export const BATCH_STATUSES = ['planned', 'cutting', 'sewing', 'finishing', 'shipped', 'cancelled'] as const;

export const createBatchInput = z.object({
  styleId: z.number({ error: 'Pick a style' }).int().positive('Pick a style'),
  quantities: z
    .record(z.string(), z.number().int('Whole garments only').min(0, 'Cannot be negative').max(100000, 'Too many'))
    .refine((q) => Object.values(q).reduce((a, b) => a + b, 0) > 0, 'Enter at least one garment'),
  dueDate: calendarDate,
  notes: safeText(2000).default(''),
});
export type CreateBatchInput = z.input<typeof createBatchInput>;

export const updateBatchInput = z.object({
  status: z.enum(BATCH_STATUSES).optional(),
  dueDate: calendarDate.optional(),
  notes: safeText(2000).optional(),
});

export interface BatchDto {
  /** For URLs and API calls only; people see `code`. */
  id: number;
  /** The batch's number in its studio, 1 for the studio's first. */
  number: number;
  /** B-0007: what the batch is called on every screen and document. */
  code: string;
  styleId: number;
  styleCode: string;
  styleName: string;
  quantities: Record<string, number>;
  total: number;
  dueDate: string;
  status: (typeof BATCH_STATUSES)[number];
  notes: string;
  createdAt: string;
}

/** The code a batch goes by on every screen and document: B-0007, from its number in its studio (never its id). */
export const batchCode = (batch: { number: number }) => `B-${String(batch.number).padStart(4, '0')}`;

/** Sum of a size → quantity map. */
export const batchTotal = (q: Record<string, number>) => Object.values(q).reduce((a, b) => a + b, 0);
