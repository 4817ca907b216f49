import { createColumnHelper } from '@tanstack/react-table';
import type { PurchaseOrderDto } from '@shared/schemas/purchasing';
import { Badge } from '@/components/ui/page';
import { formatMoney as money } from '@/lib/format';
import { quantityText } from './quantity-text';

const c = createColumnHelper<PurchaseOrderDto & { currency: string; actions: React.ReactNode }>();
export const statusTone = { draft: 'grey', sent: 'blue', confirmed: 'gold', received: 'teal' } as const;

export const orderColumns = [
  c.accessor('number', { header: 'Order', cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('supplierName', { header: 'Supplier' }),
  c.accessor((o) => o.lines.map((l) => `${l.item} ${quantityText(l.quantity, l.unit)}`).join(' · '), { id: 'lines', header: 'Lines', enableSorting: false }),
  c.accessor('totalMinor', { header: 'Total', cell: (i) => money(i.getValue(), i.row.original.currency) }),
  c.accessor('deliveryDate', { header: 'Delivery by' }),
  c.accessor('status', { header: 'Status', cell: (i) => <Badge tone={statusTone[i.getValue()]}>{i.getValue()}</Badge> }),
  c.display({ id: 'actions', header: '', cell: (i) => i.row.original.actions }),
];
