import { useQuery } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { useSearchParams } from 'react-router';
import { Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { downloadFile } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { fmt, formatDate, formatMoney } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { batchQueries, styleQueries } from '@/lib/queries';
import { operationQueries, useCopyOperations, useImportOperations } from '../api/line-queries';
import { LinePlanPanel } from './line-plan-panel';
import { OperationsEditor } from './operations-editor';
import { fixed } from './fixed';
import { rateToMajorText } from './rate-text';
import { TimeStudyForm } from './time-study-form';
import { WorkingCalendarCard } from './working-calendar-card';
import { machineTypeLabel } from '../hooks/machine-type';
import { area } from '../words';

/** Line plan: pick a batch, see its style's operations and the balanced line with its schedule. */
export function LinePage() {
  const { t } = useTranslation();
  const [params, setParams] = useSearchParams();
  const batches = useQuery(batchQueries.list());
  if (!batches.data) return <Spinner />;
  const open = batches.data.filter((b) => b.status !== 'shipped' && b.status !== 'cancelled');
  const batch = open.find((b) => b.id === Number(params.get('batch'))) ?? open[0];
  return (
    <>
      <PageHeader title={t(`${area}.page.title`)} subtitle={t(`${area}.page.subtitle`)} />
      {batch ? (
        <>
          <div className="mb-4 max-w-sm">
            <label className="field-label" htmlFor="line-batch">{t(`${area}.page.batch`)}</label>
            <select id="line-batch" className="field-input" value={batch.id} onChange={(e) => setParams({ batch: e.target.value })}>
              {open.map((b) => (
                <option key={b.id} value={b.id}>
                  {t(`${area}.page.batchOption`, { code: b.code, style: b.styleName, total: b.total, due: formatDate(b.dueDate) })}
                </option>
              ))}
            </select>
          </div>
          <div className="space-y-5">
            <LinePlanPanel key={batch.id} batch={batch} />
            <OperationsCard styleId={batch.styleId} />
            <WorkingCalendarCard />
          </div>
        </>
      ) : <Card><p className="text-sm text-ink-600">{t(`${area}.page.noOpen`)}</p></Card>}
    </>
  );
}

function OperationsCard({ styleId }: { styleId: number }) {
  const { t } = useTranslation();
  const ops = useQuery(operationQueries.list(styleId));
  const styles = useQuery(styleQueries.list());
  const currency = useMe().data?.currency ?? 'KES';
  const imp = useImportOperations(styleId);
  const copy = useCopyOperations(styleId);
  const [from, setFrom] = useState('');
  const [editing, setEditing] = useState(false);
  const [studying, setStudying] = useState<number | null>(null);
  const fileRef = useRef<HTMLInputElement>(null);
  const rows = ops.data ?? [];
  const sections = ['cutting', 'sewing', 'finishing'] as const;
  const withRates = rows.some((r) => r.pieceRateMinor !== undefined);
  if (editing) {
    return (
      <Card title={t(`${area}.ops.edit`)}>
        <OperationsEditor styleId={styleId} rows={rows} currency={currency} withRates={withRates} onDone={() => setEditing(false)} />
      </Card>
    );
  }
  return (
    <Card title={t(`${area}.ops.title`)}>
      <div className="mb-3 flex flex-wrap items-end gap-2">
        <button type="button" className="btn-primary" disabled={!ops.data} onClick={() => setEditing(true)}>{t(`${area}.ops.edit`)}</button>
        <button type="button" className="btn-quiet" onClick={() => downloadFile(`/styles/${styleId}/operations/export`, 'operations.xlsx')}>{t(`${area}.ops.export`)}</button>
        <button type="button" className="btn-quiet" onClick={() => fileRef.current?.click()}>{t(`${area}.ops.import`)}</button>
        <input ref={fileRef} type="file" accept=".xlsx" className="hidden" aria-label={t(`${area}.ops.file`)} onChange={(e) => { const f = e.target.files?.[0]; if (f) imp.mutate(f); e.target.value = ''; }} />
        <select aria-label={t(`${area}.ops.copyFrom`)} className="field-input w-auto" value={from} onChange={(e) => setFrom(e.target.value)}>
          <option value="">{t(`${area}.ops.copyFromOption`)}</option>
          {(styles.data ?? []).filter((s) => s.id !== styleId).map((s) => <option key={s.id} value={s.id}>{s.code} · {s.name}</option>)}
        </select>
        <button type="button" className="btn-quiet" disabled={!from || copy.isPending} onClick={() => copy.mutate(Number(from))}>{t(`${area}.ops.copy`)}</button>
      </div>
      <ErrorNote error={imp.error ?? copy.error ?? ops.error} />
      <div role="region" aria-label={t(`${area}.ops.ofStyle`)} tabIndex={0} className="overflow-x-auto">
        <table className="w-full min-w-[640px] text-sm" data-testid="operations">
          <thead><tr className="border-b border-calico-200 text-left text-ink-600"><th className="py-1">{t(`${area}.ops.cols.code`)}</th>
              <th>{t(`${area}.ops.cols.operation`)}</th>
              <th>{t(`${area}.ops.cols.machine`)}</th>
              <th className="text-right">{t(`${area}.ops.cols.sam`)}</th>
              <th className="pl-4">{t(`${area}.ops.cols.after`)}</th>
              {withRates ? <th className="text-right">{t(`${area}.ops.cols.rate`)}</th> : null}
              <th />
            </tr>
          </thead>
          {sections.map((sec) => (
            <tbody key={sec}>
              <tr><th colSpan={7} className="pt-3 text-left text-xs uppercase tracking-wide text-thread-700">{t(`${area}.sections.${sec}`)}</th></tr>
              {rows.filter((r) => r.section === sec).flatMap((r) => [
                <tr key={r.id} className="border-b border-calico-100">
                  <td className="py-1 font-mono">{r.code}</td><td>{r.name}</td><td>{machineTypeLabel(r.machineType)}</td>
                  <td className="text-right tabular-nums">{fixed(r.sam, r.timeStudy ? 3 : 1)}</td><td className="pl-4 font-mono text-xs">{r.predecessors.join(' ')}</td>
                  {r.pieceRateMinor !== undefined ? <td className="text-right tabular-nums">{r.pieceRateMinor == null ? '—' : Number.isInteger(r.pieceRateMinor) ? formatMoney(r.pieceRateMinor, currency) : `${currency} ${rateToMajorText(r.pieceRateMinor, currency).replace('.', fmt().number(1.5).charAt(1))}`}</td> : null}
                  <td className="pl-3 text-right">
                    <button type="button" className="text-sm underline" aria-label={t(`${area}.ops.studyOf`, { code: r.code })} onClick={() => setStudying(studying === r.id ? null : r.id)}>
                      {r.timeStudy ? t(`${area}.ops.studyDone`) : t(`${area}.ops.study`)}
                    </button>
                  </td>
                </tr>,
                studying === r.id ? (
                  <tr key={`study-${r.id}`}><td colSpan={7} className="py-2"><TimeStudyForm styleId={styleId} operation={r} onDone={() => setStudying(null)} /></td></tr>
                ) : null,
              ])}
            </tbody>
          ))}
        </table>
      </div>
    </Card>
  );
}
