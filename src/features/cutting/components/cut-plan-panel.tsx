import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Badge, Card, ErrorNote } from '@/components/ui/page';
import { ApiError, downloadFile } from '@/lib/api-client';
import { fmt, formatMoney } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { batchStyleQueries, cutPlanQueries, fabricQueries, usePlanCut } from '../api/cutting-queries';
import { area } from '../words';
import { cutPlanFabricId, metres, MM_PER_YARD, ratioLabel, SPREADING_LABELS } from './cutting-format';
import { paths } from '@/config/paths';
import { FieldError } from '@/components/ui/form';

/** The batch page's cut plan: plan settings, lays with rolls, fabric used against the lower bound. */
export function CutPlanPanel({ batch }: { batch: BatchDto }) {
  const { t } = useTranslation();
  const f = fmt();
  const imperial = f.settings.unitSystem === 'imperial';
  /** The table length is typed in metres, or in yards in an imperial studio. */
  const mmPerTable = imperial ? MM_PER_YARD : 1000;
  // Which fabric's plan is shown: the main plan until a fabric is picked (a lining has a plan of its own).
  const [shown, setShown] = useState<number | undefined>(undefined);
  const { data: plan } = useQuery(cutPlanQueries.ofBatch(batch.id, shown));
  const { data: mainPlan } = useQuery(cutPlanQueries.ofBatch(batch.id));
  const { data: fabrics = [] } = useQuery(fabricQueries.list());
  const { data: style } = useQuery({ ...batchStyleQueries.ofStyle(batch.styleId), retry: false });
  const materials = [...new Set(['self', ...Object.keys(style?.materialFabrics ?? {})])];
  const planCut = usePlanCut(batch.id);
  // Typed as text in the studio's own way of writing numbers (6,5 in French); read back with either mark.
  const [form, setForm] = useState({ fabricId: '', maxPlies: '6', maxGarmentsPerMarker: '4', maxMarkerLengthM: f.number(imperial ? 6.5 : 6), overcutPercent: '0' });
  const toNumber = (v: string) => Number(v.trim().replace(/\s/g, '').replace(',', '.'));
  const fabricId = form.fabricId || String(shown ?? cutPlanFabricId(plan?.fabricId, style?.materialFabrics?.self, fabrics.map((x) => x.id)) ?? '');
  const pickFabric = (id: string) => {
    setForm({ ...form, fabricId: id });
    setShown(id ? Number(id) : undefined);
  };
  const livePlans = mainPlan?.plans ?? [];
  const shownFabricName = fabrics.find((x) => x.id === Number(fabricId))?.name ?? '';
  const fabricQuery = plan?.material ? `?fabricId=${plan.fabricId}` : '';
  const fields = planCut.error instanceof ApiError ? planCut.error.fields : {};
  // The server refuses to drop another fabric's plan unasked (409 on fabricId); replacing it is a second, explicit press.
  const canReplace = planCut.error instanceof ApiError && planCut.error.status === 409 && Boolean(fields.fabricId) && !plan?.lays.some((l) => l.status === 'cut');
  const submit = (replacePlan: boolean) => {
    setShown(Number(fabricId));
    planCut.mutate({
      ...(replacePlan ? { replacePlan } : {}),
      fabricId: Number(fabricId), maxPlies: toNumber(form.maxPlies), maxGarmentsPerMarker: toNumber(form.maxGarmentsPerMarker),
      maxMarkerLengthMm: form.maxMarkerLengthM ? Math.round(toNumber(form.maxMarkerLengthM) * mmPerTable) : undefined, overcutPercent: toNumber(form.overcutPercent || '0'),
    });
  };
  const handleSubmit = (e: FormEvent) => {
    e.preventDefault();
    submit(false);
  };
  const num = (key: keyof typeof form, label: string, err?: string) => (
    <div>
      <label className="field-label" htmlFor={`cp-${key}`}>{label}</label>
      <input id={`cp-${key}`} className="field-input" inputMode="decimal" value={form[key]} onChange={(e) => setForm({ ...form, [key]: e.target.value })} aria-invalid={Boolean(err)} />
      {err ? <FieldError>{err}</FieldError> : null}
    </div>
  );
  return (
    <Card title={t(`${area}.plan.title`)}>
      <form onSubmit={handleSubmit} className="grid grid-cols-2 gap-3 sm:grid-cols-6 sm:items-end">
        <div>
          <label className="field-label" htmlFor="cp-fabric">{t(`${area}.plan.fabric`)}</label>
          <select id="cp-fabric" className="field-input" value={fabricId} onChange={(e) => pickFabric(e.target.value)}>
            {fabrics.map((f) => <option key={f.id} value={f.id}>{f.name}</option>)}
          </select>
          {fields.fabricId ? <FieldError>{fields.fabricId}</FieldError> : null}
        </div>
        {num('maxPlies', t(`${area}.plan.maxPlies`), fields.maxPlies)}
        {num('maxGarmentsPerMarker', t(`${area}.plan.garmentsPerMarker`), fields.maxGarmentsPerMarker)}
        {num('maxMarkerLengthM', t(`${area}.plan.tableLength`, { unit: f.fabricLengthUnit }), fields.maxMarkerLengthMm)}
        {num('overcutPercent', t(`${area}.plan.overcut`), fields.overcutPercent)}
        <button type="submit" className="btn-primary" disabled={planCut.isPending}>{planCut.isPending ? t(`${area}.plan.planning`) : t(`${area}.plan.plan`)}</button>
      </form>
      {planCut.error && (!Object.keys(fields).length || fields.fabricId) ? <div className="mt-3"><ErrorNote error={planCut.error} /></div> : null}
      {canReplace ? (
        <button type="button" className="btn-quiet mt-2" disabled={planCut.isPending} onClick={() => submit(true)}>{t(`${area}.plan.replace`)}</button>
      ) : null}
      {livePlans.length > 1 ? (
        <nav className="mt-3 flex flex-wrap items-center gap-2 text-sm" aria-label={t(`${area}.plan.plansFor`)}>
          <span className="text-ink-600">{t(`${area}.plan.plansFor`)}</span>
          {livePlans.map((p) => (
            <button
              key={p.fabricId}
              type="button"
              className={p.fabricId === plan?.fabricId ? 'btn-primary px-2 py-1 text-xs' : 'btn-quiet px-2 py-1 text-xs'}
              aria-current={p.fabricId === plan?.fabricId ? 'true' : undefined}
              onClick={() => pickFabric(String(p.fabricId))}
            >
              {t(`${area}.plan.${p.material ? 'materialPlan' : 'mainPlan'}`, { fabric: p.fabricName })}
            </button>
          ))}
        </nav>
      ) : null}
      {plan?.material ? <p className="mt-3 rounded-lg bg-calico-50 px-3 py-2 text-sm">{t(`${area}.plan.materialNote`)}</p> : null}
      {plan?.lays.some((l) => l.status === 'cut') ? (
        <p className="mt-3 rounded-lg bg-calico-50 px-3 py-2 text-sm">
          {t(`${area}.plan.alreadyCut`)}
        </p>
      ) : null}
      {plan ? (
        <div className="mt-4 space-y-3">
          <div className="flex flex-wrap gap-3 text-sm" aria-label={t(`${area}.plan.figures`)}>
            <span className="rounded-lg bg-calico-50 px-3 py-2">{t(`${area}.plan.fabricUsed`)} <b>{metres(plan.fabricUsedMm)}</b></span>
            <span className="rounded-lg bg-calico-50 px-3 py-2">{t(`${area}.plan.lowerBound`)} <b>{metres(plan.lowerBoundMm)}</b></span>
            <span className="rounded-lg bg-calico-50 px-3 py-2">{t(`${area}.plan.gap`)} <b>{f.percent(plan.gap * 100, 2)}</b></span>
            <span className="rounded-lg bg-calico-50 px-3 py-2">{t(`${area}.plan.lays`, { count: plan.lays.length, min: plan.layLowerBound })}</span>
            <Badge tone={plan.method === 'exact' ? 'teal' : 'gold'}>{plan.method === 'exact' ? t(`${area}.plan.provenBest`) : t(`${area}.plan.bestFound`, { gap: f.percent(plan.gap * 100, 2) })}</Badge>
            {plan.rates && plan.costMinor !== null ? <span className="rounded-lg bg-calico-50 px-3 py-2">{t(`${area}.plan.cost`)} <b>{formatMoney(plan.costMinor, plan.rates.currency)}</b></span> : null}
          </div>
          <p className="text-xs text-ink-600" aria-label={t(`${area}.plan.objective`)}>
            {plan.objective === 'cost'
              ? plan.rates
                ? t(`${area}.plan.${imperial ? 'leastCostYard' : 'leastCostMetre'}`, {
                    fabric: formatMoney(imperial ? Math.round((plan.rates.fabricCostPerMetreMinor * MM_PER_YARD) / 1000) : plan.rates.fabricCostPerMetreMinor, plan.rates.currency),
                    lay: formatMoney(plan.rates.layCostMinor, plan.rates.currency),
                    ply: formatMoney(plan.rates.plyCostMinor, plan.rates.currency),
                    basis: plan.rates.basis,
                  })
                : t(`${area}.plan.leastCostRates`)
              : t(`${area}.plan.leastFabric`)}
          </p>
          <p className="text-xs text-ink-600" aria-label={t(`${area}.plan.markerLengths`)}>
            {plan.markerLengths === 'measured'
              ? t(`${area}.plan.measured`)
              : <>{plan.utilisationFromMarkers > 0
                ? t(`${area}.plan.estimatedLearnt`, { utilisation: f.percent(Math.round(plan.assumedUtilisation * 100), 0), count: plan.utilisationFromMarkers })
                : t(`${area}.plan.estimated`, { utilisation: f.percent(Math.round(plan.assumedUtilisation * 100), 0) })} {plan.markerLengthsNote ?? t(`${area}.plan.buildMarkers`)}</>}
          </p>
          <div role="region" aria-label={t(`${area}.plan.lays`)} tabIndex={0} className="overflow-x-auto">
            {/* On a phone the table keeps its columns apart and scrolls sideways in its region. */}
            <table className="w-full min-w-[44rem] text-sm">
              <thead className="text-left text-xs text-ink-600"><tr>{(['lay', 'sizes', 'plies', 'marker', 'spreading', 'rolls', 'status'] as const).map((c, i) => <th key={c} className={i ? 'pr-3' : 'py-1 pr-3'}>{t(`${area}.plan.cols.${c}`)}</th>)}</tr></thead>
              <tbody>
                {plan.lays.map((l) => (
                  <tr key={l.id} className="border-t border-calico-200 align-top">
                    <td className="py-1 font-semibold">{l.seq}</td><td>{ratioLabel(l.ratio)}</td><td>{l.plies}</td>
                    <td>{metres(l.markerLengthMm)} {l.markerId ? <Badge tone="teal">{t(`${area}.plan.marker`)}</Badge> : <Badge>{t(`${area}.plan.estimate`)}</Badge>}</td>
                    <td>{t(`lay.modes.${l.spreadingMode}`, { defaultValue: SPREADING_LABELS[l.spreadingMode] ?? l.spreadingMode })}</td>
                    <td>{l.rolls.map((r) => <div key={r.rollId}>{t(`${area}.plan.rollLine`, { roll: r.label, shade: r.shadeLot, plies: t('common.plies', { count: r.plies }), remnant: metres(r.expectedRemnantMm) })}</div>)}</td>
                    <td><Badge tone={l.status === 'cut' ? 'teal' : 'grey'}>{t(`status.${l.status}`)}</Badge> <Link className="underline" to={paths.lay.getHref(l.id)}>{t(`${area}.plan.open`)}</Link></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {plan.shortfall.some((s) => s > 0) ? <p role="alert" className="text-sm text-madder-700">{t(`${area}.plan.short`, { count: plan.shortfall.reduce((a, b) => a + b, 0) })}</p> : null}
          {plan.rollRefusals?.length ? (
            <div role="status" className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">
              <p className="font-semibold">{t(`${area}.plan.leftOut`)}</p>
              <ul className="list-disc pl-5">{plan.rollRefusals.map((m) => <li key={m}>{m}</li>)}</ul>
            </div>
          ) : null}
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/marker-list.xlsx${fabricQuery}`, `marker-list-${batch.code}.xlsx`)}>{t('lay.docMarkerXlsx')}</button>
            <button type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/marker-list.pdf${fabricQuery}`, `marker-list-${batch.code}.pdf`)}>{t('lay.docMarkerPdf')}</button>
            {plan.material ? null : <button type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/bundle-register.xlsx`, `bundle-register-${batch.code}.xlsx`)}>{t('lay.docRegister')}</button>}
          </div>
        </div>
      ) : <p className="mt-3 text-sm text-ink-600">{shown !== undefined && mainPlan ? t(`${area}.plan.noneOnFabric`, { fabric: shownFabricName }) : t(`${area}.plan.none`)}</p>}
      <div className="mt-3 flex flex-wrap items-center gap-2" data-testid="material-cut-tickets">
        <span className="text-sm text-ink-600">{t(`${area}.plan.ticketsPerMaterial`)}</span>
        {materials.map((m) => (
          <button key={m} type="button" className="btn-quiet" onClick={() => downloadFile(`/batches/${batch.id}/material-cut-ticket.pdf?material=${encodeURIComponent(m)}`, `cut-ticket-${batch.code}-${m}.pdf`)}>{t(`${area}.plan.materialPdf`, { material: t(`${area}.materials.${m}`, { defaultValue: m }) })}</button>
        ))}
      </div>
    </Card>
  );
}
