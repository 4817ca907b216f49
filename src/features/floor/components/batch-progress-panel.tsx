import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import type { BatchDto } from '@shared/schemas/batches';
import { Card } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { floorQueries } from '../api/floor-queries';
import { SectionBars } from './progress-view';
import { paths } from '@/config/paths';

/** The batch page's floor panel: how far sewing and finishing have come. */
export function BatchProgressPanel({ batch }: { batch: BatchDto }) {
  const allowed = useCan('progress:read');
  const { data } = useQuery({ ...floorQueries.progress(batch.id), enabled: allowed });
  if (!allowed) return null;
  return (
    <Card title="Floor progress">
      {data && data.bundles ? <SectionBars progress={data} /> : <p className="text-sm text-ink-600">No bundles on the floor yet.</p>}
      <Link className="mt-2 inline-block text-sm text-thread-800 underline" to={paths.floor.getHref(batch.id)}>Open floor progress</Link>
    </Card>
  );
}
