import { useState } from 'react';
import type { PurchaseOrderDto } from '@shared/schemas/purchasing';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useReceiveOrder } from '../api/purchasing-queries';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';
import { fabricInputText, quantityText, readFabricInput, trimByYard, unitText } from './quantity-text';

/** Receive an order into stock: one roll per fabric line (label, length, shade lot), counts for trims. */
export function ReceiveForm({ order, onDone, onRefill }: { order: PurchaseOrderDto; onDone: () => void; onRefill?: () => void }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.receiveForm.${key}`, values);
  const receive = useReceiveOrder();
  // One key for this form's receipt: a second tap or a retry after a dropped answer sends it again, and the
  // server adds the goods once. The revision it was filled from makes a form left open while someone else
  // received the order fail plainly instead of adding the same goods again.
  // (getRandomValues, not randomUUID: the studio may serve the app over plain http on its own network.)
  const [revision] = useState(order.revision);
  const [receiptKey] = useState(() => `rcpt-${order.id}-${Array.from(crypto.getRandomValues(new Uint8Array(12)), (b) => b.toString(16).padStart(2, '0')).join('')}`);
  const [v, setV] = useState(() =>
    order.lines.map((l, i) => ({ label: `${order.number}-R${i + 1}`, metres: fabricInputText(Math.max(0, l.quantity - l.receivedQuantity)), shadeLot: 'A', quantity: trimByYard(l.unit) ? fabricInputText(Math.max(0, l.quantity - l.receivedQuantity) * 1000) : String(Math.max(0, l.quantity - l.receivedQuantity)) })),
  );
  const [lengthErrors, setLengthErrors] = useState<Record<number, string>>({});
  const set = (i: number, k: keyof (typeof v)[number], value: string) => setV(v.map((x, j) => (j === i ? { ...x, [k]: value } : x)));
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const lengths = order.lines.map((l, i) => (l.kind === 'fabric' ? readFabricInput(v[i].metres) : null));
    const bad = Object.fromEntries(
      order.lines.flatMap((l, i) => (l.kind === 'fabric' && lengths[i] === null ? [[i, w('lengthNeeded', { example: fmt().number(12.5) })]] : [])),
    );
    setLengthErrors(bad);
    if (Object.keys(bad).length) return;
    const lines = order.lines.map((l, i) =>
      l.kind === 'fabric'
        ? { index: i, rolls: [{ label: v[i].label, lengthMm: lengths[i] ?? 0, shadeLot: v[i].shadeLot }] }
        : { index: i, quantity: trimByYard(l.unit) ? (readFabricInput(v[i].quantity) ?? Number.NaN) / 1000 : Number(v[i].quantity) },
    );
    await receive.mutateAsync({ id: order.id, receiptKey, revision, lines });
    onDone();
  };
  return (
    <form onSubmit={handleSubmit} className="card mt-3 space-y-3 p-4 text-sm" aria-label={w('label', { number: order.number })}>
      <h3 className="font-semibold text-thread-800">{w('title', { number: order.number })}</h3>
      {order.lines.map((l, i) => (
        <div key={i} className="grid gap-2 sm:grid-cols-4 sm:items-end">
          <span className="sm:col-span-1">{w('ordered', { item: l.item, quantity: quantityText(l.quantity, l.unit) })}</span>
          {l.kind === 'fabric' ? (
            <>
              <label>{w('rollLabel')}<input className="field-input" value={v[i].label} onChange={(e) => set(i, 'label', e.target.value)} /></label>
              <label>
                {w('length', { unit: fmt().fabricLengthUnit })}
                <input className="field-input" inputMode="decimal" value={v[i].metres} onChange={(e) => set(i, 'metres', e.target.value)} aria-invalid={Boolean(lengthErrors[i])} />
                {lengthErrors[i] ? <span className="field-error block">{lengthErrors[i]}</span> : null}
              </label>
              <label>{w('shadeLot')}<input className="field-input" value={v[i].shadeLot} onChange={(e) => set(i, 'shadeLot', e.target.value)} /></label>
            </>
          ) : (
            <label>{w('received', { unit: trimByYard(l.unit) ? fmt().fabricLengthUnit : unitText(l.unit) })}<input className="field-input" inputMode="decimal" value={v[i].quantity} onChange={(e) => set(i, 'quantity', e.target.value)} /></label>
          )}
        </div>
      ))}
      <ErrorNote error={receive.error} />
      {onRefill && receive.error instanceof ApiError && receive.error.fields.revision ? (
        <button className="btn-quiet" type="button" onClick={onRefill}>{w('refill')}</button>
      ) : null}
      <div className="flex gap-2">
        <button className="btn-primary" type="submit" disabled={receive.isPending}>{w('submit')}</button>
        <button className="btn-quiet" type="button" onClick={onDone}>{w('cancel')}</button>
      </div>
    </form>
  );
}
