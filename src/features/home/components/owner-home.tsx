import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { differenceInCalendarDays, parseISO } from 'date-fns';
import { Link } from 'react-router';
import { Badge, Card, PageHeader } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { batchQueries } from '@/features/batches/api/batch-queries';
import { layQueries } from '@/features/cutting/api/cutting-queries';

export function OwnerHome({ name }: { name: string }) {
  const { t } = useTranslation();
  const { data: batches } = useSuspenseQuery(batchQueries.list());
  const shortages = useQuery(layQueries.shortages()).data ?? [];
  const open = batches.filter((b) => b.status !== 'shipped' && b.status !== 'cancelled');
  const today = new Date();
  const attention = open
    .map((b) => ({ b, days: differenceInCalendarDays(parseISO(b.dueDate), today) }))
    .filter(({ b, days }) => days <= 7 || b.status === 'planned');
  return (
    <>
      <PageHeader title={t('home.goodDay', { name: name.split(' ')[0] })} subtitle={t('home.ownerSubtitle')} actions={<Link className="btn-primary" to={paths.newBatch.getHref()}>{t('home.planBatch')}</Link>} />
      <div className="grid gap-5 lg:grid-cols-3">
        <Card title={t('home.inProgress')} className="lg:col-span-2">
          {open.length === 0 ? <p className="text-sm text-ink-600">{t('home.noOpen')}</p> : null}
          {batches.length === 0 ? (
            <p className="mt-2 text-sm text-ink-600">
              {t('home.firstSteps')}{' '}
              <Link className="underline" to={paths.fabrics.getHref()}>{t('home.toFabric')}</Link>
              {' · '}
              <Link className="underline" to={paths.newStyle.getHref()}>{t('home.toNewStyle')}</Link>
            </p>
          ) : null}
          <ul className="divide-y divide-calico-200">
            {open.map((b) => (
              <li key={b.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                <Link to={paths.batch.getHref(b.id)} className="font-medium text-thread-800 underline-offset-2 hover:underline">
                  {b.code} · {b.styleName}
                </Link>
                <span className="text-sm text-ink-600">{t('home.due', { garments: t('common.garments', { count: b.total }), date: formatDate(b.dueDate) })}</span>
                <Badge tone="blue">{t(`status.${b.status}`)}</Badge>
              </li>
            ))}
          </ul>
        </Card>
        <Card title={t('home.attention')}>
          {attention.length === 0 && shortages.length === 0 ? <p className="text-sm text-ink-600">{t('home.nothingPressing')}</p> : null}
          <ul className="space-y-2 text-sm">
            {shortages.map((s) => (
              <li key={`short-${s.layId}`} role="alert" className="rounded-lg bg-madder-100 px-3 py-2 text-madder-700">
                <Link to={paths.batch.getHref(s.batchId)} className="font-medium underline-offset-2 hover:underline">{t('home.lay', { batch: s.batchCode, seq: s.seq })}</Link>{' '}
                {s.message}
              </li>
            ))}
            {attention.map(({ b, days }) => (
              <li key={b.id} className="rounded-lg bg-calico-50 px-3 py-2">
                <span className="font-medium">{b.code}</span>{' '}
                {b.status === 'planned' ? t('home.notCut') : t('home.isIn', { status: t(`status.${b.status}`) })}
                {days <= 7 ? <> — <span className="text-madder-700">{t('home.dueIn', { count: days })}</span></> : <> — {t('home.dueIn', { count: days })}</>}
              </li>
            ))}
          </ul>
        </Card>
      </div>
    </>
  );
}
