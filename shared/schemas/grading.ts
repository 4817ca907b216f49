import { z } from 'zod';

/** Route params of a style's grading: /styles/:id/grading. */
export const gradingParams = z.object({ id: z.coerce.number().int().positive() });
/** Route params of one piece: /styles/:id/grading/pieces/:pieceId. */
export const gradingPieceParams = gradingParams.extend({
  pieceId: z.string().trim().min(1).max(60).regex(/^[a-z0-9-]+$/, 'Lower-case letters, digits and - only'),
});

const lengthMm = z.number({ error: 'Give a length in mm' }).finite().positive('Must be more than 0').max(5000, 'At most 5000 mm');
/** Checked against grading's POINTS_OF_MEASURE by the service (shared/ does not import the core). */
const pointOfMeasure = z.string().trim().min(1, 'Name the measurement').max(40);

/** PUT /styles/:id/grading/chart: the grid, one row per point of measure, values in mm in size order. */
export const putSizeChartInput = z
  .object({
    name: z.string().trim().min(1, 'Name is required').max(120, 'At most 120 characters'),
    sizes: z.array(z.string().trim().min(1).max(12)).min(1, 'Give at least one size').max(20),
    rows: z.array(z.object({ pointOfMeasure, values: z.array(lengthMm) })).min(1, 'Give at least one measurement'),
    eases: z
      .record(z.string(), z.object({ easeMm: z.number().finite().min(-500).max(1000), toleranceMm: z.number().finite().min(0, 'Tolerance cannot be negative').max(200) }))
      .optional(),
  })
  .superRefine((v, ctx) => {
    const seen = new Set<string>();
    v.rows.forEach((r, i) => {
      if (seen.has(r.pointOfMeasure)) ctx.addIssue({ code: 'custom', path: ['rows', i, 'pointOfMeasure'], message: 'Listed twice' });
      seen.add(r.pointOfMeasure);
      if (r.values.length !== v.sizes.length) {
        ctx.addIssue({ code: 'custom', path: ['rows', i, 'values'], message: `Give ${v.sizes.length} values, one per size` });
      }
    });
  });
export type PutSizeChartInput = z.infer<typeof putSizeChartInput>;

const move = z.object({ dx: z.number().finite().min(-500).max(500), dy: z.number().finite().min(-500).max(500) });

/** PUT /styles/:id/grading/pieces/:pieceId/rules: the movement per size step of one grade point. */
export const putGradeRuleInput = z.object({
  target: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('vertex'), index: z.number().int().min(0) }),
    z.object({ kind: z.literal('feature'), key: z.string().trim().min(1).max(80) }),
  ]),
  landmark: z.string().trim().max(60).optional(),
  steps: z.array(move).min(1, 'Give one movement per size step'),
});
export type PutGradeRuleInput = z.infer<typeof putGradeRuleInput>;

/** GET chart export: ?format=csv|xlsx&unit=mm|cm|in. */
export const chartExportQuery = z.object({
  format: z.enum(['csv', 'xlsx']).default('csv'),
  unit: z.enum(['mm', 'cm', 'in']).default('mm'),
});

/** GET piece downloads: ?size=<label>|all&paper=A4|Letter. */
export const pieceDownloadQuery = z.object({
  size: z.string().trim().max(12).optional(),
  paper: z.enum(['A4', 'Letter']).default('A4'),
});

/** POST size mix form fields (with a CSV file `file`): garments to split and the minimum per size. */
export const sizeMixInput = z.object({
  total: z.coerce.number({ error: 'Give a whole number' }).int('Give a whole number').min(1, 'At least 1').max(100000),
  minPerSize: z.coerce.number({ error: 'Give a whole number' }).int('Give a whole number').min(0).max(10000).default(0),
  column: z.string().trim().max(60).optional(),
  unit: z.enum(['mm', 'cm', 'in']).optional(),
});

/** Outline point in mm (piece frame, y up). */
export interface PointDto { x: number; y: number }

/** One size of a graded piece, for drawing. */
export interface GradedShapeDto {
  outline: PointDto[];
  grainLine: { from: PointDto; to: PointDto };
  notches: PointDto[];
  drillHoles: PointDto[];
  internalLines: { kind: string; name: string; points: PointDto[] }[];
}

export interface PieceMeasurementsDto {
  areaMm2: number;
  widthMm: number;
  heightMm: number;
  edgeLengthsMm: Record<string, number>;
}

export interface GradeRuleDto {
  target: { kind: 'vertex'; index: number } | { kind: 'feature'; key: string };
  landmark?: string;
  steps: { dx: number; dy: number }[];
}

export interface GradedPieceDto {
  id: string;
  name: string;
  role: string;
  cut: 'cut1' | 'pair' | 'fold';
  quantity: number;
  /** The style's material the piece is cut from ('self', 'lining', 'contrast', 'interfacing' or an owner's name). */
  material: string;
  landmarks: Record<string, number>;
  edges: { name: string; allowanceMm: number; isFold: boolean }[];
  rules: GradeRuleDto[];
  bySize: Record<string, GradedShapeDto>;
  /** Cutting line of the base size (mm). */
  baseCutting: PointDto[];
  measurements: Record<string, PieceMeasurementsDto>;
}

