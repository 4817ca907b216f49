import type { Millimetres, MinorUnits } from '@shared/units';

/** A fabric on the sheet. Rates may be fractional minor units; line totals are rounded once. */
export interface FabricCostLine {
  name: string;
  /** Price per metre, minor units (may be fractional, e.g. a yard price ÷ 0.9144). */
  pricePerMetre: number;
  /** Marker length per garment by size (marker length ÷ garments in the marker), mm. */
  lengthPerGarment: Record<string, Millimetres>;
  /** Share of the end allowance per garment (end allowance ÷ garments in the marker), mm. Default 0. */
  endAllowanceShare?: Millimetres;
  /** Wastage as a percentage of the length (3–5 % is common practice, from memory). Default 0. */
  wastagePercent?: number;
}

/** A trim or notion: quantity per garment × unit price (minor units, may be fractional). */
export interface TrimCostLine {
  name: string;
  quantityPerGarment: number;
  unitPrice: number;
}

/**
 * Labour: standard minutes × cost per minute (or per hour) ÷ efficiency, or a piece rate.
 * Divide by efficiency only when the minute cost is at 100 % (onlineclothingstudy.com 2011/02).
 */
export type LabourCostLine =
  | { name: string; minutes: number; costPerMinute: number; efficiency?: number }
  | { name: string; minutes: number; costPerHour: number; efficiency?: number }
  | { name: string; pieceRate: number };

/** Overheads: per standard minute of labour, and/or a percentage of prime cost (materials + labour). */
export interface OverheadRule {
  perMinute?: number;
  percentOfPrimeCost?: number;
}

/** Input to {@link costGarment}. */
export interface CostingInput {
  sizes: string[];
  /** Batch quantities per size (for the average and batch totals). */
  quantities: Record<string, number>;
  fabrics: FabricCostLine[];
  trims: TrimCostLine[];
  labour: LabourCostLine[];
  overheads?: OverheadRule;
  /** Extra cost lines as a % of the cost so far (e.g. a contingency). */
  extraCostPercent?: { name: string; percent: number }[];
  /** Markup on cost → wholesale price (20 → cost × 1.2). Ignored when `marginPercent` is given. */
  markupPercent?: number;
  /** Margin on the wholesale price → wholesale = cost ÷ (1 − margin). */
  marginPercent?: number;
  /** Suggested retail = wholesale × multiplier; default 2 (keystone). */
  retailMultiplier?: number;
}

export type CostLineKind = 'fabric' | 'trim' | 'labour' | 'overhead' | 'extra';

/** One rounded line of a size's sheet. */
export interface CostLine {
  kind: CostLineKind;
  name: string;
  amount: MinorUnits;
}

/** The sheet for one size. */
export interface SizeCost {
  size: string;
  lines: CostLine[];
  materials: MinorUnits;
  labour: MinorUnits;
  overheads: MinorUnits;
  /** Unit cost (all lines). */
  unitCost: MinorUnits;
  wholesale: MinorUnits;
  retail: MinorUnits;
}

/** Result of {@link costGarment}. */
export interface CostSheet {
  sizes: SizeCost[];
  /** Quantity-weighted averages, rounded once (0 when the batch is empty). */
  average: { unitCost: MinorUnits; wholesale: MinorUnits; retail: MinorUnits };
  /** Σ per-size unit amount × quantity. */
  batch: { quantity: number; cost: MinorUnits; wholesale: MinorUnits; retail: MinorUnits };
  roundingRule: string;
}
