import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units/units';
import { checkLayout } from './checker';
import { markerBoardBuffer, markerItemCount, sharedMarkerBoard } from './marker-board';
import { nestPieces } from './nest-pieces';
import type { NestingInput } from './types';

const snap = (x: number) => ({ v: Int32Array.of(0, 1), x: Float64Array.of(x, x + 1), y: Float64Array.of(2, 3) });

describe('marker board', () => {
  it('hands a shorter marker from one lane to another, never a longer one, never a lane its own', () => {
    const buffer = markerBoardBuffer(2);
    const a = sharedMarkerBoard(buffer, 2);
    const b = sharedMarkerBoard(buffer, 2);
    expect(b.take(100)).toBeUndefined();
    a.offer(snap(5), 50);
    expect(a.take(60)).toBeUndefined();
    const got = b.take(60);
    expect(got?.length).toBe(50);
    expect([...got!.snap.x]).toEqual([5, 6]);
    expect([...got!.snap.v]).toEqual([0, 1]);
    expect(b.take(60)).toBeUndefined();
    b.offer(snap(9), 70);
    expect(a.take(80)).toBeUndefined();
    b.offer(snap(7), 40);
    expect(a.take(50)?.length).toBe(40);
    // A lane already shorter than the board's marker keeps its own.
    b.offer(snap(1), 30);
    expect(a.take(20)).toBeUndefined();
  });

  it('goes on without the board when a lane stopped while holding its lock', () => {
    const buffer = markerBoardBuffer(2);
    const a = sharedMarkerBoard(buffer, 2);
    const b = sharedMarkerBoard(buffer, 2);
    a.offer(snap(5), 50);
    new Int32Array(buffer, 0, 1)[0] = 1; // the lock, left held by a lane that was terminated mid-copy
    b.offer(snap(1), 10);
    expect(b.take(60)).toBeUndefined();
    new Int32Array(buffer, 0, 1)[0] = 0;
    // Nothing was lost or half written: the board still holds lane a's marker, which b now sees.
    expect(b.take(60)?.length).toBe(50);
  });

  it('refuses a board made for another marker', () => {
    expect(() => sharedMarkerBoard(markerBoardBuffer(3), 4)).toThrow(/holds 3 pieces, this marker has 4/);
  });

  it('counts a mirrored piece as a pair per garment', () => {
    const sq = [{ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 1, y: 1 }];
    expect(markerItemCount({ stripWidth: mm(10), pieces: [{ id: 'a', polygon: sq, quantity: 3, mirrored: true }, { id: 'b', polygon: sq, quantity: 2 }] })).toBe(8);
  });

  // A lane takes up the board's marker in compression, the last 20 % of its budget (nest-pieces.ts).
  it('lets a lane compress the shorter marker another lane posted', () => {
    const tri = [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 0, y: 3 }];
    const input: NestingInput = { stripWidth: mm(10), pieces: [{ id: 't', polygon: tri, quantity: 16 }] };
    const buffer = markerBoardBuffer(markerItemCount(input));
    const alone = nestPieces(input, { seed: 2, maxIterations: 5 });
    const first = nestPieces(input, { seed: 1, maxIterations: 500, board: sharedMarkerBoard(buffer, 16) });
    expect(first.length).toBeLessThan(alone.length - 1);
    const second = nestPieces(input, { seed: 2, maxIterations: 5, board: sharedMarkerBoard(buffer, 16) });
    expect(checkLayout(input, second).errors).toEqual([]);
    expect(second.length).toBeLessThanOrEqual(first.length);
  });
});
