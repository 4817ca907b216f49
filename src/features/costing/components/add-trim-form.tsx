import { useMutation, useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { CreateTrimInput, TrimDto } from '@shared/schemas/costing';
import { parseMajor } from '@shared/units/money';
import { ErrorNote } from '@/components/ui/page';
import { ApiError, api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { purchasingQueries } from '@/features/purchasing/api/purchasing-queries';
import { useTranslation } from '@/lib/i18n';
import { costingQueries } from '../api/costing-queries';
import { area } from '../words';

const EXAMPLES = ['zip', 'pads', 'thread', 'care', 'hook'] as const;

/** Add a trim of the style to its bill of materials: zips, buttons, shoulder pads, thread, labels. */
export function AddTrimForm({ styleId, currency }: { styleId: number; currency: string }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.trim.${key}`, values);
  const suppliers = useQuery(purchasingQueries.suppliers());
  const [d, setD] = useState({ name: '', unit: w('defaultUnit'), quantity: '1', price: '', supplierId: '' });
  const [local, setLocal] = useState<Record<string, string>>({});
  const add = useMutation({
    mutationFn: async (v: CreateTrimInput) => (await api.post<{ trim: TrimDto }>(`/costing/styles/${styleId}/trims`, v)).trim,
    onSuccess: async () => {
      setD({ name: '', unit: w('defaultUnit'), quantity: '1', price: '', supplierId: d.supplierId });
      await queryClient.invalidateQueries({ queryKey: costingQueries.all().queryKey });
    },
  });
  const fields = { ...(add.error instanceof ApiError ? add.error.fields : {}), ...local };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const problems: Record<string, string> = {};
    const price = parseMajor(d.price, currency);
    if (price === null) problems.unitPriceMinor = w('priceNeeded', { example: '35.00' });
    const quantity = Number(d.quantity);
    if (!d.quantity.trim() || !Number.isFinite(quantity)) problems.quantityPerGarment = w('quantityNeeded');
    setLocal(problems);
    if (Object.keys(problems).length) return;
    add.mutate({ name: d.name, unit: d.unit, quantityPerGarment: quantity, unitPriceMinor: price ?? 0, supplierId: d.supplierId ? Number(d.supplierId) : null });
  };
  const field = (key: keyof typeof d, label: string, err: string, extra: Record<string, string> = {}) => (
    <div>
      <label className="field-label" htmlFor={`trim-${key}`}>{label}</label>
      <input id={`trim-${key}`} className="field-input" value={d[key]} onChange={(e) => setD({ ...d, [key]: e.target.value })} aria-invalid={Boolean(fields[err])} {...extra} />
      {fields[err] ? <p className="field-error">{fields[err]}</p> : null}
    </div>
  );
  return (
    <form onSubmit={submit} className="grid grid-cols-2 gap-3 sm:grid-cols-6 sm:items-end" aria-label={w('form')}>
      <div className="col-span-2">{field('name', w('name'), 'name', { list: 'trim-examples', placeholder: w('examplePlaceholder', { example: w('examples.zip') }) })}</div>
      <datalist id="trim-examples">{EXAMPLES.map((x) => <option key={x} value={w(`examples.${x}`)} />)}</datalist>
      {field('quantity', w('perGarment'), 'quantityPerGarment', { inputMode: 'decimal' })}
      {field('unit', w('unit'), 'unit')}
      {field('price', w('unitPrice', { currency }), 'unitPriceMinor', { inputMode: 'decimal' })}
      <div>
        <label className="field-label" htmlFor="trim-supplier">{w('supplier')}</label>
        <select id="trim-supplier" className="field-input" value={d.supplierId} onChange={(e) => setD({ ...d, supplierId: e.target.value })}>
          <option value="">{w('notSet')}</option>
          {(suppliers.data ?? []).map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </div>
      <div className="col-span-full"><button type="submit" className="btn-primary" disabled={add.isPending}>{w('add')}</button></div>
      {add.error && !Object.keys(fields).length ? <div className="col-span-full"><ErrorNote error={add.error} /></div> : null}
    </form>
  );
}
