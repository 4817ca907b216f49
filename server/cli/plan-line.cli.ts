import { z } from 'zod';
import { loadLineSolver, staffLine } from '@planning';
import { parseCliInput, readCliInput, runCore } from './cli-args';

const id = z.union([z.string().min(1), z.number()]).transform(String);

const inputSchema = z.object({
  operations: z.array(z.object({ id, minutes: z.number().positive(), machine: z.string().min(1) })).min(1),
  people: z.array(z.object({ id, efficiency: z.record(z.string(), z.number().nonnegative()) })).min(1),
  machines: z.record(z.string(), z.number().int().nonnegative()).optional(),
  maxOperationsPerPerson: z.number().int().positive().optional(),
  minutesPerDay: z.number().positive(),
  pins: z.array(z.object({ person: id, operation: id, share: z.number().positive().max(1).optional() })).optional(),
  timeLimitSeconds: z.number().positive().optional(),
});

const { input, json } = readCliInput(process.argv.slice(2));
const parsed = parseCliInput(inputSchema, input);
const solver = await loadLineSolver();
const r = runCore(() => staffLine(parsed, solver));
const out = {
  cycleMinutes: r.cycleMinutes,
  garmentsPerDay: r.garmentsPerDay,
  assignments: r.assignments,
  method: r.method,
  gap: r.gap,
};
if (json) process.stdout.write(`${JSON.stringify(out)}\n`);
else {
  const round = (v: number) => Math.round(v * 1000) / 1000;
  for (const l of r.loads) {
    const parts = r.assignments.filter((a) => a.person === l.person).map((a) => `${a.operation} ${round(a.share * 100)} %`);
    process.stdout.write(`${l.person}: ${parts.join(', ') || 'idle'} (${round(l.minutes)} min, idle ${round(l.idle)} min)${l.person === r.bottleneck ? ' bottleneck' : ''}\n`);
  }
  process.stdout.write(`cycle ${round(r.cycleMinutes)} min, ${Math.floor(r.garmentsPerDay + 1e-9)} garments a day (${r.method}, gap ${round(r.gap * 100)} %)\n`);
}
