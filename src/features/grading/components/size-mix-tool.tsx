import { useState } from 'react';
import { ErrorNote } from '@/components/ui/page';
import { Field } from '@/components/ui/form';
import { ApiError } from '@/lib/api-client';
import { useSizeMix } from '../api/grading-queries';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { Trans } from 'react-i18next';
import { useLength } from '../hooks/use-length';
import { area } from '../words';
import { enInterval } from './size-chart-grid';

/** Upload customers' bust girths (CSV), see how they fall into the run and split a batch of N over the sizes. */
export function SizeMixTool({ styleId }: { styleId: number }) {
  const { t } = useTranslation();
  const { len, system } = useLength();
  const [file, setFile] = useState<File | null>(null);
  const [total, setTotal] = useState('40');
  const [min, setMin] = useState('2');
  const [column, setColumn] = useState('');
  const mix = useSizeMix(styleId);
  const fields = mix.error instanceof ApiError ? mix.error.fields : {};
  const r = mix.data;
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-600"><Trans i18nKey={`${area}.mix.help`} components={{ code: <code /> }} /></p>
      <div className="grid gap-3 sm:grid-cols-4">
        <div className="sm:col-span-2">
          <label className="field-label" htmlFor="mix-file">{t(`${area}.mix.file`)}</label>
          <input id="mix-file" type="file" accept=".csv,.xlsx" className="field-input" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
          {fields.file ? <p className="field-error">{fields.file}</p> : null}
        </div>
        <Field label={t(`${area}.mix.garments`)} name="total" inputMode="numeric" value={total} onChange={(e) => setTotal(e.target.value)} error={fields.total} />
        <Field label={t(`${area}.mix.minPerSize`)} name="minPerSize" inputMode="numeric" value={min} onChange={(e) => setMin(e.target.value)} error={fields.minPerSize} />
        <Field label={t(`${area}.mix.column`)} name="column" value={column} onChange={(e) => setColumn(e.target.value)} error={fields.column} hint={t(`${area}.mix.columnHint`)} />
      </div>
      <button type="button" className="btn-primary" disabled={!file || mix.isPending} onClick={() => file && mix.mutate({ file, total: Number(total), minPerSize: Number(min), column: column || undefined })}>
        {mix.isPending ? t(`${area}.mix.working`) : t(`${area}.mix.split`)}
      </button>
      <ErrorNote error={mix.error} />
      {r ? (
        <div className="space-y-3">
          <p className="text-sm">{t(`${area}.mix.summary`, { count: r.measured, column: r.column, unit: r.unit, outside: fmt().number(r.outsideRun) })}</p>
          <div role="region" aria-label={t(`${area}.mix.region`)} tabIndex={0} className="overflow-x-auto">
            <table className="w-full text-sm" data-testid="size-mix">
              <thead><tr className="border-b border-calico-200 text-left text-ink-600"><th className="py-1">{t(`${area}.mix.size`)}</th><th>{t(`${area}.mix.bustFrom`)}</th><th>{t(`${area}.mix.to`)}</th><th className="text-right">{t(`${area}.mix.customers`)}</th><th className="text-right">{t(`${area}.mix.garments`)}</th></tr></thead>
              <tbody>{r.sizes.map((s) => (
                <tr key={s.size} className="border-b border-calico-100"><td className="py-1 font-medium">{s.size}</td><td>{len(s.fromMm)}</td><td>{len(s.toMm)}</td><td className="text-right">{s.bodies}</td><td className="text-right font-semibold">{s.garments}</td></tr>
              ))}</tbody>
            </table>
          </div>
          <details className="text-sm">
            <summary className="cursor-pointer text-thread-700">{t(`${area}.mix.${system === 'metric' ? 'en13402' : 'en13402Imperial'}`)}</summary>
            <div className="mt-2 flex flex-wrap gap-2">{r.en13402.map((b) => <span key={b.label} className="rounded border border-calico-200 px-2 py-1 text-xs">{enInterval(b.label, system, len)}: <b>{b.count}</b></span>)}</div>
          </details>
        </div>
      ) : null}
    </div>
  );
}
