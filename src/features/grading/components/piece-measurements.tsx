import type { GradedPieceDto } from '@shared/schemas/grading';
import { useLength } from '../hooks/use-length';

/** Measurements per size of one piece on its sewing line: width, height, area and every seam length. */
export function PieceMeasurements({ piece, sizes, baseSize }: { piece: GradedPieceDto; sizes: string[]; baseSize: string }) {
  const { len, area } = useLength();
  const edges = [...new Set(piece.edges.map((e) => e.name))];
  const row = (label: string, f: (s: string) => string) => (
    <tr key={label} className="border-b border-calico-100">
      <th scope="row" className="py-1 pr-2 text-left font-normal text-ink-600">{label}</th>
      {sizes.map((s) => <td key={s} className={`px-2 py-1 text-right tabular-nums ${s === baseSize ? 'font-semibold text-thread-800' : ''}`}>{f(s)}</td>)}
    </tr>
  );
  return (
    <div role="region" aria-label="Piece measurements" tabIndex={0} className="overflow-x-auto">
      <table className="w-full min-w-[480px] text-sm" data-testid="piece-measurements">
        <thead><tr className="border-b border-calico-200"><th className="py-1 text-left text-ink-600">{piece.name}</th>{sizes.map((s) => <th key={s} className="px-2 text-right">{s}</th>)}</tr></thead>
        <tbody>
          {row('Width', (s) => len(piece.measurements[s].widthMm))}
          {row('Length', (s) => len(piece.measurements[s].heightMm))}
          {row('Area', (s) => area(piece.measurements[s].areaMm2))}
          {edges.map((e) => row(`Seam: ${e}`, (s) => len(piece.measurements[s].edgeLengthsMm[e] ?? NaN)))}
        </tbody>
      </table>
    </div>
  );
}
