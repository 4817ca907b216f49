import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { downloadFile } from '@/lib/api-client';
import { useCan } from '@/lib/auth';
import { gradingQueries, useProposeRules } from '../api/grading-queries';
import { GradeRuleEditor } from './grade-rule-editor';
import { GradedSetDrawing } from './graded-set-drawing';
import { PatternImportCard } from './pattern-import-card';
import { PhotoTraceCard } from './photo-trace-card';
import { PieceMeasurements } from './piece-measurements';
import { SeamReport } from './seam-report';
import { SizeChartGrid } from './size-chart-grid';
import { SizeMixTool } from './size-mix-tool';
import { paths } from '@/config/paths';

const CUT_LABEL = { cut1: 'cut 1', pair: 'cut a mirrored pair', fold: 'cut on fold' } as const;

/** Pattern & grading of one style: chart, graded set, rules, seam checks, downloads and the size mix. */
export function GradingPage() {
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
        title="Pattern & grading"
        subtitle={<>Size run {g.sizes.join(', ')} · base {g.baseSize} · {g.errors.length ? <Badge tone="red">{g.errors.length} errors</Badge> : g.pieces.length ? <Badge tone="teal">seams match</Badge> : <Badge tone="gold">no pieces yet</Badge>}</>}
        actions={canEdit ? <button type="button" className="btn-quiet" disabled={propose.isPending || !g.chart} title={g.chart ? undefined : 'Import the size chart first'} onClick={() => propose.mutate()}>{propose.isPending ? 'Proposing…' : 'Propose rules from chart'}</button> : null}
      />
      <ErrorNote error={propose.error} />
      {piece ? (
        <div className="grid gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <Card title={<span>Graded set: {piece.name} <span className="text-sm font-normal text-ink-600">({CUT_LABEL[piece.cut]} × {piece.quantity})</span></span>}>
            <div className="mb-3 flex flex-wrap gap-1.5" role="tablist" aria-label="Pieces">
              {g.pieces.map((p) => (
                <button key={p.id} type="button" role="tab" aria-selected={p.id === piece.id} onClick={() => { setPieceId(p.id); setPoint(undefined); }}
                  className={`rounded-full border px-3 py-1 text-xs ${p.id === piece.id ? 'border-thread-700 bg-thread-700 text-calico-50' : 'border-calico-300 bg-white text-ink-800'}`}>
                  {p.name}
                </button>
              ))}
            </div>
            <GradedSetDrawing piece={piece} sizes={g.sizes} baseSize={g.baseSize} selectedPoint={point ?? firstPoint(piece)} onSelectPoint={setPoint} />
            <div className="mt-3 flex flex-wrap gap-2">
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('svg'), `${piece.id}-all-sizes.svg`)}>SVG (all sizes)</button>
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('dxf'), `${piece.id}-all-sizes.dxf`)}>DXF (all sizes)</button>
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('pdf', '?paper=A4'), `${piece.id}-${g.baseSize}-A4.pdf`)}>Print 1:1, A4</button>
              <button type="button" className="btn-quiet" onClick={() => downloadFile(file('pdf', '?paper=Letter'), `${piece.id}-${g.baseSize}-Letter.pdf`)}>Print 1:1, Letter</button>
            </div>
            <p className="mt-2 text-xs text-ink-600">The tiled print has overlap and alignment marks and a check square: measure it before cutting.</p>
          </Card>
          <Card title="Grade rule">
            <GradeRuleEditor styleId={styleId} piece={piece} sizes={g.sizes} selectedPoint={point ?? firstPoint(piece)} onSelectPoint={setPoint} canEdit={canEdit} />
          </Card>
        </div>
      ) : (
        <Card><p className="text-sm text-ink-600">No pattern pieces yet. {canEdit ? (g.chart ? 'Use “Propose rules from chart” to draft the blocks from the base size.' : 'Import the size chart below first; the blocks are drafted from the base size’s measurements.') : ''}</p></Card>
      )}
      <div className="mt-5 space-y-5">
        {piece ? <Card title="Measurements per size"><PieceMeasurements piece={piece} sizes={g.sizes} baseSize={g.baseSize} /></Card> : null}
        <Card title="Seam matching"><SeamReport grading={g} /></Card>
        <Card title="Size chart"><SizeChartGrid styleId={styleId} grading={g} canEdit={canEdit} /></Card>
        {canEdit ? <Card title="Import pattern file"><PatternImportCard styleId={styleId} /></Card> : null}
        {canEdit ? <Card title="From a photo"><PhotoTraceCard styleId={styleId} /></Card> : null}
        {canEdit ? <Card title="Size mix for a batch"><SizeMixTool styleId={styleId} /></Card> : null}
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
  return (
    <>
      <PageHeader title="Pattern & grading" subtitle="Pick a style" />
      <Card>
        {styles.length === 0 ? (
          <p className="text-sm text-ink-600">No style yet. <Link className="text-thread-700 underline" to="/styles/new">Add a style</Link> with its size run and base size, then come back to draft and grade its pieces.</p>
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
