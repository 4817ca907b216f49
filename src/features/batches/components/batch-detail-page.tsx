import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { Badge, Card, PageHeader, Spinner } from '@/components/ui/page';
import { formatDate } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { batchQueries } from '../api/batch-queries';
import { batchTone } from './batch-columns';
import { Suspense, type ComponentType } from 'react';
import type { BatchDto } from '@shared/schemas/batches';

export function BatchDetailPage({ panels = [] }: { panels?: { key: string; Panel: ComponentType<{ batch: BatchDto }> }[] }) {
  const { t } = useTranslation();
  const id = Number(useParams().id);
  const { data: b, isLoading } = useQuery(batchQueries.detail(id));
  if (isLoading || !b) return <Spinner />;
  return (
    <>
      <PageHeader
        title={`${b.code} · ${b.styleName}`}
        subtitle={<>{t('lists.dueOn', { date: formatDate(b.dueDate) })} · <Badge tone={batchTone[b.status]}>{t(`status.${b.status}`)}</Badge></>}
      />
      <Card title={t('lists.sizeRun')}>
        <div className="flex flex-wrap gap-2">
          {Object.entries(b.quantities).map(([s, n]) => (
            <div key={s} className="min-w-16 rounded-lg border border-calico-200 bg-calico-50 px-3 py-2 text-center">
              <div className="text-xs font-semibold text-thread-800">{s}</div>
              <div className="text-lg font-bold">{n}</div>
            </div>
          ))}
          <div className="min-w-16 rounded-lg bg-thread-700 px-3 py-2 text-center text-calico-50">
            <div className="text-xs">{t('lists.total')}</div>
            <div className="text-lg font-bold">{b.total}</div>
          </div>
        </div>
        {b.notes ? <p className="mt-3 text-sm text-ink-600">{b.notes}</p> : null}
      </Card>
      <div className="mt-5 space-y-5">
        {panels.map(({ key, Panel }) => (
          <Suspense key={key} fallback={<Spinner />}>
            <Panel batch={b} />
          </Suspense>
        ))}
      </div>
    </>
  );
}
