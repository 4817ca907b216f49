import { describe, expect, it } from 'vitest';
import type { BundleDto } from '@shared/schemas/floor';
import { onlyOpenOfMine } from './operation-choice';

type Bundle = Pick<BundleDto, 'operations' | 'states'>;
const op = (id: number, isMine: boolean) => ({ id, isMine }) as BundleDto['operations'][number];
const done = (operationId: number) => ({ operationId, done: true }) as BundleDto['states'][number];

describe('the operation a bundle offers as chosen', () => {
  it('is the machinist\'s own when exactly one of theirs is open', () => {
    const b: Bundle = { operations: [op(1, true), op(2, true), op(3, false)], states: [done(1)] };
    expect(onlyOpenOfMine(b)).toBe(2);
  });

  it('is none when two of theirs are open: a wrong guess would pay the wrong rate', () => {
    expect(onlyOpenOfMine({ operations: [op(1, true), op(2, true)], states: [] })).toBeUndefined();
  });

  it('is none when theirs are all done or they have none on this style', () => {
    expect(onlyOpenOfMine({ operations: [op(1, true), op(2, false)], states: [done(1)] })).toBeUndefined();
    expect(onlyOpenOfMine({ operations: [op(1, false), op(2, false)], states: [] })).toBeUndefined();
  });
});
