import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Card } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { costingQueries } from '../api/costing-queries';
import { formatMoney as money } from '@/lib/format';
import { paths } from '@/config/paths';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

/** On the batch page: the headline prices and a link to the full sheet (owner only). */
export function CostingPanel({ batch }: { batch: BatchDto }) {
  const { t } = useTranslation();
  const allowed = useCan('costs:read');
  const { data } = useQuery({ ...costingQueries.sheet(batch.id), enabled: allowed });
  if (!allowed) return null;
  return (
    <Card title={t(`${area}.panel.title`)}>
      {data ? (
        <p className="mb-3 text-sm text-ink-700">
          {t(`${area}.panel.summary`, {
            average: money(data.totals.averageUnitCostMinor, data.currency),
            wholesale: money(data.totals.wholesaleMinor, data.currency),
            retail: money(data.totals.retailMinor, data.currency),
          })}
        </p>
      ) : null}
      <Link className="btn-primary" to={paths.batchCosting.getHref(batch.id)}>{t(`${area}.panel.open`)}</Link>
    </Card>
  );
}
