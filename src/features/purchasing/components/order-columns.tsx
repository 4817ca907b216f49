import { createColumnHelper } from '@tanstack/react-table';
import type { PurchaseOrderDto } from '@shared/schemas/purchasing';
import { Badge } from '@/components/ui/page';
import { formatDate, formatMoney as money } from '@/lib/format';
import { i18n } from '@/lib/i18n';
import { area } from '../words';
import { quantityText } from './quantity-text';

const c = createColumnHelper<PurchaseOrderDto & { currency: string; actions: React.ReactNode }>();
export const statusTone = { draft: 'grey', sent: 'blue', confirmed: 'gold', received: 'teal' } as const;

const col = (key: string) => () => i18n.t(`${area}.cols.${key}`);

export const orderColumns = [
  c.accessor('number', { header: col('order'), cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('supplierName', { header: col('supplier') }),
  c.accessor((o) => o.lines.map((l) => `${l.item} ${quantityText(l.quantity, l.unit)}`).join(' · '), { id: 'lines', header: col('lines'), enableSorting: false }),
  c.accessor('totalMinor', { header: col('total'), cell: (i) => money(i.getValue(), i.row.original.currency) }),
  c.accessor('deliveryDate', { header: col('delivery'), cell: (i) => (i.getValue() ? formatDate(i.getValue()!) : '—') }),
  c.accessor('status', { header: col('status'), cell: (i) => <Badge tone={statusTone[i.getValue()]}>{i18n.t(`${area}.status.${i.getValue()}`)}</Badge> }),
  c.display({ id: 'actions', header: '', cell: (i) => i.row.original.actions }),
];
