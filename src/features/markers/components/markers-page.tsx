import { useQuery } from '@tanstack/react-query';
import { fmt } from '@/lib/format';
import { lazy, Suspense, useEffect, useState } from 'react';
import type { BatchDto } from '@shared/schemas/batches';
import type { FabricDto } from '@shared/schemas/cutting';
import type { CutPlanDto } from '@shared/schemas/cutting';
import { ratioText, type MarkerDto } from '@shared/schemas/markers';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { api, ApiError, downloadFile } from '@/lib/api-client';
import { useCan } from '@/lib/auth';
import { batchQueries, fabricQueries } from '@/lib/queries';
import { markerQueries, useCancelMarker, useStartMarker } from '../api/marker-queries';
import { useTranslation } from '@/lib/i18n';
import { MarkerDrawing } from './marker-drawing';
import { Trans } from 'react-i18next';
import { i18n } from '@/lib/i18n';
import { area } from '../words';
import { markerFabricId } from './marker-defaults';

// recharts loads with the first run that has points to draw, not with the page.
const MarkerProgressChart = lazy(async () => ({ default: (await import('./marker-progress-chart')).MarkerProgressChart }));

const m = (mm: number | null) => (mm === null ? '—' : fmt().fabricLength(mm));
const tone = { queued: 'grey', running: 'blue', done: 'teal', failed: 'red', cancelled: 'gold' } as const;
const w = (key: string, values?: Record<string, unknown>) => i18n.t(`${area}.${key}`, values);
const b = { b: <b /> };

