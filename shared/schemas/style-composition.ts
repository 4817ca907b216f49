import { z } from 'zod';
import { blockSpecInput } from './pattern-draft';

/** 1 in in mm. */
const IN = 25.4;

/** Presets the owner can start a style from. */
export const STYLE_PRESET_IDS = ['shirt-dress', 'lined-fitted-dress'] as const;
export type StylePresetId = (typeof STYLE_PRESET_IDS)[number];

/** Materials every style may use; an owner may name others (letters, digits, - and spaces). */
export const STANDARD_MATERIALS = ['self', 'lining', 'contrast', 'interfacing'] as const;
const materialName = z.string().trim().min(1, 'Name the material').max(40, 'At most 40 characters').regex(/^[A-Za-z0-9 -]+$/, 'Letters, digits, spaces and - only');

const seamSide = z.object({
  pieceId: z.string().trim().min(1, 'Choose a piece').max(80),
  edges: z.array(z.string().trim().min(1, 'Choose an edge').max(40)).min(1, 'Choose at least one edge').max(10),
}).strict();

/** One seam of a style: the edges sewn together (each side may join edges of several pieces), the intended length
 * difference (second side minus first, e.g. a sleeve cap's ease) and the tolerance, in mm. */
export const seamInput = z.object({
  name: z.string().trim().min(1, 'Name the seam').max(80, 'At most 80 characters'),
  a: z.array(seamSide).min(1, 'Choose the first side').max(4),
  b: z.array(seamSide).min(1, 'Choose the second side').max(4),
  easeMm: z.number({ error: 'Give a length in mm' }).finite().min(-200, 'At least -200 mm').max(200, 'At most 200 mm').optional(),
  toleranceMm: z.number({ error: 'Give a length in mm' }).finite().min(0, 'Cannot be negative').max(50, 'At most 50 mm'),
}).strict();
export type SeamInput = z.infer<typeof seamInput>;

/**
 * A style's composition: the blocks its pieces are drafted from, in order (the `blocks` of `npm run pattern:draft`).
 * A shirt-dress preset stored with no blocks (as styles saved before it became blocks) drafts the demo's blocks;
 * every other composition needs at least one block. `seams` are the seams the seam check
 * measures; absent or null, they are proposed from the drafted pieces.
 */
export const styleComposition = z
  .object({
    preset: z.enum(STYLE_PRESET_IDS).nullable().default(null),
    blocks: z.array(blockSpecInput).max(40, 'At most 40 blocks').default([]),
    seams: z.array(seamInput).max(80, 'At most 80 seams').nullable().optional(),
  })
  .strict()
  .refine((c) => c.preset === 'shirt-dress' || c.blocks.length > 0, { message: 'Choose at least one block or a preset', path: ['blocks'] })
  .refine((c) => !c.seams || new Set(c.seams.map((s) => s.name)).size === c.seams.length, { message: 'Give every seam its own name', path: ['seams'] });
export type StyleComposition = z.infer<typeof styleComposition>;
export type BlockSpecInput = z.infer<typeof blockSpecInput>;

/** Which fabric (id) each material of the style is cut from. */
export const materialFabrics = z.record(materialName, z.number().int().positive('Choose a fabric'));
export type MaterialFabrics = z.infer<typeof materialFabrics>;

/** Body of PUT /api/styles/:id/composition. */
export const putCompositionInput = z.object({ composition: styleComposition.nullable(), materialFabrics: materialFabrics.default({}) }).strict();
export type PutCompositionInput = z.input<typeof putCompositionInput>;

/** The presets: a name, a line for the owner and the composition they start from (edit freely afterwards). */
export const STYLE_PRESETS: { id: StylePresetId; name: string; description: string; composition: StyleComposition }[] = [
  {
    id: 'shirt-dress',
    name: 'Shirt dress',
    description: 'A-line shirt dress, short set-in sleeves, button front with collar band, patch pockets and a self belt.',
    composition: {
      preset: 'shirt-dress',
      // The demo's blocks (grading/blocks/shirt-dress.ts SHIRT_DRESS_BLOCKS; a test keeps the two equal).
      blocks: [
        { block: 'dress', bustEaseMm: 100, waistEaseMm: 120, hipEaseMm: 90, hemFlareMm: 60, buttonExtensionMm: 15 },
        { block: 'shirt-sleeve', capEaseMm: 15, capHeightRatio: 0.7 },
        { block: 'collar-band', heightMm: 30, extensionMm: 15 },
        { block: 'pocket', kind: 'patch', widthMm: 140, heightMm: 160, hemMm: 30, fromCentreMm: 115, belowWaistMm: 90 },
        { block: 'belt', widthMm: 35, extraMm: 300, waistEaseMm: 120 },
        { block: 'facing', of: 'front-edge', widthMm: 60, interfaced: false },
      ],
    },
  },
  {
    id: 'lined-fitted-dress',
    name: 'Lined fitted dress',
    description:
      'Fitted bodice with waist darts, 7 in V-neck and centre-back zip, long sleeves with shoulder pads, gathered circle peplum in a contrast fabric, straight lined skirt, neck facings and lining.',
    composition: {
      preset: 'lined-fitted-dress',
      blocks: [
        { block: 'bodice', neckline: { shape: 'v', depthMm: 7 * IN }, shoulderPads: {}, centreBackOpening: {} },
        { block: 'sleeve', length: 'long' },
        { block: 'peplum', shape: 'circle', innerEdge: { times: 2, plusMm: 10 * IN }, cut: 'ring', material: 'contrast' },
        { block: 'skirt', shape: 'straight', centreBackOpening: {} },
        { block: 'facing', of: 'neckline' },
        { block: 'bodice', neckline: { shape: 'v', depthMm: 7 * IN }, shoulderPads: {}, centreBackOpening: {}, material: 'lining' },
        { block: 'skirt', shape: 'straight', centreBackOpening: {}, material: 'lining' },
      ],
    },
  },
];

/** The composition of a preset (a fresh copy). */
export function presetComposition(id: StylePresetId): StyleComposition {
  const p = STYLE_PRESETS.find((x) => x.id === id);
  if (!p) throw new RangeError(`unknown preset ${id}`);
  return structuredClone(p.composition);
}
