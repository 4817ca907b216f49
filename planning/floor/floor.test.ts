import { describe, expect, it } from 'vitest';
import { minor } from '@shared/units';
import { earnedMinutes, efficiencyPercent, lineEfficiency, operatorEfficiency } from './efficiency';
import { computePiecePay } from './piece-pay';

describe('efficiency', () => {
  // onlineclothingstudy.com 2017/01, "Efficiency formula" (web article), E2 [quoted]
  it('gives 41.67 % for 400 pieces of a 0.5 min job in 480 min', () => {
    expect(earnedMinutes([{ pieces: 400, sam: 0.5 }])).toBe(200);
    expect(operatorEfficiency({ pieces: 400, sam: 0.5, attendedMinutes: 480 })).toBeCloseTo(41.67, 2);
    expect(operatorEfficiency({ pieces: 0, sam: 0.5, attendedMinutes: 0 })).toBe(0);
  });
  // onlineclothingstudy.com 2011/09, Prasanta Sarkar (web article), E1 table, all nine rows [quoted]
  it.each([
    [48, 8, 160, 44.25, 30.73], [48, 11, 240, 44.25, 33.52], [34, 8, 300, 25, 45.96],
    [35, 11, 400, 25, 43.29], [35, 11, 329, 25, 35.61], [34, 8, 230, 25, 35.23],
    [34, 8, 200, 35, 42.89], [35, 11, 311, 35, 47.12], [34, 11, 340, 35, 53.03],
  ])('line of %i operators × %i h, output %i at SAM %f → %f %%', (operators, hours, output, sam, e) => {
    expect(Math.round(lineEfficiency({ operators, hours, output, sam }) * 100) / 100).toBe(e);
  });
});

describe('efficiencyPercent, the one definition every page shows', () => {
  it('gives 41.67 % for 200 standard minutes earned in 480 minutes worked, and none without minutes worked', () => {
    // Source: ../shared/reference/production-and-costing.md §2.2 E2 (onlineclothingstudy.com 2017/01,
    // "Efficiency formula"): 400 pieces × 0.5 min = 200 min produced in 480 min → 41.67 %.
    expect(efficiencyPercent(200, 480)).toBe(41.67);
    expect(efficiencyPercent(200, 0)).toBeNull();
    expect(efficiencyPercent(0, 480)).toBe(0);
  });
});

describe('computePiecePay', () => {
  const rates = { hem: minor(12), side: minor(20) };
  it('pays pieces × rate, rework unpaid, each bundle-operation once, within the period', () => {
    const pay = computePiecePay({
      rates, from: '2025-03-01', to: '2025-03-07',
      records: [
        { personId: 'p2', bundleId: 'B1', operationId: 'hem', pieces: 10, date: '2025-03-03' },
        { personId: 'p1', bundleId: 'B1', operationId: 'side', pieces: 10, date: '2025-03-03' },
        { personId: 'p1', bundleId: 'B1', operationId: 'side', pieces: 3, date: '2025-03-04', isRework: true },
        { personId: 'p3', bundleId: 'B1', operationId: 'hem', pieces: 10, date: '2025-03-05' },
        { personId: 'p1', bundleId: 'B2', operationId: 'side', pieces: 8, date: '2025-03-09' },
        { personId: 'p1', bundleId: 'B3', operationId: 'press', pieces: 8, date: '2025-03-05' },
      ],
    });
    expect(pay.people).toEqual([
      { personId: 'p1', pieces: 10, reworkPieces: 3, amount: 200 },
      { personId: 'p2', pieces: 10, reworkPieces: 0, amount: 120 },
      { personId: 'p3', pieces: 0, reworkPieces: 0, amount: 0 },
    ]);
    expect(pay.total).toBe(320);
    expect(pay.rejected.map((r) => r.reason)).toEqual(['already-paid', 'unknown-operation']);
  });
});
