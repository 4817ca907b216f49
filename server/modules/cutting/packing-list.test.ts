import { describe, expect, it } from 'vitest';
import { rowsToRolls } from './packing-list';

const defaults = { widthMm: 1450, receivedDate: '2026-12-01' };

describe('packing-list column titles', () => {
  it('reads a French packing list (Rouleau, Bain, Longueur vg, Laize po, Date de réception) as the English one', () => {
    // 1 yd = 0.9144 m and 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
    const french = rowsToRolls(
      [
        ['N° rouleau', 'Bain', 'Longueur (vg)', 'Laize (po)', 'Date de réception'],
        ['R-01', 'A', '50', '58', '2026-11-30'],
      ],
      defaults,
    );
    expect(french.errors).toEqual([]);
    expect(french.rolls).toEqual([{ label: 'R-01', shadeLot: 'A', lengthMm: 45_720, widthMm: 1473, receivedDate: '2026-11-30' }]);
    const english = rowsToRolls([['Roll', 'Shade lot', 'Length yd', 'Width in', 'Received'], ['R-01', 'A', '50', '58', '2026-11-30']], defaults);
    expect(english.rolls).toEqual(french.rolls);
  });

  it('ignores accents and case in French titles: MÉTRAGE (m), LAIZE CM, ÉTIQUETTE, NUANCE', () => {
    const r = rowsToRolls([['ÉTIQUETTE', 'NUANCE', 'MÉTRAGE', 'LAIZE CM'], ['R-02', 'B', '12.5', '140']], defaults);
    expect(r.errors).toEqual([]);
    expect(r.rolls).toEqual([{ label: 'R-02', shadeLot: 'B', lengthMm: 12_500, widthMm: 1400, receivedDate: '2026-12-01' }]);
  });
});
