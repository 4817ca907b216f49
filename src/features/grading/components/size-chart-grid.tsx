import { useEffect, useRef, useState } from 'react';
import type { GradingDto } from '@shared/schemas/grading';
import { ErrorNote } from '@/components/ui/page';
import { ApiError, downloadFile } from '@/lib/api-client';
import { useImportChart, usePutChart } from '../api/grading-queries';
import { i18n, useTranslation } from '@/lib/i18n';
import { useLength } from '../hooks/use-length';
import { area } from '../words';

/** An EN 13402-3 bust interval (`82–86`, in cm as the standard writes it) in the studio's unit: unchanged in cm. */
export function enInterval(label: string, system: 'metric' | 'imperial', len: (mm: number) => string): string {
  if (system === 'metric') return label;
  const m = /^(\d+(?:\.\d+)?)\s*[–-]\s*(\d+(?:\.\d+)?)$/.exec(label.trim());
  return m ? `${len(Number(m[1]) * 10)}–${len(Number(m[2]) * 10)}` : label;
}

/** A point of measure's name in the studio's language (a key the chart does not know reads as plain words). */
const label = (pom: string) => i18n.t(`${area}.pom.${pom}`, { defaultValue: pom.replace(/-/g, ' ').replace(/^./, (c) => c.toUpperCase()) });

