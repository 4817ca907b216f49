import type { MarkerDrawingDto } from '@shared/schemas/markers';
import { fmt } from '@/lib/format';
import { i18n } from '@/lib/i18n';
import { area } from '../words';

/** Seamrun palette per size, in run order (thread teal, madder, saffron, indigo, umber…). */
export const SIZE_COLOURS = ['#0F766E', '#B4413C', '#C98A16', '#3F51A3', '#6B5B45', '#2F855A', '#8E3B7A', '#4A5568'];

type P = { x: number; y: number };
const place = (ring: P[], mirrored: boolean, rotation: number, dx: number, dy: number) => {
  const r = (rotation * Math.PI) / 180;
  const c = Math.round(Math.cos(r) * 1e12) / 1e12, s = Math.round(Math.sin(r) * 1e12) / 1e12;
  return ring.map((p) => {
    const x = mirrored ? -p.x : p.x;
    return { x: x * c - p.y * s + dx, y: x * s + p.y * c + dy };
  });
};

/** The marker drawn to scale: the fabric strip and every piece, coloured by size and labelled. */
export function MarkerDrawing({ drawing, lengthMm, widthMm, sizes }: { drawing: MarkerDrawingDto; lengthMm: number; widthMm: number; sizes: string[] }) {
  return (
    <div role="region" aria-label={i18n.t(`${area}.view.drawing`)} tabIndex={0} className="overflow-x-auto rounded-lg border border-calico-200 bg-calico-50 p-2">
      <svg role="img" aria-label={i18n.t(`${area}.view.drawingOf`, { length: fmt().fabricLength(lengthMm) })} viewBox={`0 0 ${lengthMm} ${widthMm}`} className="h-auto min-w-[640px] w-full">
        <rect x={0} y={0} width={lengthMm} height={widthMm} fill="#FBF8F2" stroke="#1A1A1A" strokeWidth={2} />
        <g transform={`matrix(1 0 0 -1 0 ${widthMm})`}>
          {drawing.placements.map((p) => {
            const ring = place(drawing.outlines[p.pieceKey] ?? [], p.mirrored, p.rotation, p.x, p.y);
            const colour = SIZE_COLOURS[Math.max(0, sizes.indexOf(p.size)) % SIZE_COLOURS.length];
            const cx = ring.reduce((a, q) => a + q.x, 0) / Math.max(1, ring.length);
            const cy = ring.reduce((a, q) => a + q.y, 0) / Math.max(1, ring.length);
            return (
              <g key={`${p.pieceKey}-${p.copy}`} data-piece={p.pieceKey}>
                <polygon points={ring.map((q) => `${q.x},${q.y}`).join(' ')} fill={colour} fillOpacity={0.25} stroke={colour} strokeWidth={2} />
                <text transform={`matrix(1 0 0 -1 ${cx} ${cy})`} fontSize={22} textAnchor="middle" fill="#1A1A1A">{`${p.size} ${p.pieceName}`}</text>
              </g>
            );
          })}
        </g>
      </svg>
      <div className="mt-2 flex flex-wrap gap-3 text-xs">
        {sizes.map((s, i) => (
          <span key={s} className="flex items-center gap-1"><span className="inline-block h-3 w-3 rounded-sm" style={{ background: SIZE_COLOURS[i % SIZE_COLOURS.length] }} /> {s}</span>
        ))}
      </div>
    </div>
  );
}
