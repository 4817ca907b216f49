import { expect } from 'vitest';
import type { CutOrderInput, CutOrderPlan } from './cut-order.types';

/**
 * The plan cuts every size at least as ordered and at most `allowed` over, each lay within the ply and
 * garments-per-marker limits (and the table length when one is given): what any cut order must satisfy.
 */
export function expectCovers(input: CutOrderInput, plan: Pick<CutOrderPlan, 'lays' | 'endAllowance'>, allowed: Record<string, number> = {}) {
  for (const s of input.sizes) {
    const cut = plan.lays.reduce((acc, l) => acc + (l.ratio[s] ?? 0) * l.plies, 0);
    expect(cut).toBeGreaterThanOrEqual(input.quantities[s] ?? 0);
    expect(cut).toBeLessThanOrEqual((input.quantities[s] ?? 0) + (allowed[s] ?? 0));
  }
  for (const l of plan.lays) {
    expect(l.plies).toBeGreaterThanOrEqual(1);
    expect(l.plies).toBeLessThanOrEqual(input.maxPlies);
    expect(Object.values(l.ratio).reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(input.maxGarmentsPerMarker);
    if (input.maxMarkerLength !== undefined) expect(l.markerLength + plan.endAllowance).toBeLessThanOrEqual(input.maxMarkerLength);
  }
}
