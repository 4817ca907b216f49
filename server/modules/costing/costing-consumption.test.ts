import { describe, expect, it } from 'vitest';
import { planConsumption } from '../../../planning/index';
import { layForConsumption, type LayRow } from './costing-consumption';

// Jana (2008) R1, via Scribd 561483911 [quoted]: a 6.5 m lay; roll A of 15 m gives 2 plies and leaves 2 m.
const lay = (over: Partial<LayRow> = {}): LayRow => ({
  ratio: { M: 2, L: 2 }, plies: 2, markerLengthMm: 6480, endAllowanceMm: 20, status: 'cut',
  rolls: [{ plies: 2, expectedRemnantMm: 2000 }], ...over,
});

describe('consumption of cut lays', () => {
  it('takes the remnant the cutter measured: the roll gave 15 m − 1.8 m = 13.2 m for 8 garments', () => {
    const row = lay({ rolls: [{ plies: 2, expectedRemnantMm: 2000, actualPlies: 2, actualRemnantMm: 1800 }] });
    const used = planConsumption([layForConsumption(row)]);
    expect(used.fabricMm).toBe(13_200);
    expect(used.perSize.M).toBeCloseTo(13_200 / 8, 9);
    expect(used.basis).toBe('recorded');
  });

  it('prefers the length recorded at the cut over one worked back from the plan', () => {
    const row = lay({ rolls: [{ plies: 2, expectedRemnantMm: 2000, actualPlies: 2, actualRemnantMm: 1800, takenMm: 13_050 }] });
    expect(planConsumption([layForConsumption(row)]).fabricMm).toBe(13_050);
  });

  it('counts the plan for a cut lay whose remnants were not measured', () => {
    const used = planConsumption([layForConsumption(lay())]);
    expect([used.fabricMm, used.basis]).toEqual([13_000, 'planned']);
  });
});
