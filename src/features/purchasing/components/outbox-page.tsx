import { useSuspenseQuery } from '@tanstack/react-query';
import { formatDateTime } from '@/lib/format';
import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import type { MailMessageDto } from '@shared/schemas/mail';
import { DataTable } from '@/components/ui/data-table';
import { Badge, Card, PageHeader } from '@/components/ui/page';
import { outboxQueries } from '../api/purchasing-queries';

const c = createColumnHelper<MailMessageDto>();
const columns = [
  c.accessor('createdAt', { header: 'Sent', cell: (i) => formatDateTime(i.getValue()) }),
  c.accessor('to', { header: 'To' }),
  c.accessor('subject', { header: 'Subject' }),
  c.accessor((m) => m.attachments.map((a) => a.filename).join(', '), { id: 'attachments', header: 'Attachments' }),
  c.accessor('status', { header: 'Status', cell: (i) => <Badge tone={i.getValue() === 'sent' ? 'teal' : 'red'}>{i.getValue()}</Badge> }),
];

/** Every message the studio sent, as the mail server received it. */
export function OutboxPage() {
  const { data } = useSuspenseQuery(outboxQueries.list());
  const [open, setOpen] = useState<MailMessageDto | null>(null);
  return (
    <>
      <PageHeader title="Outbox" subtitle="Purchase orders and invitations the studio has e-mailed." />
      <DataTable data={data} columns={columns} filterPlaceholder="Filter messages…" onRowClick={setOpen} empty="Nothing sent yet." />
      {open ? (
        <Card title={open.subject} className="mt-5">
          <p className="mb-2 text-sm text-ink-600">To {open.to} · {open.attachments.map((a) => `${a.filename} (${Math.ceil(a.size / 1024)} KB)`).join(', ') || 'no attachments'}</p>
          <pre className="whitespace-pre-wrap font-sans text-sm text-ink-800">{open.text}</pre>
        </Card>
      ) : null}
    </>
  );
}
