import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Link, useParams } from 'react-router';
import type { CostingSheetDto, LabourBasis } from '@shared/schemas/costing';
import { DataTable } from '@/components/ui/data-table';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { downloadFile } from '@/lib/api-client';
import { useCan } from '@/lib/auth';
import { costingQueries, useUpdateCostingSettings } from '../api/costing-queries';
import { sizeColumns } from './costing-columns';
import { CostingSettingsForm } from './costing-settings-form';
import { fmt, fmt as formats, formatMoney as money } from '@/lib/format';
import { TrimPriceEditor } from './trim-price-editor';
import { AddTrimForm } from './add-trim-form';
import { paths } from '@/config/paths';
import { localSentence, useTranslation } from '@/lib/i18n';
import { MM_PER_YARD } from '@shared/units/units';
import { area } from '../words';


function Figure({ label, value, testId, strong }: { label: string; value: string; testId: string; strong?: boolean }) {
  return (
    <div className={`rounded-card px-4 py-3 ${strong ? 'bg-thread-700 text-calico-50' : 'border border-calico-200 bg-white'}`}>
      <div className={`text-xs ${strong ? 'text-calico-100' : 'text-ink-600'}`}>{label}</div>
      <output data-testid={testId} className="text-xl font-bold">{value}</output>
    </div>
  );
}

function PlannedActual({ sheet }: { sheet: CostingSheetDto }) {
  const { t } = useTranslation();
  const a = sheet.actual;
  const rows: [string, string, string][] = [
    [t('costingPage.fabricPerGarment'), a.fabricMmPerGarment.planned ? fmt().fabricLength(a.fabricMmPerGarment.planned) : '—', a.fabricMmPerGarment.actual !== null ? fmt().fabricLength(a.fabricMmPerGarment.actual) : t('costingPage.notCut')],
    [t('costingPage.pliesSpread'), a.layPlies.planned ? fmt().number(a.layPlies.planned) : '—', a.layPlies.cut ? fmt().number(a.layPlies.cut) : t('costingPage.notCut')],
    [t('costingPage.samPerGarment'), fmt().number(a.labourMinutesPerGarment.planned), a.labourMinutesPerGarment.actual !== null ? t('costingPage.soFar', { value: fmt().number(a.labourMinutesPerGarment.actual) }) : t('costingPage.noWork')],
    [t('costingPage.payLogged'), '—', money(a.labourPaidMinor, sheet.currency)],
  ];
  return (
    <dl className="grid gap-2 text-sm sm:grid-cols-2">
      {rows.map(([k, p, x]) => (
        <div key={k} className="rounded-lg bg-calico-50 px-3 py-2">
          <dt className="font-medium text-thread-800">{k}</dt>
          <dd className="text-ink-700">{t('costingPage.plannedActual', { planned: p, actual: x })}</dd>
        </div>
      ))}
    </dl>
  );
}

