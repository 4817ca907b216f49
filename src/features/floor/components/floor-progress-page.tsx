import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { PageHeader, Spinner } from '@/components/ui/page';
import { useTranslation } from '@/lib/i18n';
import { floorQueries } from '../api/floor-queries';
import { area } from '../words';
import { ProgressView } from './progress-view';

export function FloorProgressPage() {
  const { t } = useTranslation();
  const { data: batches } = useSuspenseQuery(floorQueries.batches());
  const [params, setParams] = useSearchParams();
  const open = batches.filter((b) => b.status !== 'cancelled');
  const batchId = Number(params.get('batch')) || open[0]?.id;
  const progress = useQuery({ ...floorQueries.progress(batchId ?? 0), enabled: Boolean(batchId) });
  return (
    <>
      <PageHeader
        title={t(`${area}.progress.title`)}
        subtitle={t(`${area}.progress.subtitle`)}
        actions={
          <label className="flex items-center gap-2 text-sm">
            {t(`${area}.progress.batch`)}
            <select className="field-input" value={batchId ?? ''} onChange={(e) => setParams({ batch: e.target.value }, { replace: true })}>
              {open.map((b) => <option key={b.id} value={b.id}>{b.code} · {b.styleName}</option>)}
            </select>
          </label>
        }
      />
      {!batchId ? <p className="text-sm text-ink-600">{t(`${area}.progress.noBatches`)}</p> : progress.data ? <ProgressView progress={progress.data} /> : <Spinner />}
    </>
  );
}
