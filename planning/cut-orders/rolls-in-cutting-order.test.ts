import { describe, expect, it } from 'vitest';
import { rollsInCuttingOrder } from './rolls-in-cutting-order';

describe('rollsInCuttingOrder', () => {
  // Jana (2008) R1, via Scribd 561483911 [quoted]: 6.5 m lay; roll A 15 m → 2 plies, 2 m left; roll B 16 m → 2 plies, 3 m left.
  it('prints what each roll has left after each lay in the order the lays are cut', () => {
    const sheets = rollsInCuttingOrder(
      [
        { layNo: 1, rolls: [{ rollId: 'A', plies: 2, lengthMm: 13_000 }, { rollId: 'B', plies: 1, lengthMm: 6_500 }] },
        { layNo: 2, rolls: [{ rollId: 'B', plies: 1, lengthMm: 6_500 }] },
      ],
      [{ rollId: 'B', label: 'B', shadeLot: '1', lengthMm: 16_000 }, { rollId: 'A', label: 'A', shadeLot: '1', lengthMm: 15_000 }],
    );
    expect(sheets.map((s) => [s.label, s.expectedRemnantMm, s.isStock])).toEqual([['A', 2000, true], ['B', 3000, true]]);
    // Worked by hand: B gives 6.5 m to lay 1 (9.5 m left), then 6.5 m to lay 2 (3 m left).
    expect(sheets[1].uses.map((u) => [u.layNo, u.plies, u.remainingAfterMm])).toEqual([[1, 1, 9500], [2, 1, 3000]]);
  });

  it('follows the printed order, not the order the rolls were allocated in', () => {
    const rolls = [{ rollId: 'R', label: 'R', shadeLot: 'x', lengthMm: 10_000 }];
    const cutFirstShort = rollsInCuttingOrder([{ layNo: 1, rolls: [{ rollId: 'R', plies: 1, lengthMm: 2_000 }] }, { layNo: 2, rolls: [{ rollId: 'R', plies: 1, lengthMm: 5_000 }] }], rolls);
    expect(cutFirstShort[0].uses.map((u) => u.remainingAfterMm)).toEqual([8000, 3000]);
  });

  it('marks a roll the plan overdraws, and a remnant under 1 m as waste (1 m threshold: common practice)', () => {
    const [s] = rollsInCuttingOrder([{ layNo: 1, rolls: [{ rollId: 'R', plies: 2, lengthMm: 10_400 }] }], [{ rollId: 'R', label: 'R', shadeLot: 'x', lengthMm: 10_000 }]);
    expect([s.isShort, s.isStock, s.expectedRemnantMm]).toEqual([true, false, -400]);
    const [t] = rollsInCuttingOrder([{ layNo: 1, rolls: [{ rollId: 'R', plies: 1, lengthMm: 9_500 }] }], [{ rollId: 'R', label: 'R', shadeLot: 'x', lengthMm: 10_000 }]);
    expect([t.isShort, t.isStock]).toEqual([false, false]);
  });

  it('gives nothing for no lays and refuses a lay on a roll it does not know', () => {
    expect(rollsInCuttingOrder([], [])).toEqual([]);
    expect(() => rollsInCuttingOrder([{ layNo: 1, rolls: [{ rollId: 'Z', plies: 1, lengthMm: 1 }] }], [])).toThrow(RangeError);
  });
});
