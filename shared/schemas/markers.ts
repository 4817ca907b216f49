import { z } from 'zod';

/** Marker job states, as stored. */
export const MARKER_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type MarkerStatusValue = (typeof MARKER_STATUSES)[number];

/** Start a marker: a size ratio of a style on one fabric's cuttable width. */
export const createMarkerInput = z.object({
  styleId: z.number({ error: 'Pick a style' }).int().positive('Pick a style'),
  batchId: z.number().int().positive().optional(),
  fabricId: z.number({ error: 'Pick a fabric' }).int().positive('Pick a fabric'),
  ratio: z
    .record(z.string(), z.number().int('Whole garments only').min(0, 'Cannot be negative').max(20, 'At most 20 of a size'))
    .refine((r) => Object.values(r).reduce((a, b) => a + b, 0) > 0, 'Put at least one garment in the marker'),
  /** Time budget in seconds; the server's NESTING_SECONDS when omitted. */
  seconds: z.number().min(1, 'At least 1 second').max(600, 'At most 600 seconds').optional(),
});
export type CreateMarkerInput = z.input<typeof createMarkerInput>;

export const markerListQuery = z.object({
  styleId: z.coerce.number().int().positive().optional(),
  batchId: z.coerce.number().int().positive().optional(),
});

/** GET /api/markers/:id: the drawing comes along unless `drawing=false` (a list polling progress leaves it out). */
export const markerQuery = z.object({
  drawing: z.unknown().optional().transform((v) => v !== 'false'),
});

/** One placed copy, drawn from its piece outline: mirror (x → −x) if mirrored, rotate, then translate. */
export interface MarkerPlacementDto {
  pieceKey: string;
  size: string;
  pieceName: string;
  copy: number;
  rotation: number;
  mirrored: boolean;
  x: number;
  y: number;
}

/** A finished marker's geometry: outlines per piece key (mm) and where each copy goes. */
export interface MarkerDrawingDto {
  outlines: Record<string, { x: number; y: number }[]>;
  placements: MarkerPlacementDto[];
}

/** One point of a marker run's progress: the best length found by then and its density. */
export interface MarkerProgressPointDto {
  /** Since the run started. */
  elapsedMs: number;
  lengthMm: number;
  /** Piece area ÷ (length × width), 0–1. */
  utilisation: number;
}

export interface MarkerDto {
  id: number;
  styleId: number;
  batchId: number | null;
  fabricId: number | null;
  ratio: Record<string, number>;
  garments: number;
  widthMm: number;
  status: MarkerStatusValue;
  /** Best length so far while running; final length when done (mm). */
  lengthMm: number | null;
  /** Piece area ÷ (length × width), 0–1. */
  utilisation: number | null;
  /** Length per garment (mm) when a length is known. */
  lengthPerGarmentMm: number | null;
  elapsedMs: number;
  budgetSeconds: number;
  /** True when the run stopped before its budget ran out (cancelled with a best-so-far marker). */
  complete: boolean | null;
  error: string;
  pieceCount: number;
  /** Worker threads the run uses now (0 when not running). */
  cores: number;
  /** Best length and density over time, oldest first: live while running, as stored once finished. */
  progress: MarkerProgressPointDto[];
  createdAt: string;
  drawing?: MarkerDrawingDto;
}

/**
 * Size ratio as a short text, sizes in the given order: "XS×1 · S×2", as the printed marker lists and cut tickets
 * write it. The × keeps a numeric size run readable: "10×1 · 12×2", never "10 1 · 12 2".
 */
export const ratioText = (ratio: Record<string, number>, sizes: string[] = Object.keys(ratio)) =>
  sizes.filter((s) => (ratio[s] ?? 0) > 0).map((s) => `${s}×${ratio[s]}`).join(' · ');
