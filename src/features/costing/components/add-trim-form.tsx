import { useMutation, useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { CreateTrimInput, TrimDto } from '@shared/schemas/costing';
import { parseMajor } from '@shared/units/money';
import { ErrorNote } from '@/components/ui/page';
import { ApiError, api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { purchasingQueries } from '@/features/purchasing/api/purchasing-queries';
import { costingQueries } from '../api/costing-queries';

const EXAMPLES = ['Invisible zip 22 in', 'Shoulder pads (pair)', 'Thread', 'Care label', 'Hook and eye'];

/** Add a trim of the style to its bill of materials: zips, buttons, shoulder pads, thread, labels. */
export function AddTrimForm({ styleId, currency }: { styleId: number; currency: string }) {
  const suppliers = useQuery(purchasingQueries.suppliers());
  const [d, setD] = useState({ name: '', unit: 'pcs', quantity: '1', price: '', supplierId: '' });
  const [local, setLocal] = useState<Record<string, string>>({});
  const add = useMutation({
    mutationFn: async (v: CreateTrimInput) => (await api.post<{ trim: TrimDto }>(`/costing/styles/${styleId}/trims`, v)).trim,
    onSuccess: async () => {
      setD({ name: '', unit: 'pcs', quantity: '1', price: '', supplierId: d.supplierId });
      await queryClient.invalidateQueries({ queryKey: costingQueries.all().queryKey });
    },
  });
  const fields = { ...(add.error instanceof ApiError ? add.error.fields : {}), ...local };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const problems: Record<string, string> = {};
    const price = parseMajor(d.price, currency);
    if (price === null) problems.unitPriceMinor = 'Enter a price such as 35.00';
    const quantity = Number(d.quantity);
    if (!d.quantity.trim() || !Number.isFinite(quantity)) problems.quantityPerGarment = 'Enter how many per garment';
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
    <form onSubmit={submit} className="grid grid-cols-2 gap-3 sm:grid-cols-6 sm:items-end" aria-label="Add a trim">
      <div className="col-span-2">{field('name', 'Trim', 'name', { list: 'trim-examples', placeholder: 'e.g. Invisible zip 22 in' })}</div>
      <datalist id="trim-examples">{EXAMPLES.map((x) => <option key={x} value={x} />)}</datalist>
      {field('quantity', 'Per garment', 'quantityPerGarment', { inputMode: 'decimal' })}
      {field('unit', 'Unit', 'unit')}
      {field('price', `Unit price (${currency})`, 'unitPriceMinor', { inputMode: 'decimal' })}
      <div>
        <label className="field-label" htmlFor="trim-supplier">Supplier</label>
        <select id="trim-supplier" className="field-input" value={d.supplierId} onChange={(e) => setD({ ...d, supplierId: e.target.value })}>
          <option value="">Not set</option>
          {(suppliers.data ?? []).map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </div>
      <div className="col-span-full"><button type="submit" className="btn-primary" disabled={add.isPending}>Add trim</button></div>
      {add.error && !Object.keys(fields).length ? <div className="col-span-full"><ErrorNote error={add.error} /></div> : null}
    </form>
  );
}
