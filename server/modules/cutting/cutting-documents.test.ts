import { describe, expect, it } from 'vitest';
import type { LayEntity, RollEntity } from '../../entities';
import { byRoll } from './cutting-documents';

const roll = { id: 10, label: 'R-10', shadeLot: 'A', remainingMm: 5000 } as RollEntity;
const lay = (over: Partial<LayEntity>): LayEntity => ({ seq: 1, status: 'planned', markerLengthMm: 980, endAllowanceMm: 20, rolls: [], ...over }) as LayEntity;

describe('the marker list by roll', () => {
  // Worked by hand: spread 1 000 mm. Lay 1 was cut with 2 plies, so the roll held 5 000 + 2 000 = 7 000 mm before it;
  // lay 1 leaves 5 000, lay 2 (3 plies) leaves 2 000, kept as stock (≥ 1 m, common practice).
  it('starts each roll at what it held before the cut lays of the list and follows the cutting order', () => {
    const sheets = byRoll(
      [
        lay({ seq: 2, rolls: [{ rollId: 10, label: 'R-10', shadeLot: 'A', plies: 3, expectedRemnantMm: 0 }] }),
        lay({ seq: 1, status: 'cut', rolls: [{ rollId: 10, label: 'R-10', shadeLot: 'A', plies: 3, actualPlies: 2, expectedRemnantMm: 0 }] }),
        lay({ seq: 3, status: 'retired', rolls: [{ rollId: 10, label: 'R-10', shadeLot: 'A', plies: 9, expectedRemnantMm: 0 }] }),
      ],
      [roll],
    );
    expect(sheets).toEqual([{
      rollLabel: 'R-10', shadeLot: 'A', startLengthMm: 7000,
      uses: [{ layNo: 1, plies: 2, lengthMm: 2000, remainingAfterMm: 5000 }, { layNo: 2, plies: 3, lengthMm: 3000, remainingAfterMm: 2000 }],
      expectedRemnantMm: 2000, isStock: true,
    }]);
  });
});
