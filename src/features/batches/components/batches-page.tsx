import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router';
import { DataTable } from '@/components/ui/data-table';
import { IconPlus } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { batchQueries } from '../api/batch-queries';
import { batchColumns } from './batch-columns';

export function BatchesPage() {
  const { data } = useSuspenseQuery(batchQueries.list());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title="Batches"
        subtitle="A batch is one style made in a size run, with a due date."
        actions={<Link className="btn-primary" to={paths.newBatch.getHref()}><IconPlus /> New batch</Link>}
      />
      <DataTable data={data} columns={batchColumns} filterPlaceholder="Filter batches…" onRowClick={(b) => navigate(paths.batch.getHref(b.id))} />
    </>
  );
}
