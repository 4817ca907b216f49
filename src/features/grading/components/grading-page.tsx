import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { downloadFile } from '@/lib/api-client';
import { useCan } from '@/lib/auth';
import { useTranslation } from '@/lib/i18n';
import { gradingQueries, useProposeRules } from '../api/grading-queries';
import { usePatternNames } from '../hooks/use-pattern-names';
import { area } from '../words';
import { GradeRuleEditor } from './grade-rule-editor';
import { GradedSetDrawing } from './graded-set-drawing';
import { PatternImportCard } from './pattern-import-card';
import { PhotoTraceCard } from './photo-trace-card';
import { PieceMeasurements } from './piece-measurements';
import { SeamReport } from './seam-report';
import { SizeChartGrid } from './size-chart-grid';
import { SizeMixTool } from './size-mix-tool';
import { paths } from '@/config/paths';

/** Pattern & grading of one style: chart, graded set, rules, seam checks, downloads and the size mix. */
export function GradingPage() {
  const { t } = useTranslation();
  const names = usePatternNames();
  const styleId = Number(useParams().id);
  const { data: g, isLoading, error } = useQuery(gradingQueries.detail(styleId));
  const canEdit = useCan('grading:write');
  const [pieceId, setPieceId] = useState<string | null>(null);
  const [point, setPoint] = useState<number | undefined>(undefined);
  const propose = useProposeRules(styleId);
  if (error) return <ErrorNote error={error} />;
  if (isLoading || !g) return <Spinner />;
  const piece = g.pieces.find((p) => p.id === pieceId) ?? g.pieces[0];
  const file = (kind: string, q = '') => `/styles/${styleId}/grading/pieces/${piece.id}/${kind}${q}`;
  return (
    <>
      <PageHeader
        title={t(`${area}.title`)}
        subtitle={<>{t(`${area}.subtitle`, { sizes: g.sizes.join(', '), base: g.baseSize })}{g.errors.length ? <Badge tone="red">{t(`${area}.errors`, { count: g.errors.length })}</Badge> : g.pieces.length ? <Badge tone="teal">{t(`${area}.seamsMatch`)}</Badge> : <Badge tone="gold">{t(`${area}.noPieces`)}</Badge>}</>}
        actions={canEdit ? <button type="button" className="btn-quiet" disabled={propose.isPending || !g.chart} title={g.chart ? undefined : t(`${area}.importChartFirst`)} onClick={() => propose.mutate()}>{propose.isPending ? t(`${area}.proposing`) : t(`${area}.propose`)}</button> : null}
      />
      <ErrorNote error={propose.error} />
      {piece ? (
        <div className="grid gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <Card title={<span>{t(`${area}.gradedSet`, { piece: names.piece(piece.name) })} <span className="text-sm font-normal text-ink-600">{t(`${area}.cutTimes`, { cut: t(`${area}.cut.${piece.cut}`), count: piece.quantity })}</span></span>}>
            <div className="mb-3 flex flex-wrap gap-1.5" role="tablist" aria-label={t(`${area}.pieces`)}>
              {g.pieces.map((p) => (
                <button key={p.id} type="button" role="tab" aria-selected={p.id === piece.id} onClick={() => { setPieceId(p.id); setPoint(undefined); }}
                  className={`rounded-full border px-3 py-1 text-xs ${p.id === piece.id ? 'border-thread-700 bg-thread-700 text-calico-50' : 'border-calico-300 bg-white text-ink-800'}`}>
                  {names.piece(p.name)}
                </button>
              ))}
            </div>
            <GradedSetDrawing piece={piece} sizes={g.sizes} baseSize={g.baseSize} selectedPoint={point ?? firstPoint(piece)} onSelectPoint={setPoint} />
            <div className="mt-3 flex flex-wrap gap-2">
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('svg'), `${piece.id}-all-sizes.svg`)}>{t(`${area}.svgAll`)}</button>
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('dxf'), `${piece.id}-all-sizes.dxf`)}>{t(`${area}.dxfAll`)}</button>
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('pdf', '?paper=A4'), `${piece.id}-${g.baseSize}-A4.pdf`)}>{t(`${area}.printA4`)}</button>
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('pdf', '?paper=Letter'), `${piece.id}-${g.baseSize}-Letter.pdf`)}>{t(`${area}.printLetter`)}</button>
            </div>
            <p className="mt-2 text-xs text-ink-600">{t(`${area}.tiledNote`)}</p>
          </Card>
          <Card title={t(`${area}.gradeRule`)}>
            <GradeRuleEditor styleId={styleId} piece={piece} sizes={g.sizes} selectedPoint={point ?? firstPoint(piece)} onSelectPoint={setPoint} canEdit={canEdit} />
          </Card>
        </div>
      ) : (
        <Card><p className="text-sm text-ink-600">{t(`${area}.noPatternPieces`)} {canEdit ? (g.chart ? t(`${area}.useProposeRules`) : t(`${area}.importChartBelow`)) : ''}</p></Card>
      )}
      <div className="mt-5 space-y-5">
        {piece ? <Card title={t(`${area}.measurementsPerSize`)}><PieceMeasurements piece={piece} sizes={g.sizes} baseSize={g.baseSize} /></Card> : null}
        <Card title={t(`${area}.seamMatching`)}><SeamReport grading={g} /></Card>
        <Card title={t(`${area}.sizeChart`)}><SizeChartGrid styleId={styleId} grading={g} canEdit={canEdit} /></Card>
        {canEdit ? <Card title={t(`${area}.importPattern`)}><PatternImportCard styleId={styleId} /></Card> : null}
        {canEdit ? <Card title={t(`${area}.fromPhoto`)}><PhotoTraceCard styleId={styleId} /></Card> : null}
        {canEdit ? <Card title={t(`${area}.sizeMix`)}><SizeMixTool styleId={styleId} /></Card> : null}
      </div>
    </>
  );
}

function firstPoint(piece: { rules: { target: { kind: string; index?: number } }[] }) {
  const r = piece.rules.find((x) => x.target.kind === 'vertex');
  return r?.target.index;
}

/** Which style to grade: a short list linking to each style's grading. */
export function GradingIndexPage({ styles }: { styles: { id: number; code: string; name: string }[] }) {
  const { t } = useTranslation();
  return (
    <>
      <PageHeader title={t(`${area}.title`)} subtitle={t(`${area}.pickStyle`)} />
      <Card>
        {styles.length === 0 ? (
          <p className="text-sm text-ink-600">{t(`${area}.noStyle`)} <Link className="text-thread-700 underline" to={paths.newStyle.getHref()}>{t(`${area}.addStyle`)}</Link> {t(`${area}.noStyleAfter`)}</p>
        ) : null}
        <ul className="divide-y divide-calico-200">
          {styles.map((s) => (
            <li key={s.id} className="py-2"><Link className="text-thread-700 underline" to={paths.styleGrading.getHref(s.id)}>{s.code} · {s.name}</Link></li>
          ))}
        </ul>
      </Card>
    </>
  );
}
