import { z } from 'zod';

const mm = z.number({ error: 'Give a length in mm' }).finite().positive('Must be more than 0').max(10000, 'At most 10000 mm');
const mmOrZero = z.number({ error: 'Give a length in mm' }).finite().min(0, 'Cannot be negative').max(10000, 'At most 10000 mm');
const ease = z.number({ error: 'Give an ease in mm' }).finite().min(-500).max(2000);
const material = z.string().trim().min(1).max(40).optional();
const seams = { seamMm: mmOrZero.optional(), hemMm: mmOrZero.optional(), material };
const opening = z.object({ allowanceMm: mmOrZero.optional() }).strict().nullable().optional();
const ringCut = z.enum(['ring', 'halves', 'quarters']).optional();
const fraction = z.number({ error: 'Give a fraction of a circle' }).finite().gt(0, 'Must be more than 0').max(1, 'At most 1 (a full circle)').optional();

const neckline = z.discriminatedUnion('shape', [
  z.object({ shape: z.literal('round'), widthMm: mm.optional(), depthMm: mm.optional() }).strict(),
  z.object({ shape: z.literal('v'), widthMm: mm.optional(), depthMm: mm.optional() }).strict(),
  z.object({ shape: z.literal('square'), widthMm: mm.optional(), depthMm: mm.optional() }).strict(),
  z.object({ shape: z.literal('boat'), widthMm: mm.optional(), depthMm: mm.optional() }).strict(),
]);

const bodice = z.object({
  block: z.literal('bodice'), bustEaseMm: ease.optional(), waistEaseMm: ease.optional(), waistDartMm: mmOrZero.optional(),
  bustDartMm: z.union([mmOrZero, z.literal('from-lengths')]).optional(), neckline: neckline.optional(),
  backNeckline: z.enum(['standard', 'high']).optional(),
  shoulderPads: z.union([z.literal(false), z.object({ thicknessMm: mmOrZero.optional(), extraWidthMm: mmOrZero.optional() }).strict()]).optional(),
  centreBackOpening: opening, ...seams,
}).strict();

const skirt = z.object({
  block: z.literal('skirt'), shape: z.enum(['straight', 'pencil', 'a-line', 'gathered', 'circle']).optional(),
  lengthMm: mm.optional(), waistEaseMm: ease.optional(), hipEaseMm: ease.optional(), waistDartMm: mmOrZero.optional(),
  centreBackOpening: opening, vent: z.object({ lengthMm: mm.optional(), widthMm: mm.optional() }).strict().nullable().optional(),
  hemTaperMm: mmOrZero.optional(), hemFlareMm: mmOrZero.optional(), fullness: z.number().finite().min(1).max(6).optional(),
  fraction, cut: ringCut, ...seams,
}).strict();

const sleeve = z.object({
  block: z.literal('sleeve'), length: z.enum(['short', 'three-quarter', 'long']).optional(), lengthMm: mm.optional(),
  armholeFrontMm: mm.optional(), armholeBackMm: mm.optional(), capEaseFrontMm: ease.optional(), capEaseBackMm: ease.optional(),
  capHeightMm: mm.optional(), hemWidthMm: mm.optional(), ...seams,
}).strict();

const peplum = z.object({
  block: z.literal('peplum'), shape: z.literal('circle').optional(),
  innerEdge: z.object({ times: z.number().finite().positive('Must be more than 0').max(10).optional(), plusMm: z.number().finite().min(-2000).max(5000).optional() }).strict().optional(),
  lengthMm: mm.optional(), waistEaseMm: ease.optional(), fraction, cut: ringCut, openingAllowanceMm: mmOrZero.optional(), cornerRadiusMm: mmOrZero.optional(), ...seams,
}).strict();

const dress = z.object({
  block: z.literal('dress'), bustEaseMm: ease.optional(), waistEaseMm: ease.optional(), hipEaseMm: ease.optional(), lengthMm: mm.optional(),
  hemFlareMm: mmOrZero.optional(), buttonExtensionMm: mmOrZero.optional(), ...seams,
}).strict();

const shirtSleeve = z.object({
  block: z.literal('shirt-sleeve'), capEaseMm: ease.optional(), capHeightRatio: z.number().finite().gt(0, 'Must be more than 0').max(1.5).optional(),
  underarmLengthMm: mm.optional(), hemTaperMm: mmOrZero.optional(), ...seams,
}).strict();

const band = { heightMm: mm.optional(), extensionMm: mmOrZero.optional(), seamMm: mmOrZero.optional(), material };
const collarBand = z.object({ block: z.literal('collar-band'), ...band }).strict();
const collar = z.object({
  block: z.literal('collar'), ...band,
  collar: z.object({ widthMm: mm.optional(), pointMm: mmOrZero.optional(), seamMm: mmOrZero.optional() }).strict().optional(),
}).strict();

const pocket = z.object({
  block: z.literal('pocket'), kind: z.enum(['patch', 'in-seam']).optional(), widthMm: mm.optional(), heightMm: mm.optional(), hemMm: mmOrZero.optional(),
  fromCentreMm: mmOrZero.optional(), belowWaistMm: mmOrZero.optional(), openingMm: mm.optional(), depthBelowMm: mmOrZero.optional(),
  seamMm: mmOrZero.optional(), material,
}).strict();

const belt = z.object({
  block: z.literal('belt'), widthMm: mm.optional(), extraMm: mmOrZero.optional(), waistEaseMm: ease.optional(), seamMm: mmOrZero.optional(), material,
}).strict();

const facing = z.object({
  block: z.literal('facing'), of: z.enum(['neckline', 'armhole', 'front-edge']).optional(), widthMm: mm.optional(), interfaced: z.boolean().optional(), material,
}).strict();

const waistband = z.object({
  block: z.literal('waistband'), widthMm: mm.optional(), extensionMm: mmOrZero.optional(), waistEaseMm: ease.optional(), seamMm: mmOrZero.optional(), material,
}).strict();

/** One block and its options (every option has a default in the grading core). */
export const blockSpecInput = z.discriminatedUnion('block', [bodice, dress, skirt, sleeve, shirtSleeve, peplum, facing, waistband, collarBand, collar, pocket, belt], {
  error: 'Choose a block: bodice, dress, skirt, sleeve, shirt-sleeve, peplum, facing, waistband, collar-band, collar, pocket or belt',
});

/**
 * Input of `npm run pattern:draft`: one size's body measurements in mm by point of measure (names checked against
 * the grading core's list by the caller) and the blocks to draft, in order.
 */
export const patternDraftInput = z.object({
  measurements: z.record(z.string(), mm),
  blocks: z.array(blockSpecInput).min(1, 'Give at least one block').max(40),
}).strict();
export type PatternDraftInput = z.infer<typeof patternDraftInput>;
