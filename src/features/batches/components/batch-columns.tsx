import { createColumnHelper } from '@tanstack/react-table';
import type { BatchDto } from '@shared/schemas/batches';
import { Badge } from '@/components/ui/page';
import { formatDate } from '@/lib/format';
import { i18n } from '@/lib/i18n';

const c = createColumnHelper<BatchDto>();
export const batchTone = { planned: 'blue', cutting: 'gold', sewing: 'teal', finishing: 'teal', shipped: 'grey', cancelled: 'red' } as const;

export const batchColumns = [
  c.accessor('code', { header: () => i18n.t('lists.batch'), cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('styleName', { header: () => i18n.t('lists.style') }),
  c.accessor((b) => Object.entries(b.quantities).map(([s, n]) => `${s} ${n}`).join(' · '), { id: 'sizes', header: () => i18n.t('lists.quantityPerSize'), enableSorting: false }),
  c.accessor('total', { header: () => i18n.t('lists.total') }),
  c.accessor('dueDate', { header: () => i18n.t('lists.due'), cell: (i) => formatDate(i.getValue()) }),
  c.accessor('status', { header: () => i18n.t('lists.status'), cell: (i) => <Badge tone={batchTone[i.getValue()]}>{i18n.t(`status.${i.getValue()}`)}</Badge> }),
];
