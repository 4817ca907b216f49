import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '@/components/ui/data-table';
import { PageHeader } from '@/components/ui/page';
import { api } from '@/lib/api-client';

interface AuditEntry {
  id: number;
  userName: string;
  action: string;
  entity: string;
  entityId: number | null;
  before: string;
  after: string;
  createdAt: string;
}

export const auditQueries = {
  list: () => queryOptions({ queryKey: ['audit', 'list'], queryFn: async () => (await api.get<{ entries: AuditEntry[] }>('/audit')).entries }),
};

const c = createColumnHelper<AuditEntry>();
const columns = [
  c.accessor('createdAt', { header: 'When', cell: (i) => new Date(i.getValue()).toLocaleString() }),
  c.accessor('userName', { header: 'Who' }),
  c.accessor('action', { header: 'What' }),
  c.accessor((e) => `${e.entity}${e.entityId ? ` #${e.entityId}` : ''}`, { id: 'record', header: 'Record' }),
  c.accessor('after', { header: 'Change', enableSorting: false, cell: (i) => <code className="block max-w-md truncate text-xs" title={i.getValue()}>{i.getValue()}</code> }),
];

export function AuditPage() {
  const { data } = useSuspenseQuery(auditQueries.list());
  return (
    <>
      <PageHeader title="Audit trail" subtitle="Who changed what and when: batches, plans, pay and prices, failed checks and undone floor logs. Ordinary floor logs carry their own who and when, and count in floor progress and pay." />
      <DataTable data={data} columns={columns} filterPlaceholder="Filter the trail…" />
    </>
  );
}
