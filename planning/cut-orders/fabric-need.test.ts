import { describe, expect, it } from 'vitest';
import { netFabricNeed, planConsumption, type LayForConsumption } from './fabric-need';

const lay = (over: Partial<LayForConsumption> = {}): LayForConsumption => ({
  ratio: { M: 2, L: 1 }, plies: 10, markerLengthMm: 2980, endAllowanceMm: 20, status: 'planned', ...over,
});

describe('planConsumption', () => {
  // K4 (production-and-costing.md §5.1 [quoted]): fabric per garment = marker length ÷ garments in marker; 39 yd a
  // dozen → 3.25 yd each. Here 3000 mm spread ÷ 3 garments = 1000 mm each (computed by hand).
  it('gives the planned spread per garment when nothing is recorded', () => {
    const c = planConsumption([lay()]);
    expect(c.perSize).toEqual({ M: 1000, L: 1000 });
    expect([c.fabricMm, c.stillNeededMm, c.garments, c.basis]).toEqual([30_000, 30_000, 30, 'planned']);
  });

  it('takes the recorded spread and remnants of a cut lay: length taken from the rolls over garments actually cut', () => {
    // Two rolls: 5 plies took 15 400 mm (a splice and a flaw cut out), 4 plies took 12 200 mm → 27 600 mm over 27 garments.
    const cut = lay({ status: 'cut', rolls: [{ plies: 5, actualPlies: 5, takenMm: 15_400 }, { plies: 5, actualPlies: 4, takenMm: 12_200 }] });
    const c = planConsumption([cut]);
    expect(c.perSize.M).toBeCloseTo(27_600 / 27, 9);
    expect([c.fabricMm, c.stillNeededMm, c.garments, c.basis]).toEqual([27_600, 0, 27, 'recorded']);
  });

  it('mixes recorded cut lays with planned ones and leaves retired lays out', () => {
    const c = planConsumption([
      lay({ status: 'cut', rolls: [{ plies: 10, actualPlies: 10, takenMm: 31_000 }] }),
      lay({ plies: 5 }),
      lay({ status: 'retired', plies: 40 }),
    ]);
    expect([c.fabricMm, c.stillNeededMm, c.garments, c.basis]).toEqual([46_000, 15_000, 45, 'mixed']);
  });

  it('counts a cut lay without recorded lengths at the planned spread per ply spread', () => {
    const c = planConsumption([lay({ status: 'cut', rolls: [{ plies: 10, actualPlies: 8 }] })]);
    expect([c.fabricMm, c.garments, c.basis]).toEqual([24_000, 24, 'planned']);
  });

  it('gives zeros for no lays', () => {
    expect(planConsumption([])).toEqual({ perSize: {}, fabricMm: 0, stillNeededMm: 0, garments: 0, basis: 'planned' });
  });
});

// Net requirement = gross − on hand − scheduled receipts (Orlicky 1975, MRP; from memory). Allowances of 1 % + 1 %
// on ticket lengths are common practice (no published figure).
describe('netFabricNeed', () => {
  it('nets the need against free stock and open orders, then grosses up for the ticket allowances', () => {
    // 100 m needed; 60 m on hand of which 10 m held by another batch → 50 m free; 20 m on order → 19.6 m usable.
    // Net 30.4 m; ÷ 0.98 = 31.020… m → 31.1 m in 100 mm steps (computed by hand).
    const need = netFabricNeed({ requiredMm: 100_000, onHandMm: 60_000, heldByOthersMm: 10_000, onOrderMm: 20_000 });
    expect(need).toEqual({ required: 100_000, freeStock: 50_000, onOrder: 20_000, toOrder: 31_100 });
  });

  it('orders nothing when free stock and open orders cover the need', () => {
    expect(netFabricNeed({ requiredMm: 10_000, onHandMm: 12_000, heldByOthersMm: 0, onOrderMm: 0 }).toOrder).toBe(0);
    expect(netFabricNeed({ requiredMm: 0, onHandMm: 0, heldByOthersMm: 0, onOrderMm: 0 }).toOrder).toBe(0);
  });

  it('never counts stock held by other batches, even past what is on hand', () => {
    expect(netFabricNeed({ requiredMm: 5_000, onHandMm: 3_000, heldByOthersMm: 4_000, onOrderMm: 0 }, { shortLengthPercent: 0, flawPercent: 0 })).toEqual({ required: 5_000, freeStock: 0, onOrder: 0, toOrder: 5_000 });
  });

  it('refuses negative figures', () => {
    expect(() => netFabricNeed({ requiredMm: -1, onHandMm: 0, heldByOthersMm: 0, onOrderMm: 0 })).toThrow(RangeError);
  });
});
