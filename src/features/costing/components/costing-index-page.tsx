import { useSuspenseQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { useNavigate } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { DataTable } from '@/components/ui/data-table';
import { PageHeader } from '@/components/ui/page';
import { costingQueries } from '../api/costing-queries';
import { paths } from '@/config/paths';
import { i18n, useTranslation } from '@/lib/i18n';

const c = createColumnHelper<BatchDto>();
const columns = [
  c.accessor('code', { header: () => i18n.t('lists.batch'), cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('styleName', { header: () => i18n.t('lists.style') }),
  c.accessor('total', { header: () => i18n.t('lists.garments') }),
  c.accessor('status', { header: () => i18n.t('lists.status'), cell: (i) => i18n.t(`status.${i.getValue()}`) }),
];

/** Every batch, each opening its costing sheet. */
export function CostingIndexPage() {
  const { t } = useTranslation();
  const { data } = useSuspenseQuery(costingQueries.batches());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title={t('lists.costing')} subtitle={t('lists.costingSubtitle')} />
      <DataTable data={data} columns={columns} filterPlaceholder={t('lists.filterBatches')} onRowClick={(b) => navigate(paths.batchCosting.getHref(b.id))} />
    </>
  );
}
