import type { GradedPieceDto } from '@shared/schemas/grading';
import { useTranslation } from '@/lib/i18n';
import { useLength } from '../hooks/use-length';
import { usePatternNames } from '../hooks/use-pattern-names';
import { area } from '../words';

/** Measurements per size of one piece on its sewing line: width, height, area and every seam length. */
export function PieceMeasurements({ piece, sizes, baseSize }: { piece: GradedPieceDto; sizes: string[]; baseSize: string }) {
  const { t } = useTranslation();
  const names = usePatternNames();
  const { len, area: areaOf } = useLength();
  const edges = [...new Set(piece.edges.map((e) => e.name))];
  const row = (label: string, f: (s: string) => string) => (
    <tr key={label} className="border-b border-calico-100">
      <th scope="row" className="py-1 pr-2 text-left font-normal text-ink-600">{label}</th>
      {sizes.map((s) => <td key={s} className={`px-2 py-1 text-right tabular-nums ${s === baseSize ? 'font-semibold text-thread-800' : ''}`}>{f(s)}</td>)}
    </tr>
  );
  return (
    <div role="region" aria-label={t(`${area}.measurements.region`)} tabIndex={0} className="overflow-x-auto">
      <table className="w-full min-w-[480px] text-sm" data-testid="piece-measurements">
        <thead><tr className="border-b border-calico-200"><th className="py-1 text-left text-ink-600">{names.piece(piece.name)}</th>{sizes.map((s) => <th key={s} className="px-2 text-right">{s}</th>)}</tr></thead>
        <tbody>
          {row(t(`${area}.measurements.width`), (s) => len(piece.measurements[s].widthMm))}
          {row(t(`${area}.measurements.length`), (s) => len(piece.measurements[s].heightMm))}
          {row(t(`${area}.measurements.area`), (s) => areaOf(piece.measurements[s].areaMm2))}
          {edges.map((e) => row(t(`${area}.measurements.seam`, { edge: names.part(e) }), (s) => len(piece.measurements[s].edgeLengthsMm[e] ?? NaN)))}
        </tbody>
      </table>
    </div>
  );
}
