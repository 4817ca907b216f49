import { useQuery } from '@tanstack/react-query';
import { parseLength } from '@shared/units/length-format';
import { fmt, formatDateTime } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { useEffect, useState } from 'react';
import { useParams } from 'react-router';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { ApiError, downloadFile } from '@/lib/api-client';
import { layQueries, useCorrectLay, useCutLay, useRecordLay } from '../api/cutting-queries';
import { area } from '../words';
import { CuttingCautions } from './cutting-cautions';
import { metres, ratioLabel, SPREADING_LABELS } from './cutting-format';
import { ConfirmButton } from '@/components/ui/confirm-button';
import { FieldError } from '@/components/ui/form';

type Actual = { actualPlies: string; actualRemnantM: string; note: string };

/** The remnant as typed in the studio's units: metres, or inches (`54`, `54 1/2"`) or yards (`1.5 yd`). */
const remnantText = (mm: number, imperial: boolean) => (imperial ? fmt().length(mm).replace('"', '') : (mm / 1000).toFixed(2));
const readRemnant = (text: string, imperial: boolean) => (imperial ? parseLength(text, 'imperial') : parseLength(`${text} m`, 'metric'));

export function LayPage() {
  const { t } = useTranslation();
  const imperial = fmt().settings.unitSystem === 'imperial';
  const id = Number(useParams().id);
  const { data, isLoading } = useQuery(layQueries.detail(id));
  const record = useRecordLay(id);
  const cut = useCutLay(id);
  const correct = useCorrectLay(id);
  const [correcting, setCorrecting] = useState(false);
  const [reason, setReason] = useState('');
  const [actual, setActual] = useState<Record<number, Actual>>({});
  const [flaws, setFlaws] = useState('');
  const [local, setLocal] = useState<Record<string, string>>({});
  useEffect(() => {
    if (!data) return;
    // Empty until the cutter types what was spread and measured: a pre-filled plan would be saved as fact.
    setActual(Object.fromEntries(data.lay.rolls.map((r) => [r.rollId, {
      actualPlies: r.actualPlies == null ? '' : String(r.actualPlies),
      actualRemnantM: r.actualRemnantMm == null ? '' : remnantText(r.actualRemnantMm, imperial),
      note: r.note ?? '',
    }])));
    setFlaws(data.lay.flaws);
  }, [data, imperial]);
  if (isLoading || !data) return <Spinner />;
  const { lay, fabric, bundles } = data;
  const typed = (v: string | undefined) => v !== undefined && v.trim() !== '';
  const isTyped = (rollId: number) => typed(actual[rollId]?.actualPlies) && typed(actual[rollId]?.actualRemnantM);
  /** Rows typed in full; marking the lay cut needs every row, saving needs at least one. */
  const body = (everyRow: boolean) => {
    const missing: Record<string, string> = {};
    lay.rolls.forEach((r, i) => {
      if (!everyRow && !typed(actual[r.rollId]?.actualPlies) && !typed(actual[r.rollId]?.actualRemnantM)) return;
      if (!typed(actual[r.rollId]?.actualPlies)) missing[`rolls.${i}.actualPlies`] = t('lay.enterPlies');
      if (!typed(actual[r.rollId]?.actualRemnantM)) missing[`rolls.${i}.actualRemnantMm`] = t('lay.enterRemnant');
      else if (readRemnant(actual[r.rollId].actualRemnantM, imperial) === null) missing[`rolls.${i}.actualRemnantMm`] = t('lay.badRemnant');
    });
    const rows = lay.rolls.filter((r) => isTyped(r.rollId));
    if (!rows.length && !Object.keys(missing).length) missing['rolls.0.actualPlies'] = t('lay.enterPlies');
    setLocal(missing);
    if (Object.keys(missing).length) return null;
    return {
      rolls: rows.map((r) => ({ rollId: r.rollId, actualPlies: Number(actual[r.rollId].actualPlies), actualRemnantMm: Math.round(readRemnant(actual[r.rollId].actualRemnantM, imperial) ?? 0), note: actual[r.rollId]?.note || undefined })),
      flaws,
    };
  };
  // The errors on screen are the last request's: a save refused earlier is not shown once the lay is cut.
  const only = (keep: { reset: () => void }) => {
    for (const m of [record, cut, correct]) if (m !== keep) m.reset();
  };
  const failure = record.error ?? cut.error ?? correct.error;
  const server = failure instanceof ApiError ? failure.fields ?? {} : {};
  const fields: Record<string, string> = { ...server, ...local };
  const isCut = lay.status === 'cut';
  const retired = lay.status === 'retired';
  // After the cut the record is read-only; a correction reopens it with a reason, and the server audits it.
  const readOnly = retired || (isCut && !correcting);
  const handleCorrect = () => {
    const b = body(true);
    if (!b) return;
    if (reason.trim().length < 3) {
      setLocal({ reason: t(`${area}.lay.sayWhy`) });
      return;
    }
    only(correct);
    correct.mutate({ ...b, reason }, { onSuccess: () => { setCorrecting(false); setReason(''); } });
  };
  const spreadPlies = lay.rolls.reduce((a, r) => a + (Number(actual[r.rollId]?.actualPlies) || 0), 0);
  const file = (url: string, name: string) => () => downloadFile(url, name);
  return (
    <>
      <PageHeader
        title={t('home.lay', { batch: lay.batchCode, seq: lay.seq })}
        subtitle={<>{t('lay.perPly', { ratio: ratioLabel(lay.ratio), plies: t('common.plies', { count: lay.plies }) })} · <Badge tone={isCut ? 'teal' : retired ? 'gold' : 'grey'}>{t(`status.${lay.status}`)}</Badge></>}
        actions={<button type="button" className="btn-quiet" onClick={() => window.print()}>{t('lay.print')}</button>}
      />
      <div className="space-y-5">
        {retired ? (
          <p role="status" className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">
            {t('lay.retired')}
          </p>
        ) : null}
        {lay.shortage && !readOnly ? (
          <p role="alert" className="rounded-lg bg-madder-100 px-3 py-2 text-sm text-madder-700">
            {lay.shortage.message} {t('lay.tellOwner')}
          </p>
        ) : null}
        <Card title={t('lay.marker')}>
          <dl className="mb-3 grid grid-cols-2 gap-2 text-sm sm:grid-cols-4">
            <div><dt className="text-xs text-ink-600">{t('lay.markerLength')}</dt><dd className="font-semibold">{metres(lay.markerLengthMm)}</dd></div>
            <div><dt className="text-xs text-ink-600">{t('lay.endAllowance')}</dt><dd className="font-semibold">{t('lay.eachEnd', { length: fmt().smallLength(lay.endAllowanceMm / 2) })}</dd></div>
            <div><dt className="text-xs text-ink-600">{t('lay.spreading')}</dt><dd className="font-semibold">{t(`lay.modes.${lay.spreadingMode}`, { defaultValue: SPREADING_LABELS[lay.spreadingMode] ?? lay.spreadingMode })}</dd></div>
            <div><dt className="text-xs text-ink-600">{t('lay.fabric')}</dt><dd className="font-semibold">{fabric ? `${fabric.name}, ${fmt().fabricWidth(fabric.widthMm)}` : '—'}</dd></div>
          </dl>
          <p className="mb-2 text-xs text-ink-600">
            {fabric?.isDirectional ? t('lay.oneWay') : t('lay.bothWays')}
          </p>
          {lay.markerId ? <img src={`/api/markers/${lay.markerId}/svg`} alt={t('lay.markerOf', { seq: lay.seq })} className="w-full rounded-lg border border-calico-200 bg-calico-50" /> : <p className="text-sm text-ink-600">{t('lay.noMarker')}</p>}
        </Card>
        <Card title={t('lay.perRoll')}>
          <div role="region" aria-label={t(`${area}.lay.rolls`)} tabIndex={0} className="overflow-x-auto">
            <table className="w-full text-sm">
              <thead className="text-left text-xs text-ink-600"><tr><th className="py-1 pr-3">{t('fabric.roll')}</th><th className="pr-3">{t('fabric.shadeLot')}</th><th className="pr-3">{t('lay.pliesToSpread')}</th><th className="pr-3">{t('lay.expectedRemnant')}</th><th>{t('lay.pliesSpread')}</th><th>{imperial ? t('lay.remnantLeftIn') : t('lay.remnantLeftM')}</th><th>{t('lay.note')}</th></tr></thead>
              <tbody>
                {lay.rolls.map((r, i) => (
                  <tr key={r.rollId} className="border-t border-calico-200">
                    <td className="whitespace-nowrap py-1 pr-3 font-semibold">{r.label}</td><td className="whitespace-nowrap pr-3">{r.shadeLot}</td><td className="pr-3 tabular-nums">{r.plies}</td><td className="whitespace-nowrap pr-3">{metres(r.expectedRemnantMm)}</td>
                    <td><input aria-label={t('lay.pliesFrom', { roll: r.label })} className="field-input w-20" type="number" disabled={readOnly} value={actual[r.rollId]?.actualPlies ?? ''} onChange={(e) => setActual({ ...actual, [r.rollId]: { ...actual[r.rollId], actualPlies: e.target.value } })} />
                      {fields[`rolls.${i}.actualPlies`] ? <p className="field-error">{fields[`rolls.${i}.actualPlies`]}</p> : null}</td>
                    <td><input aria-label={t('lay.remnantOn', { roll: r.label })} className="field-input w-24" type={imperial ? 'text' : 'number'} step="0.01" disabled={readOnly} value={actual[r.rollId]?.actualRemnantM ?? ''} onChange={(e) => setActual({ ...actual, [r.rollId]: { ...actual[r.rollId], actualRemnantM: e.target.value } })} />
                      {fields[`rolls.${i}.actualRemnantMm`] ? <p className="field-error">{fields[`rolls.${i}.actualRemnantMm`]}</p> : null}</td>
                    <td><input aria-label={t('lay.noteOn', { roll: r.label })} className="field-input" disabled={readOnly} value={actual[r.rollId]?.note ?? ''} onChange={(e) => setActual({ ...actual, [r.rollId]: { ...actual[r.rollId], note: e.target.value } })} /></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="mt-2 text-sm">{t('lay.spreadOf', { spread: spreadPlies, plies: lay.plies })}{fabric && lay.plies > fabric.maxPlies ? t('lay.aboveLimit') : ''}</p>
          <div className="mt-3">
            <label className="field-label" htmlFor="lay-flaws">{t('lay.flaws')}</label>
            <textarea id="lay-flaws" className="field-input" rows={2} disabled={readOnly} value={flaws} onChange={(e) => setFlaws(e.target.value)} />
          </div>
          {!readOnly ? (
            <div className="mt-3 flex flex-wrap gap-2">
              <button type="button" className="btn-quiet" disabled={record.isPending} onClick={() => { const b = body(false); if (b) { only(record); record.mutate(b); } }}>{t('lay.save')}</button>
              <ConfirmButton
                label={t('lay.markCut')}
                question={t('lay.markCutQuestion', { seq: lay.seq })}
                confirmLabel={t('lay.markCutYes')}
                disabled={cut.isPending}
                onConfirm={() => { const b = body(true); if (b) { only(cut); cut.mutate(b); } }}
              />
            </div>
          ) : retired ? null : correcting ? (
            <div className="mt-3 space-y-2">
              <label className="field-label" htmlFor="lay-correction-reason">{t(`${area}.lay.why`)}</label>
              <textarea id="lay-correction-reason" className="field-input" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} aria-invalid={Boolean(fields.reason)} />
              {fields.reason ? <FieldError>{fields.reason}</FieldError> : null}
              <div className="flex flex-wrap gap-2">
                <button type="button" className="btn-primary" disabled={correct.isPending} onClick={handleCorrect}>{t(`${area}.lay.saveCorrection`)}</button>
                <button type="button" className="btn-quiet" onClick={() => { setCorrecting(false); setLocal({}); }}>{t('common.cancel')}</button>
              </div>
              <p className="text-xs text-ink-600">{t(`${area}.lay.correctionNote`)}</p>
            </div>
          ) : (
            <div className="mt-3 flex flex-wrap items-center gap-3">
              <p className="text-sm text-thread-800">{t('lay.cutAt', { when: lay.cutAt ? formatDateTime(lay.cutAt) : '', bundles: t('common.bundles', { count: bundles.length }) })} {t(`${area}.lay.closed`)}</p>
              <button type="button" className="btn-quiet" onClick={() => setCorrecting(true)}>{t(`${area}.lay.correct`)}</button>
            </div>
          )}
          {record.isSuccess && !isCut ? <p className="mt-2 text-sm text-thread-800">{t('common.saved')}</p> : null}
          {correct.isSuccess && !correcting ? <p className="mt-2 text-sm text-thread-800" role="status">{t(`${area}.lay.correctionSaved`)}</p> : null}
          {failure && !Object.keys(server).length ? <div className="mt-2"><ErrorNote error={failure} /></div> : null}
          {lay.corrections?.length ? (
            <div className="mt-3">
              <h3 className="text-sm font-semibold">{t(`${area}.lay.corrections`)}</h3>
              <ul className="mt-1 space-y-1 text-sm">
                {lay.corrections.map((c) => (
                  <li key={c.at} className="rounded-lg border border-calico-200 px-2 py-1">
                    {formatDateTime(c.at)} · {c.by}: {c.reason}{c.changes.length ? ` (${c.changes.join('; ')})` : ''}
                  </li>
                ))}
              </ul>
            </div>
          ) : null}
        </Card>
        {bundles.length ? (
          <Card title={t('lay.bundles')}>
            <ul className="grid grid-cols-2 gap-2 text-sm sm:grid-cols-4">
              {bundles.map((b) => <li key={b.id} className="rounded-lg border border-calico-200 px-2 py-1">{t('lay.bundleLine', { number: b.number, size: b.size, shade: b.shadeLot, from: b.plyFrom, to: b.plyTo })}</li>)}
            </ul>
          </Card>
        ) : null}
        {retired ? null : <Card title={t('lay.documents')}>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/cut-ticket.pdf`, `cut-ticket-${lay.batchCode}-lay-${lay.seq}.pdf`)}>{t('lay.docCutTicket')}</button>
            <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/marker-list.xlsx`, `marker-list-${lay.batchCode}-lay-${lay.seq}.xlsx`)}>{t('lay.docMarkerXlsx')}</button>
            <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/marker-list.pdf`, `marker-list-${lay.batchCode}-lay-${lay.seq}.pdf`)}>{t('lay.docMarkerPdf')}</button>
            {lay.markerId ? <button type="button" className="btn-quiet" onClick={file(`/markers/${lay.markerId}/plot.pdf`, `marker-${lay.batchCode}-${lay.markerId}.pdf`)}>{t(`${area}.lay.plot`)}</button> : null}
            {bundles.length ? <button type="button" className="btn-quiet" onClick={file(`/lays/${id}/bundle-tickets.pdf`, `bundle-tickets-${lay.batchCode}-lay-${lay.seq}.pdf`)}>{t('lay.docTickets')}</button> : null}
            {bundles.length ? <button type="button" className="btn-quiet" onClick={file(`/batches/${lay.batchId}/bundle-register.xlsx`, `bundle-register-${lay.batchCode}.xlsx`)}>{t('lay.docRegister')}</button> : null}
          </div>
          {data.materials.length ? (
            <div className="mt-3 flex flex-wrap items-center gap-2" data-testid="lay-material-tickets">
              <span className="text-sm text-ink-600">{t(`${area}.plan.ticketsPerMaterial`)}</span>
              {data.materials.map((m) => (
                <button key={m} type="button" className="btn-quiet" onClick={file(`/batches/${lay.batchId}/material-cut-ticket.pdf?material=${encodeURIComponent(m)}`, `cut-ticket-${lay.batchCode}-${m}.pdf`)}>
                  {t(`${area}.plan.materialPdf`, { material: t(`${area}.materials.${m}`, { defaultValue: m }) })}
                </button>
              ))}
            </div>
          ) : null}
        </Card>}
        <CuttingCautions />
      </div>
    </>
  );
}
