import { useMutation, useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { CreateFabricInput, FabricDto } from '@shared/schemas/cutting';
import { parseMajor, toMajorText } from '@shared/units/money';
import { parseLength } from '@shared/units/length-format';
import { ErrorNote } from '@/components/ui/page';
import { ApiError, api } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { queryClient } from '@/lib/query-client';
import { purchasingQueries } from '@/features/purchasing/api/purchasing-queries';
import { area } from '../words';
import { MM_PER_YARD } from './cutting-format';
import { FieldError } from '@/components/ui/form';

interface Draft {
  name: string;
  composition: string;
  width: string;
  shrinkageLength: string;
  shrinkageWidth: string;
  isDirectional: boolean;
  price: string;
  priceUnit: 'metre' | 'yard';
  supplierId: string;
  maxPlies: string;
}

/** A decimal as typed in the language: `450,5` in French reads as 450.5 (spaces between thousands are dropped). */
const decimalText = (text: string, french: boolean) => (french ? text.replace(/[\s\u202f\u00a0]/g, '').replace(',', '.') : text);

function draftOf(f: FabricDto | null, imperial: boolean, currency: string, french = false): Draft {
  if (!f) return { name: '', composition: '', width: '', shrinkageLength: '0', shrinkageWidth: '0', isDirectional: false, price: '', priceUnit: imperial ? 'yard' : 'metre', supplierId: '', maxPlies: '40' };
  const inLanguage = (text: string) => (french ? text.replace('.', ',') : text);
  // The price as the supplier quoted it; older fabrics only have a rate per metre. An imperial studio prices by
  // the yard: a quote per metre is shown per yard there (and saved so once the form is saved).
  const asQuoted = f.price ?? (f.pricePerMetreMinor === undefined ? undefined : { amountMinor: f.pricePerMetreMinor, per: 'metre' as const });
  const quoted = imperial && asQuoted?.per === 'metre' ? { amountMinor: Math.round((asQuoted.amountMinor * MM_PER_YARD) / 1000), per: 'yard' as const } : asQuoted;
  return {
    name: f.name,
    composition: f.composition,
    // Inches with fractions to 1/8 (`57 1/2`), as the studio writes them.
    width: imperial ? fmt().fabricWidth(f.widthMm).replace('"', '') : String(f.widthMm / 10),
    shrinkageLength: inLanguage(String(f.shrinkageLengthPercent ?? f.shrinkagePercent)),
    shrinkageWidth: inLanguage(String(f.shrinkageWidthPercent ?? f.shrinkagePercent)),
    isDirectional: f.isDirectional,
    price: quoted ? (french ? toMajorText(quoted.amountMinor, currency).replace('.', ',') : toMajorText(quoted.amountMinor, currency)) : '',
    priceUnit: quoted?.per ?? (imperial ? 'yard' : 'metre'),
    supplierId: f.supplierId === null ? '' : String(f.supplierId),
    maxPlies: String(f.maxPlies),
  };
}

/**
 * Add or edit a fabric, lining or interfacing of the studio: cuttable width in the studio's units
 * (cm, or inches), the price per metre or per yard as quoted, shrinkage along and across the grain, one-way, and the supplier it is bought from.
 */
export function FabricForm({ fabric, onDone }: { fabric: FabricDto | null; onDone: (f: FabricDto) => void }) {
  const { t } = useTranslation();
  const me = useMe().data;
  const imperial = me?.unitSystem === 'imperial';
  const french = fmt().settings.language === 'fr';
  const currency = me?.currency ?? 'KES';
  const suppliers = useQuery(purchasingQueries.suppliers());
  const [d, setD] = useState<Draft>(() => draftOf(fabric, imperial, currency, french));
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: async (v: CreateFabricInput) =>
      (fabric ? await api.put<{ fabric: FabricDto }>(`/fabrics/${fabric.id}`, v) : await api.post<{ fabric: FabricDto }>('/fabrics', v)).fabric,
    onSuccess: async (f) => {
      await queryClient.invalidateQueries({ queryKey: ['fabrics'] });
      if (!fabric) setD(draftOf(null, imperial, currency, french));
      onDone(f);
    },
  });
  const serverErrors = save.error instanceof ApiError ? save.error.fields : {};
  const errors = { ...serverErrors, ...localErrors };

  const handleSubmit = (e: FormEvent) => {
    e.preventDefault();
    const problems: Record<string, string> = {};
    const widthMm = imperial ? (parseLength(`${d.width} in`, 'imperial') ?? NaN) : Number(decimalText(d.width, french)) * 10;
    if (!d.width.trim() || !Number.isFinite(widthMm) || widthMm <= 0) problems.widthMm = t(`${area}.form.widthNeeded`);
    const price = d.price.trim() === '' ? 0 : parseMajor(decimalText(d.price, french), currency);
    if (price === null || price < 0) problems.priceMinor = t(`${area}.form.priceNeeded`);
    for (const [key, field] of [['shrinkageLength', 'shrinkageLengthPercent'], ['shrinkageWidth', 'shrinkageWidthPercent']] as const) {
      const v = Number(decimalText(d[key], french) || 0);
      if (!Number.isFinite(v) || v < 0 || v > 30) problems[field] = t(`${area}.form.shrinkRange`);
    }
    const plies = Number(d.maxPlies);
    if (!Number.isInteger(plies)) problems.maxPlies = t(`${area}.form.wholePlies`);
    setLocalErrors(problems);
    if (Object.keys(problems).length) return;
    // Kept exactly as quoted; the rate per metre is only for older readers of the fabric.
    const perMetre = d.priceUnit === 'yard' ? Math.round(((price ?? 0) * 1000) / MM_PER_YARD) : (price ?? 0);
    const shrinkLength = Number(decimalText(d.shrinkageLength, french) || 0);
    const shrinkWidth = Number(decimalText(d.shrinkageWidth, french) || 0);
    save.mutate({
      name: d.name,
      composition: d.composition,
      widthMm: Math.round(widthMm),
      shrinkagePercent: Math.max(shrinkLength, shrinkWidth),
      shrinkageLengthPercent: shrinkLength,
      shrinkageWidthPercent: shrinkWidth,
      isDirectional: d.isDirectional,
      pricePerMetreMinor: perMetre,
      priceMinor: price ?? 0,
      priceUnit: d.priceUnit,
      supplierId: d.supplierId ? Number(d.supplierId) : null,
      maxPlies: plies,
    });
  };

  const prefix = fabric ? `fabric-${fabric.id}` : 'fabric-new';
  const text = (key: keyof Draft, label: string, errKey: string, type = 'text', hint?: string) => (
    <div>
      <label className="field-label" htmlFor={`${prefix}-${key}`}>{label}</label>
      <input
        id={`${prefix}-${key}`}
        className="field-input"
        type={type}
        step="any"
        inputMode={type === 'number' ? 'decimal' : undefined}
        value={String(d[key])}
        onChange={(e) => setD({ ...d, [key]: e.target.value })}
        aria-invalid={Boolean(errors[errKey])}
        aria-describedby={errors[errKey] ? `${prefix}-${key}-error` : undefined}
      />
      {hint && !errors[errKey] ? <p className="text-xs text-ink-600">{hint}</p> : null}
      {errors[errKey] ? <p id={`${prefix}-${key}-error`} className="field-error">{errors[errKey]}</p> : null}
    </div>
  );

  return (
    <form onSubmit={handleSubmit} className="grid grid-cols-1 gap-3 sm:grid-cols-4 sm:items-start" aria-label={fabric ? t(`${area}.rolls.edit`, { name: fabric.name }) : t(`${area}.form.add`)}>
      {text('name', t(`${area}.form.name`), 'name', 'text', t(`${area}.form.nameHint`))}
      {text('composition', t(`${area}.form.composition`), 'composition', 'text', t(`${area}.form.compositionHint`))}
      {text('width', t(`${area}.form.width`, { unit: fmt().fabricWidthUnit }), 'widthMm', imperial ? 'text' : 'number', t(`${area}.form.widthHint`))}
      {text('price', t(`${area}.form.price.${d.priceUnit}`, { currency }), 'priceMinor', 'text', t(`${area}.form.priceHint`))}
      {imperial ? null : <div>
        <label className="field-label" htmlFor={`${prefix}-priceUnit`}>{t(`${area}.form.priceUnit`)}</label>
        <select id={`${prefix}-priceUnit`} className="field-input" value={d.priceUnit} onChange={(e) => setD({ ...d, priceUnit: e.target.value === 'yard' ? 'yard' : 'metre' })}>
          <option value="metre">{t(`${area}.form.metre`)}</option>
          <option value="yard">{t(`${area}.form.yard`)}</option>
        </select>
      </div>}
      {text('shrinkageLength', t(`${area}.form.shrinkAlong`), 'shrinkageLengthPercent', french ? 'text' : 'number', t(`${area}.form.shrinkAlongHint`))}
      {text('shrinkageWidth', t(`${area}.form.shrinkAcross`), 'shrinkageWidthPercent', french ? 'text' : 'number', t(`${area}.form.shrinkAcrossHint`))}
      {text('maxPlies', t(`${area}.form.maxPlies`), 'maxPlies', 'number')}
      <div>
        <label className="field-label" htmlFor={`${prefix}-supplier`}>{t(`${area}.form.supplier`)}</label>
        <select id={`${prefix}-supplier`} className="field-input" value={d.supplierId} onChange={(e) => setD({ ...d, supplierId: e.target.value })} aria-invalid={Boolean(errors.supplierId)}>
          <option value="">{t(`${area}.form.notSet`)}</option>
          {(suppliers.data ?? []).map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
        {errors.supplierId ? <FieldError>{errors.supplierId}</FieldError> : null}
      </div>
      <label className="flex items-center gap-2 pt-6 text-sm">
        <input type="checkbox" checked={d.isDirectional} onChange={(e) => setD({ ...d, isDirectional: e.target.checked })} />
        {t(`${area}.form.oneWay`)}
      </label>
      <div className="col-span-full flex items-center gap-3">
        <button type="submit" className="btn-primary" disabled={save.isPending}>{fabric ? t(`${area}.form.save`) : t(`${area}.form.addButton`)}</button>
        {save.isSuccess ? <p className="text-sm text-thread-800" role="status">{t('common.saved')}</p> : null}
      </div>
      {save.error && !Object.keys(serverErrors).length ? <div className="col-span-full"><ErrorNote error={save.error} /></div> : null}
    </form>
  );
}
