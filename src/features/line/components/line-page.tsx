import { useQuery } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { useSearchParams } from 'react-router';
import { Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { downloadFile } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { formatMoney } from '@/lib/format';
import { batchQueries, styleQueries } from '@/lib/queries';
import { operationQueries, useCopyOperations, useImportOperations } from '../api/line-queries';
import { LinePlanPanel } from './line-plan-panel';
import { OperationsEditor } from './operations-editor';


/** Line plan: pick a batch, see its style's operations and the balanced line with its schedule. */
export function LinePage() {
  const [params, setParams] = useSearchParams();
  const batches = useQuery(batchQueries.list());
  if (!batches.data) return <Spinner />;
  const open = batches.data.filter((b) => b.status !== 'shipped' && b.status !== 'cancelled');
  const batch = open.find((b) => b.id === Number(params.get('batch'))) ?? open[0];
  return (
    <>
      <PageHeader title="Line plan" subtitle="Operations, line balance, capacity and the batch schedule" />
      {batch ? (
        <>
          <div className="mb-4 max-w-sm">
            <label className="field-label" htmlFor="line-batch">Batch</label>
            <select id="line-batch" className="field-input" value={batch.id} onChange={(e) => setParams({ batch: e.target.value })}>
              {open.map((b) => <option key={b.id} value={b.id}>{b.code} · {b.styleName} · {b.total} due {b.dueDate}</option>)}
            </select>
          </div>
          <div className="space-y-5">
            <LinePlanPanel key={batch.id} batch={batch} />
            <OperationsCard styleId={batch.styleId} />
          </div>
        </>
      ) : <Card><p className="text-sm text-ink-600">No open batches.</p></Card>}
    </>
  );
}

function OperationsCard({ styleId }: { styleId: number }) {
  const ops = useQuery(operationQueries.list(styleId));
  const styles = useQuery(styleQueries.list());
  const currency = useMe().data?.currency ?? 'KES';
  const imp = useImportOperations(styleId);
  const copy = useCopyOperations(styleId);
  const [from, setFrom] = useState('');
  const [editing, setEditing] = useState(false);
  const fileRef = useRef<HTMLInputElement>(null);
  const rows = ops.data ?? [];
  const sections = ['cutting', 'sewing', 'finishing'] as const;
  const withRates = rows.some((r) => r.pieceRateMinor !== undefined);
  if (editing) {
    return (
      <Card title="Edit operations">
        <OperationsEditor styleId={styleId} rows={rows} currency={currency} withRates={withRates} onDone={() => setEditing(false)} />
      </Card>
    );
  }
  return (
    <Card title="Operations and standard minutes (SAM)">
      <div className="mb-3 flex flex-wrap items-end gap-2">
        <button type="button" className="btn-primary" disabled={!ops.data} onClick={() => setEditing(true)}>Edit operations</button>
        <button type="button" className="btn-quiet" onClick={() => downloadFile(`/styles/${styleId}/operations/export`, 'operations.xlsx')}>Export XLSX</button>
        <button type="button" className="btn-quiet" onClick={() => fileRef.current?.click()}>Import XLSX</button>
        <input ref={fileRef} type="file" accept=".xlsx" className="hidden" aria-label="Operations file" onChange={(e) => { const f = e.target.files?.[0]; if (f) imp.mutate(f); e.target.value = ''; }} />
        <select aria-label="Copy from style" className="field-input w-auto" value={from} onChange={(e) => setFrom(e.target.value)}>
          <option value="">Copy from style…</option>
          {(styles.data ?? []).filter((s) => s.id !== styleId).map((s) => <option key={s.id} value={s.id}>{s.code} · {s.name}</option>)}
        </select>
        <button type="button" className="btn-quiet" disabled={!from || copy.isPending} onClick={() => copy.mutate(Number(from))}>Copy</button>
      </div>
      <ErrorNote error={imp.error ?? copy.error ?? ops.error} />
      <div role="region" aria-label="Operations of the style" tabIndex={0} className="overflow-x-auto">
        <table className="w-full min-w-[640px] text-sm" data-testid="operations">
          <thead><tr className="border-b border-calico-200 text-left text-ink-600"><th className="py-1">Code</th><th>Operation</th><th>Machine</th><th className="text-right">SAM</th><th className="pl-4">After</th>{rows.some((r) => r.pieceRateMinor !== undefined) ? <th className="text-right">Piece rate</th> : null}</tr></thead>
          {sections.map((sec) => (
            <tbody key={sec}>
              <tr><th colSpan={6} className="pt-3 text-left text-xs uppercase tracking-wide text-thread-700">{sec}</th></tr>
              {rows.filter((r) => r.section === sec).map((r) => (
                <tr key={r.id} className="border-b border-calico-100">
                  <td className="py-1 font-mono">{r.code}</td><td>{r.name}</td><td>{r.machineType}</td>
                  <td className="text-right tabular-nums">{r.sam.toFixed(1)}</td><td className="pl-4 font-mono text-xs">{r.predecessors.join(' ')}</td>
                  {r.pieceRateMinor !== undefined ? <td className="text-right tabular-nums">{r.pieceRateMinor == null ? '—' : formatMoney(r.pieceRateMinor, currency)}</td> : null}
                </tr>
              ))}
            </tbody>
          ))}
        </table>
      </div>
    </Card>
  );
}
