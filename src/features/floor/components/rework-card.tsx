import { useQuery } from '@tanstack/react-query';
import { Card } from '@/components/ui/page';
import { floorQueries } from '../api/floor-queries';

/** Bundles a finisher's check sent back to the signed-in person: theirs to redo (the operation is not paid again). */
export function ReworkCard({ onOpen }: { onOpen: (target: { bundleNumber: number; batchId: number }) => void }) {
  const { data } = useQuery(floorQueries.rework());
  if (!data?.length) return null;
  return (
    <Card title="Rework for you">
      <p className="mb-2 text-sm text-ink-600">A quality check sent these back to you. Redo them and log them again; they are not paid a second time.</p>
      <ul className="divide-y divide-calico-200 text-sm" aria-label="Rework for you">
        {data.map((r) => (
          <li key={`${r.batchId}-${r.bundleNumber}-${r.operationId}`} className="flex items-center justify-between gap-2 py-1.5">
            <span>
              Bundle {r.bundleNumber} ({r.batchCode}) · {r.operationCode} {r.operationName}
              {r.defect ? <span className="block text-xs text-madder-700">Defect: {r.defect}{r.checkedBy ? ` (checked by ${r.checkedBy})` : ''}</span> : null}
            </span>
            <button type="button" className="btn-quiet" onClick={() => onOpen({ bundleNumber: r.bundleNumber, batchId: r.batchId })}>Open</button>
          </li>
        ))}
      </ul>
    </Card>
  );
}
