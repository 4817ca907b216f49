import { EFFICIENCY_DEFINITION } from '@planning';
import type { ProgressDto } from '@shared/schemas/floor';
import { DataTable } from '@/components/ui/data-table';
import { Card } from '@/components/ui/page';
import { efficiencyColumns, operationProgressColumns } from './progress-columns';

const STAGE_LABELS = { cut: 'Cut, not started', sewing: 'In sewing', finishing: 'In finishing', packed: 'Packed' } as const;

/** Sections as bars; the batch panel shows just this. */
export function SectionBars({ progress }: { progress: ProgressDto }) {
  return (
    <div className="space-y-2">
      {progress.sections.map((s) => (
        <div key={s.section}>
          <div className="flex justify-between text-sm"><span className="capitalize">{s.section}</span><span>{s.laysTotal ? `${s.laysDone} of ${s.laysTotal} lays · ` : ''}{s.percent} %</span></div>
          <div className="h-2.5 rounded-full bg-calico-200" role="progressbar" aria-label={`${s.section} done`} aria-valuenow={s.percent} aria-valuemin={0} aria-valuemax={100}>
            <div className="h-2.5 rounded-full bg-thread-700" style={{ width: `${Math.min(100, s.percent)}%` }} />
          </div>
        </div>
      ))}
      <p className="text-sm text-ink-600">{progress.packedPieces} of {progress.totalPieces} garments packed · {progress.bundles} bundles</p>
    </div>
  );
}

function DailyChart({ daily }: { daily: ProgressDto['daily'] }) {
  const max = Math.max(1, ...daily.map((d) => Math.max(d.pieces, d.planned)));
  return (
    <div>
      <div role="region" tabIndex={0} className="flex h-40 items-end gap-1 overflow-x-auto" aria-label="Output per day against the plan">
        {daily.map((d) => (
          <div key={d.day} className="flex min-w-8 flex-1 flex-col items-center justify-end gap-1" title={`${d.day}: ${d.pieces} packed, plan ${d.planned}`}>
            <div className="relative flex h-32 w-full items-end justify-center">
              <div className="w-3/5 rounded-t bg-thread-700" style={{ height: `${(d.pieces / max) * 100}%` }} />
              {d.planned ? <div className="absolute left-0 right-0 border-t-2 border-dashed border-madder-500" style={{ bottom: `${(d.planned / max) * 100}%` }} /> : null}
            </div>
            <span className="text-[10px] text-ink-600">{d.day.slice(5)}</span>
          </div>
        ))}
      </div>
      <p className="mt-1 text-xs text-ink-600">Bars: garments packed per day. Dashed line: the plan (the batch spread evenly over working days to the due date).</p>
    </div>
  );
}

export function ProgressView({ progress }: { progress: ProgressDto }) {
  return (
    <div className="space-y-5">
      <div className="grid gap-5 lg:grid-cols-2">
        <Card title="By section"><SectionBars progress={progress} /></Card>
        <Card title="Bundles at each stage">
          <ul className="grid grid-cols-2 gap-2">
            {progress.stages.map((s) => (
              <li key={s.stage} className="rounded-lg bg-calico-50 p-3">
                <p className="text-xs text-ink-600">{STAGE_LABELS[s.stage]}</p>
                <p className="text-2xl font-bold text-thread-800" data-testid={`stage-${s.stage}`}>{s.bundles}</p>
              </li>
            ))}
          </ul>
        </Card>
      </div>
      <Card title="Output per day"><DailyChart daily={progress.daily} /></Card>
      <Card title="Work in progress per operation"><DataTable data={progress.operations} columns={operationProgressColumns} filterPlaceholder="Filter operations…" urlKey="ops" label="Work in progress per operation" /></Card>
      <Card title={`Efficiency per person (${EFFICIENCY_DEFINITION.toLowerCase()})`}>
        <DataTable data={progress.people} columns={efficiencyColumns} urlKey="people" label="Efficiency per person" filterPlaceholder="Filter people…" empty="No one has logged work on this batch yet." />
      </Card>
    </div>
  );
}
