import { useQuery } from '@tanstack/react-query';
import { Card } from '@/components/ui/page';
import { formatMoney } from '@/lib/format';
import { floorQueries } from '../api/floor-queries';

/** The signed-in person's own count and earnings today. */
export function TodayCard() {
  const { data } = useQuery(floorQueries.today());
  return (
    <Card title="Today">
      <dl className="grid grid-cols-3 gap-2 text-center" aria-label="Today's count">
        <div className="rounded-lg bg-calico-50 p-2">
          <dt className="text-xs text-ink-600">Bundle operations</dt>
          <dd className="text-2xl font-bold text-thread-800" data-testid="today-ops">{data?.bundleOps ?? '–'}</dd>
        </div>
        <div className="rounded-lg bg-calico-50 p-2">
          <dt className="text-xs text-ink-600">Pieces</dt>
          <dd className="text-2xl font-bold text-thread-800" data-testid="today-pieces">{data?.pieces ?? '–'}</dd>
        </div>
        <div className="rounded-lg bg-calico-50 p-2">
          <dt className="text-xs text-ink-600">Earned</dt>
          <dd className="text-lg font-bold text-thread-800" data-testid="today-earned">{data ? formatMoney(data.earningsMinor, data.currency) : '–'}</dd>
        </div>
      </dl>
      {data?.logs.length ? (
        <ul className="mt-3 divide-y divide-calico-200 text-sm" aria-label="Today's logs">
          {data.logs.map((l) => (
            <li key={l.id} className="flex justify-between gap-2 py-1.5">
              <span>
                Bundle {l.bundleNumber} · {l.operationCode} {l.operationName}
                {l.attempt > 0 ? ' (rework)' : ''}
              </span>
              <span className="whitespace-nowrap text-ink-600">{l.pieces} pcs · {formatMoney(l.payMinor, l.currency)}</span>
            </li>
          ))}
        </ul>
      ) : null}
    </Card>
  );
}
