import { z } from 'zod';
import { safeText } from './common';
import { limitText, MAX_PRICE_MINOR, MAX_STOCK_QUANTITY } from './limits';

/** How labour is costed: standard minutes × cost per minute, or the operations' piece rates. */
export const LABOUR_BASES = ['sam', 'piece-rates'] as const;
export type LabourBasis = (typeof LABOUR_BASES)[number];

const minorAmount = (label: string) =>
  z
    .number({ error: `${label} is required` })
    .int('Whole minor units only (e.g. cents)')
    .min(0, 'Cannot be negative')
    .max(MAX_PRICE_MINOR, `At most ${limitText(MAX_PRICE_MINOR)} minor units`);
const percent = (max: number) =>
  z.number({ error: 'Enter a percentage' }).min(0, 'Cannot be negative').max(max, `At most ${max} %`);

/** `labourBasis` overrides the style's saved basis for one answer; without it the saved basis is used. */
export const costingQuery = z.object({ labourBasis: z.enum(LABOUR_BASES).optional() });

const trimFields = {
  name: safeText(120).min(1, 'Name the trim'),
  unit: safeText(16).min(1, 'Give a unit, e.g. pcs or m'),
  quantityPerGarment: z.number({ error: 'Enter a quantity' }).min(0, 'Cannot be negative').max(10000, 'Too many'),
  unitPriceMinor: minorAmount('Unit price'),
  supplierId: z.number().int().positive().nullable(),
  inStock: z.number({ error: 'Enter the stock' }).min(0, 'Cannot be negative').max(MAX_STOCK_QUANTITY, `At most ${limitText(MAX_STOCK_QUANTITY)} in stock`),
};

export const createTrimInput = z.object({
  ...trimFields,
  supplierId: trimFields.supplierId.default(null),
  inStock: trimFields.inStock.default(0),
});
export type CreateTrimInput = z.input<typeof createTrimInput>;

/** Only the fields sent change (no defaults here: a price edit must not clear the supplier). */
export const updateTrimInput = z.object(trimFields).partial();
export type UpdateTrimInput = z.input<typeof updateTrimInput>;

export const updateCostingSettingsInput = z.object({
  labourCostPerMinuteMinor: minorAmount('Labour cost per minute').optional(),
  overheadPercent: percent(500).optional(),
  wastagePercent: percent(50).optional(),
  marginPercent: percent(99).optional(),
  retailMultiplier: z.number().min(1, 'At least 1 (selling at wholesale)').max(10, 'At most 10').optional(),
  labourBasis: z.enum(LABOUR_BASES, { error: 'Standard minutes or piece rates' }).optional(),
});
export type UpdateCostingSettingsInput = z.input<typeof updateCostingSettingsInput>;

export interface CostingSettingsDto {
  styleId: number;
  labourCostPerMinuteMinor: number;
  overheadPercent: number;
  wastagePercent: number;
  marginPercent: number;
  retailMultiplier: number;
  /** How labour is costed on the costing page, the batch page and the workbook alike. */
  labourBasis: LabourBasis;
  /** True when the style has no saved settings and these are the studio defaults. */
  isDefault: boolean;
}

export interface TrimDto {
  id: number;
  styleId: number;
  name: string;
  unit: string;
  quantityPerGarment: number;
  unitPriceMinor: number;
  supplierId: number | null;
  supplierName: string;
  inStock: number;
}

/** One cost line of the sheet, per garment of each size. Money in integer minor units. */
export interface CostingLineDto {
  kind: 'fabric' | 'trim' | 'labour' | 'overhead';
  /** Trim id for trim lines, fabric id for the fabric line; null otherwise. */
  refId: number | null;
  description: string;
  unit: string;
  /** Unit price in minor units; for a percent overhead, null (see `percent`). */
  priceMinor: number | null;
  percent: number | null;
  /** Quantity per garment by size (m of fabric, trim units, minutes). */
  quantities: Record<string, number>;
  costMinor: Record<string, number>;
  /** A material's fabric line with its own cut plan: what that plan's lays still to cut spread, mm. */
  stillToCutMm?: number;
}

/** Where the fabric figure comes from: the released cut plan, a finished marker, or an estimate. */
export type ConsumptionBasis = 'cut-plan' | 'marker' | 'estimate';

export interface CostingSizeDto {
  size: string;
  quantity: number;
  unitCostMinor: number;
  batchCostMinor: number;
  /** Per-size prices from the size's own unit cost (margin, then the retail multiplier). */
  wholesaleMinor: number;
  retailMinor: number;
  fabricMmPerGarment: number;
}

export interface CostingSheetDto {
  batch: { id: number; code: string; total: number };
  style: { id: number; code: string; name: string };
  studioName: string;
  currency: string;
  locale: string;
  unitSystem: 'metric' | 'imperial';
  settings: CostingSettingsDto;
  fabric: {
    id: number;
    name: string;
    pricePerMetreMinor: number;
    basis: ConsumptionBasis;
    /** Planned fabric for the whole batch, wastage included. */
    batchFabricMm: number;
    /** With a cut plan: the spread its lays still to cut take (marker length + end allowance × plies), mm. */
    stillToCutMm?: number;
  } | null;
  labour: { basis: LabourBasis; samMinutes: number; pieceRateMinor: number; operations: number; isEstimate: boolean };
  lines: CostingLineDto[];
  sizes: CostingSizeDto[];
  totals: {
    garments: number;
    batchCostMinor: number;
    averageUnitCostMinor: number;
    wholesaleMinor: number;
    retailMinor: number;
    batchWholesaleMinor: number;
    batchRetailMinor: number;
  };
  /** Planned against actual, once lays are cut or work is logged; null figures are not known yet. */
  actual: {
    layPlies: { planned: number; cut: number };
    fabricMmPerGarment: { planned: number; actual: number | null };
    labourMinutesPerGarment: { planned: number; actual: number | null };
    labourPaidMinor: number;
    piecesLogged: number;
  };
  notes: string[];
}
