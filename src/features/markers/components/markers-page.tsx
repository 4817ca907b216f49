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
import { area } from '../words';

// recharts loads with the first run that has points to draw, not with the page.
const MarkerProgressChart = lazy(async () => ({ default: (await import('./marker-progress-chart')).MarkerProgressChart }));

const m = (mm: number | null) => (mm === null ? '—' : fmt().fabricLength(mm));
const tone = { queued: 'grey', running: 'blue', done: 'teal', failed: 'red', cancelled: 'gold' } as const;

function MarkerView({ id, sizes }: { id: number; sizes: string[] }) {
  const { data: marker } = useQuery(markerQueries.detail(id));
  const cancel = useCancelMarker();
  const canWrite = useCan('markers:write');
  const { t } = useTranslation();
  if (!marker) return <Spinner />;
  const isLive = marker.status === 'queued' || marker.status === 'running';
  const pct = marker.budgetSeconds ? Math.min(100, (marker.elapsedMs / (marker.budgetSeconds * 1000)) * 100) : 0;
  return (
    <Card title={`Marker ${ratioText(marker.ratio, sizes)}`}>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <Badge tone={tone[marker.status]}>{marker.status}</Badge>
        <span>Best length <b data-testid="marker-length">{m(marker.lengthMm)}</b></span>
        <span>Elapsed <b>{(marker.elapsedMs / 1000).toFixed(1)} s</b> of {marker.budgetSeconds} s{marker.cores > 0 ? ` ${t(`${area}.cores`, { count: marker.cores })}` : ''}</span>
        {marker.utilisation !== null && !isLive ? <span>Utilisation <b data-testid="marker-utilisation">{(marker.utilisation * 100).toFixed(1)} %</b></span> : null}
        {marker.lengthPerGarmentMm ? <span>{m(marker.lengthPerGarmentMm)} per garment</span> : null}
        <span>{marker.pieceCount} pieces · width {Math.round(marker.widthMm / 10)} cm</span>
      </div>
      {isLive ? (
        <div className="mt-3">
          <div role="progressbar" aria-label="Marker progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(pct)} className="h-3 w-full overflow-hidden rounded-full bg-calico-200">
            <div className="h-full bg-thread-700 transition-all" style={{ width: `${marker.status === 'queued' ? 2 : Math.max(4, pct)}%` }} />
          </div>
          <p className="mt-1 text-xs text-ink-600">{marker.status === 'queued' ? 'Waiting for the nesting queue…' : 'Nesting: the strip is shortened while pieces are moved apart.'}</p>
          {canWrite ? <button type="button" className="btn-quiet mt-2" onClick={() => cancel.mutate(marker.id)}>Stop</button> : null}
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
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/markers/${marker.id}/svg`, `${markerFileName(marker)}.svg`)}>Download SVG</button>
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/markers/${marker.id}/dxf`, `${markerFileName(marker)}.dxf`)}>Plotter file (DXF, 1:1)</button>
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/markers/${marker.id}/plot.pdf`, `${markerFileName(marker)}.pdf`)}>Plotter PDF (1:1, marker width)</button>
          </div>
        </div>
      ) : null}
    </Card>
  );
}

function StartForm({ batch, fabrics, plan, sizes, onStarted }: { batch: BatchDto; fabrics: FabricDto[]; plan: CutPlanDto | null; sizes: string[]; onStarted: (m: MarkerDto) => void }) {
  const start = useStartMarker();
  const [ratio, setRatio] = useState<Record<string, number>>(() => Object.fromEntries(sizes.map((s) => [s, 0])));
  const [fabricId, setFabricId] = useState<number | undefined>(fabrics[0]?.id);
  const [seconds, setSeconds] = useState('');
  const fields = start.error instanceof ApiError ? start.error.fields : {};
  return (
    <Card title={`New marker for ${batch.code}`}>
      {plan ? (
        <div className="mb-3 flex flex-wrap gap-2 text-sm">
          <span className="text-ink-600">Ratios of the cut plan:</span>
          {plan.lays.map((l) => (
            <button type="button" key={l.id} className="btn-quiet" onClick={() => setRatio({ ...Object.fromEntries(sizes.map((s) => [s, 0])), ...l.ratio })}>Lay {l.seq}: {ratioText(l.ratio, sizes)}</button>
          ))}
        </div>
      ) : null}
      <div className="grid grid-cols-3 gap-3 sm:grid-cols-8 sm:items-end">
        {sizes.map((s) => (
          <div key={s}>
            <label className="field-label" htmlFor={`ratio-${s}`}>{s}</label>
            <input id={`ratio-${s}`} aria-label={`Garments of size ${s}`} className="field-input" type="number" min={0} value={ratio[s] ?? 0} onChange={(e) => setRatio({ ...ratio, [s]: Number(e.target.value) })} />
          </div>
        ))}
        <div className="col-span-2">
          <label className="field-label" htmlFor="marker-fabric">Fabric</label>
          <select id="marker-fabric" className="field-input" value={fabricId} onChange={(e) => setFabricId(Number(e.target.value))}>
            {fabrics.map((f) => <option key={f.id} value={f.id}>{f.name} ({Math.round(f.widthMm / 10)} cm{f.isDirectional ? ', one way' : ''})</option>)}
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="marker-seconds">Seconds</label>
          <input id="marker-seconds" className="field-input" type="number" placeholder="server default" value={seconds} onChange={(e) => setSeconds(e.target.value)} />
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
        Start marker
      </button>
    </Card>
  );
}

export function MarkersPage() {
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
  if (!batch) return <PageHeader title="Markers" subtitle="No batch yet." />;
  const sizes = Object.keys(batch.quantities);
  const shown = openId ?? markers[0]?.id ?? null;
  return (
    <>
      <PageHeader title="Markers" subtitle="Graded pieces packed across the fabric width; shorter markers use less fabric." />
      <div className="mb-4 max-w-xs">
        <label className="field-label" htmlFor="marker-batch">Batch</label>
        <select id="marker-batch" className="field-input" value={batch.id} onChange={(e) => setBatchId(Number(e.target.value))}>
          {batches.map((b) => <option key={b.id} value={b.id}>{b.code} · {b.styleName} ({b.total})</option>)}
        </select>
      </div>
      <div className="space-y-5">
        {canWrite ? <StartForm key={batch.id} batch={batch} fabrics={fabrics} plan={plan} sizes={sizes} onStarted={(mk) => setOpenId(mk.id)} /> : null}
        {shown !== null ? <MarkerView id={shown} sizes={sizes} /> : null}
        <Card title="Markers of this batch">
          {markers.length === 0 ? <p className="text-sm text-ink-600">None yet.</p> : null}
          <ul className="divide-y divide-calico-200 text-sm">
            {markers.map((mk) => (
              <li key={mk.id} className="flex flex-wrap items-center gap-3 py-2">
                <button type="button" className="underline" onClick={() => setOpenId(mk.id)}>{ratioText(mk.ratio, sizes)}</button>
                <Badge tone={tone[mk.status]}>{mk.status}</Badge>
                <span>{m(mk.lengthMm)}</span>
                {mk.utilisation !== null ? <span>{(mk.utilisation * 100).toFixed(1)} %</span> : null}
              </li>
            ))}
          </ul>
        </Card>
      </div>
    </>
  );
}

/** The batch goes in every marker file name, as the server names them. */
const markerFileName = (m: { id: number; batchId: number | null }) => `marker-${m.batchId ? `B-${String(m.batchId).padStart(4, '0')}-` : ''}${m.id}`;
