import { minor, type MinorUnits } from '@shared/units';
import type { CostLine, CostSheet, CostingInput, LabourCostLine, SizeCost } from './costing.types';
import { roundMinor } from './round-minor';
import { KEYSTONE_MULTIPLIER, priceFromMargin, priceFromMarkup } from './pricing';

export const COSTING_ROUNDING_RULE =
  'Each line rounded once, half away from zero, to a whole minor unit; totals are integer sums of rounded lines.';

const sum = (xs: number[]): MinorUnits => minor(xs.reduce((a, b) => a + b, 0));

function labourAmount(l: LabourCostLine): number {
  if ('pieceRate' in l) return l.pieceRate;
  const perMinute = 'costPerMinute' in l ? l.costPerMinute : l.costPerHour / 60;
  const eff = l.efficiency ?? 1;
  if (!(eff > 0)) throw new RangeError(`labour line ${l.name} needs a positive efficiency`);
  return (l.minutes * perMinute) / eff;
}

function costSize(input: CostingInput, size: string): SizeCost {
  const lines: CostLine[] = [];
  for (const f of input.fabrics) {
    const len = f.lengthPerGarment[size];
    if (!(len >= 0)) throw new RangeError(`fabric ${f.name} has no length for size ${size}`);
    const metres = ((len + (f.endAllowanceShare ?? 0)) * (1 + (f.wastagePercent ?? 0) / 100)) / 1000;
    lines.push({ kind: 'fabric', name: f.name, amount: roundMinor(metres * f.pricePerMetre) });
  }
  for (const t of input.trims) lines.push({ kind: 'trim', name: t.name, amount: roundMinor(t.quantityPerGarment * t.unitPrice) });
  for (const l of input.labour) lines.push({ kind: 'labour', name: l.name, amount: roundMinor(labourAmount(l)) });
  const materials = sum(lines.filter((l) => l.kind !== 'labour').map((l) => l.amount));
  const labour = sum(lines.filter((l) => l.kind === 'labour').map((l) => l.amount));
  const minutes = input.labour.reduce((a, l) => a + ('minutes' in l ? l.minutes : 0), 0);
  const o = input.overheads;
  if (o?.perMinute !== undefined) lines.push({ kind: 'overhead', name: 'overhead per minute', amount: roundMinor(minutes * o.perMinute) });
  if (o?.percentOfPrimeCost !== undefined)
    lines.push({ kind: 'overhead', name: 'overhead % of prime cost', amount: roundMinor(((materials + labour) * o.percentOfPrimeCost) / 100) });
  const overheads = sum(lines.filter((l) => l.kind === 'overhead').map((l) => l.amount));
  for (const x of input.extraCostPercent ?? []) {
    const soFar = sum(lines.map((l) => l.amount));
    lines.push({ kind: 'extra', name: x.name, amount: roundMinor((soFar * x.percent) / 100) });
  }
  const unitCost = sum(lines.map((l) => l.amount));
  const wholesale =
    input.marginPercent !== undefined
      ? priceFromMargin(unitCost, input.marginPercent)
      : priceFromMarkup(unitCost, input.markupPercent ?? 0);
  const retail = roundMinor(wholesale * (input.retailMultiplier ?? KEYSTONE_MULTIPLIER));
  return { size, lines, materials, labour, overheads, unitCost, wholesale, retail };
}

/**
 * Builds the costing sheet per size in integer minor units: fabric (length per garment + end
 * allowance share, + wastage %) × price per metre, trims (qty × unit price), labour (minutes × cost
 * per minute ÷ efficiency, or piece rates), overheads (per minute and/or % of prime cost), extra % lines,
 * then wholesale (markup on cost or margin on price) and suggested retail (× multiplier, keystone 2).
 * Rounding: {@link COSTING_ROUNDING_RULE}. Averages are quantity-weighted, rounded once. Throws
 * RangeError on a missing size length, a non-positive efficiency or a margin ≥ 100 %.
 */
export function costGarment(input: CostingInput): CostSheet {
  const sizes = input.sizes.map((s) => costSize(input, s));
  const qty = input.sizes.map((s) => input.quantities[s] ?? 0);
  const quantity = qty.reduce((a, b) => a + b, 0);
  const batchOf = (pick: (c: SizeCost) => number) => sum(sizes.map((c, i) => pick(c) * qty[i]));
  const cost = batchOf((c) => c.unitCost);
  const wholesale = batchOf((c) => c.wholesale);
  const retail = batchOf((c) => c.retail);
  const avg = (total: number) => (quantity > 0 ? roundMinor(total / quantity) : minor(0));
  return {
    sizes,
    average: { unitCost: avg(cost), wholesale: avg(wholesale), retail: avg(retail) },
    batch: { quantity, cost, wholesale, retail },
    roundingRule: COSTING_ROUNDING_RULE,
  };
}
