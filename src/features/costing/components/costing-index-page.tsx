import { useSuspenseQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { useNavigate } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { DataTable } from '@/components/ui/data-table';
import { PageHeader } from '@/components/ui/page';
import { costingQueries } from '../api/costing-queries';
import { paths } from '@/config/paths';

const c = createColumnHelper<BatchDto>();
const columns = [
  c.accessor('code', { header: 'Batch', cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('styleName', { header: 'Style' }),
  c.accessor('total', { header: 'Garments' }),
  c.accessor('status', { header: 'Status' }),
];

/** Every batch, each opening its costing sheet. */
export function CostingIndexPage() {
  const { data } = useSuspenseQuery(costingQueries.batches());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Costing" subtitle="Open a batch to price it from its marker, bill of materials and operations." />
      <DataTable data={data} columns={columns} filterPlaceholder="Filter batches…" onRowClick={(b) => navigate(paths.batchCosting.getHref(b.id))} />
    </>
  );
}
