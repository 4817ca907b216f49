import { z } from 'zod';
import { safeText, sizeLabel } from './common';
import type { MaterialFabrics, StyleComposition } from './style-composition';

export const STYLE_STATUSES = ['draft', 'sampling', 'approved', 'archived'] as const;

const styleFields = z.object({
  code: z
    .string()
    .trim()
    .min(1, 'Code is required')
    .max(24, 'At most 24 characters')
    .regex(/^[A-Za-z0-9-_]+$/, 'Letters, digits, - and _ only'),
  name: z.string().trim().min(1, 'Name is required').max(120, 'At most 120 characters'),
  description: safeText(2000).default(''),
  sizeRun: z
    .array(sizeLabel)
    .min(1, 'Give at least one size')
    .max(20, 'At most 20 sizes')
    .refine((s) => new Set(s).size === s.length, 'Sizes must be unique'),
  baseSize: sizeLabel,
  status: z.enum(STYLE_STATUSES).default('draft'),
});

export const createStyleInput = styleFields.refine((s) => s.sizeRun.includes(s.baseSize), {
  message: 'Base size must be one of the size run',
  path: ['baseSize'],
});
export type CreateStyleInput = z.input<typeof createStyleInput>;

export const updateStyleInput = createStyleInput;

export interface StyleDto {
  id: number;
  code: string;
  name: string;
  description: string;
  sizeRun: string[];
  baseSize: string;
  status: (typeof STYLE_STATUSES)[number];
  /** Blocks (or preset) the pieces are drafted from; null until the owner chooses. */
  composition: StyleComposition | null;
  /** Fabric id per material ({} = none linked). */
  materialFabrics: MaterialFabrics;
  updatedAt: string;
}
