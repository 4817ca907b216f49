/**
 * Line-staffing benchmark: how long HiGHS takes to share 60 operations among 20 people (planning/line-staffing).
 *
 *   npm run bench:line [-- --instances N] [--seconds S] [--seed K]
 *
 * Each instance is random but seeded (mulberry32): 60 operations of 0.3–3.0 standard minutes on five machine
 * types (lockstitch most common); 20 people each able to run 2–4 of the types at 0.7–1.3 efficiency; machine
 * counts a little above the people each type needs; at most 5 operations per person. Prints ONE JSON line per
 * instance: {instance, people, operations, seconds, method, gap, cycleMinutes, lowerBound, garmentsPerDay}, then a
 * summary line {instances, exact, medianSeconds, maxSeconds, maxGap}. `--seconds` is the solver's time limit
 * (default 10). Not a timed test; it never runs inside npm test.
 */
import { loadLineSolver, staffLine } from '../../planning';
import { randomLine } from './line/random-line';

function arg(name: string, fallback: number): number {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? Number(process.argv[at + 1]) : fallback;
}

const solver = await loadLineSolver();
const instances = arg('instances', 5);
const seconds = arg('seconds', 10);
const seed = arg('seed', 1);
const times: number[] = [];
let exact = 0;
let maxGap = 0;
for (let i = 0; i < instances; i++) {
  const input = { ...randomLine(seed + i), timeLimitSeconds: seconds };
  const t0 = performance.now();
  const r = staffLine(input, solver);
  const s = (performance.now() - t0) / 1000;
  times.push(s);
  if (r.method === 'exact') exact++;
  maxGap = Math.max(maxGap, r.gap);
  const round = (v: number, d = 4) => Math.round(v * 10 ** d) / 10 ** d;
  process.stdout.write(
    `${JSON.stringify({ instance: seed + i, people: input.people.length, operations: input.operations.length, seconds: round(s, 2), method: r.method, gap: round(r.gap, 6), cycleMinutes: round(r.cycleMinutes), lowerBound: round(r.lowerBound), garmentsPerDay: round(r.garmentsPerDay, 2) })}\n`,
  );
}
times.sort((a, b) => a - b);
const median = times[Math.floor(times.length / 2)];
process.stdout.write(`${JSON.stringify({ instances, exact, medianSeconds: Math.round(median * 100) / 100, maxSeconds: Math.round(times[times.length - 1] * 100) / 100, maxGap: Math.round(maxGap * 1e6) / 1e6 })}\n`);
