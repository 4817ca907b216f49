import { createColumnHelper } from '@tanstack/react-table';
import type { StyleDto } from '@shared/schemas/styles';
import { Badge } from '@/components/ui/page';
import { i18n } from '@/lib/i18n';

const c = createColumnHelper<StyleDto>();
const tone = { draft: 'grey', sampling: 'gold', approved: 'teal', archived: 'grey' } as const;

export const styleColumns = [
  c.accessor('code', { header: () => i18n.t('lists.code'), cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('name', { header: () => i18n.t('lists.name') }),
  c.accessor((s) => s.sizeRun.join(' · '), { id: 'sizeRun', header: () => i18n.t('lists.sizeRun'), enableSorting: false }),
  c.accessor('baseSize', { header: () => i18n.t('lists.baseSize') }),
  c.accessor('status', { header: () => i18n.t('lists.status'), cell: (i) => <Badge tone={tone[i.getValue()]}>{i18n.t(`styleStatus.${i.getValue()}`)}</Badge> }),
];
