import { usableTicketLength, type PackingListAllowance } from './roll-rules';

/** A lay as the consumption and need figures see it. Lengths in mm. */
export interface LayForConsumption {
  ratio: Record<string, number>;
  plies: number;
  markerLengthMm: number;
  endAllowanceMm: number;
  status: 'planned' | 'cut' | 'retired';
  /** Per roll: plies planned and, once recorded, plies spread and the length the lay took from the roll. */
  rolls?: { plies: number; actualPlies?: number; takenMm?: number }[];
}

/** Fabric of a plan: spread and garments, and where the figures come from. */
export interface PlanConsumption {
  /** Fabric per garment by size, mm (each garment of a lay takes an equal share of its spread). */
  perSize: Record<string, number>;
  /** Fabric the lays take: recorded where cut and recorded, planned otherwise, mm. */
  fabricMm: number;
  /** Fabric the planned (not yet cut) lays still need, mm. */
  stillNeededMm: number;
  garments: number;
  /** `recorded`: every lay cut with its spread recorded; `planned`: none; `mixed`: some. */
  basis: 'recorded' | 'planned' | 'mixed';
}

/**
 * Fabric per garment from lays, the reference's "marker length ÷ garments in marker" plus end allowance
 * (shared/reference/production-and-costing.md §5.1, K4), with what was recorded where it exists: a cut
 * lay whose every roll has the length it took counts that length and the plies actually spread (the
 * overlap of splices, flaws cut out and a short roll are in it); other cut lays count the planned spread
 * per ply × plies spread. Retired lays count nothing. A size's figure averages over its lays, weighted
 * by garments. Empty input gives zeros and `planned`.
 */
export function planConsumption(lays: LayForConsumption[]): PlanConsumption {
  const length: Record<string, number> = {};
  const garments: Record<string, number> = {};
  let fabricMm = 0, stillNeededMm = 0, total = 0, recorded = 0, counted = 0;
  for (const lay of lays) {
    if (lay.status === 'retired') continue;
    const inMarker = Object.values(lay.ratio).reduce((a, b) => a + b, 0);
    const spread = lay.markerLengthMm + lay.endAllowanceMm;
    const rolls = lay.rolls ?? [];
    const isRecorded = lay.status === 'cut' && rolls.length > 0 && rolls.every((r) => r.takenMm !== undefined);
    const plies = lay.status === 'cut' && rolls.some((r) => r.actualPlies !== undefined) ? rolls.reduce((a, r) => a + (r.actualPlies ?? r.plies), 0) : lay.plies;
    const layFabric = isRecorded ? rolls.reduce((a, r) => a + (r.takenMm ?? 0), 0) : spread * plies;
    counted += 1;
    if (isRecorded) recorded += 1;
    if (lay.status === 'planned') stillNeededMm += layFabric;
    fabricMm += layFabric;
    if (inMarker <= 0 || plies <= 0) continue;
    total += inMarker * plies;
    const perGarment = layFabric / (inMarker * plies);
    for (const [size, n] of Object.entries(lay.ratio)) {
      if (!(n > 0)) continue;
      length[size] = (length[size] ?? 0) + perGarment * n * plies;
      garments[size] = (garments[size] ?? 0) + n * plies;
    }
  }
  const perSize = Object.fromEntries(Object.keys(length).map((s) => [s, length[s] / garments[s]]));
  const basis = recorded === 0 ? 'planned' : recorded === counted ? 'recorded' : 'mixed';
  return { perSize, fabricMm, stillNeededMm, garments: total, basis };
}

/** What a batch must order of one fabric, mm. */
export interface FabricNeed {
  /** Fabric the batch still has to spread (its planned lays, or the estimate when it has no plan). */
  required: number;
  /** On hand and not held by other batches' plans (this batch's own holds count as its stock). */
  freeStock: number;
  /** Ordered and not yet received. */
  onOrder: number;
  /** Length to order, as a supplier's ticket length, rounded up to the order step. */
  toOrder: number;
}

/**
 * Net requirement of one fabric, the MRP rule: need − free stock − open orders, never below zero (Orlicky,
 * *Material Requirements Planning*, 1975: net = gross − on hand − scheduled receipts; from memory). The
 * net need is grossed up by the packing-list allowances, since ticket lengths arrive short by them
 * (see `usableTicketLength`), then rounded up to `stepMm`. Throws RangeError on negative inputs.
 */
export function netFabricNeed(
  input: { requiredMm: number; onHandMm: number; heldByOthersMm: number; onOrderMm: number; stepMm?: number },
  allowance: PackingListAllowance = {},
): FabricNeed {
  const { requiredMm, onHandMm, heldByOthersMm, onOrderMm } = input;
  for (const [k, v] of Object.entries({ requiredMm, onHandMm, heldByOthersMm, onOrderMm })) if (!(v >= 0)) throw new RangeError(`${k} must be at least 0, got ${v}`);
  const step = input.stepMm ?? 100;
  const freeStock = Math.max(0, onHandMm - heldByOthersMm);
  // Ordered length arrives with the same short-length and flaw allowances as any packing list.
  const onOrderUsable = usableTicketLength(onOrderMm, allowance);
  const net = Math.max(0, requiredMm - freeStock - onOrderUsable);
  const usableShare = usableTicketLength(1_000_000, allowance) / 1_000_000;
  const ticket = net / usableShare;
  return { required: requiredMm, freeStock, onOrder: onOrderMm, toOrder: net === 0 ? 0 : Math.ceil(ticket / step - 1e-9) * step };
}
