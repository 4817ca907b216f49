import type { StaffLineInput } from './line-staffing.types';
import type { StaffPair } from './staffing-model';

const BISECTIONS = 30;

/**
 * A feasible plan to start the MIP from, or null when the greedy finds none. Bisects on a target cycle T between
 * the pooled bound and the whole line's minutes: for each T, operations (fewest able people first, then longest)
 * go to able people with room left under T, whole when one person has room for the rest, otherwise split over
 * the roomiest, within the cap on operations and the machines (a person keeps a machine type once they use it).
 * Returns the shares in `pairs` order and the machine types each person holds.
 */
export function greedyStart(input: StaffLineInput, pairs: StaffPair[], lower: number): { shares: number[]; holds: Set<string>[] } | null {
  const upper = pairs.reduce((a, pr) => Math.max(a, pr.time), 0) * input.operations.length;
  let best = tryCycle(input, pairs, upper);
  if (!best) return null;
  let lo = lower;
  let hi = upper;
  for (let i = 0; i < BISECTIONS; i++) {
    const mid = (lo + hi) / 2;
    const r = tryCycle(input, pairs, mid);
    if (r) {
      best = r;
      hi = mid;
    } else lo = mid;
  }
  return best;
}

function tryCycle(input: StaffLineInput, pairs: StaffPair[], target: number) {
  const cap = input.maxOperationsPerPerson ?? Infinity;
  const n = input.people.length;
  const load = new Array<number>(n).fill(0);
  const count = new Array<number>(n).fill(0);
  const holds = Array.from({ length: n }, () => new Set<string>());
  const holders = new Map<string, number>();
  const shares = new Array<number>(pairs.length).fill(0);
  const byOp = input.operations.map(() => [] as number[]);
  pairs.forEach((pr, i) => byOp[pr.o].push(i));
  const order = input.operations
    .map((op, o) => ({ o, able: byOp[o].length, minutes: op.minutes }))
    .sort((a, b) => a.able - b.able || b.minutes - a.minutes || a.o - b.o);
  for (const { o } of order) {
    const type = input.operations[o].machine;
    const limit = input.machines?.[type] ?? Infinity;
    let rest = 1;
    while (rest > 1e-12) {
      const room = (i: number) => (target - load[pairs[i].p]) / pairs[i].time;
      const open = byOp[o].filter((i) => {
        const p = pairs[i].p;
        return shares[i] === 0 && count[p] < cap && room(i) > 1e-9 && (holds[p].has(type) || (holders.get(type) ?? 0) < limit);
      });
      if (open.length === 0) return null;
      // Someone already on this machine type first; among them whoever can take the rest whole with least room
      // to spare, else whoever has the most room.
      const rank = (i: number) => (holds[pairs[i].p].has(type) ? 0 : 1);
      const whole = open.filter((i) => room(i) >= rest).sort((a, b) => rank(a) - rank(b) || room(a) - room(b));
      const pick = whole[0] ?? open.sort((a, b) => rank(a) - rank(b) || room(b) - room(a))[0];
      const take = Math.min(rest, room(pick));
      const p = pairs[pick].p;
      shares[pick] = take;
      load[p] += take * pairs[pick].time;
      count[p]++;
      if (!holds[p].has(type)) {
        holds[p].add(type);
        holders.set(type, (holders.get(type) ?? 0) + 1);
      }
      rest -= take;
    }
  }
  return { shares, holds };
}
