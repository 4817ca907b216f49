import { createColumnHelper } from '@tanstack/react-table';
import type { StyleDto } from '@shared/schemas/styles';
import { Badge } from '@/components/ui/page';

const c = createColumnHelper<StyleDto>();
const tone = { draft: 'grey', sampling: 'gold', approved: 'teal', archived: 'grey' } as const;

export const styleColumns = [
  c.accessor('code', { header: 'Code', cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  c.accessor('name', { header: 'Name' }),
  c.accessor((s) => s.sizeRun.join(' · '), { id: 'sizeRun', header: 'Size run', enableSorting: false }),
  c.accessor('baseSize', { header: 'Base size' }),
  c.accessor('status', { header: 'Status', cell: (i) => <Badge tone={tone[i.getValue()]}>{i.getValue()}</Badge> }),
];
