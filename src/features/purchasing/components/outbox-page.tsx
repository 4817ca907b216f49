import { useSuspenseQuery } from '@tanstack/react-query';
import { formatDateTime } from '@/lib/format';
import { i18n, useTranslation } from '@/lib/i18n';
import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import type { MailMessageDto } from '@shared/schemas/mail';
import { DataTable } from '@/components/ui/data-table';
import { Badge, Card, PageHeader } from '@/components/ui/page';
import { outboxQueries } from '../api/purchasing-queries';

const c = createColumnHelper<MailMessageDto>();
const columns = [
  c.accessor('createdAt', { header: () => i18n.t('outbox.sent'), cell: (i) => formatDateTime(i.getValue()) }),
  c.accessor('to', { header: () => i18n.t('outbox.to') }),
  c.accessor('subject', { header: () => i18n.t('outbox.subject') }),
  c.accessor((m) => m.attachments.map((a) => a.filename).join(', '), { id: 'attachments', header: () => i18n.t('outbox.attachments') }),
  c.accessor('status', { header: () => i18n.t('lists.status'), cell: (i) => <Badge tone={i.getValue() === 'sent' ? 'teal' : 'red'}>{i18n.t(`outbox.status.${i.getValue()}`, { defaultValue: i.getValue() })}</Badge> }),
];

/** Every message the studio sent, as the mail server received it. */
export function OutboxPage() {
  const { t } = useTranslation();
  const { data } = useSuspenseQuery(outboxQueries.list());
  const [open, setOpen] = useState<MailMessageDto | null>(null);
  return (
    <>
      <PageHeader title={t('outbox.title')} subtitle={t('outbox.subtitle')} />
      <DataTable data={data} columns={columns} filterPlaceholder={t('outbox.filter')} onRowClick={setOpen} empty={t('outbox.empty')} />
      {open ? (
        <Card title={open.subject} className="mt-5">
          <p className="mb-2 text-sm text-ink-600">{t('outbox.toLine', { to: open.to, files: open.attachments.map((a) => `${a.filename} (${Math.ceil(a.size / 1024)} KB)`).join(', ') || t('outbox.noAttachments') })}</p>
          <pre className="whitespace-pre-wrap font-sans text-sm text-ink-800">{open.text}</pre>
        </Card>
      ) : null}
    </>
  );
}
