import { describe, expect, it } from 'vitest';
import { operationInput } from './line';

const op = (pieceRateMinor: number) => ({ code: 'S01', name: 'Join shoulders', section: 'sewing', machineType: 'overlock', sam: 0.9, pieceRateMinor });
const problems = (v: number) => operationInput.safeParse(op(v)).error?.issues.map((i) => `${i.path.join('.')}: ${i.message}`) ?? [];

describe('an operation\'s piece rate', () => {
  it('says a negative rate is negative, and only that', () => {
    expect(problems(-5)).toEqual(['pieceRateMinor: Cannot be negative']);
  });

  it('takes a fraction of a minor unit to 6 decimals, not 7', () => {
    expect(problems(0.125)).toEqual([]);
    expect(problems(0.1234567)).toEqual(['pieceRateMinor: At most 6 decimals of a minor unit']);
  });
});
