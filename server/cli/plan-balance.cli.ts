import { z } from 'zod';
import { balanceLine } from '@planning';
import { parseCliInput, readCliInput, runCore } from './cli-args';

/** A task id as written in the file: a string or a number (both are accepted, and printed back as given). */
const taskId = z.union([z.string().min(1), z.number()]);

const inputSchema = z
  .object({
    tasks: z.array(
      z.object({ id: taskId, time: z.number().positive(), after: z.array(taskId).default([]) }),
    ),
    cycleTime: z.number().positive().optional(),
    stations: z.number().int().positive().optional(),
  })
  .refine((v) => v.cycleTime !== undefined || v.stations !== undefined, { message: 'give cycleTime or stations', path: ['cycleTime'] })
  .superRefine((v, ctx) => {
    const seen = new Map<string, number>();
    v.tasks.forEach((t, i) => {
      if (seen.has(String(t.id))) ctx.addIssue({ code: 'custom', path: ['tasks', i, 'id'], message: `${t.id} appears twice` });
      seen.set(String(t.id), i);
    });
    v.tasks.forEach((t, i) => {
      if (v.cycleTime !== undefined && t.time > v.cycleTime)
        ctx.addIssue({ code: 'custom', path: ['tasks', i, 'time'], message: `${t.time} is longer than the cycle time ${v.cycleTime}` });
    });
    v.tasks.forEach((t, i) =>
      t.after.forEach((a, k) => {
        if (!seen.has(String(a))) ctx.addIssue({ code: 'custom', path: ['tasks', i, 'after', k], message: `no task ${a}` });
      }),
    );
  });

const { input, json } = readCliInput(process.argv.slice(2));
const parsed = parseCliInput(inputSchema, input);
const original = new Map(parsed.tasks.map((t) => [String(t.id), t.id]));
const r = runCore(() =>
  balanceLine({
    cycleTime: parsed.cycleTime,
    stations: parsed.stations,
    tasks: parsed.tasks.map((t) => ({ id: String(t.id), time: t.time, after: t.after.map(String) })),
  }),
  'tasks',
);
const stations = r.stations.map((s) => s.tasks.map((id) => original.get(id) ?? id));
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
