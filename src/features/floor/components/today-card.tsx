import { useQuery } from '@tanstack/react-query';
import { Card } from '@/components/ui/page';
import { formatDate, formatMoney } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { floorQueries } from '../api/floor-queries';
import { area } from '../words';

/** The signed-in person's own count and earnings today. */
export function TodayCard() {
  const { t } = useTranslation();
  const { data } = useQuery(floorQueries.today());
  return (
    <Card title={t('floor.today')}>
      <dl className="grid grid-cols-3 gap-2 text-center" aria-label={t('floor.todaysCount')}>
        <div className="rounded-lg bg-calico-50 p-2">
          <dt className="text-xs text-ink-600">{t('floor.bundleOps')}</dt>
          <dd className="text-2xl font-bold text-thread-800" data-testid="today-ops">{data?.bundleOps ?? '–'}</dd>
        </div>
        <div className="rounded-lg bg-calico-50 p-2">
          <dt className="text-xs text-ink-600">{t('floor.piecesLabel')}</dt>
          <dd className="text-2xl font-bold text-thread-800" data-testid="today-pieces">{data?.pieces ?? '–'}</dd>
        </div>
        <div className="rounded-lg bg-calico-50 p-2">
          <dt className="text-xs text-ink-600">{t('floor.earned')}</dt>
          <dd className="text-lg font-bold text-thread-800" data-testid="today-earned">{data ? formatMoney(data.earningsMinor, data.currency) : '–'}</dd>
        </div>
      </dl>
      <WeekAndPeriod />
      {data?.logs.length ? (
        <ul className="mt-3 divide-y divide-calico-200 text-sm" aria-label={t('floor.todaysLogs')}>
          {data.logs.map((l) => (
            <li key={l.id} className="flex justify-between gap-2 py-1.5">
              <span>
                {t('floor.todayLog', { number: l.bundleNumber, op: `${l.operationCode} ${l.operationName}` })}
                {l.attempt > 0 ? t('floor.reworkMark') : ''}
              </span>
              <span className="whitespace-nowrap text-ink-600">{t('common.pieces', { count: l.pieces })} · {formatMoney(l.payMinor, l.currency)}</span>
            </li>
          ))}
        </ul>
      ) : null}
    </Card>
  );
}

/** This week's and this pay period's count and earnings, as the pay period will pay them. */
function WeekAndPeriod() {
  const { t } = useTranslation();
  const { data } = useQuery(floorQueries.summary());
  if (!data) return null;
  const rows = [
    { label: t(`${area}.week.week`), sub: t(`${area}.week.since`, { day: formatDate(data.week.fromDay) }), f: data.week, id: 'week' },
    { label: t(`${area}.week.period`), sub: t(`${area}.week.periodSince`, { day: formatDate(data.payPeriod.fromDay) }), f: data.payPeriod, id: 'period' },
  ];
  return (
    <dl className="mt-3 space-y-1 text-sm" aria-label={t(`${area}.week.label`)}>
      {rows.map((r) => (
        <div key={r.id} className="flex items-baseline justify-between gap-2 rounded-lg bg-calico-50 px-2 py-1.5">
          <dt>
            <span className="font-semibold text-thread-800">{r.label}</span> <span className="text-xs text-ink-600">{r.sub}</span>
          </dt>
          <dd className="whitespace-nowrap" data-testid={`${r.id}-figures`}>
            {t(`${area}.week.figures`, { pieces: t(`${area}.pcs`, { count: r.f.pieces }), ops: t(`${area}.week.ops`, { count: r.f.bundleOps }) })}
            <strong>{formatMoney(r.f.earningsMinor, data.currency)}</strong>
          </dd>
        </div>
      ))}
    </dl>
  );
}
