import type { StaffLineInput } from '../../../planning';
import { createRng } from '../../../planning/nesting/random';

const TYPES = ['lockstitch', 'overlock', 'coverstitch', 'buttonhole', 'bartack'];
const TYPE_WEIGHTS = [0.5, 0.25, 0.1, 0.08, 0.07];

/** A seeded random line of `people` people and `operations` operations. */
/** A seeded random line (see line.bench.ts for the recipe). */
export function randomLine(seed: number, people = 20, operations = 60): StaffLineInput {
  const rng = createRng(seed);
  const pickType = () => {
    let u = rng();
    for (let i = 0; i < TYPES.length; i++) if ((u -= TYPE_WEIGHTS[i]) <= 0) return TYPES[i];
    return TYPES[0];
  };
  const ops = Array.from({ length: operations }, (_, i) => ({ id: `O${i + 1}`, minutes: Math.round((0.3 + rng() * 2.7) * 10) / 10, machine: pickType() }));
  const staff = Array.from({ length: people }, (_, i) => {
    const efficiency: Record<string, number> = { lockstitch: Math.round((0.7 + rng() * 0.6) * 100) / 100 };
    const more = 1 + Math.floor(rng() * 3);
    for (let k = 0; k < more; k++) efficiency[TYPES[1 + Math.floor(rng() * (TYPES.length - 1))]] = Math.round((0.7 + rng() * 0.6) * 100) / 100;
    return { id: `P${i + 1}`, efficiency };
  });
  const total = ops.reduce((a, o) => a + o.minutes, 0);
  const machines = Object.fromEntries(
    TYPES.map((t) => {
      const share = ops.filter((o) => o.machine === t).reduce((a, o) => a + o.minutes, 0) / total;
      return [t, Math.max(1, Math.ceil(share * people * 1.3))];
    }),
  );
  return { operations: ops, people: staff, machines, maxOperationsPerPerson: 5, minutesPerDay: 480 };
}

