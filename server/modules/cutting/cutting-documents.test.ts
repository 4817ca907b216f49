import { describe, expect, it } from 'vitest';
import type { BatchEntity, FabricEntity, LayEntity, RollEntity, StudioEntity } from '../../entities';
import { byRoll, markerListInput } from './cutting-documents';

const roll = { id: 10, label: 'R-10', shadeLot: 'A', remainingMm: 5000 } as RollEntity;
const lay = (over: Partial<LayEntity>): LayEntity => ({ seq: 1, status: 'planned', markerLengthMm: 980, endAllowanceMm: 20, ratio: { M: 1 }, spreadingMode: 'face-up', rolls: [], ...over }) as LayEntity;

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

describe('the marker list per lay', () => {
  // Worked by hand, same roll and lays as above: lay 1 starts on 7 000 mm and leaves 5 000; lay 2 (3 plies of
  // 1 000 mm) starts on 5 000 and leaves 2 000. The per-lay lines must say the same as the by-roll section, not
  // plies × length + a plan-time remnant (which said 3 000 for lay 2, a length the roll never had).
  it('gives each lay the roll length it starts on and the length it leaves, as the rolls-in-cutting-order section does', () => {
    const lays = [
      lay({ seq: 1, status: 'cut', rolls: [{ rollId: 10, label: 'R-10', shadeLot: 'A', plies: 3, actualPlies: 2, expectedRemnantMm: 0 }] }),
      lay({ seq: 2, rolls: [{ rollId: 10, label: 'R-10', shadeLot: 'A', plies: 3, expectedRemnantMm: 0 }] }),
    ];
    const studio = { name: 'Hand Studio', unitSystem: 'metric', currency: 'EUR', language: 'en', timeZone: 'UTC' } as StudioEntity;
    const batch = { id: 1, number: 1, style: { code: 'D1', name: 'Dress', sizeRun: ['M'] } } as unknown as BatchEntity;
    const fabric = { name: 'Crepe', composition: '', widthMm: 1500 } as FabricEntity;
    const input = markerListInput(studio, batch, fabric, lays, new Date('2026-12-05T00:00:00Z'), [roll]);
    expect(input.lays.map((l) => l.rolls.map((r) => [r.lengthMm, r.expectedRemnantMm]))).toEqual([[[7000, 5000]], [[5000, 2000]]]);
  });
});
