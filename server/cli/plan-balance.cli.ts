import { z } from 'zod';
import { balanceLine } from '@planning';
import { readCliInput } from './cli-args';

const inputSchema = z
  .object({
    tasks: z.array(z.object({ id: z.string(), time: z.number().positive(), after: z.array(z.string()).default([]) })),
    cycleTime: z.number().positive().optional(),
    stations: z.number().int().positive().optional(),
  })
  .refine((v) => v.cycleTime !== undefined || v.stations !== undefined, 'give cycleTime or stations');

const { input, json } = readCliInput(process.argv.slice(2));
const parsed = inputSchema.parse(input);
const r = balanceLine(parsed);
const stations = r.stations.map((s) => s.tasks);
const round2 = (v: number) => Math.round(v * 100) / 100;
const out =
  parsed.cycleTime !== undefined
    ? { stations, count: r.count, efficiency: round2(r.efficiency), method: r.method }
    : { cycleTime: r.cycleTime, stations, count: r.count, efficiency: round2(r.efficiency), method: r.method };
if (json) process.stdout.write(`${JSON.stringify(out)}\n`);
else {
  r.stations.forEach((s, i) => process.stdout.write(`station ${i + 1}: ${s.tasks.join(' ')} (time ${s.time}, idle ${s.idle})\n`));
  process.stdout.write(`cycle time ${r.cycleTime}, ${r.count} stations, efficiency ${round2(r.efficiency)} % (${r.method})\n`);
}
