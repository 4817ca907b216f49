import { z } from 'zod';

export const UPLOAD_KINDS = ['sketch', 'photo', 'swatch', 'packing-list', 'measurements'] as const;
export type UploadKind = (typeof UPLOAD_KINDS)[number];

export const uploadFields = z.object({
  kind: z.enum(UPLOAD_KINDS, { error: 'Pick what the file is: sketch, photo, swatch, packing-list or measurements' }),
  styleId: z.coerce.number().int().positive().optional(),
});

export const uploadListQuery = z.object({
  kind: z.enum(UPLOAD_KINDS).optional(),
  styleId: z.coerce.number().int().positive().optional(),
});

export interface UploadDto {
  id: number;
  kind: UploadKind;
  styleId: number | null;
  originalName: string;
  mimeType: string;
  size: number;
  uploadedBy: number;
  createdAt: string;
  url: string;
}