export interface SeamCheckDto {
  seam: string;
  size: string;
  lengthAMm: number;
  lengthBMm: number;
  differenceMm: number;
  expectedMm: number;
  toleranceMm: number;
  ok: boolean;
}

export interface GradingErrorDto {
  pieceId?: string;
  size?: string;
  code: string;
  message: string;
}

export interface SizeChartRowDto {
  pointOfMeasure: string;
  values: number[];
  /** value[i + 1] − value[i] (mm). */
  grades: number[];
}

export interface GradingDto {
  styleId: number;
  baseSize: string;
  sizes: string[];
  chart: { name: string; sizes: string[]; rows: SizeChartRowDto[] } | null;
  /** EN 13402-3 bust interval of each size's bust girth (null outside 74–131 cm or no bust row). */
  designations: Record<string, string | null>;
  eases: Record<string, { easeMm: number; toleranceMm: number }>;
  specSheet: { pointOfMeasure: string; size: string; bodyMm: number; garmentMm: number; minMm: number; maxMm: number }[];
  pieces: GradedPieceDto[];
  seams: SeamCheckDto[];
  errors: GradingErrorDto[];
  updatedAt: string | null;
}

export interface SizeMixDto {
  total: number;
  minPerSize: number;
  measured: number;
  outsideRun: number;
  column: string;
  unit: 'mm' | 'cm' | 'in';
  sizes: { size: string; fromMm: number; toMm: number; bodies: number; garments: number }[];
  /** Counts per EN 13402-3 bust interval (cm), with below/above the table. */
  en13402: { label: string; count: number }[];
}

/** POST /styles/:id/pattern/import (multipart, with `file`): whether the file's outline is the sewing or the cutting line must be said. */
export const patternImportInput = z.object({
  units: z.enum(['mm', 'cm', 'in'], { error: 'Give the units as mm, cm or in' }).optional(),
  outlineIs: z.enum(['sewing', 'cutting'], { error: 'Say whether the outline in the file is the sewing line or the cutting line' }),
});
export type PatternImportInput = z.infer<typeof patternImportInput>;

const xy = z.tuple([z.number().finite().min(-1e6).max(1e6), z.number().finite().min(-1e6).max(1e6)]);

/**
 * POST /styles/:id/pattern/accept: the previewed pieces with the owner's settings; they replace the style's
 * pieces, or with `keepExisting` (a piece traced from a photo) join them, the existing pieces and rules kept.
 */
export const patternAcceptInput = z.object({
  outlineIs: z.enum(['sewing', 'cutting'], { error: 'Say whether the outline is the sewing line or the cutting line' }),
  keepExisting: z.boolean().optional(),
  pieces: z
    .array(
      z.object({
        name: z.string().trim().min(1, 'Name the piece').max(80, 'At most 80 characters'),
        outline: z.array(xy).min(3, 'An outline needs at least 3 points').max(20000, 'At most 20000 points'),
        grainLine: z.object({ from: xy, to: xy }).optional(),
        notches: z.array(xy).max(500).optional(),
        drillHoles: z.array(xy).max(500).optional(),
        cut: z.enum(['cut1', 'pair', 'fold'], { error: 'Choose cut once, cut a pair or cut on the fold' }),
        copies: z.number().int('Whole copies only').min(1, 'At least 1').max(50, 'At most 50'),
        material: z.string().trim().max(80, 'At most 80 characters').optional(),
        seamAllowanceMm: z.number().finite().min(0, 'Cannot be negative').max(100, 'At most 100 mm'),
      }),
    )
    .min(1, 'Accept at least one piece')
    .max(200, 'At most 200 pieces'),
});
export type PatternAcceptInput = z.infer<typeof patternAcceptInput>;

/** A piece previewed from a pattern file: millimetres, y up, outline counter-clockwise. */
export interface PatternPreviewPieceDto {
  name: string;
  size?: string;
  quantity?: number;
  material?: string;
  outline: [number, number][];
  grainLine?: { from: [number, number]; to: [number, number] };
  notches?: [number, number][];
  drillHoles?: [number, number][];
  areaMm2: number;
  perimeterMm: number;
  widthMm: number;
  heightMm: number;
}

/** POST /styles/:id/pattern/import answer: nothing is saved until the pieces are accepted. */
export interface PatternPreviewDto {
  units: string;
  outlineIs: 'sewing' | 'cutting';
  pieces: PatternPreviewPieceDto[];
  /** The style's base size; of a graded file, the pieces in this size are the ones to keep. */
  baseSize: string;
  /** Sizes named in the file's piece text, and those of them that are not in the style's size run. */
  sizesInFile: string[];
  sizesNotInRun: string[];
}
