import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ErrorNote } from '@/components/ui/page';
import { purchasingQueries, useCreateOrder } from '../api/purchasing-queries';

/** A draft order by hand: a supplier, one fabric or trim, how much, and the batch it is for. */
export function NewOrderForm() {
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
  const unit = item?.kind === 'fabric' ? 'm' : item?.unit ?? '';
  const handleItem = (key: string) => {
    setItemKey(key);
    const next = items.find((i) => `${i.kind}-${i.refId}` === key);
    if (next?.supplierId) setSupplierId(next.supplierId);
  };
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const q = Number(quantity);
    if (!item || !(q > 0)) return setError('Enter how much to order');
    setError('');
    await create.mutateAsync({ supplierId, batchId: batchId || null, lines: [{ kind: item.kind, refId: item.refId, quantity: item.kind === 'fabric' ? Math.round(q * 1000) : q }] });
    setQuantity('');
  };
  return (
    <form onSubmit={handleSubmit} className="grid gap-3 sm:grid-cols-5 sm:items-end" aria-label="New purchase order" noValidate>
      <label className="text-sm">
        <span className="field-label">Item</span>
        <select aria-label="Item" className="field-input" value={itemKey} onChange={(e) => handleItem(e.target.value)}>
          {items.map((i) => <option key={`${i.kind}-${i.refId}`} value={`${i.kind}-${i.refId}`}>{i.kind === 'fabric' ? 'Fabric: ' : ''}{i.item}</option>)}
        </select>
      </label>
      <label className="text-sm">
        <span className="field-label">Supplier</span>
        <select aria-label="Supplier" className="field-input" value={supplierId} onChange={(e) => setSupplierId(Number(e.target.value))}>
          {suppliers.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </label>
      <label className="text-sm">
        <span className="field-label">Quantity ({unit})</span>
        <input aria-label="Quantity to order" className="field-input" inputMode="decimal" value={quantity} onChange={(e) => setQuantity(e.target.value)} />
        {error ? <span className="field-error">{error}</span> : null}
      </label>
      <label className="text-sm">
        <span className="field-label">For batch</span>
        <select aria-label="For batch" className="field-input" value={batchId} onChange={(e) => setBatchId(Number(e.target.value))}>
          <option value={0}>No batch (stock)</option>
          {batches.map((b) => <option key={b.id} value={b.id}>{b.code} · {b.styleName}</option>)}
        </select>
      </label>
      <div>
        <button className="btn-quiet" type="submit" disabled={create.isPending}>Make draft order</button>
        <ErrorNote error={create.error} />
      </div>
    </form>
  );
}
