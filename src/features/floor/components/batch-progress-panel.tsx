import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Card } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { floorQueries } from '../api/floor-queries';
import { SectionBars } from './progress-view';
import { paths } from '@/config/paths';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

/** The batch page's floor panel: how far sewing and finishing have come. */
export function BatchProgressPanel({ batch }: { batch: BatchDto }) {
  const { t } = useTranslation();
  const allowed = useCan('progress:read');
  const { data } = useQuery({ ...floorQueries.progress(batch.id), enabled: allowed });
  if (!allowed) return null;
  return (
    <Card title={t(`${area}.progress.title`)}>
      {data && data.bundles ? <SectionBars progress={data} /> : <p className="text-sm text-ink-600">{t(`${area}.progress.panelNone`)}</p>}
      <Link className="mt-2 inline-block text-sm text-thread-800 underline" to={paths.floor.getHref(batch.id)}>{t(`${area}.progress.open`)}</Link>
    </Card>
  );
}
