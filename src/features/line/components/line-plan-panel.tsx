import { EFFICIENCY_DEFINITION } from '@planning';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { BatchDto } from '@shared/schemas/batches';
import { Badge, Card, Caution, ErrorNote, Spinner } from '@/components/ui/page';
import { formatDate } from '@/lib/format';
import { actualOutputQueries, linePlanQueries, type PlanParams } from '../api/line-queries';
import { CapacityChart, OutputChart, SectionTimeline } from './line-charts';
import { StaffingCard, Stat } from './staffing-card';

const RISK = { 'on-time': ['teal', 'On time'], 'at-risk': ['gold', 'At risk'], late: ['red', 'Late'], 'no-due-date': ['grey', 'No due date'] } as const;

/** Balance, capacity, schedule and output of one batch's sewing line, with the working-hours caution. */
export function LinePlanPanel({ batch }: { batch: Pick<BatchDto, 'id' | 'code' | 'dueDate' | 'total'> }) {
  const [params, setParams] = useState<PlanParams>({ mode: 'due', efficiency: 0.7, pins: [] });
  const [draft, setDraft] = useState({ mode: 'due' as PlanParams['mode'], people: '', efficiency: '70', maxOps: '' });
  const plan = useQuery(linePlanQueries.detail(batch.id, params));
  const actual = useQuery(actualOutputQueries.detail(batch.id));
  const p = plan.data;
  const apply = () => setParams({ ...params, mode: draft.mode, people: Number(draft.people) || undefined, efficiency: (Number(draft.efficiency) || 70) / 100, maxOps: Number(draft.maxOps) || undefined });
  return (
    <Card title={`Sewing line for ${batch.code}`}>
      <form className="mb-4 grid gap-3 sm:grid-cols-5" onSubmit={(e) => { e.preventDefault(); apply(); }}>
        <div>
          <label className="field-label" htmlFor="plan-mode">Balance for</label>
          <select id="plan-mode" className="field-input" value={draft.mode} onChange={(e) => setDraft({ ...draft, mode: e.target.value as PlanParams['mode'] })}>
            <option value="due">The due date ({formatDate(batch.dueDate)})</option>
            <option value="people">The people present</option>
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="plan-people">Machinists present</label>
          <input id="plan-people" className="field-input" inputMode="numeric" placeholder="everyone active" disabled={draft.mode !== 'people'} value={draft.people} onChange={(e) => setDraft({ ...draft, people: e.target.value })} />
        </div>
        <div>
          <label className="field-label" htmlFor="plan-max-ops">Most operations a person</label>
          <input id="plan-max-ops" className="field-input" inputMode="numeric" placeholder="no limit" disabled={draft.mode !== 'people'} value={draft.maxOps} onChange={(e) => setDraft({ ...draft, maxOps: e.target.value })} />
        </div>
        <div>
          <label className="field-label" htmlFor="plan-eff" title={EFFICIENCY_DEFINITION}>Expected efficiency (%)</label>
          <input id="plan-eff" className="field-input" inputMode="numeric" title={EFFICIENCY_DEFINITION} value={draft.efficiency} onChange={(e) => setDraft({ ...draft, efficiency: e.target.value })} />
        </div>
        <div className="flex items-end"><button type="submit" className="btn-primary w-full">Balance the line</button></div>
      </form>
      {plan.isLoading ? <Spinner label="Balancing…" /> : null}
      <ErrorNote error={plan.error} />
      {plan.error && params.pins?.length ? <button type="button" className="btn-quiet mt-2" onClick={() => setParams({ ...params, pins: [] })}>Clear the pins and plan again</button> : null}
      {p ? (
        <div className="space-y-5">
          {p.balance ? <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="balance-summary">
            <Stat label="Stations" value={String(p.balance.stationCount)} note={p.balance.stationCount > p.balance.peopleAvailable ? `only ${p.balance.peopleAvailable} machinists` : `${p.balance.peopleAvailable} machinists`} />
            <Stat label="Line balance" value={`${p.balance.efficiencyPct.toFixed(1)} %`} note={p.balance.taktMin ? `${p.balance.utilisationPct.toFixed(1)} % of the takt` : `balance delay ${p.balance.balanceDelayPct.toFixed(1)} %`} />
            <Stat label="Bottleneck" value={`${p.stations[p.balance.bottleneck]?.label} · ${p.balance.cycleTimeMin} min`} note={p.balance.taktMin ? `takt ${p.balance.taktMin} min` : 'smallest cycle time'} />
            <Stat label="Output a day" value={`${p.balance.outputPerDay} garments`} note={`${p.balance.method === 'exact' ? 'exact balance' : p.balance.method === 'rpw' ? 'ranked positional weight (heuristic)' : 'best found before the limit'}`} />
          </dl> : null}
          {p.mode === 'people' ? <StaffingCard plan={p} pins={params.pins ?? []} onPins={(pins) => setParams({ ...params, pins })} /> : null}
          {p.balance ? <>
          <div>
            <h3 className="mb-2 text-sm font-semibold text-thread-800">{p.mode === 'people' ? 'For comparison, a straight line with one machine type per station: ' : ''}Capacity against load per station, a day</h3>
            <CapacityChart plan={p} />
            <p className="text-xs text-ink-600"><span className="font-semibold text-madder-600">Madder bar</span>: the bottleneck station. Dashed line: one operator's capacity ({p.minutesPerDay} min × {Math.round(p.efficiency * 100)} %).</p>
          </div>
          <div role="region" aria-label="Line plan" tabIndex={0} className="overflow-x-auto">
            <table className="w-full min-w-[520px] text-sm" data-testid="stations">
              <thead><tr className="border-b border-calico-200 text-left text-ink-600"><th className="py-1">Station</th><th>Machine</th><th>Operations</th><th className="text-right">Minutes</th><th className="text-right">Idle</th></tr></thead>
              <tbody>{p.stations.map((s) => (
                <tr key={s.label} className={`border-b border-calico-100 ${s.isBottleneck ? 'bg-madder-100/60' : ''}`}>
                  <td className="py-1 font-medium">{s.label} {s.isBottleneck ? <Badge tone="red">bottleneck</Badge> : null}</td>
                  <td>{s.machineType}</td><td className="font-mono text-xs">{s.operations.join(' ')}</td>
                  <td className="text-right tabular-nums">{s.timeMin.toFixed(1)}</td><td className="text-right tabular-nums">{s.idleMin.toFixed(1)}</td>
                </tr>
              ))}</tbody>
            </table>
          </div>
          </> : null}
          <div>
            <h3 className="mb-2 flex flex-wrap items-center gap-2 text-sm font-semibold text-thread-800">
              Schedule: cutting → sewing → finishing <Badge tone={RISK[p.schedule.risk][0]}>{RISK[p.schedule.risk][1]}</Badge>
            </h3>
            <SectionTimeline plan={p} />
            <ul className="mt-2 space-y-0.5 text-sm" data-testid="schedule">
              {p.schedule.stages.map((s) => <li key={s.name}><b className="capitalize">{s.name}</b>: {formatDate(s.startDate)} → {formatDate(s.endDate)} · {s.people} {s.people === 1 ? 'person' : 'people'}</li>)}
              <li>Finished {formatDate(p.schedule.finishDate)}; due {formatDate(p.dueDate)} ({p.schedule.workingDaysToDue} working days from {formatDate(p.start)}).</li>
              {p.schedule.overtimeMinutesPerDay !== 0 ? <li className="text-madder-700">Overtime needed: {p.schedule.overtimeMinutesPerDay < 0 ? 'the due date has passed' : `${Math.ceil(p.schedule.overtimeMinutesPerDay)} min a day for every section (${p.schedule.hoursPerDay.toFixed(1)} h a day, ${p.schedule.hoursPerWeek.toFixed(1)} h a week)`}.</li> : null}
            </ul>
          </div>
          {p.schedule.exceedsIlo && p.schedule.caution ? (
            <Caution title="This plan needs more than a normal working day or week" items={[`${p.schedule.hoursPerDay.toFixed(1)} h a day and ${p.schedule.hoursPerWeek.toFixed(1)} h a week: beyond 8 h a day or 48 h a week.`, 'Move the due date, add people or split the batch before asking for overtime; overtime must be agreed and paid as your local law says.']} source={p.schedule.caution} />
          ) : null}
          <div>
            <h3 className="mb-2 text-sm font-semibold text-thread-800">Garments finished, cumulative</h3>
            <OutputChart plan={p} actual={actual.data} />
            {actual.data === null ? <p className="text-xs text-ink-600">Actual output appears here once the floor logs bundles.</p> : null}
          </div>
          <details className="text-xs text-ink-600"><summary className="cursor-pointer">Assumptions</summary><ul className="mt-1 list-disc pl-5">{p.assumptions.map((a) => <li key={a}>{a}</li>)}</ul></details>
        </div>
      ) : null}
    </Card>
  );
}