export function CostingPage() {
  const { t } = useTranslation();
  const id = Number(useParams().id);
  const { data: sheet, isLoading, error, isFetching } = useQuery({ ...costingQueries.sheet(id), placeholderData: (prev) => prev });
  const canEdit = useCan('costs:write');
  // The chosen basis is saved with the style's settings, so the batch page and the workbook follow it.
  const saveSettings = useUpdateCostingSettings();
  // A stable array: the table resets its state whenever `data` changes identity.
  const sizeRows = useMemo(() => (sheet ? sheet.sizes.map((s) => ({ ...s, currency: sheet.currency, locale: sheet.locale })) : []), [sheet]);
  const [downloadError, setDownloadError] = useState<unknown>(null);
  if (error) return <ErrorNote error={error} />;
  if (isLoading || !sheet) return <Spinner />;
  const fmt = (v: number) => money(v, sheet.currency);
  const imperialSheet = sheet.unitSystem === 'imperial';
  const { fabricLength, number: fmtNumber } = formats();
  const handleDownload = async () => {
    setDownloadError(null);
    try {
      await downloadFile(`/batches/${id}/costing.xlsx`, `costing-${sheet.batch.code}.xlsx`);
    } catch (e) {
      setDownloadError(e);
    }
  };
  return (
    <>
      <PageHeader
        title={t('costingPage.title', { batch: sheet.batch.code })}
        subtitle={<>{sheet.style.code} {sheet.style.name} · {t('common.garments', { count: sheet.batch.total })} · {t('costingPage.pricesIn', { currency: sheet.currency })}</>}
        actions={
          <>
            <Link className="btn-quiet" to={paths.batch.getHref(id)}>{t('costingPage.back')}</Link>
            <button type="button" className="btn-primary" onClick={handleDownload}>{t(`${area}.download`)}</button>
          </>
        }
      />
      <ErrorNote error={downloadError} />
      <div className="mb-5 grid grid-cols-2 gap-3 lg:grid-cols-4" aria-busy={isFetching}>
        <Figure label={t('costingPage.average')} value={fmt(sheet.totals.averageUnitCostMinor)} testId="average-unit-cost" />
        <Figure label={t('costingPage.wholesale', { margin: fmtNumber(sheet.settings.marginPercent) })} value={fmt(sheet.totals.wholesaleMinor)} testId="wholesale" strong />
        <Figure label={t('costingPage.retail', { multiplier: fmtNumber(sheet.settings.retailMultiplier) })} value={fmt(sheet.totals.retailMinor)} testId="retail" />
        <Figure label={t('costingPage.batchCost')} value={fmt(sheet.totals.batchCostMinor)} testId="batch-cost" />
      </div>
      {sheet.notes.length ? (
        <ul className="mb-5 space-y-1 rounded-card border border-saffron-500/40 bg-saffron-100 px-4 py-3 text-sm text-ink-800">
          {sheet.notes.map((n) => <li key={n}>{localSentence(n, formats().settings)}</li>)}
        </ul>
      ) : null}
      <div className="space-y-5">
        <Card title={t('costingPage.bySize')}>
          <DataTable data={sizeRows} columns={sizeColumns} filterPlaceholder={t('costingPage.filterSizes')} />
          {sheet.fabric ? (
            <p className="mt-2 text-xs text-ink-600">
              {t(imperialSheet ? 'costingPage.fabricNoteYard' : 'costingPage.fabricNoteMetre', {
                name: sheet.fabric.name,
                price: fmt(imperialSheet ? Math.round((sheet.fabric.pricePerMetreMinor * MM_PER_YARD) / 1000) : sheet.fabric.pricePerMetreMinor),
                basis: t(`costingPage.basis.${sheet.fabric.basis}`),
                wastage: fmtNumber(sheet.settings.wastagePercent),
                length: fabricLength(sheet.fabric.batchFabricMm),
              })}
            </p>
          ) : null}
        </Card>
        <Card
          title={
            <span className="flex flex-wrap items-center justify-between gap-2">
              <span>{t(`${area}.lines`)}</span>
              <label className="flex items-center gap-2 text-sm font-normal text-ink-700">
                {t(`${area}.labourBy`)}
                <select aria-label={t(`${area}.labourBy`)} className="field-input w-auto py-1" value={sheet.settings.labourBasis} disabled={!canEdit || saveSettings.isPending} onChange={(e) => saveSettings.mutate({ styleId: sheet.style.id, labourBasis: e.target.value as LabourBasis })}>
                  <option value="sam">{t(`${area}.bySam`)}</option>
                  <option value="piece-rates">{t(`${area}.byPieceRates`)}</option>
                </select>
                {sheet.labour.isEstimate ? <Badge tone="gold">{t(`${area}.estimate`)}</Badge> : null}
              </label>
            </span>
          }
        >
          <TrimPriceEditor sheet={sheet} canEdit={canEdit} />
          <p className="mt-2 text-xs text-ink-600">{t(`${area}.linesHint`)}</p>
        </Card>
        {canEdit ? (
          <Card title={t(`${area}.addTrimTitle`)}>
            <AddTrimForm styleId={sheet.style.id} currency={sheet.currency} />
          </Card>
        ) : null}
        {canEdit ? (
          <Card title={t(`${area}.settingsTitle`)}>
            <CostingSettingsForm key={JSON.stringify(sheet.settings)} sheet={sheet} />
          </Card>
        ) : null}
        <Card title={t(`${area}.plannedActual`)}>
          <PlannedActual sheet={sheet} />
        </Card>
      </div>
    </>
  );
}
