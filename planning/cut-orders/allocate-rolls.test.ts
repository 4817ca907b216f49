import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { mm } from '@shared/units';
import { allocateRolls } from './allocate-rolls';

describe('allocateRolls', () => {
  // Jana (2008), via Scribd 561483911 [quoted]: lay 6.5 m; roll 15 m → 2 plies, 2 m left; 16 m → 2 plies, 3 m left.
  it('reproduces plies = ⌊roll ÷ lay⌋ and the remnants of the R1 example (no end allowance)', () => {
    const res = allocateRolls({
      lays: [{ plies: 4, markerLength: mm(6500) }],
      rolls: [{ id: 'A', length: mm(15000), shadeLot: '1' }, { id: 'B', length: mm(16000), shadeLot: '1' }],
      endAllowance: mm(0),
    });
    const byId = Object.fromEntries(res.rolls.map((r) => [r.id, r]));
    expect(byId.A.segments[0].plies).toBe(2);
    expect(byId.A.remnant).toBe(2000);
    expect(byId.B.segments[0].plies).toBe(2);
    expect(byId.B.remnant).toBe(3000);
    expect(res.shortfall).toEqual([0]);
  });
  // puzzling.stackexchange.com question 26416 (R2 instance) [quoted]: a 100 m roll gives 9 plies of 10.5 m, 5.5 m left.
  it('takes 9 plies of a 10.5 m marker from a 100 m roll (R2)', () => {
    const res = allocateRolls({ lays: [{ plies: 9, markerLength: mm(10500) }], rolls: [{ id: 'R', length: mm(100000), shadeLot: 'x' }], endAllowance: mm(0) });
    expect(res.rolls[0].segments[0].plies).toBe(9);
    expect(res.rolls[0].remnant).toBe(5500);
    expect(res.rolls[0].isStock).toBe(true); // ≥ 1 m kept as stock (common practice threshold)
  });
  it('spreads a lay from one shade lot when one lot can supply it', () => {
    const res = allocateRolls({
      lays: [{ plies: 3, markerLength: mm(1980) }],
      rolls: [{ id: 'a1', length: mm(5000), shadeLot: 'A' }, { id: 'b1', length: mm(7000), shadeLot: 'B' }],
    });
    expect(res.layLots[0]).toEqual([{ shadeLot: 'B', plies: 3 }]);
    expect(res.splitLays).toEqual([]);
  });
  it('splits a lay by lot and reports it when no lot suffices', () => {
    const res = allocateRolls({
      lays: [{ plies: 5, markerLength: mm(980) }],
      rolls: [{ id: 'a1', length: mm(3000), shadeLot: 'A' }, { id: 'b1', length: mm(2000), shadeLot: 'B' }],
    });
    expect(res.splitLays).toEqual([0]);
    expect(res.layLots[0]).toEqual([{ shadeLot: 'A', plies: 3 }, { shadeLot: 'B', plies: 2 }]);
  });
  it('reports a shortfall when the rolls run out', () => {
    const res = allocateRolls({ lays: [{ plies: 5, markerLength: mm(980) }], rolls: [{ id: 'a', length: mm(2500), shadeLot: 'A' }] });
    expect(res.shortfall).toEqual([3]);
  });
  // Splice zones: two splice lines per splice area, overlap 10–20 cm (Vilumsone-Nemes, Industrial Cutting of
  // Textile Materials, p. 41). Worked by hand: spread 1000 mm (980 + 20), lead 10 mm; roll a 1500 → 1 ply, 500 left;
  // roll b 1700 → 1 ply, 700 left; zone 300–450: a gives 10 + 450 = 460 (40 cut off), b gives 1000 − 10 − 300 = 690.
  it('splices across rolls of one lot only at a splice zone the marker marks, with its overlap', () => {
    const rolls = [{ id: 'a', length: mm(1500), shadeLot: 'A' }, { id: 'b', length: mm(1700), shadeLot: 'A' }];
    const zone = { near: mm(300), far: mm(450) };
    expect(allocateRolls({ lays: [{ plies: 3, markerLength: mm(980) }], rolls }).shortfall).toEqual([1]);
    // Changed on purpose: splicing wherever a roll ends is gone; a marker with no splice zones gets no splices.
    expect(allocateRolls({ lays: [{ plies: 3, markerLength: mm(980) }], rolls, spliceOverlap: mm(150) }).shortfall).toEqual([1]);
    const spliced = allocateRolls({ lays: [{ plies: 3, markerLength: mm(980), spliceZones: [zone] }], rolls, spliceOverlap: mm(150) });
    expect(spliced.shortfall).toEqual([0]);
    expect(Object.fromEntries(spliced.rolls.map((r) => [r.id, r.remnant]))).toEqual({ a: 40, b: 10 });
    expect(spliced.rolls.find((r) => r.id === 'b')!.segments).toEqual([{ lay: 0, plies: 2, spliced: 1, remaining: 10 }]);
  });

  it('does not splice when the roll end cannot reach any splice zone of the marker', () => {
    const rolls = [{ id: 'a', length: mm(1500), shadeLot: 'A' }, { id: 'b', length: mm(1700), shadeLot: 'A' }];
    // Zone 400–550 needs 10 + 550 = 560 mm of roll a; only 500 mm are left.
    const res = allocateRolls({ lays: [{ plies: 3, markerLength: mm(980), spliceZones: [{ near: mm(400), far: mm(550) }] }], rolls, spliceOverlap: mm(150) });
    expect(res.shortfall).toEqual([1]);
    expect(res.rolls[0].remnant).toBe(500);
  });

  it('sends a roll end below the minimum tail to remnants instead of splicing it', () => {
    const rolls = [{ id: 'a', length: mm(1500), shadeLot: 'A' }, { id: 'b', length: mm(1700), shadeLot: 'A' }];
    const lays = [{ plies: 3, markerLength: mm(980), spliceZones: [{ near: mm(300), far: mm(450) }] }];
    const res = allocateRolls({ lays, rolls, spliceOverlap: mm(150), minSpliceTail: mm(600) });
    expect(res.shortfall).toEqual([1]);
    expect(res.rolls.map((r) => r.remnant)).toEqual([500, 700]);
  });

  it('refuses a roll narrower than the marker for that lay, naming the roll and both widths', () => {
    const rolls = [
      { id: '1', label: 'R-07', length: mm(30000), shadeLot: 'A', width: mm(1400) },
      { id: '2', label: 'R-08', length: mm(30000), shadeLot: 'A', width: mm(1500) },
    ];
    const res = allocateRolls({ lays: [{ plies: 5, markerLength: mm(2980), markerWidth: mm(1450) }], rolls });
    expect(res.rolls.map((r) => r.segments.map((s) => s.plies))).toEqual([[], [5]]);
    expect(res.refusals).toHaveLength(1);
    expect(res.refusals[0].lay).toBe(0);
    expect(res.refusals[0].refusal.message).toBe('Roll R-07 is 1400 mm wide, narrower than the 1450 mm marker: it cannot be spread for this lay');
    // Only narrow rolls: every ply is short.
    const only = allocateRolls({ lays: [{ plies: 2, markerLength: mm(980), markerWidth: mm(1450) }], rolls: [rolls[0]] });
    expect(only.shortfall).toEqual([2]);
  });

  it('never uses a roll beyond its length (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ plies: fc.integer({ min: 1, max: 30 }), markerLength: fc.integer({ min: 500, max: 8000 }) }), { minLength: 1, maxLength: 4 }),
        fc.array(fc.record({ length: fc.integer({ min: 0, max: 80000 }), lot: fc.constantFrom('A', 'B', 'C') }), { minLength: 1, maxLength: 8 }),
        fc.option(fc.integer({ min: 50, max: 300 }), { nil: undefined }),
        (lays, rs, overlap) => {
          const rolls = rs.map((r, i) => ({ id: `r${i}`, length: mm(r.length), shadeLot: r.lot }));
          const res = allocateRolls({ lays: lays.map((l) => ({ plies: l.plies, markerLength: mm(l.markerLength) })), rolls, spliceOverlap: overlap === undefined ? undefined : mm(overlap) });
          res.rolls.forEach((r) => {
            expect(r.remnant).toBeGreaterThanOrEqual(-1e-9);
            const used = r.segments.reduce((acc, s) => acc + s.plies * (lays[s.lay].markerLength + 20), 0);
            if (overlap === undefined) expect(used).toBeLessThanOrEqual(r.length);
          });
          lays.forEach((l, i) => {
            const got = res.layLots[i].reduce((a, x) => a + x.plies, 0);
            expect(got + res.shortfall[i]).toBe(l.plies);
          });
        },
      ),
      { numRuns: 200, seed: 7 },
    );
  });
});
