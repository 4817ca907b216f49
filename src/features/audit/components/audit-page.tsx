import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '@/components/ui/data-table';
import { PageHeader } from '@/components/ui/page';
import { api } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { i18n, useTranslation } from '@/lib/i18n';
import { auditChanges, auditSentence, type AuditEntry } from '../lib/audit-sentence';

export const auditQueries = {
  list: () => queryOptions({ queryKey: ['audit', 'list'], queryFn: async () => (await api.get<{ entries: AuditEntry[] }>('/audit')).entries }),
};

const c = createColumnHelper<AuditEntry>();
const columns = [
  c.accessor('createdAt', { header: () => i18n.t('audit.when'), cell: (i) => formatDateTime(i.getValue()) }),
  c.accessor((e) => auditSentence(e, i18n.t), {
    id: 'what',
    header: () => i18n.t('audit.what'),
    cell: (i) => {
      const changes = auditChanges(i.row.original, i18n.t);
      return (
        <div>
          <p>{i.getValue()}</p>
          {changes.length ? (
            <ul className="mt-1 max-w-xl list-disc pl-5 text-xs text-ink-600" aria-label={i18n.t('audit.changes')}>
              {changes.slice(0, 8).map((line) => <li key={line}>{line}</li>)}
            </ul>
          ) : null}
        </div>
      );
    },
  }),
];

export function AuditPage() {
  const { t } = useTranslation();
  const { data } = useSuspenseQuery(auditQueries.list());
  return (
    <>
      <PageHeader title={t('audit.title')} subtitle={t('audit.subtitle')} />
      <DataTable data={data} columns={columns} filterPlaceholder={t('audit.filter')} />
    </>
  );
}
