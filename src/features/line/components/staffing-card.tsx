import { useState } from 'react';
import type { LinePlanDto, StaffingDto } from '@shared/schemas/line';
import { Badge } from '@/components/ui/page';
import { fmt } from '@/lib/format';
import { i18n, useTranslation } from '@/lib/i18n';
import { machineTypeLabel } from '../hooks/machine-type';
import { area } from '../words';
import { fixed } from './fixed';

type Pin = { personId: number; code: string };

const shareText = (s: number) => (s >= 0.9995 ? i18n.t(`${area}.staffing.whole`) : `${Math.round(s * 100)} %`);

/**
 * Who does what on the shared-operations line: each person's operations with their shares, their minutes per
 * garment against the cycle (a bar), the bottleneck and the idle time; the owner pins a person to an operation and
 * the plan is made again around the pin.
 */
export function StaffingCard({ plan, pins, onPins }: { plan: LinePlanDto; pins: Pin[]; onPins: (pins: Pin[]) => void }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.staffing.${key}`, values);
  const s = plan.staffing;
  if (!s) return <p className="text-sm text-madder-700" data-testid="staffing-note">{plan.staffingNote}</p>;
  return (
    <div data-testid="staffing">
      <h3 className="mb-2 text-sm font-semibold text-thread-800">{w('title')}</h3>
      <dl className="mb-3 grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="staffing-summary">
        <Stat label={w('garmentsDay')} value={fmt().number(s.garmentsPerDay)} note={w('atPace', { percent: Math.round(plan.efficiency * 100), minutes: fmt().number(plan.minutesPerDay) })} />
        <Stat label={w('cycle')} value={t(`${area}.minutes`, { value: fixed(s.cycleMin, 2) })} note={w('cycleNote')} />
        <Stat label={w('bottleneck')} value={s.bottleneck} note={w('bottleneckNote')} />
        <Stat
          label={w('idle')}
          value={t(`${area}.minutes`, { value: fixed(s.idleMin, 2) })}
          note={s.method === 'exact' ? w('proven') : w('withinGap', { gap: `${fixed(s.gapPct, 1)} %` })}
        />
      </dl>
      {plan.staffingNote ? <p className="mb-2 text-xs text-ink-600">{plan.staffingNote}</p> : null}
      <div className="overflow-x-auto">
        <table className="w-full min-w-[560px] text-sm" data-testid="staffing-people">
          <thead>
            <tr className="border-b border-calico-200 text-left text-ink-600">
              <th className="py-1">{w('cols.person')}</th>
              <th>{w('cols.operations')}</th>
              <th className="w-40 pl-3">{w('cols.load')}</th>
              <th className="pl-3 text-right">{w('cols.minutes')}</th>
              <th className="pl-3 text-right">{w('cols.idle')}</th>
            </tr>
          </thead>
          <tbody>{s.people.map((p) => (
            <tr key={`${p.personId ?? p.name}`} className={`border-b border-calico-100 align-top ${p.isBottleneck ? 'bg-madder-100/60' : ''}`}>
              <td className="py-1 font-medium">{p.name} {p.isBottleneck ? <Badge tone="red">{w('bottleneckBadge')}</Badge> : null}</td>
              <td className="py-1">
                <div className="flex flex-wrap gap-1">
                  {p.operations.length ? p.operations.map((o) => (
                    <span key={o.code} className={`rounded px-1 font-mono text-xs ${o.pinned ? 'bg-saffron-100' : 'bg-calico-100'}`} title={w('opTitle', { machine: machineTypeLabel(o.machineType), minutes: fixed(o.minutes, 2) })}>
                      {o.code} {shareText(o.share)}{o.pinned ? w('pinned') : ''}
                    </span>
                  )) : <span className="text-xs text-ink-600">{w('nothing')}</span>}
                </div>
              </td>
              <td className="py-1 pl-3">
                <div className="h-2.5 w-full rounded bg-calico-100" role="img" aria-label={w('loadOf', { name: p.name, percent: Math.round(p.loadPct) })}>
                  <div className={`h-2.5 rounded ${p.isBottleneck ? 'bg-madder-600' : 'bg-thread-700'}`} style={{ width: `${Math.min(100, p.loadPct)}%` }} />
                </div>
              </td>
              <td className="pl-3 text-right tabular-nums">{fixed(p.loadMin, 2)}</td>
              <td className="pl-3 text-right tabular-nums">{fixed(p.idleMin, 2)}</td>
            </tr>
          ))}</tbody>
        </table>
      </div>
      <PinForm staffing={s} pins={pins} onPins={onPins} />
    </div>
  );
}

function PinForm({ staffing, pins, onPins }: { staffing: StaffingDto; pins: Pin[]; onPins: (pins: Pin[]) => void }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.staffing.${key}`, values);
  const people = staffing.people.filter((p) => p.personId !== null);
  const codes = [...new Set(staffing.people.flatMap((p) => p.operations.map((o) => o.code)))].sort();
  const [person, setPerson] = useState(String(people[0]?.personId ?? ''));
  const [code, setCode] = useState(codes[0] ?? '');
  const nameOf = (id: number) => people.find((p) => p.personId === id)?.name ?? `#${id}`;
  const add = (e: React.FormEvent) => {
    e.preventDefault();
    if (!person || !code || pins.some((x) => x.personId === Number(person) && x.code === code)) return;
    onPins([...pins, { personId: Number(person), code }]);
  };
  return (
    <form onSubmit={add} className="mt-3 flex flex-wrap items-end gap-2" aria-label={w('pinForm')}>
      <div>
        <label className="field-label" htmlFor="pin-person">{w('pin')}</label>
        <select id="pin-person" className="field-input w-auto" value={person} onChange={(e) => setPerson(e.target.value)}>
          {people.map((p) => <option key={p.personId} value={p.personId!}>{p.name}</option>)}
        </select>
      </div>
      <div>
        <label className="field-label" htmlFor="pin-operation">{w('toOperation')}</label>
        <select id="pin-operation" className="field-input w-auto" value={code} onChange={(e) => setCode(e.target.value)}>
          {codes.map((c) => <option key={c} value={c}>{c}</option>)}
        </select>
      </div>
      <button type="submit" className="btn-quiet" disabled={!people.length}>{w('pinAndPlan')}</button>
      {pins.length ? (
        <ul className="flex flex-wrap gap-1 text-xs" data-testid="pins">
          {pins.map((x) => (
            <li key={`${x.personId}:${x.code}`} className="rounded bg-saffron-100 px-1">
              {w('onOp', { name: nameOf(x.personId), code: x.code })}{' '}
              <button type="button" className="underline" aria-label={w('unpinOf', { name: nameOf(x.personId), code: x.code })} onClick={() => onPins(pins.filter((y) => y !== x))}>
                {w('unpin')}
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </form>
  );
}

export function Stat({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded-lg border border-calico-200 bg-calico-50 px-3 py-2">
      <dt className="text-xs text-ink-600">{label}</dt>
      <dd className="text-lg font-bold text-thread-800">{value}</dd>
      {note ? <dd className="text-xs text-ink-600">{note}</dd> : null}
    </div>
  );
}
