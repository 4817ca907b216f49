import { limitText, MAX_PLIES, MAX_PRICE_MINOR, MAX_ROLL_LENGTH_MM, MAX_ROLLS_AT_ONCE } from './limits';
import { z } from 'zod';
import { calendarDate, safeText } from './common';

const name = z.string().trim().min(1, 'Name is required').max(120, 'At most 120 characters');
const positiveMm = (what: string) => z.number({ error: `${what} is required` }).positive(`${what} must be above 0`).max(MAX_ROLL_LENGTH_MM, `${what} is too large: at most ${limitText(MAX_ROLL_LENGTH_MM)} mm (1 km)`);

export const createFabricInput = z.object({
  name,
  composition: safeText(200).default(''),
  widthMm: positiveMm('Cuttable width').max(5000, 'At most 5000 mm'),
  shrinkagePercent: z.number().min(0, 'Cannot be negative').max(30, 'At most 30 %').default(0),
  /** Along the grain (warp); absent: `shrinkagePercent`. */
  shrinkageLengthPercent: z.number().min(0, 'Cannot be negative').max(30, 'At most 30 %').optional(),
  /** Across the grain (weft); absent: `shrinkagePercent`. */
  shrinkageWidthPercent: z.number().min(0, 'Cannot be negative').max(30, 'At most 30 %').optional(),
  isDirectional: z.boolean().default(false),
  pricePerMetreMinor: z.number().int('Whole minor units').min(0, 'Cannot be negative').max(MAX_PRICE_MINOR, `At most ${limitText(MAX_PRICE_MINOR)} minor units`).default(0),
  /** The price exactly as the supplier quotes it, with `priceUnit`; absent: `pricePerMetreMinor` per metre. */
  priceMinor: z.number().int('Whole minor units').min(0, 'Cannot be negative').max(MAX_PRICE_MINOR, `At most ${limitText(MAX_PRICE_MINOR)} minor units`).optional(),
  priceUnit: z.enum(['metre', 'yard'], { error: 'Per metre or per yard' }).optional(),
  supplierId: z.number().int().positive().nullable().default(null),
  maxPlies: z.number().int('Whole plies').min(1, 'At least 1 ply').max(MAX_PLIES, `At most ${MAX_PLIES} plies`).default(40),
});
export type CreateFabricInput = z.input<typeof createFabricInput>;
/**
 * An edit sends only what changes: the create defaults must not fill the fields it leaves out (a rename
 * would otherwise reset the price, shrinkage and one-way flag).
 */
export const updateFabricInput = z.object(
  Object.fromEntries(Object.entries(createFabricInput.shape).map(([k, v]) => [k, (v instanceof z.ZodDefault ? v.unwrap() : v).optional()])) as {
    [K in keyof typeof createFabricInput.shape]: z.ZodOptional<typeof createFabricInput.shape[K] extends z.ZodDefault<infer T> ? T : typeof createFabricInput.shape[K]>;
  },
);

export interface FabricDto {
  id: number;
  name: string;
  composition: string;
  widthMm: number;
  shrinkagePercent: number;
  /** Shrinkage along the grain and across it, percent of the unwashed length; pieces are cut larger by 1 ÷ (1 − s). */
  shrinkageLengthPercent?: number;
  shrinkageWidthPercent?: number;
  isDirectional: boolean;
  maxPlies: number;
  supplierId: number | null;
  /** Present only for roles that may read costs. */
  pricePerMetreMinor?: number;
  /** The price as the supplier quotes it (per metre or per yard); only for roles that may read costs. */
  price?: { amountMinor: number; per: 'metre' | 'yard' };
  rollCount: number;
  totalRemainingMm: number;
}

