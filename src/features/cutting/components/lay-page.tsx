import { useQuery } from '@tanstack/react-query';
import { fmt, formatDateTime } from '@/lib/format';
import { useEffect, useState } from 'react';
import { useParams } from 'react-router';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { ApiError, downloadFile } from '@/lib/api-client';
import { layQueries, useCutLay, useRecordLay } from '../api/cutting-queries';
import { CuttingCautions } from './cutting-cautions';
import { metres, ratioLabel, SPREADING_LABELS } from './cutting-format';
import { ConfirmButton } from '@/components/ui/confirm-button';

type Actual = { actualPlies: string; actualRemnantM: string; note: string };

export function LayPage() {
  const id = Number(useParams().id);
  const { data, isLoading } = useQuery(layQueries.detail(id));
  const record = useRecordLay(id);
  const cut = useCutLay(id);
  const [actual, setActual] = useState<Record<number, Actual>>({});
  const [flaws, setFlaws] = useState('');
  const [local, setLocal] = useState<Record<string, string>>({});
  useEffect(() => {
    if (!data) return;
    // Empty until the cutter types what was spread and measured: a pre-filled plan would be saved as fact.
    setActual(Object.fromEntries(data.lay.rolls.map((r) => [r.rollId, {
      actualPlies: r.actualPlies == null ? '' : String(r.actualPlies),
      actualRemnantM: r.actualRemnantMm == null ? '' : (r.actualRemnantMm / 1000).toFixed(2),
      note: r.note ?? '',
    }])));
    setFlaws(data.lay.flaws);
  }, [data]);
  if (isLoading || !data) return <Spinner />;
  const { lay, fabric, bundles } = data;
  const typed = (v: string | undefined) => v !== undefined && v.trim() !== '';
  const isTyped = (rollId: number) => typed(actual[rollId]?.actualPlies) && typed(actual[rollId]?.actualRemnantM);
  /** Rows typed in full; marking the lay cut needs every row, saving needs at least one. */
  const body = (everyRow: boolean) => {
    const missing: Record<string, string> = {};
    lay.rolls.forEach((r, i) => {
      if (!everyRow && !typed(actual[r.rollId]?.actualPlies) && !typed(actual[r.rollId]?.actualRemnantM)) return;
      if (!typed(actual[r.rollId]?.actualPlies)) missing[`rolls.${i}.actualPlies`] = 'Enter the plies spread';
      if (!typed(actual[r.rollId]?.actualRemnantM)) missing[`rolls.${i}.actualRemnantMm`] = 'Measure and enter the remnant';
    });
    const rows = lay.rolls.filter((r) => isTyped(r.rollId));
    if (!rows.length && !Object.keys(missing).length) missing['rolls.0.actualPlies'] = 'Enter the plies spread';
    setLocal(missing);
    if (Object.keys(missing).length) return null;
    return {
      rolls: rows.map((r) => ({ rollId: r.rollId, actualPlies: Number(actual[r.rollId].actualPlies), actualRemnantMm: Math.round(Number(actual[r.rollId].actualRemnantM) * 1000), note: actual[r.rollId]?.note || undefined })),
      flaws,
    };
  };
  const server = (record.error ?? cut.error) instanceof ApiError ? ((record.error ?? cut.error) as ApiError).fields ?? {} : {};
  const fields: Record<string, string> = { ...server, ...local };
  const isCut = lay.status === 'cut';
  const retired = lay.status === 'retired';
  const readOnly = isCut || retired;
  const spreadPlies = lay.rolls.reduce((a, r) => a + (Number(actual[r.rollId]?.actualPlies) || 0), 0);
  const file = (url: string, name: string) => () => downloadFile(url, name);
  return (
    <>
      <PageHeader
        title={`${lay.batchCode} · Lay ${lay.seq}`}
        subtitle={<>{ratioLabel(lay.ratio)} per ply · {lay.plies} plies · <Badge tone={isCut ? 'teal' : retired ? 'gold' : 'grey'}>{lay.status}</Badge></>}
        actions={<button type="button" className="btn-quiet" onClick={() => window.print()}>Print</button>}
      />
      <div className="space-y-5">
        {retired ? (
          <p role="status" className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">
            This lay was retired when the batch was planned again: do not spread or cut it. The batch's current cut plan lists the lays to cut.
          </p>
        ) : null}
        {lay.shortage && !readOnly ? (
          <p role="alert" className="rounded-lg bg-madder-100 px-3 py-2 text-sm text-madder-700">
            {lay.shortage.message} Tell the owner before spreading.
          </p>
        ) : null}
        <Card title="Marker">
          <dl className="mb-3 grid grid-cols-2 gap-2 text-sm sm:grid-cols-4">
            <div><dt className="text-xs text-ink-600">Marker length</dt><dd className="font-semibold">{metres(lay.markerLengthMm)}</dd></div>
            <div><dt className="text-xs text-ink-600">End allowance</dt><dd className="font-semibold">{fmt().smallLength(lay.endAllowanceMm / 2)} each end</dd></div>
            <div><dt className="text-xs text-ink-600">Spreading</dt><dd className="font-semibold">{SPREADING_LABELS[lay.spreadingMode] ?? lay.spreadingMode}</dd></div>
            <div><dt className="text-xs text-ink-600">Fabric</dt><dd className="font-semibold">{fabric ? `${fabric.name}, ${Math.round(fabric.widthMm / 10)} cm` : '—'}</dd></div>
          </dl>
          <p className="mb-2 text-xs text-ink-600">
            {fabric?.isDirectional ? 'One-way fabric: every ply face up, all running the same way.' : 'Face up; the marker already holds the left and right of every pair, so plies may run both ways.'}
          </p>
          {lay.markerId ? <img src={`/api/markers/${lay.markerId}/svg`} alt={`Marker of lay ${lay.seq}`} className="w-full rounded-lg border border-calico-200 bg-calico-50" /> : <p className="text-sm text-ink-600">No drawn marker stored for this ratio yet; the length is the plan's estimate.</p>}
        </Card>
        <Card title="Marker list per roll">
          <div tabIndex={0} className="overflow-x-auto">
            <table className="w-full text-sm">
              <thead className="text-left text-xs text-ink-600"><tr><th className="py-1">Roll</th><th>Shade lot</th><th>Plies to spread</th><th>Expected remnant</th><th>Plies spread</th><th>Remnant left (m)</th><th>Note</th></tr></thead>
              <tbody>
                {lay.rolls.map((r, i) => (
                  <tr key={r.rollId} className="border-t border-calico-200">
                    <td className="py-1 font-semibold">{r.label}</td><td>{r.shadeLot}</td><td>{r.plies}</td><td>{metres(r.expectedRemnantMm)}</td>
                    <td><input aria-label={`Plies spread from ${r.label}`} className="field-input w-20" type="number" disabled={readOnly} value={actual[r.rollId]?.actualPlies ?? ''} onChange={(e) => setActual({ ...actual, [r.rollId]: { ...actual[r.rollId], actualPlies: e.target.value } })} />
                      {fields[`rolls.${i}.actualPlies`] ? <p className="field-error">{fields[`rolls.${i}.actualPlies`]}</p> : null}</td>
                    <td><input aria-label={`Remnant left on ${r.label}`} className="field-input w-24" type="number" step="0.01" disabled={readOnly} value={actual[r.rollId]?.actualRemnantM ?? ''} onChange={(e) => setActual({ ...actual, [r.rollId]: { ...actual[r.rollId], actualRemnantM: e.target.value } })} />
                      {fields[`rolls.${i}.actualRemnantMm`] ? <p className="field-error">{fields[`rolls.${i}.actualRemnantMm`]}</p> : null}</td>
                    <td><input aria-label={`Note on ${r.label}`} className="field-input" disabled={readOnly} value={actual[r.rollId]?.note ?? ''} onChange={(e) => setActual({ ...actual, [r.rollId]: { ...actual[r.rollId], note: e.target.value } })} /></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="mt-2 text-sm">Plies spread: <b>{spreadPlies}</b> of {lay.plies}{fabric && lay.plies > fabric.maxPlies ? ' · above this fabric’s ply limit' : ''}</p>
          <div className="mt-3">
            <label className="field-label" htmlFor="lay-flaws">Flaws and shortages</label>
            <textarea id="lay-flaws" className="field-input" rows={2} disabled={readOnly} value={flaws} onChange={(e) => setFlaws(e.target.value)} />
          </div>
          {!readOnly ? (
            <div className="mt-3 flex flex-wrap gap-2">
              <button type="button" className="btn-quiet" disabled={record.isPending} onClick={() => { const b = body(false); if (b) record.mutate(b); }}>Save what was spread</button>
              <ConfirmButton
                label="Mark lay cut"
                question={`Mark lay ${lay.seq} cut? The plies and remnants entered become the roll stock and the bundles are made.`}
                confirmLabel="Yes, mark it cut"
                disabled={cut.isPending}
                onConfirm={() => { const b = body(true); if (b) cut.mutate(b); }}
              />
            </div>
          ) : retired ? null : <p className="mt-3 text-sm text-thread-800">Cut {lay.cutAt ? formatDateTime(lay.cutAt) : ''} · {bundles.length} bundles.</p>}
          {record.isSuccess && !isCut ? <p className="mt-2 text-sm text-thread-800">Saved.</p> : null}
          {(record.error || cut.error) && !Object.keys(server).length ? <div className="mt-2"><ErrorNote error={record.error ?? cut.error} /></div> : null}
        </Card>
        {bundles.length ? (
          <Card title="Bundles">
            <ul className="grid grid-cols-2 gap-2 text-sm sm:grid-cols-4">
              {bundles.map((b) => <li key={b.id} className="rounded-lg border border-calico-200 px-2 py-1">No. {b.number} · {b.size} · {b.shadeLot} · plies {b.plyFrom}–{b.plyTo}</li>)}
            </ul>
          </Card>
        ) : null}
        {retired ? null : <Card title="Documents">
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/cut-ticket.pdf`, `cut-ticket-lay-${lay.seq}.pdf`)}>Cut ticket (PDF)</button>
            <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/marker-list.xlsx`, `marker-list-lay-${lay.seq}.xlsx`)}>Marker list per roll (XLSX)</button>
            <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/marker-list.pdf`, `marker-list-lay-${lay.seq}.pdf`)}>Marker list per roll (PDF)</button>
            {bundles.length ? <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/bundle-tickets.pdf`, `bundle-tickets-lay-${lay.seq}.pdf`)}>Bundle tickets (PDF)</button> : null}
            {bundles.length ? <button type="button" className="btn-quiet" onClick={file(`/batches/${lay.batchId}/bundle-register.xlsx`, `bundle-register-${lay.batchCode}.xlsx`)}>Bundle register (XLSX)</button> : null}
          </div>
        </Card>}
        <CuttingCautions />
      </div>
    </>
  );
}
