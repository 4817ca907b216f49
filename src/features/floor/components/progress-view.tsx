import type { ProgressDto } from '@shared/schemas/floor';
import { DataTable } from '@/components/ui/data-table';
import { Card } from '@/components/ui/page';
import { fmt, formatDate } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';
import { efficiencyColumns, operationProgressColumns } from './progress-columns';

/** Sections as bars; the batch panel shows just this. */
export function SectionBars({ progress }: { progress: ProgressDto }) {
  const { t } = useTranslation();
  return (
    <div className="space-y-2">
      {progress.sections.map((s) => (
        <div key={s.section}>
          <div className="flex justify-between text-sm"><span className="capitalize">{t(`${area}.sections.${s.section}`)}</span><span>{s.laysTotal ? t(`${area}.progress.lays`, { done: s.laysDone, total: s.laysTotal }) : ''}{fmt().percent(s.percent, 0)}</span></div>
          <div className="h-2.5 rounded-full bg-calico-200" role="progressbar" aria-label={t(`${area}.progress.sectionDone`, { section: t(`${area}.sections.${s.section}`) })} aria-valuenow={s.percent} aria-valuemin={0} aria-valuemax={100}>
            <div className="h-2.5 rounded-full bg-thread-700" style={{ width: `${Math.min(100, s.percent)}%` }} />
          </div>
        </div>
      ))}
      <p className="text-sm text-ink-600">{t(`${area}.progress.packed`, { packed: progress.packedPieces, total: progress.totalPieces, bundles: t('common.bundles', { count: progress.bundles }) })}</p>
    </div>
  );
}

function DailyChart({ daily }: { daily: ProgressDto['daily'] }) {
  const { t } = useTranslation();
  const max = Math.max(1, ...daily.map((d) => Math.max(d.pieces, d.planned)));
  return (
    <div>
      <div role="region" tabIndex={0} className="flex h-40 items-end gap-1 overflow-x-auto" aria-label={t(`${area}.progress.chart`)}>
        {daily.map((d) => (
          <div key={d.day} className="flex min-w-8 flex-1 flex-col items-center justify-end gap-1" title={t(`${area}.progress.dayTitle`, { day: formatDate(d.day), pieces: d.pieces, planned: d.planned })}>
            <div className="relative flex h-32 w-full items-end justify-center">
              <div className="w-3/5 rounded-t bg-thread-700" style={{ height: `${(d.pieces / max) * 100}%` }} />
              {d.planned ? <div className="absolute left-0 right-0 border-t-2 border-dashed border-madder-500" style={{ bottom: `${(d.planned / max) * 100}%` }} /> : null}
            </div>
            <span className="text-[10px] text-ink-600">{shortDay(d.day)}</span>
          </div>
        ))}
      </div>
      <p className="mt-1 text-xs text-ink-600">{t(`${area}.progress.chartKey`)}</p>
    </div>
  );
}

export function ProgressView({ progress }: { progress: ProgressDto }) {
  const { t } = useTranslation();
  return (
    <div className="space-y-5">
      <div className="grid gap-5 lg:grid-cols-2">
        <Card title={t(`${area}.progress.bySection`)}><SectionBars progress={progress} /></Card>
        <Card title={t(`${area}.progress.atStage`)}>
          <ul className="grid grid-cols-2 gap-2">
            {progress.stages.map((s) => (
              <li key={s.stage} className="rounded-lg bg-calico-50 p-3">
                <p className="text-xs text-ink-600">{t(`${area}.progress.stages.${s.stage}`)}</p>
                <p className="text-2xl font-bold text-thread-800" data-testid={`stage-${s.stage}`}>{s.bundles}</p>
              </li>
            ))}
          </ul>
        </Card>
      </div>
      <Card title={t(`${area}.progress.perDay`)}><DailyChart daily={progress.daily} /></Card>
      <Card title={t(`${area}.progress.wip`)}>
        <DataTable data={progress.operations} columns={operationProgressColumns} filterPlaceholder={t(`${area}.progress.filterOps`)} urlKey="ops" label={t(`${area}.progress.wip`)} />
      </Card>
      <Card title={t(`${area}.progress.perPerson`, { definition: t(`${area}.efficiencyLower`) })}>
        <DataTable data={progress.people} columns={efficiencyColumns} urlKey="people" label={t(`${area}.progress.perPersonLabel`)} filterPlaceholder={t(`${area}.progress.filterPeople`)} empty={t(`${area}.progress.nobody`)} />
      </Card>
    </div>
  );
}

/** A chart day's tick: the day and month in the studio's language (`26 Nov`, `26 nov.`). */
function shortDay(day: string) {
  return new Intl.DateTimeFormat(fmt().locale, { day: 'numeric', month: 'short', timeZone: 'UTC' }).format(Date.parse(`${day}T00:00:00Z`));
}
