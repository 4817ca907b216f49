import type { MarkerBoard, NestingInput } from './types';

/** Copies of pieces in a marker (the engine's items): a mirrored piece gives a pair per quantity. */
export function markerItemCount(input: NestingInput): number {
  return input.pieces.reduce((s, p) => s + (p.mirrored ? 2 : 1) * p.quantity, 0);
}

const HEADER_BYTES = 24;
/** Tries at the lock before a post or a look is skipped (about a millisecond). */
const LOCK_SPINS = 1 << 20;

/** Memory for a board of `n` items, to hand to every lane's worker (workerData shares it, not copies). */
export function markerBoardBuffer(n: number): SharedArrayBuffer {
  const buffer = new SharedArrayBuffer(HEADER_BYTES + 16 * n + 4 * n);
  const head = new Int32Array(buffer, 0, 4);
  head[2] = n;
  new Float64Array(buffer, 16, 1)[0] = Infinity;
  return buffer;
}

/**
 * A board in shared memory (one per search, one view per lane). Layout: Int32 lock, version, n; Float64
 * length; Float64 x[n], y[n]; Int32 v[n]. The lock is held only while n positions are copied, so a lane
 * normally spins for a few microseconds. A lane's own posts never come back to it.
 */
export function sharedMarkerBoard(buffer: SharedArrayBuffer, n: number): MarkerBoard {
  const head = new Int32Array(buffer, 0, 4);
  if (head[2] !== n) throw new RangeError(`marker board holds ${head[2]} pieces, this marker has ${n}`);
  const len = new Float64Array(buffer, 16, 1);
  const xs = new Float64Array(buffer, HEADER_BYTES, n);
  const ys = new Float64Array(buffer, HEADER_BYTES + 8 * n, n);
  const vs = new Int32Array(buffer, HEADER_BYTES + 16 * n, n);
  let seen = 0;
  // Another lane holds the lock only while it copies n numbers. A lane stopped inside that copy (a worker
  // terminated after its cancel grace) would leave it held for good, so the wait is bounded: past it, this
  // post or look is skipped and the lane goes on with its own marker.
  const lock = () => {
    for (let k = 0; k < LOCK_SPINS; k++) if (Atomics.compareExchange(head, 0, 0, 1) === 0) return true;
    return false;
  };
  const unlock = () => Atomics.store(head, 0, 0);
  return {
    offer(snap, length) {
      if (!lock()) return;
      if (length < len[0]) {
        xs.set(snap.x);
        ys.set(snap.y);
        vs.set(snap.v);
        len[0] = length;
        seen = Atomics.add(head, 1, 1) + 1;
      }
      unlock();
    },
    take(length) {
      if (Atomics.load(head, 1) === seen || !lock()) return undefined;
      seen = Atomics.load(head, 1);
      const held = len[0];
      const got = held < length ? { snap: { x: xs.slice(), y: ys.slice(), v: vs.slice() }, length: held } : undefined;
      unlock();
      return got;
    },
  };
}
