import { createColumnHelper } from '@tanstack/react-table';
import type { BatchDto } from '@shared/schemas/batches';
import { Badge } from '@/components/ui/page';
import { formatDate } from '@/lib/format';

const c = createColumnHelper<BatchDto>();
export const batchTone = { planned: 'blue', cutting: 'gold', sewing: 'teal', finishing: 'teal', shipped: 'grey', cancelled: 'red' } as const;

export const batchColumns = [
  c.accessor('code', { header: 'Batch', cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('styleName', { header: 'Style' }),
  c.accessor((b) => Object.entries(b.quantities).map(([s, n]) => `${s} ${n}`).join(' · '), { id: 'sizes', header: 'Quantity per size', enableSorting: false }),
  c.accessor('total', { header: 'Total' }),
  c.accessor('dueDate', { header: 'Due', cell: (i) => formatDate(i.getValue()) }),
  c.accessor('status', { header: 'Status', cell: (i) => <Badge tone={batchTone[i.getValue()]}>{i.getValue()}</Badge> }),
];
