import type { GradedPieceDto, PointDto } from '@shared/schemas/grading';
import { useTranslation } from '@/lib/i18n';
import { usePatternNames } from '../hooks/use-pattern-names';
import { area } from '../words';
import { sizeLineStyle } from './size-line-styles';

const path = (pts: PointDto[], close = true) =>
  pts.length ? `M${pts.map((p) => `${p.x.toFixed(1)},${(-p.y).toFixed(1)}`).join('L')}${close ? 'Z' : ''}` : '';

/**
 * One piece's graded set drawn overlaid at scale (y up in the piece, so y is negated for SVG): every size's sewing
 * line in its own line style, the base size's cutting line faint, grade points as dots (the selected one ringed).
 */
export function GradedSetDrawing({ piece, sizes, baseSize, selectedPoint, onSelectPoint }: {
  piece: GradedPieceDto;
  sizes: string[];
  baseSize: string;
  selectedPoint?: number;
  onSelectPoint?: (vertex: number) => void;
}) {
  const { t } = useTranslation();
  const names = usePatternNames();
  const all = [...sizes.flatMap((s) => piece.bySize[s]?.outline ?? []), ...piece.baseCutting];
  const xs = all.map((p) => p.x), ys = all.map((p) => -p.y);
  const minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
  const pad = Math.max(maxX - minX, maxY - minY) * 0.04 + 10;
  const vb = `${minX - pad} ${minY - pad} ${maxX - minX + 2 * pad} ${maxY - minY + 2 * pad}`;
  const k = (maxX - minX + 2 * pad) / 600; // stroke widths in screen-ish pixels
  const base = piece.bySize[baseSize];
  const points = piece.rules.flatMap((r) => (r.target.kind === 'vertex' ? [{ index: r.target.index, name: r.landmark ? names.part(r.landmark) : t(`${area}.drawing.point`, { n: r.target.index }) }] : []));
  const order = [...sizes.filter((s) => s !== baseSize), baseSize];
  return (
    <figure className="w-full">
      <svg viewBox={vb} role="img" aria-label={t(`${area}.drawing.graded`, { piece: names.piece(piece.name), count: sizes.length })} data-testid="graded-set" className="h-[min(70vh,560px)] w-full rounded-lg border border-calico-200 bg-calico-50">
        <path d={path(piece.baseCutting)} fill="none" stroke="#D6C8B0" strokeWidth={1.2 * k} />
        {order.map((s) => {
          const st = sizeLineStyle(sizes, baseSize, s);
          const shape = piece.bySize[s];
          if (!shape) return null;
          return (
            <g key={s} data-size={s}>
              <path d={path(shape.outline)} fill={s === baseSize ? 'rgba(15,76,92,0.05)' : 'none'} stroke={st.stroke} strokeWidth={st.width * k} strokeDasharray={st.dash.split(' ').map((d) => Number(d) * k).join(' ')} strokeLinejoin="round" />
              {s === baseSize ? shape.internalLines.map((l) => <path key={l.name} d={path(l.points, false)} fill="none" stroke="#434B50" strokeWidth={0.8 * k} strokeDasharray={`${3 * k} ${2 * k}`} />) : null}
            </g>
          );
        })}
        {base ? (
          <line x1={base.grainLine.from.x} y1={-base.grainLine.from.y} x2={base.grainLine.to.x} y2={-base.grainLine.to.y} stroke="#434B50" strokeWidth={k} markerEnd="url(#grain-arrow)" />
        ) : null}
        <defs>
          <marker id="grain-arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse"><path d="M0,0L10,5L0,10z" fill="#434B50" /></marker>
        </defs>
        {base ? points.map((p) => {
          const q = base.outline[p.index];
          if (!q) return null;
          const on = p.index === selectedPoint;
          return (
            <g key={p.index} onClick={() => onSelectPoint?.(p.index)} className="cursor-pointer">
              <title>{p.name}</title>
              <circle cx={q.x} cy={-q.y} r={(on ? 7 : 4) * k} fill={on ? '#B5523B' : '#0F4C5C'} stroke="#fff" strokeWidth={k} />
            </g>
          );
        }) : null}
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-600" aria-label={t(`${area}.drawing.legend`)}>
        {sizes.map((s) => {
          const st = sizeLineStyle(sizes, baseSize, s);
          return (
            <span key={s} className="inline-flex items-center gap-1.5">
              <svg width="34" height="8" aria-hidden><line x1="1" y1="4" x2="33" y2="4" stroke={st.stroke} strokeWidth={st.width} strokeDasharray={st.dash} /></svg>
              <span className={s === baseSize ? 'font-semibold text-thread-800' : ''}>{s === baseSize ? t(`${area}.drawing.base`, { size: s }) : s}</span>
            </span>
          );
        })}
        <span className="inline-flex items-center gap-1.5">
          <svg width="34" height="8" aria-hidden><line x1="1" y1="4" x2="33" y2="4" stroke="#D6C8B0" strokeWidth="2" /></svg>{t(`${area}.drawing.cuttingLine`, { size: baseSize })}
        </span>
      </figcaption>
    </figure>
  );
}
