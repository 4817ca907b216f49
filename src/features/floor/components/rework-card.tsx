import { useQuery } from '@tanstack/react-query';
import { Card } from '@/components/ui/page';
import { useTranslation } from '@/lib/i18n';
import { floorQueries } from '../api/floor-queries';
import { area } from '../words';

/** Bundles a finisher's check sent back to the signed-in person: theirs to redo (the operation is not paid again). */
export function ReworkCard({ onOpen }: { onOpen: (target: { bundleNumber: number; batchId: number }) => void }) {
  const { t } = useTranslation();
  const { data } = useQuery(floorQueries.rework());
  if (!data?.length) return null;
  return (
    <Card title={t(`${area}.rework.title`)}>
      <p className="mb-2 text-sm text-ink-600">{t(`${area}.rework.intro`)}</p>
      <ul className="divide-y divide-calico-200 text-sm" aria-label={t(`${area}.rework.title`)}>
        {data.map((r) => (
          <li key={`${r.batchId}-${r.bundleNumber}-${r.operationId}`} className="flex items-center justify-between gap-2 py-1.5">
            <span>
              {t(`${area}.rework.line`, { number: r.bundleNumber, batch: r.batchCode, op: `${r.operationCode} ${r.operationName}` })}
              {r.defect ? (
                <span className="block text-xs text-madder-700">
                  {t(`${area}.rework.defect`, { defect: r.defect })}
                  {r.checkedBy ? t(`${area}.rework.checkedBy`, { name: r.checkedBy }) : ''}
                </span>
              ) : null}
            </span>
            <button type="button" className="btn-quiet" onClick={() => onOpen({ bundleNumber: r.bundleNumber, batchId: r.batchId })}>{t(`${area}.rework.open`)}</button>
          </li>
        ))}
      </ul>
    </Card>
  );
}
