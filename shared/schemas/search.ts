import { z } from 'zod';

/** The one search box: a bundle number or QR text, a style code or name, a roll label, a batch code, a person. */
export const searchQuery = z.object({
  q: z.string().trim().min(1, 'Type what to look for').max(100, 'At most 100 characters'),
});
export type SearchQuery = z.infer<typeof searchQuery>;

export const SEARCH_KINDS = ['bundle', 'style', 'roll', 'batch', 'person'] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];

/** One thing found; `layId` leads a bundle (or a batch with lays) to its lay for people who cannot open batches. */
export interface SearchHitDto {
  kind: SearchKind;
  id: number;
  title: string;
  detail: string;
  layId?: number;
}
