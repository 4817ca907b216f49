import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Card } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { costingQueries } from '../api/costing-queries';
import { formatMoney as money } from '@/lib/format';
import { paths } from '@/config/paths';

/** On the batch page: the headline prices and a link to the full sheet (owner only). */
export function CostingPanel({ batch }: { batch: BatchDto }) {
  const allowed = useCan('costs:read');
  const { data } = useQuery({ ...costingQueries.sheet(batch.id), enabled: allowed });
  if (!allowed) return null;
  return (
    <Card title="Costing">
      {data ? (
        <p className="mb-3 text-sm text-ink-700">
          {money(data.totals.averageUnitCostMinor, data.currency)} a garment on average · wholesale{' '}
          {money(data.totals.wholesaleMinor, data.currency)} · suggested retail {money(data.totals.retailMinor, data.currency)}
        </p>
      ) : null}
      <Link className="btn-primary" to={paths.batchCosting.getHref(batch.id)}>Open costing sheet</Link>
    </Card>
  );
}
