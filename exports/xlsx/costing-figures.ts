/**
 * The costing sheet's numbers, computed the way the sheet's formulas compute them: every cost line per size is
 * rounded to whole minor units (ROUND(…, digits)), then summed. The builder caches these as formula results.
 */
import type { CostingSheetInput } from '../types';
import { currencyDigits, longLengthUnit, toLongLength } from '../pdf/document-format';
import { roundHalfAwayFromZero } from './spreadsheet-round';

/** How a line's formula is shaped (see costing-sheet.xlsx.ts). */
export type CostingLineShape = 'quantity-x-price' | 'minutes-x-hourly' | 'percent-of-running';

/** One cost line of the sheet. */
export interface CostingLineFigures {
  kind: 'Fabric' | 'Trim' | 'Labour' | 'Overhead';
  description: string;
  unit: string;
  shape: CostingLineShape;
  /** The price cell's value: major units (per length, per unit, per minute or per hour) or a fraction for %. */
  priceCell: number;
  /** Quantity per garment for each size, in the sheet's units (m/yd, pcs, min); 0 for percent lines. */
  quantities: number[];
  /** Cost per garment for each size, minor units. */
  costsMinor: number[];
}

/** All figures of one costing sheet, in minor units unless stated. */
export interface CostingFigures {
  digits: number;
  lines: CostingLineFigures[];
  unitCostMinor: number[];
  batchCostMinor: number[];
  totalQuantity: number;
  totalBatchCostMinor: number;
  /** Batch cost ÷ garments, rounded; 0 for an empty batch. */
  averageUnitCostMinor: number;
  /** Average unit cost ÷ (1 − margin), rounded. */
  wholesaleMinor: number;
  retailMultiplier: number;
  /** Wholesale × multiplier, rounded. */
  suggestedRetailMinor: number;
}

/** Keystone: retail = 2 × wholesale (Monash Business School marketing dictionary, "Keystone markup"). */
export const KEYSTONE_MULTIPLIER = 2;

const perSize = <T>(value: T | Record<string, T>, size: string, missing: T): T =>
  typeof value === 'object' && value !== null
    ? ((value as Record<string, T>)[size] ?? missing)
    : (value as T);

/**
 * Computes every figure of the costing sheet from its input. Throws RangeError when the margin is not in
 * [0, 100) or the multiplier is not positive.
 */
export function computeCostingFigures(input: CostingSheetInput): CostingFigures {
  const digits = currencyDigits(input.currency);
  const scale = 10 ** digits;
  const sizes = input.sizes.map((s) => s.size);
  if (!(input.marginPercent >= 0 && input.marginPercent < 100)) {
    throw new RangeError(`margin must be in [0, 100), got ${input.marginPercent}`);
  }
  const multiplier = input.retailMultiplier ?? KEYSTONE_MULTIPLIER;
  if (!(multiplier > 0))
    throw new RangeError(`retail multiplier must be positive, got ${multiplier}`);

  const lines: CostingLineFigures[] = [];
  const priced = (
    kind: CostingLineFigures['kind'],
    description: string,
    unit: string,
    priceMinor: number,
    quantities: number[],
  ): CostingLineFigures => ({
    kind,
    description,
    unit,
    shape: 'quantity-x-price',
    priceCell: priceMinor / scale,
    quantities,
    costsMinor: quantities.map((q) => roundHalfAwayFromZero(q * priceMinor)),
  });

  for (const f of input.fabrics) {
    const qty = sizes.map((s) => toLongLength(f.consumptionMmBySize[s] ?? 0, input.unitSystem));
    lines.push(
      priced('Fabric', f.description, longLengthUnit(input.unitSystem), f.pricePerLengthMinor, qty),
    );
  }
  for (const t of input.trims) {
    const qty = sizes.map((s) => perSize(t.quantityPerGarment, s, 0));
    lines.push(priced('Trim', t.description, t.unit, t.unitPriceMinor, qty));
  }
  for (const l of input.labour) {
    const minutes = sizes.map((s) => perSize(l.samMinutes, s, 0));
    if ('perGarmentMinor' in l.rate) {
      // Piece rates: a labour line of one garment at the summed rate, labelled labour like any other.
      lines.push(priced('Labour', l.operation, 'per garment', l.rate.perGarmentMinor, sizes.map(() => 1)));
    } else if ('perMinute' in l.rate) {
      const perMinute = Number(l.rate.perMinute);
      if (!Number.isFinite(perMinute))
        throw new RangeError(`bad rate per minute: ${l.rate.perMinute}`);
      lines.push({
        ...priced('Labour', l.operation, 'min', 0, minutes),
        priceCell: perMinute,
        costsMinor: minutes.map((m) => roundHalfAwayFromZero(m * perMinute * scale)),
      });
    } else {
      const hourly = l.rate.perHourMinor;
      lines.push({
        ...priced('Labour', l.operation, 'min (rate per hour)', hourly, minutes),
        shape: 'minutes-x-hourly',
        costsMinor: minutes.map((m) => roundHalfAwayFromZero((m * hourly) / 60)),
      });
    }
  }
  for (const o of input.overheads) {
    if (o.kind === 'per-garment') {
      lines.push(
        priced(
          'Overhead',
          o.description,
          'per garment',
          o.amountMinor,
          sizes.map(() => 1),
        ),
      );
    } else {
      const running = sizes.map((_, i) => lines.reduce((sum, line) => sum + line.costsMinor[i], 0));
      lines.push({
        kind: 'Overhead',
        description: o.description,
        unit: '% of cost above',
        shape: 'percent-of-running',
        priceCell: o.percent / 100,
        quantities: sizes.map(() => 0),
        costsMinor: running.map((r) => roundHalfAwayFromZero((r * o.percent) / 100)),
      });
    }
  }

  const unitCostMinor = sizes.map((_, i) =>
    lines.reduce((sum, line) => sum + line.costsMinor[i], 0),
  );
  const batchCostMinor = input.sizes.map((s, i) => s.quantity * unitCostMinor[i]);
  const totalQuantity = input.sizes.reduce((sum, s) => sum + s.quantity, 0);
  const totalBatchCostMinor = batchCostMinor.reduce((a, b) => a + b, 0);
  const averageUnitCostMinor =
    totalQuantity === 0 ? 0 : roundHalfAwayFromZero(totalBatchCostMinor / totalQuantity);
  const wholesaleMinor = roundHalfAwayFromZero(
    averageUnitCostMinor / (1 - input.marginPercent / 100),
  );
  const suggestedRetailMinor = roundHalfAwayFromZero(wholesaleMinor * multiplier);
  return {
    digits,
    lines,
    unitCostMinor,
    batchCostMinor,
    totalQuantity,
    totalBatchCostMinor,
    averageUnitCostMinor,
    wholesaleMinor,
    retailMultiplier: multiplier,
    suggestedRetailMinor,
  };
}
