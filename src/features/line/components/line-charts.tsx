import { Bar, BarChart, CartesianGrid, Cell, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { LinePlanDto } from '@shared/schemas/line';
import { fmt, formatDate } from '@/lib/format';
import { i18n, useTranslation } from '@/lib/i18n';
import { machineTypeLabel } from '../hooks/machine-type';
import { area } from '../words';
import { fixed } from './fixed';

const C = { teal: '#0F4C5C', tealLight: '#1F6F7F', madder: '#B5523B', saffron: '#D99A1E', indigo: '#3D4A8C', calico: '#E8DFCF', ink: '#434B50' };
const axis = { fontSize: 11, fill: C.ink };
/** A chart day's tick: day and month in the studio's language (`26 Nov`, `26 nov.`). */
const short = (iso: string) => new Intl.DateTimeFormat(fmt().locale, { day: 'numeric', month: 'short', timeZone: 'UTC' }).format(Date.parse(`${iso}T00:00:00Z`));
const w = (key: string, values?: Record<string, unknown>) => i18n.t(`${area}.charts.${key}`, values);

/** Load against capacity per station per day; the bottleneck bar in madder. */
export function CapacityChart({ plan }: { plan: LinePlanDto }) {
  useTranslation();
  const data = plan.stations.map((s) => ({ name: s.label, load: s.loadPerDayMin, capacity: s.capacityPerDayMin, bottleneck: s.isBottleneck, machine: machineTypeLabel(s.machineType) }));
  const cap = plan.stations[0]?.capacityPerDayMin ?? 0;
  return (
    <div data-testid="capacity-chart" className="h-64 w-full">
      <ResponsiveContainer>
        <BarChart data={data} margin={{ top: 16, right: 8, left: -8, bottom: 0 }}>
          <CartesianGrid stroke={C.calico} vertical={false} />
          <XAxis dataKey="name" tick={axis} />
          <YAxis tick={axis} unit={w('minuteUnit')} tickFormatter={(v: number) => fmt().number(v)} />
          <Tooltip
            formatter={(v) => i18n.t(`${area}.minutes`, { value: fmt().number(Number(v)) })}
            labelFormatter={(l, p) => `${l} · ${p?.[0]?.payload?.machine ?? ''}${p?.[0]?.payload?.bottleneck ? w('bottleneck') : ''}`}
          />
          <ReferenceLine y={cap} stroke={C.saffron} strokeDasharray="6 3" label={{ value: w('capacity'), position: 'insideTopRight', fill: C.ink, fontSize: 11 }} />
          <Bar dataKey="load" name={w('load')} radius={[4, 4, 0, 0]}>
            {data.map((d) => <Cell key={d.name} fill={d.bottleneck ? C.madder : C.tealLight} />)}
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}

/** The batch's sections on the calendar: cutting, sewing, finishing as bars over working days. */
export function SectionTimeline({ plan }: { plan: LinePlanDto }) {
  useTranslation();
  const per = plan.minutesPerDay;
  const data = plan.schedule.stages.map((s) => ({ name: i18n.t(`${area}.sections.${s.name}`, { defaultValue: s.name }), offset: s.startMinute / per, length: (s.endMinute - s.startMinute) / per, from: formatDate(s.startDate), to: formatDate(s.endDate) }));
  const due = plan.schedule.workingDaysToDue;
  const colours = [C.indigo, C.teal, C.saffron];
  return (
    <div data-testid="timeline-chart" className="h-48 w-full">
      <ResponsiveContainer>
        <BarChart data={data} layout="vertical" margin={{ top: 8, right: 12, left: 8, bottom: 0 }}>
          <CartesianGrid stroke={C.calico} horizontal={false} />
          <XAxis type="number" tick={axis} unit={w('dayUnit')} domain={[0, Math.max(due ?? 0, Math.ceil(Math.max(...data.map((d) => d.offset + d.length))))]} />
          <YAxis type="category" dataKey="name" tick={axis} width={64} />
          <Tooltip formatter={(v, n) => (n === 'offset' ? null : w('workingDays', { value: fixed(Number(v), 1) }))} labelFormatter={(l, p) => `${l}: ${p?.[0]?.payload?.from ?? ''} → ${p?.[0]?.payload?.to ?? ''}`} />
          {due ? <ReferenceLine x={due} stroke={C.madder} strokeDasharray="4 3" label={{ value: w('due'), position: 'top', fill: C.madder, fontSize: 11 }} /> : null}
          <Bar dataKey="offset" stackId="t" fill="transparent" legendType="none" />
          <Bar dataKey="length" stackId="t" name={w('days')} radius={4}>
            {data.map((d, i) => <Cell key={d.name} fill={colours[i % colours.length]} />)}
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}

/** Cumulative planned garments per working day, with the floor's actual output when there is any. */
export function OutputChart({ plan, actual }: { plan: LinePlanDto; actual?: { day: string; pieces: number }[] | null }) {
  useTranslation();
  let run = 0;
  const actualByDay = new Map((actual ?? []).map((a) => [a.day, a.pieces]));
  const data = plan.plannedOutput.map((p) => {
    const a = actualByDay.get(p.day);
    if (a !== undefined) run += a;
    return { day: short(p.day), planned: p.pieces, actual: a !== undefined ? run : undefined };
  });
  return (
    <div data-testid="output-chart" className="h-56 w-full">
      <ResponsiveContainer>
        <LineChart data={data} margin={{ top: 8, right: 12, left: -8, bottom: 0 }}>
          <CartesianGrid stroke={C.calico} />
          <XAxis dataKey="day" tick={axis} interval="preserveStartEnd" />
          <YAxis tick={axis} domain={[0, plan.quantity]} />
          <Tooltip />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <ReferenceLine y={plan.quantity} stroke={C.saffron} strokeDasharray="4 3" />
          <Line type="stepAfter" dataKey="planned" name={w('planned')} stroke={C.teal} strokeWidth={2.5} dot={false} />
          {actual?.length ? <Line type="monotone" dataKey="actual" name={w('actual')} stroke={C.madder} strokeWidth={2} strokeDasharray="5 3" connectNulls /> : null}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
