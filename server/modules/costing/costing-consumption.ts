import type { LayForConsumption } from '../../../planning/index';

/**
 * Fabric per garment from lays: each ply of a lay uses marker length + end allowance and holds the garments
 * of its ratio; a garment's share is that length divided by the garments in the marker (the reference's
 * "marker length / garments in marker", shared/reference/production-and-costing.md §5.1, K4). A size's
 * figure is the average over the lays it is cut in, weighted by garments cut.
 */
export interface LayLike {
  ratio: Record<string, number>;
  plies: number;
  markerLengthMm: number;
  endAllowanceMm: number;
}

/** mm per garment by size (without wastage); sizes not cut in any lay are absent. */
export function consumptionBySize(lays: LayLike[]): Record<string, number> {
  const length: Record<string, number> = {};
  const garments: Record<string, number> = {};
  for (const lay of lays) {
    const inMarker = Object.values(lay.ratio).reduce((a, b) => a + b, 0);
    if (inMarker <= 0 || lay.plies <= 0) continue;
    const perGarment = (lay.markerLengthMm + lay.endAllowanceMm) / inMarker;
    for (const [size, n] of Object.entries(lay.ratio)) {
      if (n <= 0) continue;
      length[size] = (length[size] ?? 0) + perGarment * n * lay.plies;
      garments[size] = (garments[size] ?? 0) + n * lay.plies;
    }
  }
  return Object.fromEntries(Object.keys(length).map((s) => [s, length[s] / garments[s]]));
}

/** Fabric spread by the lays, mm, and the garments they hold. */
export function layTotals(lays: LayLike[]): { fabricMm: number; garments: number } {
  let fabricMm = 0;
  let garments = 0;
  for (const lay of lays) {
    const inMarker = Object.values(lay.ratio).reduce((a, b) => a + b, 0);
    fabricMm += (lay.markerLengthMm + lay.endAllowanceMm) * lay.plies;
    garments += inMarker * lay.plies;
  }
  return { fabricMm, garments };
}

/** What a lay row holds, as the consumption core reads it. */
export interface LayRow extends LayLike {
  status: 'planned' | 'cut' | 'retired';
  rolls?: { plies: number; expectedRemnantMm: number; actualPlies?: number; actualRemnantMm?: number; takenMm?: number }[];
}

/**
 * A lay row for `planConsumption`: the length each roll gave as recorded at the cut; for cuts recorded
 * before that was kept, the roll's length before the lay (its expected remnant + the planned plies ×
 * spread) less the remnant measured after.
 */
export function layForConsumption(l: LayRow): LayForConsumption {
  const spread = l.markerLengthMm + l.endAllowanceMm;
  return {
    ratio: l.ratio, plies: l.plies, markerLengthMm: l.markerLengthMm, endAllowanceMm: l.endAllowanceMm, status: l.status,
    rolls: (l.rolls ?? []).map((r) => ({
      plies: r.plies,
      actualPlies: r.actualPlies,
      takenMm: r.takenMm ?? (l.status === 'cut' && r.actualRemnantMm !== undefined ? Math.max(0, r.expectedRemnantMm + r.plies * spread - r.actualRemnantMm) : undefined),
    })),
  };
}

/**
 * Estimated fabric per garment when no marker exists yet: 2.4 m for the base size of a shirt dress on
 * 150 cm fabric, ±3 % a size step (from memory; an estimate, replaced by the marker once it is made).
 */
export const ESTIMATE_BASE_MM = 2400;
export const ESTIMATE_STEP = 0.03;

export function estimateConsumption(sizeRun: string[], baseSize: string): Record<string, number> {
  const base = Math.max(0, sizeRun.indexOf(baseSize));
  return Object.fromEntries(sizeRun.map((s, i) => [s, ESTIMATE_BASE_MM * (1 + ESTIMATE_STEP * (i - base))]));
}

/**
 * Garment SAM used when the style has no operation list yet: a shirt bulletin's total SMV of 33.84 min
 * (ordnur.com, web article, quoted in shared/reference/production-and-costing.md §2.5). An estimate.
 */
export const ESTIMATE_GARMENT_SAM = 33.84;
