import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { RollDto } from '@shared/schemas/cutting';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useCan, useMe } from '@/lib/auth';
import { fmt, formatDate, formatMoney } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { Trans } from 'react-i18next';
import { dayInZone } from '@shared/format/studio-format';
import { parseLength, parseLongLength } from '@shared/units/length-format';
import { fabricQueries, useAddRolls, useImportRolls } from '../api/cutting-queries';
import { area } from '../words';
import { fabricUnits, MM_PER_YARD } from './cutting-format';
import { FabricForm } from './fabric-form';
import { FieldError } from '@/components/ui/form';

function RollTable({ rolls }: { rolls: RollDto[] }) {
  const { t } = useTranslation();
  const u = fabricUnits(useMe().data?.unitSystem === 'imperial');
  return (
    <div role="region" aria-label={t(`${area}.rolls.table`)} tabIndex={0} className="overflow-x-auto">
      {/* On a phone the columns keep their room and the region scrolls sideways, rather than running the headers together. */}
      <table className="w-full min-w-[36rem] text-sm [&_td]:pr-3 [&_th]:pr-3">
        <thead className="text-left text-xs text-ink-600"><tr><th className="py-1">{t('fabric.roll')}</th><th>{t('fabric.shadeLot')}</th><th>{t('fabric.length')}</th><th>{t('fabric.left')}</th><th>{t('fabric.held')}</th><th>{t('fabric.width')}</th><th>{t('fabric.received')}</th></tr></thead>
        <tbody>
          {rolls.map((r) => (
            <tr key={r.id} className="border-t border-calico-200">
              <td className="py-1 font-medium">{r.label} {r.isRemnant ? <Badge tone="gold">{t('fabric.remnant')}</Badge> : null}</td>
              <td>{r.shadeLot}</td><td>{u.length(r.lengthMm)}</td><td>{u.length(r.remainingMm)}</td><td>{r.reservedMm > 0 ? u.length(r.reservedMm) : '—'}</td><td>{u.width(r.widthMm)}</td><td>{formatDate(r.receivedDate)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function AddRollForm({ fabricId, widthMm }: { fabricId: number; widthMm: number }) {
  const { t } = useTranslation();
  const add = useAddRolls(fabricId);
  const me = useMe().data;
  const imperial = me?.unitSystem === 'imperial';
  const u = fabricUnits(imperial);
  // An imperial width is typed in inches with fractions (`58 1/8`), as the studio writes it.
  const widthText = (mm: number) => (imperial ? u.width(mm).replace('"', '') : String(Math.round((mm / u.mmPerWidth) * 8) / 8));
  const readWidth = (text: string) => (imperial ? parseLength(`${text} in`, 'imperial') ?? NaN : Number(text) * u.mmPerWidth);
  const [f, setF] = useState({ label: '', lengthM: '', widthCm: widthText(widthMm + 20), shadeLot: '', receivedDate: dayInZone(new Date(), me?.timeZone ?? 'UTC') });
  const [lengthError, setLengthError] = useState('');
  const fields = add.error instanceof ApiError ? add.error.fields : {};
  const handleSubmit = (e: FormEvent) => {
    e.preventDefault();
    // The length as the cutter writes it: 50, 49,8, 40 1/2 or 40½ (metres or yards), or with a unit.
    const lengthMm = parseLongLength(f.lengthM, imperial ? 'imperial' : 'metric');
    setLengthError(lengthMm === null ? t(`${area}.rolls.lengthNeeded`, { example: imperial ? '40 1/2' : fmt().number(49.8) }) : '');
    if (lengthMm === null) return;
    add.mutate([{ label: f.label, lengthMm: Math.round(lengthMm), widthMm: Math.round(readWidth(f.widthCm)), shadeLot: f.shadeLot, receivedDate: f.receivedDate }], {
      onSuccess: () => setF({ ...f, label: '', lengthM: '' }),
    });
  };
  const input = (key: keyof typeof f, label: string, type = 'text', err?: string) => (
    <div>
      <label className="field-label" htmlFor={`roll-${key}`}>{label}</label>
      <input id={`roll-${key}`} className="field-input" type={type} step="any" value={f[key]} onChange={(e) => setF({ ...f, [key]: e.target.value })} aria-invalid={Boolean(err)} />
      {err ? <FieldError>{err}</FieldError> : null}
    </div>
  );
  return (
    <form onSubmit={handleSubmit} className="grid grid-cols-2 gap-3 sm:grid-cols-6 sm:items-end">
      {input('label', t(`${area}.rolls.label`), 'text', fields['rolls.0.label'])}
      {input('lengthM', t(`${area}.rolls.length`, { unit: u.lengthUnit }), 'text', lengthError || fields['rolls.0.lengthMm'])}
      {input('widthCm', t(`${area}.rolls.width`, { unit: u.widthUnit }), imperial ? 'text' : 'number', fields['rolls.0.widthMm'])}
      {input('shadeLot', t('fabric.shadeLot'), 'text', fields['rolls.0.shadeLot'])}
      {input('receivedDate', t('fabric.received'), 'date', fields['rolls.0.receivedDate'])}
      <button type="submit" className="btn-primary" disabled={add.isPending}>{t(`${area}.rolls.add`)}</button>
      {add.error && !Object.keys(fields).length ? <div className="col-span-full"><ErrorNote error={add.error} /></div> : null}
    </form>
  );
}

function ImportForm({ fabricId }: { fabricId: number }) {
  const { t } = useTranslation();
  const imp = useImportRolls(fabricId);
  const [file, setFile] = useState<File | null>(null);
  const rows = imp.error instanceof ApiError ? Object.entries(imp.error.fields) : [];
  return (
    <div className="space-y-2">
      <p className="text-sm text-ink-600"><Trans i18nKey={`${area}.rolls.importHelp`} components={{ b: <b /> }} /></p>
      <div className="flex flex-wrap items-center gap-2">
        <input aria-label={t(`${area}.rolls.importFile`)} type="file" accept=".csv,.xlsx" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
        <button type="button" className="btn-quiet" disabled={!file || imp.isPending} onClick={() => file && imp.mutate(file)}>{t(`${area}.rolls.import`)}</button>
      </div>
      {imp.isSuccess ? <p className="text-sm text-thread-800">{t(`${area}.rolls.imported`, { count: imp.data.length })}</p> : null}
      {imp.error ? <ErrorNote error={imp.error} /> : null}
      {rows.length ? <ul className="list-disc pl-5 text-sm text-madder-700">{rows.map(([k, v]) => <li key={k}>{k}: {v}</li>)}</ul> : null}
    </div>
  );
}

export function FabricsPage() {
  const { t } = useTranslation();
  const { data: fabrics, isLoading } = useQuery(fabricQueries.list());
  const [openId, setOpenId] = useState<number | null>(null);
  const id = openId ?? fabrics?.[0]?.id ?? null;
  const detail = useQuery({ ...fabricQueries.detail(id ?? 0), enabled: id !== null });
  const canWrite = useCan('fabric:write');
  const currency = useMe().data?.currency ?? 'KES';
  const u = fabricUnits(useMe().data?.unitSystem === 'imperial');
  /** A quoted price per metre or per yard, per the studio's own unit (as quoted when the two agree). */
  const inStudioUnit = (price: { amountMinor: number; per: 'metre' | 'yard' }) =>
    price.per === u.pricePer ? price.amountMinor : Math.round((price.amountMinor * u.mmPerLength) / (price.per === 'yard' ? MM_PER_YARD : 1000));
  if (isLoading || !fabrics) return <Spinner />;
  return (
    <>
      <PageHeader title={t('fabric.title')} subtitle={t('fabric.subtitle')} />
      {fabrics.length === 0 ? <p className="mb-4 text-sm text-ink-600">{t('fabric.none')}</p> : null}
      <div className="grid gap-4 md:grid-cols-3">
        {fabrics.map((f) => (
          <button type="button" key={f.id} onClick={() => setOpenId(f.id)} className={`card p-4 text-left ${f.id === id ? 'ring-2 ring-thread-700' : ''}`}>
            <p className="font-semibold text-thread-800">{f.name}</p>
            <p className="text-sm text-ink-600">{[f.composition, t('fabric.cuttable', { width: u.width(f.widthMm) }), f.isDirectional ? t('fabric.oneWay') : ''].filter(Boolean).join(' · ')}</p>
            <p className="mt-1 text-sm">{t('fabric.stock', { count: f.rollCount, length: u.length(f.totalRemainingMm) })}</p>
            {f.price ? <p className="text-sm text-ink-600">{formatMoney(inStudioUnit(f.price), currency)} / {u.pricePer === 'yard' ? t(`${area}.rolls.unitYard`) : t(`${area}.rolls.unitMetre`)}</p>
              : f.pricePerMetreMinor !== undefined ? <p className="text-sm text-ink-600">{t(`fabric.per.${u.pricePer}`, { price: formatMoney(Math.round((f.pricePerMetreMinor * u.mmPerLength) / 1000), currency) })}</p> : null}
            {(f.shrinkageLengthPercent ?? f.shrinkagePercent) || (f.shrinkageWidthPercent ?? f.shrinkagePercent) ? <p className="text-xs text-ink-600">{t(`${area}.rolls.shrinkage`, { along: fmt().number(f.shrinkageLengthPercent ?? f.shrinkagePercent), across: fmt().number(f.shrinkageWidthPercent ?? f.shrinkagePercent) })}</p> : null}
          </button>
        ))}
      </div>
      {id !== null && detail.data ? (
        <div className="mt-5 space-y-5">
          <Card title={t('fabric.rollsOf', { name: detail.data.fabric.name })}><RollTable rolls={detail.data.rolls} /></Card>
          {canWrite ? <Card title={t(`${area}.rolls.enter`)}><AddRollForm fabricId={id} widthMm={detail.data.fabric.widthMm} /></Card> : null}
          {canWrite ? <Card title={t(`${area}.rolls.importTitle`)}><ImportForm fabricId={id} /></Card> : null}
          {canWrite ? <Card title={t(`${area}.rolls.edit`, { name: detail.data.fabric.name })}><FabricForm key={id} fabric={detail.data.fabric} onDone={() => undefined} /></Card> : null}
        </div>
      ) : null}
      {canWrite ? <div className="mt-5"><Card title={t(`${area}.rolls.addFabric`)}><FabricForm fabric={null} onDone={(f) => setOpenId(f.id)} /></Card></div> : null}
    </>
  );
}