export const rollInput = z.object({
  label: z.string().trim().min(1, 'Roll label is required').max(40, 'At most 40 characters'),
  lengthMm: positiveMm('Length'),
  widthMm: positiveMm('Width').max(5000, 'At most 5000 mm'),
  shadeLot: z.string().trim().min(1, 'Shade lot is required').max(40, 'At most 40 characters'),
  receivedDate: calendarDate,
});
export type RollInput = z.input<typeof rollInput>;
/** Table entry: one or more rolls saved together (all or none). */
export const createRollsInput = z.object({ rolls: z.array(rollInput).min(1, 'Enter at least one roll').max(500, 'At most 500 rolls') });

export interface RollDto {
  id: number;
  fabricId: number;
  label: string;
  lengthMm: number;
  widthMm: number;
  shadeLot: string;
  receivedDate: string;
  remainingMm: number;
  /** Held by planned lays not yet cut; free for other plans = remaining − reserved. */
  reservedMm: number;
  isRemnant: boolean;
  /** The supplier's ticket length when the roll came from a packing list, else null. */
  ticketLengthMm?: number | null;
}

/** One bad cell of an imported packing list: 1-based row as the spreadsheet shows it (header = row 1). */
export interface ImportRowError {
  row: number;
  column: string;
  message: string;
}

export const fabricParam = z.object({ id: z.coerce.number().int().positive() });

/** Which of a batch's cut plans: the one on this fabric (a lining's…); without it, the main plan. */
export const cutPlanQuery = z.object({ fabricId: z.coerce.number().int().positive('Pick a fabric').optional() });

export const createCutPlanInput = z.object({
  fabricId: z.number({ error: 'Pick a fabric' }).int().positive('Pick a fabric'),
  maxPlies: z.number().int('Whole plies').min(1, 'At least 1 ply').max(MAX_PLIES, `At most ${MAX_PLIES} plies`),
  maxGarmentsPerMarker: z.number().int('Whole garments').min(1, 'At least 1 garment').max(12, 'At most 12 garments'),
  maxMarkerLengthMm: z.number().positive('Must be above 0').max(100_000, 'At most 100 m').optional(),
  overcutPercent: z.number().min(0, 'Cannot be negative').max(50, 'At most 50 %').optional(),
  endAllowanceMm: z.number().min(0, 'Cannot be negative').max(500, 'At most 500 mm').optional(),
  rollIds: z.array(z.number().int().positive()).max(MAX_ROLLS_AT_ONCE, `At most ${MAX_ROLLS_AT_ONCE} rolls`).optional(),
  /** A batch has one cut plan: planning another fabric than the plan's replaces it only when this is true. */
  replacePlan: z.boolean().optional(),
});
export type CreateCutPlanInput = z.input<typeof createCutPlanInput>;

export interface LayRollDto {
  rollId: number;
  label: string;
  shadeLot: string;
  plies: number;
  expectedRemnantMm: number;
  actualPlies?: number;
  actualRemnantMm?: number;
  note?: string;
}

export interface LayDto {
  id: number;
  cutPlanId: number;
  batchId: number;
  batchCode: string;
  seq: number;
  ratio: Record<string, number>;
  garmentsPerPly: number;
  plies: number;
  markerLengthMm: number;
  endAllowanceMm: number;
  markerId: number | null;
  spreadingMode: string;
  rolls: LayRollDto[];
  /** The fabric the lay is spread from (a batch's lining lays are numbered apart from its shell lays). */
  fabricName?: string;
  /** `retired`: replaced when the batch was planned again; kept for the record, not to be spread or cut. */
  status: 'planned' | 'cut' | 'retired';
  flaws: string;
  cutAt: string | null;
  bundleCount: number;
  /** Set while a planned lay cannot be spread in full from the stock it holds. */
  shortage?: LayShortageDto | null;
  /** Corrections made to the record after the cut, oldest first (each is in the audit log too). */
  corrections?: LayCorrectionDto[];
}

/** One correction of a cut lay's record: who, when, why and what changed. */
export interface LayCorrectionDto {
  at: string;
  by: string;
  reason: string;
  /** Plain lines such as "R-07: plies 12 → 11". */
  changes: string[];
}

