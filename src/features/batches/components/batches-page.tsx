import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router';
import { DataTable } from '@/components/ui/data-table';
import { IconPlus } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { useTranslation } from '@/lib/i18n';
import { batchQueries } from '../api/batch-queries';
import { batchColumns } from './batch-columns';

export function BatchesPage() {
  const { t } = useTranslation();
  const { data } = useSuspenseQuery(batchQueries.list());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title={t('lists.batches')}
        subtitle={t('lists.batchesSubtitle')}
        actions={<Link className="btn-primary" to={paths.newBatch.getHref()}><IconPlus /> {t('lists.newBatch')}</Link>}
      />
      <DataTable data={data} columns={batchColumns} filterPlaceholder={t('lists.filterBatches')} onRowClick={(b) => navigate(paths.batch.getHref(b.id))} />
    </>
  );
}
