import { useState } from 'react';
import { LINE_SECTIONS, MACHINE_TYPES, putOperationsInput, type OperationDto } from '@shared/schemas/line';
import { parseMajor, toMajorText } from '@shared/units/money';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useSaveOperations } from '../api/line-queries';

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

const toDraft = (o: OperationDto, key: number, currency: string): DraftRow => ({
  key,
  code: o.code,
  name: o.name,
  section: o.section,
  machineType: o.machineType,
  sam: String(o.sam),
  after: o.predecessors.join(' '),
  rate: o.pieceRateMinor == null ? '' : toMajorText(o.pieceRateMinor, currency),
});

/**
 * The operations table edited in place: every cell checked with the same schema the server uses, each
 * error shown on its cell, and nothing saved until the whole table is valid. Piece rates appear only for
 * roles that see pay (the server keeps the stored rates otherwise).
 */
export function OperationsEditor({ styleId, rows, currency, withRates, onDone }: { styleId: number; rows: OperationDto[]; currency: string; withRates: boolean; onDone: () => void }) {
  const [draft, setDraft] = useState<DraftRow[]>(() => rows.map((r, i) => toDraft(r, i, currency)));
  const [nextKey, setNextKey] = useState(rows.length);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useSaveOperations(styleId);
  const set = (key: number, patch: Partial<DraftRow>) => setDraft((d) => d.map((r) => (r.key === key ? { ...r, ...patch } : r)));

  const handleSave = async () => {
    const found: Record<string, string> = {};
    const operations = draft.map((r, i) => {
      const sam = r.sam.trim() === '' ? Number.NaN : Number(r.sam);
      const rate = r.rate.trim() === '' ? null : parseMajor(r.rate, currency);
      if (r.rate.trim() !== '' && rate === null) found[`operations.${i}.pieceRateMinor`] = 'Give an amount, e.g. 12.50';
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
    if (!parsed.success) for (const issue of parsed.error.issues) found[issue.path.join('.')] ??= issue.message;
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
        <input aria-label={`${label}, row ${i + 1}`} className={`w-full rounded border px-1.5 py-1 ${e ? 'border-madder-500' : 'border-calico-300'} ${className}`} value={value} list={list} onChange={(ev) => onChange(ev.target.value)} aria-invalid={Boolean(e)} />
        {e ? <p className="field-error">{e}</p> : null}
      </td>
    );
  };

  return (
    <div>
      <datalist id="machine-types">{MACHINE_TYPES.map((m) => <option key={m} value={m} />)}</datalist>
      <div role="region" aria-label="Operations" tabIndex={0} className="overflow-x-auto">
        <table className="w-full min-w-[860px] text-sm" aria-label="Edit operations">
          <thead>
            <tr className="border-b border-calico-200 text-left text-ink-600">
              <th className="py-1">Code</th><th>Operation</th><th>Section</th><th>Machine</th><th>SAM (min)</th><th>After</th>{withRates ? <th>Piece rate</th> : null}<th />
            </tr>
          </thead>
          <tbody>
            {draft.map((r, i) => (
              <tr key={r.key} className="border-b border-calico-100">
                {cell(i, 'code', 'Code', r.code, (v) => set(r.key, { code: v }), 'w-20 font-mono')}
                {cell(i, 'name', 'Operation', r.name, (v) => set(r.key, { name: v }))}
                <td className="py-1 pr-1 align-top">
                  <select aria-label={`Section, row ${i + 1}`} className="rounded border border-calico-300 bg-white px-1.5 py-1" value={r.section} onChange={(e) => set(r.key, { section: e.target.value as DraftRow['section'] })}>
                    {LINE_SECTIONS.map((s) => <option key={s} value={s}>{s}</option>)}
                  </select>
                </td>
                {cell(i, 'machineType', 'Machine', r.machineType, (v) => set(r.key, { machineType: v }), 'w-28', 'machine-types')}
                {cell(i, 'sam', 'SAM', r.sam, (v) => set(r.key, { sam: v }), 'w-16 text-right tabular-nums')}
                {cell(i, 'predecessors', 'After', r.after, (v) => set(r.key, { after: v }), 'w-28 font-mono text-xs')}
                {withRates ? cell(i, 'pieceRateMinor', 'Piece rate', r.rate, (v) => set(r.key, { rate: v }), 'w-20 text-right tabular-nums') : null}
                <td className="py-1 align-top">
                  <button type="button" className="text-sm underline" onClick={() => setDraft((d) => d.filter((x) => x.key !== r.key))}>Remove</button>
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
          Add operation
        </button>
        <button type="button" className="btn-primary" disabled={save.isPending} onClick={handleSave}>{save.isPending ? 'Saving…' : 'Save operations'}</button>
        <button type="button" className="btn-quiet" onClick={onDone}>Cancel</button>
      </div>
    </div>
  );
}
