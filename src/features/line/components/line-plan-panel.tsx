import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Badge, Card, Caution, ErrorNote, Spinner } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { fmt, formatDate } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { machineTypeLabel } from '../hooks/machine-type';
import { workingHoursCaution } from '../hooks/working-hours-caution';
import { area } from '../words';
import { fixed } from './fixed';
import { actualOutputQueries, linePlanQueries, type PlanParams } from '../api/line-queries';
import { CapacityChart, OutputChart, SectionTimeline } from './line-charts';
import { StaffingCard, Stat } from './staffing-card';

const RISK_TONE = { 'on-time': 'teal', 'at-risk': 'gold', late: 'red', 'no-due-date': 'grey' } as const;
const pct = (value: number) => `${fixed(value, 1)} %`;

/** Balance, capacity, schedule and output of one batch's sewing line, with the working-hours caution. */
export function LinePlanPanel({ batch }: { batch: Pick<BatchDto, 'id' | 'code' | 'dueDate' | 'total'> }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.${key}`, values);
  const [params, setParams] = useState<PlanParams>({ mode: 'due', efficiency: 0.7, pins: [] });
  const [draft, setDraft] = useState({ mode: 'due' as PlanParams['mode'], people: '', efficiency: '70', maxOps: '' });
  const plan = useQuery(linePlanQueries.detail(batch.id, params));
  const actual = useQuery(actualOutputQueries.detail(batch.id));
  const p = plan.data;
  const apply = () => setParams({ ...params, mode: draft.mode, people: Number(draft.people) || undefined, efficiency: (Number(draft.efficiency) || 70) / 100, maxOps: Number(draft.maxOps) || undefined });
  return (
    <Card title={w('plan.title', { batch: batch.code })}>
      {/* Inputs line up at the bottom however the labels wrap, and the two widest fields get the room their words need (French runs longer). */}
      <form className="mb-4 grid gap-3 sm:grid-cols-2 sm:items-end lg:grid-cols-[1.7fr_1.5fr_1fr_0.8fr_auto]" onSubmit={(e) => { e.preventDefault(); apply(); }}>
        <div>
          <label className="field-label" htmlFor="plan-mode">{w('plan.balanceFor')}</label>
          <select id="plan-mode" className="field-input" value={draft.mode} onChange={(e) => setDraft({ ...draft, mode: e.target.value as PlanParams['mode'] })}>
            <option value="due">{w('plan.dueDate', { date: formatDate(batch.dueDate) })}</option>
            <option value="people">{w('plan.peoplePresent')}</option>
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="plan-people">{w('plan.machinists')}</label>
          <input id="plan-people" className="field-input" inputMode="numeric" placeholder={w('plan.everyone')} disabled={draft.mode !== 'people'} value={draft.people} onChange={(e) => setDraft({ ...draft, people: e.target.value })} />
        </div>
        <div>
          <label className="field-label" htmlFor="plan-max-ops">{w('plan.maxOps')}</label>
          <input id="plan-max-ops" className="field-input" inputMode="numeric" placeholder={w('plan.noLimit')} disabled={draft.mode !== 'people'} value={draft.maxOps} onChange={(e) => setDraft({ ...draft, maxOps: e.target.value })} />
        </div>
        <div>
          <label className="field-label" htmlFor="plan-eff" title={w('efficiency')}>{w('plan.expected')}</label>
          <input id="plan-eff" className="field-input" inputMode="numeric" title={w('efficiency')} value={draft.efficiency} onChange={(e) => setDraft({ ...draft, efficiency: e.target.value })} />
        </div>
        <div className="flex items-end"><button type="submit" className="btn-primary w-full">{w('plan.balance')}</button></div>
      </form>
      {plan.isLoading ? <Spinner label={w('plan.balancing')} /> : null}
      <ErrorNote error={plan.error} />
      {plan.error instanceof ApiError && plan.error.fields.operations ? (
        <Link className="mt-2 inline-block text-sm font-medium underline" to={paths.line.getHref(batch.id)}>{w('plan.editOperations')}</Link>
      ) : null}
      {plan.error && params.pins?.length ? <button type="button" className="btn-quiet mt-2" onClick={() => setParams({ ...params, pins: [] })}>{w('plan.clearPins')}</button> : null}
      {p ? (
        <div className="space-y-5">
          {p.balance ? <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="balance-summary">
            <Stat
              label={w('plan.stations')}
              value={String(p.balance.stationCount)}
              note={w(p.balance.stationCount > p.balance.peopleAvailable ? 'plan.onlyMachinists' : 'plan.machinistsCount', { count: p.balance.peopleAvailable })}
            />
            <Stat
              label={w('plan.lineBalance')}
              value={pct(p.balance.efficiencyPct)}
              note={p.balance.taktMin ? w('plan.ofTakt', { percent: pct(p.balance.utilisationPct) }) : w('plan.balanceDelay', { percent: pct(p.balance.balanceDelayPct) })}
            />
            <Stat
              label={w('plan.bottleneck')}
              value={`${p.stations[p.balance.bottleneck]?.label} · ${w('minutes', { value: fmt().number(p.balance.cycleTimeMin) })}`}
              note={p.balance.taktMin ? w('plan.takt', { value: fmt().number(p.balance.taktMin) }) : w('plan.smallestCycle')}
            />
            <Stat
              label={w('plan.outputDay')}
              value={w('plan.garments', { count: p.balance.outputPerDay })}
              note={w(p.balance.method === 'exact' ? 'plan.exact' : p.balance.method === 'rpw' ? 'plan.rpw' : 'plan.bestFound')}
            />
          </dl> : null}
          {p.mode === 'people' ? <StaffingCard plan={p} pins={params.pins ?? []} onPins={(pins) => setParams({ ...params, pins })} /> : null}
          {p.balance ? <>
          <div>
            <h3 className="mb-2 text-sm font-semibold text-thread-800">{p.mode === 'people' ? w('plan.comparison') : ''}{w('plan.capacityTitle')}</h3>
            <CapacityChart plan={p} />
            <p className="text-xs text-ink-600">
              <span className="font-semibold text-madder-600">{w('plan.madder')}</span>
              {w('plan.capacityKey', { minutes: fmt().number(p.minutesPerDay), percent: Math.round(p.efficiency * 100) })}
            </p>
          </div>
          <div role="region" aria-label={w('plan.table')} tabIndex={0} className="overflow-x-auto">
            <table className="w-full min-w-[520px] text-sm" data-testid="stations">
              <thead>
                <tr className="border-b border-calico-200 text-left text-ink-600">
                  <th className="py-1">{w('plan.cols.station')}</th>
                  <th>{w('plan.cols.machine')}</th>
                  <th>{w('plan.cols.operations')}</th>
                  <th className="text-right">{w('plan.cols.minutes')}</th>
                  <th className="text-right">{w('plan.cols.idle')}</th>
                </tr>
              </thead>
              <tbody>{p.stations.map((s) => (
                <tr key={s.label} className={`border-b border-calico-100 ${s.isBottleneck ? 'bg-madder-100/60' : ''}`}>
                  <td className="py-1 font-medium">{s.label} {s.isBottleneck ? <Badge tone="red">{w('plan.bottleneckBadge')}</Badge> : null}</td>
                  <td>{machineTypeLabel(s.machineType)}</td><td className="font-mono text-xs">{s.operations.join(' ')}</td>
                  <td className="text-right tabular-nums">{fixed(s.timeMin, 1)}</td><td className="text-right tabular-nums">{fixed(s.idleMin, 1)}</td>
                </tr>
              ))}</tbody>
            </table>
          </div>
          </> : null}
          <div>
            <h3 className="mb-2 flex flex-wrap items-center gap-2 text-sm font-semibold text-thread-800">
              {w('plan.schedule')} <Badge tone={RISK_TONE[p.schedule.risk]}>{w(`plan.risk.${p.schedule.risk}`)}</Badge>
            </h3>
            <SectionTimeline plan={p} />
            <ul className="mt-2 space-y-0.5 text-sm" data-testid="schedule">
              {p.schedule.stages.map((s) => (
                <li key={s.name}>
                  <b className="capitalize">{w(`sections.${s.name}`, { defaultValue: s.name })}</b>
                  {w('plan.stage', { from: formatDate(s.startDate), to: formatDate(s.endDate), count: s.people })}
                </li>
              ))}
              <li>
                {w('plan.finished', { finish: formatDate(p.schedule.finishDate), due: formatDate(p.dueDate), count: p.schedule.workingDaysToDue ?? 0, start: formatDate(p.start) })}
              </li>
              {p.schedule.overtimeMinutesPerDay !== 0 ? (
                <li className="text-madder-700">
                  {w('plan.overtime', {
                    what: p.schedule.overtimeMinutesPerDay < 0
                      ? w('plan.duePassed')
                      : w('plan.overtimeFigures', { minutes: Math.ceil(p.schedule.overtimeMinutesPerDay), day: fixed(p.schedule.hoursPerDay, 1), week: fixed(p.schedule.hoursPerWeek, 1) }),
                  })}
                </li>
              ) : null}
            </ul>
          </div>
          {p.schedule.exceedsIlo && p.schedule.caution ? (
            <Caution
              title={w('plan.cautionTitle')}
              items={[w('plan.cautionHours', { day: fixed(p.schedule.hoursPerDay, 1), week: fixed(p.schedule.hoursPerWeek, 1) }), w('plan.cautionMove')]}
              source={workingHoursCaution(p.schedule.caution)}
            />
          ) : null}
          <div>
            <h3 className="mb-2 text-sm font-semibold text-thread-800">{w('plan.finishedChart')}</h3>
            <OutputChart plan={p} actual={actual.data} />
            {actual.data === null ? <p className="text-xs text-ink-600">{w('plan.actualLater')}</p> : null}
          </div>
          <details className="text-xs text-ink-600"><summary className="cursor-pointer">{w('plan.assumptions')}</summary><ul className="mt-1 list-disc pl-5">{p.assumptions.map((a) => <li key={a}>{a}</li>)}</ul></details>
        </div>
      ) : null}
    </Card>
  );
}
