import { useState } from 'react';
import type { PurchaseOrderDto } from '@shared/schemas/purchasing';
import { ErrorNote } from '@/components/ui/page';
import { useReceiveOrder } from '../api/purchasing-queries';
import { quantityText } from './quantity-text';

/** Receive an order into stock: one roll per fabric line (label, length, shade lot), counts for trims. */
export function ReceiveForm({ order, onDone }: { order: PurchaseOrderDto; onDone: () => void }) {
  const receive = useReceiveOrder();
  const [v, setV] = useState(() =>
    order.lines.map((l, i) => ({ label: `${order.number}-R${i + 1}`, metres: (Math.max(0, l.quantity - l.receivedQuantity) / 1000).toFixed(1), shadeLot: 'A', quantity: String(Math.max(0, l.quantity - l.receivedQuantity)) })),
  );
  const set = (i: number, k: keyof (typeof v)[number], value: string) => setV(v.map((x, j) => (j === i ? { ...x, [k]: value } : x)));
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const lines = order.lines.map((l, i) =>
      l.kind === 'fabric'
        ? { index: i, rolls: [{ label: v[i].label, lengthMm: Math.round(Number(v[i].metres) * 1000), shadeLot: v[i].shadeLot }] }
        : { index: i, quantity: Number(v[i].quantity) },
    );
    await receive.mutateAsync({ id: order.id, lines });
    onDone();
  };
  return (
    <form onSubmit={handleSubmit} className="card mt-3 space-y-3 p-4 text-sm" aria-label={`Receive ${order.number}`}>
      <h3 className="font-semibold text-thread-800">Receive {order.number} into stock</h3>
      {order.lines.map((l, i) => (
        <div key={i} className="grid gap-2 sm:grid-cols-4 sm:items-end">
          <span className="sm:col-span-1">{l.item} ({quantityText(l.quantity, l.unit)} ordered)</span>
          {l.kind === 'fabric' ? (
            <>
              <label>Roll label<input className="field-input" value={v[i].label} onChange={(e) => set(i, 'label', e.target.value)} /></label>
              <label>Length (m)<input className="field-input" inputMode="decimal" value={v[i].metres} onChange={(e) => set(i, 'metres', e.target.value)} /></label>
              <label>Shade lot<input className="field-input" value={v[i].shadeLot} onChange={(e) => set(i, 'shadeLot', e.target.value)} /></label>
            </>
          ) : (
            <label>Received ({l.unit})<input className="field-input" inputMode="decimal" value={v[i].quantity} onChange={(e) => set(i, 'quantity', e.target.value)} /></label>
          )}
        </div>
      ))}
      <ErrorNote error={receive.error} />
      <div className="flex gap-2">
        <button className="btn-primary" type="submit" disabled={receive.isPending}>Receive into stock</button>
        <button className="btn-quiet" type="button" onClick={onDone}>Cancel</button>
      </div>
    </form>
  );
}