/** Why a planned lay cannot be spread in full: plies with no roll, or rolls holding less than lays need. */
export interface LayShortageDto {
  /** Plies no roll could supply when the plan was made (stock was already held or used). */
  pliesWithoutFabric: number;
  /** Rolls with less on hand than the lays waiting on them hold, mm. */
  rolls: { rollId: number; label: string; onHandMm: number; heldMm: number }[];
  /** One plain sentence for the owner and the cutter. */
  message: string;
}

/** A shortage on the owner's Today: which lay of which batch. */
export interface ShortageDto extends LayShortageDto {
  layId: number;
  batchId: number;
  batchCode: string;
  seq: number;
}

export interface CutPlanDto {
  id: number;
  batchId: number;
  fabricId: number;
  fabricName: string;
  /** True for a material's plan (lining, contrast…) beside the main plan: its lays make no bundles. */
  material: boolean;
  /** Every live plan of the batch, main first: the fabric each is on, to switch between them. */
  plans: { fabricId: number; fabricName: string; material: boolean }[];
  status: string;
  fabricUsedMm: number;
  lowerBoundMm: number;
  gap: number;
  layLowerBound: number;
  method: string;
  overcut: Record<string, number>;
  cut: Record<string, number>;
  /** How each lay's marker length was found: stored marker or estimate. */
  lengthSources: { ratio: Record<string, number>; source: 'marker' | 'estimate'; markerId?: number }[];
  assumedUtilisation: number;
  /** Finished markers of the style on this fabric the assumed utilisation comes from; 0 = the default assumption. */
  utilisationFromMarkers: number;
  /** Every marker length in the plan is measured (stored markers) or every one is an estimate, never mixed. */
  markerLengths: 'measured' | 'estimated';
  /** Why the plan uses estimates although measured markers exist. */
  markerLengthsNote: string | null;
  /** What the plan minimises: total cost at the studio's rates, or fabric and then lays. */
  objective: 'cost' | 'fabric';
  /** Rates the plan was priced with (minor units); null when unpriced or not shown to this role. */
  rates: { layCostMinor: number; plyCostMinor: number; fabricCostPerMetreMinor: number; basis: string; currency: string } | null;
  /** Fabric, lays and plies at those rates (minor units); null when unpriced. */
  costMinor: number | null;
  endOfRollWasteMm: number;
  stockKeptMm: number;
  shortfall: number[];
  splitLays: number[];
  /** Rolls left out of a lay because they are narrower than its marker, one sentence each. */
  rollRefusals?: string[];
  lays: LayDto[];
  createdAt: string;
}

export const recordLayInput = z.object({
  rolls: z
    .array(
      z.object({
        rollId: z.number().int().positive(),
        actualPlies: z.number().int('Whole plies').min(0, 'Cannot be negative').max(MAX_PLIES, `At most ${MAX_PLIES} plies`),
        actualRemnantMm: z.number().min(0, 'Cannot be negative').max(MAX_ROLL_LENGTH_MM, 'Longer than any roll'),
        note: safeText(500).optional(),
      }),
    )
    .min(1, 'Record at least one roll'),
  flaws: safeText(2000).default(''),
});
export type RecordLayInput = z.input<typeof recordLayInput>;

export interface BundleDto {
  id: number;
  number: number;
  layId: number;
  size: string;
  shadeLot: string;
  plyFrom: number;
  plyTo: number;
  pieces: number;
  qrText: string;
}

/** Text of a bundle's QR code. */
export const bundleQrText = (batchId: number, bundleNumber: number) => `SR-B:${batchId}:${bundleNumber}`;

/** Mark a lay cut; without rolls the planned plies count as spread. */
export const cutLayInput = recordLayInput.partial({ rolls: true });

/** Correct the record of a cut lay: what was really spread and left, and why the record changes. */
export const correctLayInput = recordLayInput.extend({
  reason: z.string({ error: 'Say why the record is corrected' }).trim().min(3, 'Say why the record is corrected').max(500, 'At most 500 characters'),
});
export type CorrectLayInput = z.input<typeof correctLayInput>;