/** The body chart as an editable grid (studio units), the grade between neighbouring sizes, import and export. */
export function SizeChartGrid({ styleId, grading, canEdit }: { styleId: number; grading: GradingDto; canEdit: boolean }) {
  const { t } = useTranslation();
  const { bodyCell, parseBodyCell, bodyUnit, bodyUnitWord, bodyGrade, len, system } = useLength();
  const chart = grading.chart;
  const [cells, setCells] = useState<string[][]>([]);
  const [cellErrors, setCellErrors] = useState<Record<string, string>>({});
  const put = usePutChart(styleId);
  const imp = useImportChart(styleId);
  const fileRef = useRef<HTMLInputElement>(null);
  useEffect(() => setCells(chart ? chart.rows.map((r) => r.values.map(bodyCell)) : []), [chart]);
  const importError = imp.error instanceof ApiError ? imp.error : null;
  const importProblems = importError ? (
    <div role="alert" className="rounded-lg bg-madder-100 px-3 py-2 text-sm text-madder-700">
      <p className="font-medium">{importError.message}</p>
      <ul className="mt-1 list-disc pl-5">{Object.entries(importError.fields).map(([k, m]) => <li key={k}>{k}: {m}</li>)}</ul>
    </div>
  ) : null;
  const importControl = canEdit ? (
    <>
      <button type="button" className={chart ? 'btn-quiet' : 'btn-primary'} disabled={imp.isPending} onClick={() => fileRef.current?.click()}>{imp.isPending ? t(`${area}.chart.importing`) : t(`${area}.chart.import`)}</button>
      <input ref={fileRef} type="file" accept=".csv,.xlsx" className="hidden" aria-label={t(`${area}.chart.file`)} onChange={(e) => { const f = e.target.files?.[0]; if (f) imp.mutate(f); e.target.value = ''; }} />
    </>
  ) : null;
  if (!chart) {
    return (
      <div className="space-y-3 text-sm">
        <p className="text-ink-600">{t(`${area}.chart.none`)}{canEdit ? t(`${area}.chart.importHow`) : ''}</p>
        {canEdit ? (
          <p className="text-ink-600">
            {t(`${area}.chart.firstRow`)} <code>{t(`${area}.chart.header`, { sizes: grading.sizes.join(', ') })}</code>{t(`${area}.chart.thenRows`)}{' '}
            <code>{t(`${area}.chart.example`)}</code>{t(`${area}.chart.unitsNote`)} <code>{t(`${area}.chart.fraction`)}</code> {t(`${area}.chart.unitsNoteEnd`)}
          </p>
        ) : null}
        <div className="flex flex-wrap gap-2">{importControl}</div>
        {importProblems}
      </div>
    );
  }
  const save = () => {
    const errs: Record<string, string> = {};
    const rows = chart.rows.map((r, i) => ({
      pointOfMeasure: r.pointOfMeasure,
      values: cells[i].map((text, j) => {
        const v = parseBodyCell(text.trim());
        if (v === null || !(v > 0)) errs[`${i}.${j}`] = t(`${area}.chart.notALength`);
        return v ?? 0;
      }),
    }));
    setCellErrors(errs);
    if (Object.keys(errs).length === 0) put.mutate({ name: chart.name, sizes: chart.sizes, rows, eases: grading.eases });
  };
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-2">
        {canEdit ? <button type="button" className="btn-primary" onClick={save} disabled={put.isPending}>{put.isPending ? t(`${area}.chart.saving`) : t(`${area}.chart.save`)}</button> : null}
        {importControl}
        <button type="button" className="btn-quiet" onClick={() => downloadFile(`/styles/${styleId}/grading/chart/export?format=csv&unit=${bodyUnit}`, 'size-chart.csv')}>{t(`${area}.chart.exportCsv`)}</button>
        <button type="button" className="btn-quiet" onClick={() => downloadFile(`/styles/${styleId}/grading/chart/export?format=xlsx&unit=${bodyUnit}`, 'size-chart.xlsx')}>{t(`${area}.chart.exportXlsx`)}</button>
      </div>
      <ErrorNote error={put.error} />
      {importProblems}
      <div role="region" className="overflow-x-auto" tabIndex={0} aria-label={t(`${area}.chart.region`)}>
        <table className="w-full min-w-[640px] text-sm" data-testid="size-chart">
          <thead>
            <tr className="border-b border-calico-200 text-left">
              <th className="py-1 pr-2 text-ink-600">{t(`${area}.chart.body`, { unit: bodyUnitWord })}</th>
              {chart.sizes.map((s, j) => (
                <th key={s} className="px-1 text-center" colSpan={j < chart.sizes.length - 1 ? 2 : 1}>
                  {s}{grading.designations[s] ? <span className="block text-[10px] font-normal text-ink-400">{t(`${area}.chart.designation`, { designation: enInterval(grading.designations[s], system, len) })}</span> : null}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {chart.rows.map((r, i) => (
              <tr key={r.pointOfMeasure} className="border-b border-calico-100">
                <th scope="row" className="whitespace-nowrap py-1 pr-2 text-left font-normal">{label(r.pointOfMeasure)}</th>
                {chart.sizes.map((s, j) => (
                  <FragmentCells key={s} last={j === chart.sizes.length - 1} grade={r.grades[j]} gradeText={r.grades[j] !== undefined ? bodyGrade(r.grades[j]) : ''}>
                    <input
                      aria-label={`${label(r.pointOfMeasure)} ${s}`}
                      className={`w-20 rounded border px-1.5 py-1 text-right tabular-nums ${cellErrors[`${i}.${j}`] ? 'border-madder-500 bg-madder-100' : 'border-calico-300'}`}
                      disabled={!canEdit}
                      value={cells[i]?.[j] ?? ''}
                      onChange={(e) => setCells(cells.map((row, a) => (a === i ? row.map((c, b) => (b === j ? e.target.value : c)) : row)))}
                    />
                  </FragmentCells>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-600">{t(`${area}.chart.${system === 'metric' ? 'note' : 'noteImperial'}`)}</p>
    </div>
  );
}

function FragmentCells({ children, last, gradeText }: { children: React.ReactNode; last: boolean; grade?: number; gradeText: string }) {
  const { t } = useTranslation();
  return (
    <>
      <td className="px-1 py-1 text-center">{children}</td>
      {last ? null : <td className="whitespace-nowrap px-0.5 text-center text-[11px] text-ink-400 tabular-nums" aria-label={t(`${area}.chart.grade`)}>{gradeText}</td>}
    </>
  );
}
