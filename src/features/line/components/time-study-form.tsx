import { useState } from 'react';
import { studyStandardMinutes } from '@planning';
import { timeStudyInput, type OperationDto } from '@shared/schemas/line';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { Trans } from 'react-i18next';
import { fmt } from '@/lib/format';
import { localSentence, useTranslation } from '@/lib/i18n';
import { useTimeStudy } from '../api/line-queries';
import { area } from '../words';
import { fixed } from './fixed';

/** One element as typed: times and ratings as lists of numbers separated by spaces. */
interface DraftElement {
  key: number;
  name: string;
  seconds: string;
  ratings: string;
  frequency: string;
}

const numbers = (text: string) => text.split(/[\s,;]+/).filter(Boolean).map(Number);

const fromStudy = (op: OperationDto): DraftElement[] =>
  op.timeStudy?.elements.map((e, i) => ({
    key: i,
    name: e.name,
    seconds: e.observations.map((o) => o.seconds).join(' '),
    ratings: e.observations.map((o) => o.rating).join(' '),
    frequency: String(e.frequency),
  })) ?? [{ key: 0, name: op.name, seconds: '', ratings: '100', frequency: '1' }];

/**
 * The time-study sheet of one operation (ILO work-study method): each element's timed cycles in seconds and the
 * pace rated at each (100 = standard pace; one rating applies to every cycle), how often it happens per garment,
 * and the allowances. Shows basic and standard minutes as you type; saving sets the operation's SAM.
 */
export function TimeStudyForm({ styleId, operation, onDone }: { styleId: number; operation: OperationDto; onDone: () => void }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.study.${key}`, values);
  const [elements, setElements] = useState<DraftElement[]>(() => fromStudy(operation));
  const [relaxation, setRelaxation] = useState(String(operation.timeStudy?.relaxationPercent ?? 15));
  const [contingency, setContingency] = useState(String(operation.timeStudy?.contingencyPercent ?? 0));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useTimeStudy(styleId, operation.id);
  const set = (key: number, patch: Partial<DraftElement>) => setElements((d) => d.map((e) => (e.key === key ? { ...e, ...patch } : e)));

  const sheet = {
    elements: elements.map((e) => {
      const secs = numbers(e.seconds);
      const rates = numbers(e.ratings);
      return { name: e.name, frequency: Number(e.frequency), observations: secs.map((s, i) => ({ seconds: s, rating: rates.length === 1 ? rates[0] : rates[i] })) };
    }),
    relaxationPercent: Number(relaxation),
    contingencyPercent: Number(contingency),
  };
  const parsed = timeStudyInput.safeParse(sheet);
  let preview: { basic: number; standard: number } | null = null;
  if (parsed.success) {
    try {
      const r = studyStandardMinutes({
        elements: parsed.data.elements.map((e) => ({ name: e.name, frequency: e.frequency, observations: e.observations.map((o) => ({ minutes: o.seconds / 60, rating: o.rating })) })),
        relaxationPercent: parsed.data.relaxationPercent,
        contingencyPercent: parsed.data.contingencyPercent,
      });
      preview = { basic: r.basicMinutes, standard: r.standardMinutes };
    } catch {
      preview = null;
    }
  }

  const handleSave = async () => {
    if (!parsed.success) {
      const found: Record<string, string> = {};
      for (const i of parsed.error.issues) found[i.path.join('.')] ??= localSentence(i.message, fmt().settings);
      setErrors(found);
      return;
    }
    setErrors({});
    try {
      await save.mutateAsync(parsed.data);
      onDone();
    } catch (e) {
      if (e instanceof ApiError && Object.keys(e.fields).length) setErrors(e.fields);
    }
  };
  const errorOf = (i: number) => Object.entries(errors).find(([k]) => k.startsWith(`elements.${i}.`))?.[1];

  return (
    <div className="rounded-lg border border-calico-200 p-3" data-testid="time-study-form">
      <p className="mb-2 text-sm text-ink-700">
        <Trans i18nKey={`${area}.study.intro`} values={{ op: `${operation.code} ${operation.name}` }} components={{ b: <strong /> }} />
      </p>
      <table className="w-full text-sm" aria-label={w('elements')}>
        <thead>
          <tr className="text-left text-ink-600">
            <th>{w('cols.element')}</th>
            <th>{w('cols.times')}</th>
            <th>{w('cols.ratings')}</th>
            <th>{w('cols.perGarment')}</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {elements.map((e, i) => (
            <tr key={e.key} className="align-top">
              <td className="pr-1"><input aria-label={w('element', { n: i + 1 })} className="field-input" value={e.name} onChange={(ev) => set(e.key, { name: ev.target.value })} /></td>
              <td className="pr-1"><input aria-label={w('timesOf', { n: i + 1 })} className="field-input" placeholder="36 34 38" value={e.seconds} onChange={(ev) => set(e.key, { seconds: ev.target.value })} /></td>
              <td className="pr-1"><input aria-label={w('ratingsOf', { n: i + 1 })} className="field-input" placeholder="100" value={e.ratings} onChange={(ev) => set(e.key, { ratings: ev.target.value })} /></td>
              <td className="pr-1"><input aria-label={w('perGarmentOf', { n: i + 1 })} className="field-input w-20" value={e.frequency} onChange={(ev) => set(e.key, { frequency: ev.target.value })} /></td>
              <td><button type="button" className="text-sm underline" onClick={() => setElements((d) => d.filter((x) => x.key !== e.key))}>{w('remove')}</button></td>
            </tr>
          ))}
          {elements.map((e, i) => (errorOf(i) ? <tr key={`err-${e.key}`}><td colSpan={5} className="field-error">{w('elementError', { n: i + 1, error: errorOf(i) })}</td></tr> : null))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-600">{w('hint', { tenth: '0.1' })}</p>
      <div className="mt-2 flex flex-wrap items-end gap-3">
        <button type="button" className="btn-quiet" onClick={() => setElements((d) => [...d, { key: Math.max(0, ...d.map((x) => x.key)) + 1, name: '', seconds: '', ratings: '100', frequency: '1' }])}>{w('add')}</button>
        <label className="text-sm">{w('relaxation')}<input aria-label={w('relaxation')} className="field-input w-20" value={relaxation} onChange={(e) => setRelaxation(e.target.value)} /></label>
        <label className="text-sm">{w('contingency')}<input aria-label={w('contingency')} className="field-input w-20" value={contingency} onChange={(e) => setContingency(e.target.value)} /></label>
      </div>
      {errors.relaxationPercent || errors.contingencyPercent || errors.elements ? <p className="field-error">{errors.relaxationPercent ?? errors.contingencyPercent ?? errors.elements}</p> : null}
      <p className="mt-2 text-sm" aria-live="polite" data-testid="time-study-result">
        {preview ? (
          <Trans i18nKey={`${area}.study.result`} values={{ basic: fixed(preview.basic, 3), standard: fixed(preview.standard, 3) }} components={{ b: <strong /> }} />
        ) : (
          w('fill')
        )}
      </p>
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
      <div className="mt-2 flex gap-2">
        <button type="button" className="btn-primary" disabled={save.isPending} onClick={handleSave}>{save.isPending ? w('saving') : w('save')}</button>
        <button type="button" className="btn-quiet" onClick={onDone}>{w('cancel')}</button>
      </div>
    </div>
  );
}
