import { useState } from 'react';
import { LINE_SECTIONS, MACHINE_TYPES, putOperationsInput, type OperationDto } from '@shared/schemas/line';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { fmt } from '@/lib/format';
import { localSentence, useTranslation } from '@/lib/i18n';
import { useSaveOperations } from '../api/line-queries';
import { machineTypeLabel } from '../hooks/machine-type';
import { area } from '../words';
import { parseRateMajor, rateToMajorText } from './rate-text';

/** One row as typed: text fields, so a half-typed number is kept until it is checked. */
interface DraftRow {
  key: number;
  code: string;
  name: string;
  section: OperationDto['section'];
  machineType: string;
  sam: string;
  after: string;
  rate: string;
}

/** Each typed cell's width and type style. */
const CELL = {
  code: 'w-20 font-mono',
  machine: 'w-28',
  sam: 'w-16 text-right tabular-nums',
  after: 'w-28 font-mono text-xs',
  rate: 'w-20 text-right tabular-nums',
};

const toDraft = (o: OperationDto, key: number, currency: string): DraftRow => ({
  key,
  code: o.code,
  name: o.name,
  section: o.section,
  machineType: o.machineType,
  sam: String(o.sam),
  after: o.predecessors.join(' '),
  rate: o.pieceRateMinor == null ? '' : rateToMajorText(o.pieceRateMinor, currency),
});

/**
 * The operations table edited in place: every cell checked with the same schema the server uses, each
 * error shown on its cell, and nothing saved until the whole table is valid. Piece rates appear only for
 * roles that see pay (the server keeps the stored rates otherwise).
 */
export function OperationsEditor({ styleId, rows, currency, withRates, onDone }: { styleId: number; rows: OperationDto[]; currency: string; withRates: boolean; onDone: () => void }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.ops.${key}`, values);
  const [draft, setDraft] = useState<DraftRow[]>(() => rows.map((r, i) => toDraft(r, i, currency)));
  const [nextKey, setNextKey] = useState(rows.length);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useSaveOperations(styleId);
  const set = (key: number, patch: Partial<DraftRow>) => setDraft((d) => d.map((r) => (r.key === key ? { ...r, ...patch } : r)));

  const handleSave = async () => {
    const found: Record<string, string> = {};
    const operations = draft.map((r, i) => {
      const sam = r.sam.trim() === '' ? Number.NaN : Number(r.sam);
      const rate = r.rate.trim() === '' ? null : parseRateMajor(r.rate, currency);
      if (r.rate.trim() !== '' && rate === null) found[`operations.${i}.pieceRateMinor`] = w('rateNeeded', { example: '12.50' });
      return {
        code: r.code,
        name: r.name,
        section: r.section,
        machineType: r.machineType,
        sam,
        predecessors: r.after.split(/[\s,]+/).filter(Boolean),
        ...(withRates ? { pieceRateMinor: rate } : {}),
      };
    });
    const parsed = putOperationsInput.safeParse({ operations });
    if (!parsed.success) for (const issue of parsed.error.issues) found[issue.path.join('.')] ??= localSentence(issue.message, fmt().settings);
    setErrors(found);
    if (Object.keys(found).length) return;
    try {
      await save.mutateAsync(parsed.data!.operations);
      onDone();
    } catch (e) {
      if (e instanceof ApiError && Object.keys(e.fields).length) setErrors(e.fields);
    }
  };

  const err = (i: number, field: string) => errors[`operations.${i}.${field}`] ?? (field === 'predecessors' ? Object.entries(errors).find(([k]) => k.startsWith(`operations.${i}.predecessors.`))?.[1] : undefined);
  const cell = (i: number, field: string, label: string, value: string, onChange: (v: string) => void, className = '', list?: string) => {
    const e = err(i, field);
    return (
      <td className="py-1 pr-1 align-top">
        <input aria-label={w('rowLabel', { label, row: i + 1 })} className={`w-full rounded border px-1.5 py-1 ${e ? 'border-madder-500' : 'border-calico-300'} ${className}`} value={value} list={list} onChange={(ev) => onChange(ev.target.value)} aria-invalid={Boolean(e)} />
        {e ? <p className="field-error">{e}</p> : null}
      </td>
    );
  };

  return (
    <div>
      <datalist id="machine-types">{MACHINE_TYPES.map((m) => <option key={m} value={m} label={machineTypeLabel(m)} />)}</datalist>
      <div role="region" aria-label={w('table')} tabIndex={0} className="overflow-x-auto">
        <table className="w-full min-w-[860px] text-sm" aria-label={w('edit')}>
          <thead>
            <tr className="border-b border-calico-200 text-left text-ink-600">
              <th className="py-1">{w('cols.code')}</th>
              <th>{w('cols.operation')}</th>
              <th>{w('cols.section')}</th>
              <th>{w('cols.machine')}</th>
              <th>{w('cols.samMin')}</th>
              <th>{w('cols.after')}</th>
              {withRates ? <th>{w('cols.rate')}</th> : null}
              <th />
            </tr>
          </thead>
          <tbody>
            {draft.map((r, i) => (
              <tr key={r.key} className="border-b border-calico-100">
                {cell(i, 'code', w('cols.code'), r.code, (v) => set(r.key, { code: v }), CELL.code)}
                {cell(i, 'name', w('cols.operation'), r.name, (v) => set(r.key, { name: v }))}
                <td className="py-1 pr-1 align-top">
                  <select aria-label={w('rowLabel', { label: w('cols.section'), row: i + 1 })} className="rounded border border-calico-300 bg-white px-1.5 py-1" value={r.section} onChange={(e) => set(r.key, { section: e.target.value as DraftRow['section'] })}>
                    {LINE_SECTIONS.map((s) => <option key={s} value={s}>{t(`${area}.sections.${s}`)}</option>)}
                  </select>
                </td>
                {cell(i, 'machineType', w('cols.machine'), r.machineType, (v) => set(r.key, { machineType: v }), CELL.machine, 'machine-types')}
                {cell(i, 'sam', w('cols.sam'), r.sam, (v) => set(r.key, { sam: v }), CELL.sam)}
                {cell(i, 'predecessors', w('cols.after'), r.after, (v) => set(r.key, { after: v }), CELL.after)}
                {withRates ? cell(i, 'pieceRateMinor', w('cols.rate'), r.rate, (v) => set(r.key, { rate: v }), CELL.rate) : null}
                <td className="py-1 align-top">
                  <button type="button" className="text-sm underline" onClick={() => setDraft((d) => d.filter((x) => x.key !== r.key))}>{w('remove')}</button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {errors.operations ? <p className="field-error">{errors.operations}</p> : null}
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
      <div className="mt-3 flex flex-wrap gap-2">
        <button
          type="button"
          className="btn-quiet"
          onClick={() => {
            setDraft((d) => [...d, { key: nextKey, code: '', name: '', section: 'sewing', machineType: 'lockstitch', sam: '', after: d.at(-1)?.code ?? '', rate: '' }]);
            setNextKey((k) => k + 1);
          }}
        >
          {w('add')}
        </button>
        <button type="button" className="btn-primary" disabled={save.isPending} onClick={handleSave}>{save.isPending ? w('saving') : w('save')}</button>
        <button type="button" className="btn-quiet" onClick={onDone}>{w('cancel')}</button>
      </div>
    </div>
  );
}
