import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Card, ErrorNote } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { purchasingQueries, useCreateOrders } from '../api/purchasing-queries';
import { quantityText } from './quantity-text';
import { paths } from '@/config/paths';

/** On the batch page: fabric and trims still to order, net of stock and open orders. */
export function NeedsPanel({ batch }: { batch: BatchDto }) {
  const allowed = useCan('suppliers:manage');
  const { data: needs } = useQuery({ ...purchasingQueries.needs(batch.id), enabled: allowed });
  const create = useCreateOrders();
  if (!allowed) return null;
  const toOrder = (needs ?? []).filter((n) => n.toOrder > 0);
  return (
    <Card title="Materials to order">
      <ul className="mb-3 divide-y divide-calico-200 text-sm">
        {(needs ?? []).map((n) => (
          <li key={`${n.kind}-${n.refId}`} className="flex flex-wrap justify-between gap-2 py-2">
            <span><span className="mr-2 text-xs uppercase text-ink-600">{n.kind}</span>{n.item}</span>
            <span className="text-ink-700">
              need {quantityText(n.required, n.unit)} · in stock {quantityText(n.inStock, n.unit)} · on order {quantityText(n.onOrder, n.unit)} ·{' '}
              <strong>to order {quantityText(n.toOrder, n.unit)}</strong> {n.supplierName ? `from ${n.supplierName}` : '(no supplier)'}
            </span>
          </li>
        ))}
      </ul>
      <ErrorNote error={create.error} />
      {create.data ? <p role="status" className="mb-2 text-sm text-thread-800">{create.data.orders.length} draft purchase orders made.</p> : null}
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-primary" disabled={!toOrder.length || create.isPending} onClick={() => create.mutate(batch.id)}>
          Make purchase orders
        </button>
        <Link className="btn-quiet" to={paths.purchasing.getHref()}>Suppliers and orders</Link>
      </div>
    </Card>
  );
}
