import { createColumnHelper } from '@tanstack/react-table';
import type { CostingSizeDto } from '@shared/schemas/costing';
import { fmt, formatMoney as money } from '@/lib/format';
import { i18n } from '@/lib/i18n';

const c = createColumnHelper<CostingSizeDto & { currency: string; locale: string }>();
const cash = (v: number, r: { currency: string; locale: string }) => money(v, r.currency);

export const sizeColumns = [
  c.accessor('size', { header: () => i18n.t('costingPage.cols.size'), cell: (i) => <span className="font-semibold">{i.getValue()}</span> }),
  c.accessor('quantity', { header: () => i18n.t('lists.garments') }),
  c.accessor('fabricMmPerGarment', { header: () => i18n.t('costingPage.fabricPerGarment'), cell: (i) => fmt().fabricLength(i.getValue()) }),
  c.accessor('unitCostMinor', { header: () => i18n.t('costingPage.cols.cost'), cell: (i) => <span data-testid={`unit-cost-${i.row.original.size}`}>{cash(i.getValue(), i.row.original)}</span> }),
  c.accessor('wholesaleMinor', { header: () => i18n.t('costingPage.cols.wholesale'), cell: (i) => cash(i.getValue(), i.row.original) }),
  c.accessor('retailMinor', { header: () => i18n.t('costingPage.cols.retail'), cell: (i) => cash(i.getValue(), i.row.original) }),
  c.accessor('batchCostMinor', { header: () => i18n.t('costingPage.batchCost'), cell: (i) => cash(i.getValue(), i.row.original) }),
];
