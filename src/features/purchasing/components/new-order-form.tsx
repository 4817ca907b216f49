import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ErrorNote } from '@/components/ui/page';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { purchasingQueries, useCreateOrder } from '../api/purchasing-queries';
import { area } from '../words';
import { readFabricInput, trimByYard, unitText } from './quantity-text';

/** A draft order by hand: a supplier, one fabric or trim, how much, and the batch it is for. */
export function NewOrderForm() {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.newOrder.${key}`, values);
  const { data: suppliers } = useSuspenseQuery(purchasingQueries.suppliers());
  const { data: items } = useSuspenseQuery(purchasingQueries.items());
  const { data: batches } = useSuspenseQuery(purchasingQueries.batches());
  const create = useCreateOrder();
  const [itemKey, setItemKey] = useState(items[0] ? `${items[0].kind}-${items[0].refId}` : '');
  const item = items.find((i) => `${i.kind}-${i.refId}` === itemKey);
  const [supplierId, setSupplierId] = useState<number>(item?.supplierId ?? suppliers[0]?.id ?? 0);
  const [quantity, setQuantity] = useState('');
  const [batchId, setBatchId] = useState<number>(0);
  const [error, setError] = useState('');
  const byYard = item?.kind === 'trim' && trimByYard(item.unit);
  const unit = item?.kind === 'fabric' || byYard ? fmt().fabricLengthUnit : unitText(item?.unit ?? '');
  const handleItem = (key: string) => {
    setItemKey(key);
    const next = items.find((i) => `${i.kind}-${i.refId}` === key);
    if (next?.supplierId) setSupplierId(next.supplierId);
  };
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const mm = item?.kind === 'fabric' || byYard ? readFabricInput(quantity) : null;
    const q = item?.kind === 'fabric' ? mm : byYard ? (mm === null ? null : mm / 1000) : Number(quantity.replace(',', '.'));
    if (!item || q === null || !(q > 0)) return setError(w('howMuch'));
    setError('');
    await create.mutateAsync({ supplierId, batchId: batchId || null, lines: [{ kind: item.kind, refId: item.refId, quantity: q }] });
    setQuantity('');
  };
  return (
    <form onSubmit={handleSubmit} className="grid gap-3 sm:grid-cols-5 sm:items-end" aria-label={w('label')} noValidate>
      <label className="text-sm">
        <span className="field-label">{w('item')}</span>
        <select aria-label={w('item')} className="field-input" value={itemKey} onChange={(e) => handleItem(e.target.value)}>
          {items.map((i) => <option key={`${i.kind}-${i.refId}`} value={`${i.kind}-${i.refId}`}>{i.kind === 'fabric' ? w('fabric', { item: i.item }) : i.item}</option>)}
        </select>
      </label>
      <label className="text-sm">
        <span className="field-label">{w('supplier')}</span>
        <select aria-label={w('supplier')} className="field-input" value={supplierId} onChange={(e) => setSupplierId(Number(e.target.value))}>
          {suppliers.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </label>
      <label className="text-sm">
        <span className="field-label">{unit ? w('quantity', { unit }) : w('quantityLabel')}</span>
        <input aria-label={w('quantityLabel')} className="field-input" inputMode="decimal" value={quantity} onChange={(e) => setQuantity(e.target.value)} />
        {error ? <span className="field-error">{error}</span> : null}
      </label>
      <label className="text-sm">
        <span className="field-label">{w('forBatch')}</span>
        <select aria-label={w('forBatch')} className="field-input" value={batchId} onChange={(e) => setBatchId(Number(e.target.value))}>
          <option value={0}>{w('noBatch')}</option>
          {batches.map((b) => <option key={b.id} value={b.id}>{b.code} · {b.styleName}</option>)}
        </select>
      </label>
      <div>
        <button className="btn-quiet" type="submit" disabled={create.isPending}>{w('make')}</button>
        <ErrorNote error={create.error} />
      </div>
    </form>
  );
}
