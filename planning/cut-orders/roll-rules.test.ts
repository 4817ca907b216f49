import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units';
import { checkRollWidth, usableTicketLength } from './roll-rules';
import { markerSpliceZones } from './splice-zones';

describe('roll rules', () => {
  it('accepts a roll as wide as the marker and refuses a narrower one', () => {
    expect(checkRollWidth({ id: '1', width: mm(1450) }, mm(1450))).toBeNull();
    expect(checkRollWidth({ id: '1', width: mm(1449.8) }, mm(1450))).toBeNull(); // within the 0.5 mm tolerance
    expect(checkRollWidth({ id: '1' }, mm(1450))).toBeNull();
    expect(checkRollWidth({ id: '1', label: 'R-3', width: mm(1420) }, mm(1450))?.message).toContain('R-3 is 1420 mm wide, narrower than the 1450 mm marker');
  });

  // Short-length and flaw allowances of 1 % each are common practice (no published figure): 50 m → 49 m.
  it('takes the short-length and flaw allowances off a packing-list length', () => {
    expect(usableTicketLength(mm(50_000))).toBe(49_000);
    expect(usableTicketLength(mm(50_000), { shortLengthPercent: 0, flawPercent: 0 })).toBe(50_000);
    expect(usableTicketLength(mm(45_720), { shortLengthPercent: 2, flawPercent: 0.5 })).toBe(44_577); // 45 720 × 0.975 = 44 577 (computed by hand)
    expect(usableTicketLength(mm(0))).toBe(0);
    expect(() => usableTicketLength(mm(-1))).toThrow(RangeError);
    expect(() => usableTicketLength(mm(1000), { flawPercent: 60 })).toThrow(RangeError);
  });
});

// Two splice lines per splice area; pieces behind end before the far line, pieces ahead start after the
// near line (Vilumsone-Nemes, Industrial Cutting of Textile Materials, p. 41). Worked by hand below.
describe('markerSpliceZones', () => {
  const rect = (x0: number, x1: number, y0 = 0, y1 = 100) => [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }];

  it('marks a zone where the pieces behind end and the pieces ahead begin, with the overlap', () => {
    // Pieces [0, 600] and [620, 1200]: a join starting at 620 with 150 overlap reaches 770; [0, 600] ends before it.
    expect(markerSpliceZones([rect(0, 600), rect(620, 1200)], mm(1200), mm(150))).toEqual([{ near: 620, far: 770 }]);
  });

  it('lets pieces interleave inside the overlap', () => {
    // [0, 700] and [600, 1200] overlap in x by 100 mm: a 150 mm zone 600–750 holds both ends.
    expect(markerSpliceZones([rect(0, 700), rect(600, 1200, 100, 200)], mm(1200), mm(150))).toEqual([{ near: 600, far: 750 }]);
    // A 50 mm overlap cannot hold 100 mm of interleaving.
    expect(markerSpliceZones([rect(0, 700), rect(600, 1200, 100, 200)], mm(1200), mm(50))).toEqual([]);
  });

  it('marks none where a piece runs the whole marker, and none at its very start or end', () => {
    expect(markerSpliceZones([rect(0, 1200)], mm(1200), mm(150))).toEqual([]);
    expect(markerSpliceZones([], mm(1200), mm(150))).toEqual([]);
    expect(markerSpliceZones([rect(0, 400), rect(400, 800), rect(800, 1200)], mm(1200), mm(0))).toEqual([{ near: 400, far: 400 }, { near: 800, far: 800 }]);
  });
});
