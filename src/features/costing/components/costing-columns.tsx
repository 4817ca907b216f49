import { createColumnHelper } from '@tanstack/react-table';
import type { CostingSizeDto } from '@shared/schemas/costing';
import { fmt, formatMoney as money } from '@/lib/format';

const c = createColumnHelper<CostingSizeDto & { currency: string; locale: string }>();
const cash = (v: number, r: { currency: string; locale: string }) => money(v, r.currency);

export const sizeColumns = [
  c.accessor('size', { header: 'Size', cell: (i) => <span className="font-semibold">{i.getValue()}</span> }),
  c.accessor('quantity', { header: 'Garments' }),
  c.accessor('fabricMmPerGarment', { header: 'Fabric per garment', cell: (i) => fmt().fabricLength(i.getValue()) }),
  c.accessor('unitCostMinor', { header: 'Cost per garment', cell: (i) => <span data-testid={`unit-cost-${i.row.original.size}`}>{cash(i.getValue(), i.row.original)}</span> }),
  c.accessor('wholesaleMinor', { header: 'Wholesale', cell: (i) => cash(i.getValue(), i.row.original) }),
  c.accessor('retailMinor', { header: 'Suggested retail', cell: (i) => cash(i.getValue(), i.row.original) }),
  c.accessor('batchCostMinor', { header: 'Batch cost', cell: (i) => cash(i.getValue(), i.row.original) }),
];