function MarkerView({ id, sizes, batchCode }: { id: number; sizes: string[]; batchCode: string }) {
  const { data: marker } = useQuery(markerQueries.detail(id));
  const cancel = useCancelMarker();
  const canWrite = useCan('markers:write');
  const { t } = useTranslation();
  if (!marker) return <Spinner />;
  const isLive = marker.status === 'queued' || marker.status === 'running';
  const pct = marker.budgetSeconds ? Math.min(100, (marker.elapsedMs / (marker.budgetSeconds * 1000)) * 100) : 0;
  return (
    <Card title={w('view.title', { ratio: ratioText(marker.ratio, sizes) })}>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <Badge tone={tone[marker.status]}>{w(`status.${marker.status}`)}</Badge>
        <span><Trans i18nKey={`${area}.view.best`} values={{ length: m(marker.lengthMm) }} components={{ b: <b data-testid="marker-length" /> }} /></span>
        <span><Trans i18nKey={`${area}.view.elapsed`} values={{ elapsed: fmt().number(marker.elapsedMs / 1000, 1), budget: fmt().number(marker.budgetSeconds) }} components={b} />{marker.cores > 0 ? ` ${t(`${area}.cores`, { count: marker.cores })}` : ''}</span>
        {marker.utilisation !== null && !isLive ? <span><Trans i18nKey={`${area}.view.utilisation`} values={{ percent: fmt().percent(marker.utilisation * 100) }} components={{ b: <b data-testid="marker-utilisation" /> }} /></span> : null}
        {marker.lengthPerGarmentMm ? <span>{w('view.perGarment', { length: m(marker.lengthPerGarmentMm) })}</span> : null}
        <span>{w('view.facts', { count: marker.pieceCount, width: fmt().fabricWidth(marker.widthMm) })}</span>
      </div>
      {isLive ? (
        <div className="mt-3">
          <div role="progressbar" aria-label={w('view.progress')} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(pct)} className="h-3 w-full overflow-hidden rounded-full bg-calico-200">
            <div className="h-full bg-thread-700 transition-all" style={{ width: `${marker.status === 'queued' ? 2 : Math.max(4, pct)}%` }} />
          </div>
          <p className="mt-1 text-xs text-ink-600">{marker.status === 'queued' ? w('view.waiting') : w('view.nesting')}</p>
          {canWrite ? <button type="button" className="btn-quiet mt-2" onClick={() => cancel.mutate(marker.id)}>{w('view.stop')}</button> : null}
        </div>
      ) : null}
      {marker.progress.length > 0 ? (
        <Suspense fallback={<div className="mt-3 h-48" />}>
          <MarkerProgressChart points={marker.progress} />
        </Suspense>
      ) : isLive && marker.status === 'running' ? (
        <p className="mt-2 text-xs text-ink-600">{t(`${area}.noPointsYet`)}</p>
      ) : null}
      {marker.error ? <p className={`mt-2 text-sm ${marker.status === 'failed' ? 'text-madder-700' : 'text-ink-600'}`}>{marker.error}</p> : null}
      {marker.drawing && marker.lengthMm ? (
        <div className="mt-3 space-y-2">
          <MarkerDrawing drawing={marker.drawing} lengthMm={marker.lengthMm} widthMm={marker.widthMm} sizes={sizes} />
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/markers/${marker.id}/svg`, `${markerFileName(marker, batchCode)}.svg`)}>{w('view.svg')}</button>
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/markers/${marker.id}/dxf`, `${markerFileName(marker, batchCode)}.dxf`)}>{w('view.dxf')}</button>
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/markers/${marker.id}/plot.pdf`, `${markerFileName(marker, batchCode)}.pdf`)}>{w('view.pdf')}</button>
          </div>
        </div>
      ) : null}
    </Card>
  );
}

function StartForm({ batch, fabrics, plan, sizes, onStarted }: { batch: BatchDto; fabrics: FabricDto[]; plan: CutPlanDto | null; sizes: string[]; onStarted: (m: MarkerDto) => void }) {
  useTranslation();
  const start = useStartMarker();
  const [ratio, setRatio] = useState<Record<string, number>>(() => Object.fromEntries(sizes.map((s) => [s, 0])));
  const [picked, setFabricId] = useState<number | undefined>();
  // Until the owner picks one, the plan's fabric (the plan may arrive after the form).
  const fabricId = picked ?? markerFabricId(plan?.fabricId, fabrics.map((f) => f.id));
  const [seconds, setSeconds] = useState('');
  const fields = start.error instanceof ApiError ? start.error.fields : {};
  return (
    <Card title={w('start.title', { batch: batch.code })}>
      {plan ? (
        <div className="mb-3 flex flex-wrap gap-2 text-sm">
          <span className="text-ink-600">{w('start.ratios')}</span>
          {plan.lays.map((l) => (
            <button type="button" key={l.id} className="btn-quiet" onClick={() => { setRatio({ ...Object.fromEntries(sizes.map((s) => [s, 0])), ...l.ratio }); setFabricId(markerFabricId(plan.fabricId, fabrics.map((f) => f.id))); }}>{w('start.lay', { seq: l.seq, ratio: ratioText(l.ratio, sizes) })}</button>
          ))}
        </div>
      ) : null}
      <div className="grid grid-cols-3 gap-3 sm:grid-cols-8 sm:items-end">
        {sizes.map((s) => (
          <div key={s}>
            <label className="field-label" htmlFor={`ratio-${s}`}>{s}</label>
            <input id={`ratio-${s}`} aria-label={w('start.garmentsOf', { size: s })} className="field-input" type="number" min={0} value={ratio[s] ?? 0} onChange={(e) => setRatio({ ...ratio, [s]: Number(e.target.value) })} />
          </div>
        ))}
        <div className="col-span-2">
          <label className="field-label" htmlFor="marker-fabric">{w('start.fabric')}</label>
          <select id="marker-fabric" className="field-input" value={fabricId} onChange={(e) => setFabricId(Number(e.target.value))}>
            {fabrics.map((f) => <option key={f.id} value={f.id}>{w(f.isDirectional ? 'start.fabricOptionOneWay' : 'start.fabricOption', { name: f.name, width: fmt().fabricWidth(f.widthMm) })}</option>)}
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="marker-seconds">{w('start.seconds')}</label>
          <input id="marker-seconds" className="field-input" type="number" placeholder={w('start.serverDefault')} value={seconds} onChange={(e) => setSeconds(e.target.value)} />
        </div>
      </div>
      {fields.ratio ? <p className="field-error">{fields.ratio}</p> : null}
      {start.error && !Object.keys(fields).length ? <div className="mt-2"><ErrorNote error={start.error} /></div> : null}
      <button
        type="button"
        className="btn-primary mt-3"
        disabled={start.isPending || !fabricId}
        onClick={() => start.mutate({ styleId: batch.styleId, batchId: batch.id, fabricId: fabricId!, ratio, seconds: seconds ? Number(seconds) : undefined }, { onSuccess: (r) => onStarted(r.marker) })}
      >
        {w('start.start')}
      </button>
    </Card>
  );
}

export function MarkersPage() {
  useTranslation();
  const { data: batches } = useQuery(batchQueries.list());
  const { data: fabrics } = useQuery(fabricQueries.list());
  const [batchId, setBatchId] = useState<number | undefined>();
  const batch = batches?.find((b) => b.id === batchId) ?? batches?.[0];
  const { data: plan = null } = useQuery({ queryKey: ['cut-plans', 'batch', batch?.id ?? 0], enabled: Boolean(batch), queryFn: async () => (await api.get<{ cutPlan: CutPlanDto | null }>(`/batches/${batch!.id}/cut-plan`)).cutPlan });
  const { data: markers = [] } = useQuery({ ...markerQueries.list({ batchId: batch?.id }), enabled: Boolean(batch) });
  const [openId, setOpenId] = useState<number | null>(null);
  useEffect(() => setOpenId(null), [batch?.id]);
  const canWrite = useCan('markers:write');
  if (!batches || !fabrics) return <Spinner />;
  if (!batch) return <PageHeader title={w('title')} subtitle={w('noBatch')} />;
  const sizes = Object.keys(batch.quantities);
  const shown = openId ?? markers[0]?.id ?? null;
  return (
    <>
      <PageHeader title={w('title')} subtitle={w('subtitle')} />
      <div className="mb-4 max-w-xs">
        <label className="field-label" htmlFor="marker-batch">{w('batch')}</label>
        <select id="marker-batch" className="field-input" value={batch.id} onChange={(e) => setBatchId(Number(e.target.value))}>
          {batches.map((b) => <option key={b.id} value={b.id}>{b.code} · {b.styleName} ({b.total})</option>)}
        </select>
      </div>
      <div className="space-y-5">
        {canWrite ? <StartForm key={batch.id} batch={batch} fabrics={fabrics} plan={plan} sizes={sizes} onStarted={(mk) => setOpenId(mk.id)} /> : null}
        {shown !== null ? <MarkerView id={shown} sizes={sizes} batchCode={batch.code} /> : null}
        <Card title={w('ofBatch')}>
          {markers.length === 0 ? <p className="text-sm text-ink-600">{w('none')}</p> : null}
          <ul className="divide-y divide-calico-200 text-sm">
            {markers.map((mk) => (
              <li key={mk.id} className="flex flex-wrap items-center gap-3 py-2">
                <button type="button" className="underline" onClick={() => setOpenId(mk.id)}>{ratioText(mk.ratio, sizes)}</button>
                <Badge tone={tone[mk.status]}>{w(`status.${mk.status}`)}</Badge>
                <span>{m(mk.lengthMm)}</span>
                {mk.utilisation !== null ? <span>{fmt().percent(mk.utilisation * 100)}</span> : null}
              </li>
            ))}
          </ul>
        </Card>
      </div>
    </>
  );
}

/** The batch goes in every marker file name, as the server names them: its code in the studio (the markers listed are the batch's own). */
const markerFileName = (m: { id: number; batchId: number | null }, batchCode: string) => `marker-${m.batchId ? `${batchCode}-` : ''}${m.id}`;
