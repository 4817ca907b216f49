import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Card, ErrorNote } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { purchasingQueries, useCreateOrders } from '../api/purchasing-queries';
import { quantityText } from './quantity-text';
import { paths } from '@/config/paths';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

/** On the batch page: fabric and trims still to order, net of stock and open orders. */
export function NeedsPanel({ batch }: { batch: BatchDto }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.needs.${key}`, values);
  const allowed = useCan('suppliers:manage');
  const { data: needs } = useQuery({ ...purchasingQueries.needs(batch.id), enabled: allowed });
  const create = useCreateOrders();
  if (!allowed) return null;
  const toOrder = (needs ?? []).filter((n) => n.toOrder > 0);
  return (
    <Card title={w('title')}>
      <ul className="mb-3 divide-y divide-calico-200 text-sm">
        {(needs ?? []).map((n) => (
          <li key={`${n.kind}-${n.refId}`} className="flex flex-wrap justify-between gap-2 py-2">
            <span><span className="mr-2 text-xs uppercase text-ink-600">{t(`${area}.kinds.${n.kind}`)}</span>{n.item}</span>
            <span className="text-ink-700">
              {w('line', { required: quantityText(n.required, n.unit), inStock: quantityText(n.inStock, n.unit), onOrder: quantityText(n.onOrder, n.unit) })}
              <strong>{w('toOrder', { quantity: quantityText(n.toOrder, n.unit) })}</strong>{' '}
              {n.supplierName ? w('from', { supplier: n.supplierName }) : w('noSupplier')}
            </span>
          </li>
        ))}
      </ul>
      <ErrorNote error={create.error} />
      {create.data ? <p role="status" className="mb-2 text-sm text-thread-800">{w('made', { count: create.data.orders.length })}</p> : null}
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-primary" disabled={!toOrder.length || create.isPending} onClick={() => create.mutate(batch.id)}>
          {w('make')}
        </button>
        <Link className="btn-quiet" to={paths.purchasing.getHref()}>{w('link')}</Link>
      </div>
    </Card>
  );
}
