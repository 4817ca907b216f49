import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Badge, Card, ErrorNote } from '@/components/ui/page';
import { ApiError, downloadFile } from '@/lib/api-client';
import { formatMoney } from '@/lib/format';
import { batchStyleQueries, cutPlanQueries, fabricQueries, usePlanCut } from '../api/cutting-queries';
import { metres, ratioLabel, SPREADING_LABELS } from './cutting-format';
import { paths } from '@/config/paths';

/** The batch page's cut plan: plan settings, lays with rolls, fabric used against the lower bound. */
export function CutPlanPanel({ batch }: { batch: BatchDto }) {
  const { data: plan } = useQuery(cutPlanQueries.ofBatch(batch.id));
  const { data: fabrics = [] } = useQuery(fabricQueries.list());
  const { data: style } = useQuery({ ...batchStyleQueries.ofStyle(batch.styleId), retry: false });
  const materials = [...new Set(['self', ...Object.keys(style?.materialFabrics ?? {})])];
  const planCut = usePlanCut(batch.id);
  const [form, setForm] = useState({ fabricId: '', maxPlies: '6', maxGarmentsPerMarker: '4', maxMarkerLengthM: '6', overcutPercent: '0' });
  const fields = planCut.error instanceof ApiError ? planCut.error.fields : {};
  const handleSubmit = (e: FormEvent) => {
    e.preventDefault();
    planCut.mutate({
      fabricId: Number(form.fabricId || fabrics[0]?.id), maxPlies: Number(form.maxPlies), maxGarmentsPerMarker: Number(form.maxGarmentsPerMarker),
      maxMarkerLengthMm: form.maxMarkerLengthM ? Number(form.maxMarkerLengthM) * 1000 : undefined, overcutPercent: Number(form.overcutPercent || 0),
    });
  };
  const num = (key: keyof typeof form, label: string, err?: string) => (
    <div>
      <label className="field-label" htmlFor={`cp-${key}`}>{label}</label>
      <input id={`cp-${key}`} className="field-input" type="number" step="any" value={form[key]} onChange={(e) => setForm({ ...form, [key]: e.target.value })} aria-invalid={Boolean(err)} />
      {err ? <p className="field-error">{err}</p> : null}
    </div>
  );
  return (
    <Card title="Cut plan">
      <form onSubmit={handleSubmit} className="grid grid-cols-2 gap-3 sm:grid-cols-6 sm:items-end">
        <div>
          <label className="field-label" htmlFor="cp-fabric">Fabric</label>
          <select id="cp-fabric" className="field-input" value={form.fabricId || String(fabrics[0]?.id ?? '')} onChange={(e) => setForm({ ...form, fabricId: e.target.value })}>
            {fabrics.map((f) => <option key={f.id} value={f.id}>{f.name}</option>)}
          </select>
        </div>
        {num('maxPlies', 'Most plies', fields.maxPlies)}
        {num('maxGarmentsPerMarker', 'Garments per marker', fields.maxGarmentsPerMarker)}
        {num('maxMarkerLengthM', 'Table length (m)', fields.maxMarkerLengthMm)}
        {num('overcutPercent', 'Over-cut allowed (%)', fields.overcutPercent)}
        <button type="submit" className="btn-primary" disabled={planCut.isPending}>{planCut.isPending ? 'Planning…' : 'Plan the cut'}</button>
      </form>
      {planCut.error && !Object.keys(fields).length ? <div className="mt-3"><ErrorNote error={planCut.error} /></div> : null}
      {plan?.lays.some((l) => l.status === 'cut') ? (
        <p className="mt-3 rounded-lg bg-calico-50 px-3 py-2 text-sm">
          Lays already cut stay as they are; planning again covers only the garments still to cut, with the rolls as they are now.
        </p>
      ) : null}
      {plan ? (
        <div className="mt-4 space-y-3">
          <div className="flex flex-wrap gap-3 text-sm" aria-label="Plan figures">
            <span className="rounded-lg bg-calico-50 px-3 py-2">Fabric used <b>{metres(plan.fabricUsedMm)}</b></span>
            <span className="rounded-lg bg-calico-50 px-3 py-2">Lower bound <b>{metres(plan.lowerBoundMm)}</b></span>
            <span className="rounded-lg bg-calico-50 px-3 py-2">Gap <b>{(plan.gap * 100).toFixed(2)} %</b></span>
            <span className="rounded-lg bg-calico-50 px-3 py-2">{plan.lays.length} lays (at least {plan.layLowerBound})</span>
            <Badge tone={plan.method === 'exact' ? 'teal' : 'gold'}>{plan.method === 'exact' ? 'proven best' : `best found, within ${(plan.gap * 100).toFixed(2)} %`}</Badge>
            {plan.rates && plan.costMinor !== null ? <span className="rounded-lg bg-calico-50 px-3 py-2">Cost <b>{formatMoney(plan.costMinor, plan.rates.currency)}</b></span> : null}
          </div>
          <p className="text-xs text-ink-600" aria-label="Plan objective">
            {plan.objective === 'cost'
              ? plan.rates
                ? <>Least total cost: fabric at {formatMoney(plan.rates.fabricCostPerMetreMinor, plan.rates.currency)} a metre, {formatMoney(plan.rates.layCostMinor, plan.rates.currency)} a lay and {formatMoney(plan.rates.plyCostMinor, plan.rates.currency)} a ply ({plan.rates.basis}).</>
                : <>Least total cost of fabric, lays and plies at the studio's rates.</>
              : <>Least fabric, then fewest lays. With a fabric price and a labour cost per minute in the style's costing, the plan weighs fabric against lays.</>}
          </p>
          <p className="text-xs text-ink-600" aria-label="Marker lengths">
            {plan.markerLengths === 'measured'
              ? 'Every marker length is a measured marker.'
              : <>Every marker length is an estimate: piece area ÷ (width × {Math.round(plan.assumedUtilisation * 100)} % assumed utilisation). {plan.markerLengthsNote ?? 'Build the markers to plan on measured lengths.'}</>}
          </p>
          <div role="region" aria-label="Lays of the cut plan" tabIndex={0} className="overflow-x-auto">
            <table className="w-full text-sm">
              <thead className="text-left text-xs text-ink-600"><tr><th className="py-1">Lay</th><th>Sizes per ply</th><th>Plies</th><th>Marker</th><th>Spreading</th><th>Rolls (plies, expected remnant)</th><th>Status</th></tr></thead>
              <tbody>
                {plan.lays.map((l) => (
                  <tr key={l.id} className="border-t border-calico-200 align-top">
                    <td className="py-1 font-semibold">{l.seq}</td><td>{ratioLabel(l.ratio)}</td><td>{l.plies}</td>
                    <td>{metres(l.markerLengthMm)} {l.markerId ? <Badge tone="teal">marker</Badge> : <Badge>estimate</Badge>}</td>
                    <td>{SPREADING_LABELS[l.spreadingMode] ?? l.spreadingMode}</td>
                    <td>{l.rolls.map((r) => <div key={r.rollId}>{r.label} ({r.shadeLot}): {r.plies} plies, {metres(r.expectedRemnantMm)}</div>)}</td>
                    <td><Badge tone={l.status === 'cut' ? 'teal' : 'grey'}>{l.status}</Badge> <Link className="underline" to={paths.lay.getHref(l.id)}>open</Link></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {plan.shortfall.some((s) => s > 0) ? <p role="alert" className="text-sm text-madder-700">Not enough fabric in the chosen rolls: {plan.shortfall.reduce((a, b) => a + b, 0)} plies short.</p> : null}
          {plan.rollRefusals?.length ? (
            <div role="status" className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">
              <p className="font-semibold">Rolls left out because they are narrower than the marker:</p>
              <ul className="list-disc pl-5">{plan.rollRefusals.map((m) => <li key={m}>{m}</li>)}</ul>
            </div>
          ) : null}
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/marker-list.xlsx`, `marker-list-${batch.code}.xlsx`)}>Marker list per roll (XLSX)</button>
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/marker-list.pdf`, `marker-list-${batch.code}.pdf`)}>Marker list per roll (PDF)</button>
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/bundle-register.xlsx`, `bundle-register-${batch.code}.xlsx`)}>Bundle register (XLSX)</button>
          </div>
        </div>
      ) : <p className="mt-3 text-sm text-ink-600">No cut plan yet.</p>}
      <div className="mt-3 flex flex-wrap items-center gap-2" data-testid="material-cut-tickets">
        <span className="text-sm text-ink-600">Cut ticket for each material (pieces, sizes and copies to cut):</span>
        {materials.map((m) => (
          <button key={m} type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/material-cut-ticket.pdf?material=${encodeURIComponent(m)}`, `cut-ticket-${batch.code}-${m}.pdf`)}>{m} (PDF)</button>
        ))}
      </div>
    </Card>
  );
}
