import { z } from 'zod';
import highsLoader from 'highs';
import { mm } from '@shared/units';
import { allocateRolls, solveCutOrder } from '@planning';
import { readCliInput } from './cli-args';

const rate = z.number().nonnegative();
const inputSchema = z.object({
  sizes: z.array(z.string()).min(1),
  quantities: z.record(z.string(), z.number().int().nonnegative()),
  maxPlies: z.number().int().positive(),
  maxGarmentsPerMarker: z.number().int().positive(),
  maxMarkerLength: z.number().positive().optional(),
  overcutPercent: z.number().nonnegative().optional(),
  endAllowance: z.number().nonnegative().optional(),
  garmentLength: z.record(z.string(), z.number().positive()),
  rolls: z.array(z.object({ id: z.string(), length: z.number().nonnegative(), shadeLot: z.string() })).optional(),
  /** Money objective (minor units); any of them given = least total cost instead of least fabric, then fewest lays. */
  layCost: rate.optional(),
  plyCost: rate.optional(),
  fabricCostPerMetre: rate.optional(),
  timeLimitSeconds: z.number().positive().max(600).optional(),
});

const { input, json } = readCliInput(process.argv.slice(2));
const checked = inputSchema.safeParse(input);
if (!checked.success) {
  // One line per bad field, named by its path, then exit 2 (as a missing --in does).
  for (const issue of checked.error.issues) process.stderr.write(`${issue.path.join('.') || 'input'}: ${issue.message}\n`);
  process.exit(2);
}
const parsed = checked.data;
const priced = parsed.layCost !== undefined || parsed.plyCost !== undefined || parsed.fabricCostPerMetre !== undefined;
const solve = (order: Parameters<typeof solveCutOrder>[0], solver: Parameters<typeof solveCutOrder>[1]) => {
  try {
    return solveCutOrder(order, solver);
  } catch (err) {
    if (!(err instanceof RangeError)) throw err;
    process.stderr.write(`${err.message}\n`);
    process.exit(2);
  }
};
const plan = solve(
  {
    sizes: parsed.sizes, quantities: parsed.quantities, maxPlies: parsed.maxPlies, maxGarmentsPerMarker: parsed.maxGarmentsPerMarker,
    overcutPercent: parsed.overcutPercent, timeLimitSeconds: parsed.timeLimitSeconds,
    maxMarkerLength: parsed.maxMarkerLength === undefined ? undefined : mm(parsed.maxMarkerLength),
    endAllowance: parsed.endAllowance === undefined ? undefined : mm(parsed.endAllowance),
    garmentLength: Object.fromEntries(Object.entries(parsed.garmentLength).map(([k, v]) => [k, mm(v)])),
    ...(priced ? { costs: { layCost: parsed.layCost, plyCost: parsed.plyCost, fabricCostPerMetre: parsed.fabricCostPerMetre } } : {}),
  },
  await highsLoader(),
);
const allocation = parsed.rolls
  ? allocateRolls({ lays: plan.lays, rolls: parsed.rolls.map((r) => ({ ...r, length: mm(r.length) })), endAllowance: plan.endAllowance })
  : undefined;
const out = {
  lays: plan.lays.map((l) => ({ ratio: l.ratio, plies: l.plies, markerLength: l.markerLength })),
  fabricUsed: plan.fabricUsed,
  lowerBound: plan.lowerBound,
  overcut: plan.overcut,
  rolls: (allocation?.rolls ?? []).flatMap((r): { id: string; lay: number | null; plies: number; remnant: number }[] =>
    r.segments.length === 0
      ? [{ id: r.id, lay: null, plies: 0, remnant: r.remnant }]
      : r.segments.map((s) => ({ id: r.id, lay: s.lay, plies: s.plies, remnant: s.remaining })),
  ),
  // "exact" only when HiGHS proved the plan optimal; otherwise "heuristic" with the gap to the proven bound.
  method: plan.method,
  gap: plan.gap,
  layLowerBound: plan.layLowerBound,
  ...(plan.cost === undefined ? {} : { cost: Math.round(plan.cost) }),
  ...(allocation ? { shortfall: allocation.shortfall, splitLays: allocation.splitLays } : {}),
};
if (json) process.stdout.write(`${JSON.stringify(out)}\n`);
else {
  plan.lays.forEach((l, i) => process.stdout.write(`lay ${i + 1}: ${JSON.stringify(l.ratio)} × ${l.plies} plies, marker ${l.markerLength} mm\n`));
  const how = plan.method === 'exact' ? 'exact' : `heuristic, gap ${(plan.gap * 100).toFixed(2)} %`;
  process.stdout.write(`fabric ${plan.fabricUsed} mm (lower bound ${plan.lowerBound} mm, ${how})${plan.cost === undefined ? '' : `, cost ${Math.round(plan.cost)}`}\n`);
}
