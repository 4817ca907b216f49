import { useMemo, useRef, useState, type PointerEvent as ReactPointerEvent } from 'react';
import { polygonArea, polygonPerimeter } from '@shared/geometry/polygon';
import type { Point } from '@shared/geometry/types';
import { ErrorNote } from '@/components/ui/page';
import { useAcceptPattern } from '../api/grading-queries';
import { useLength } from '../hooks/use-length';
import { TRACE_FAILURE_TEXT, useTracePhoto } from '../photo-trace/use-trace-photo';

type Cut = 'cut1' | 'pair' | 'fold';
type Mode = 'corners' | 'grain' | 'notches';
type Sheet = 'sheet-A4' | 'sheet-Letter' | 'border-A4';

const SHEET_LINKS: { label: string; kind: 'sheet' | 'border'; paper: 'A4' | 'Letter' | 'whole' }[] = [
  { label: 'Sheet, A4', kind: 'sheet', paper: 'A4' },
  { label: 'Sheet, Letter', kind: 'sheet', paper: 'Letter' },
  { label: 'Border frame on A4 pages', kind: 'border', paper: 'A4' },
  { label: 'Border frame on Letter pages', kind: 'border', paper: 'Letter' },
  { label: 'Border frame on one large page', kind: 'border', paper: 'whole' },
];

/** The point of `ring` nearest to `q` on its edges, and the edge it lies on. */
function nearestOnRing(ring: Point[], q: Point): { at: Point; edge: number } {
  let best = { at: ring[0], edge: 0 }, bestD = Infinity;
  for (let i = 0; i < ring.length; i++) {
    const a = ring[i], b = ring[(i + 1) % ring.length];
    const dx = b.x - a.x, dy = b.y - a.y, l2 = dx * dx + dy * dy || 1;
    const t = Math.max(0, Math.min(1, ((q.x - a.x) * dx + (q.y - a.y) * dy) / l2));
    const p = { x: a.x + t * dx, y: a.y + t * dy }, d = Math.hypot(p.x - q.x, p.y - q.y);
    if (d < bestD) { bestD = d; best = { at: p, edge: i }; }
  }
  return best;
}

/**
 * A paper pattern piece from a phone photo: print a calibration sheet, lay the piece on it, take or choose
 * a photo; the trace runs in a web worker; the owner checks the outline over the top-down photo, moves
 * corners, marks the grain line and notches, sets the piece's details and adds it to the style's pieces.
 */
export function PhotoTraceCard({ styleId }: { styleId: number }) {
  const { len, area } = useLength();
  const { state, trace, reset } = useTracePhoto();
  const accept = useAcceptPattern(styleId);
  const [sheet, setSheet] = useState<Sheet>('sheet-A4');
  const [outline, setOutline] = useState<Point[]>([]);
  const [grain, setGrain] = useState<{ from: Point; to?: Point } | null>(null);
  const [notches, setNotches] = useState<Point[]>([]);
  const [mode, setMode] = useState<Mode>('corners');
  const [dragging, setDragging] = useState<number | null>(null);
  const [name, setName] = useState('');
  const [cut, setCut] = useState<Cut>('cut1');
  const [copies, setCopies] = useState('1');
  const [material, setMaterial] = useState('');
  const [seam, setSeam] = useState('10');
  const [outlineIs, setOutlineIs] = useState('');
  const svg = useRef<SVGSVGElement>(null);

  const handleFile = async (file: File | undefined) => {
    if (!file) return;
    setOutline([]); setGrain(null); setNotches([]); accept.reset();
    const [kind, paper] = sheet.split('-') as ['sheet' | 'border', 'A4' | 'Letter'];
    await trace(file, kind, paper);
  };
  const done = state.status === 'done' ? state : null;
  // The traced outline becomes the editable one when a trace arrives.
  const [tracedFrom, setTracedFrom] = useState<unknown>(null);
  if (done && tracedFrom !== done.result) { setTracedFrom(done.result); setOutline(done.result.outline); }

  const toSheet = (e: { clientX: number; clientY: number }): Point | null => {
    const m = svg.current?.getScreenCTM();
    if (!m) return null;
    const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(m.inverse());
    return { x: p.x, y: p.y };
  };
  const handleMove = (e: ReactPointerEvent) => {
    if (dragging === null) return;
    const p = toSheet(e);
    if (p) setOutline((o) => o.map((q, k) => (k === dragging ? p : q)));
  };
  const handleClick = (e: React.MouseEvent) => {
    const p = toSheet(e);
    if (!p || outline.length < 3) return;
    if (mode === 'grain') setGrain((g) => (!g || g.to ? { from: p } : { ...g, to: p }));
    if (mode === 'notches') {
      const { at, edge } = nearestOnRing(outline, p);
      setOutline((o) => [...o.slice(0, edge + 1), at, ...o.slice(edge + 1)]);
      setNotches((n) => [...n, at]);
    }
  };
  const nudge = (k: number, dx: number, dy: number) => setOutline((o) => o.map((q, i) => (i === k ? { x: q.x + dx, y: q.y + dy } : q)));

  const figures = useMemo(() => (outline.length >= 3 ? { area: polygonArea(outline), perimeter: polygonPerimeter(outline) } : null), [outline]);
  const maxY = Math.max(0, ...outline.map((p) => p.y));
  const up = (p: Point): [number, number] => [Math.round(p.x * 1000) / 1000, Math.round((maxY - p.y) * 1000) / 1000];
  const canAccept = !!done && outline.length >= 3 && name.trim() !== '' && outlineIs !== '' && !!grain?.to;
  const doAccept = () => canAccept && accept.mutate({
    outlineIs: outlineIs as 'sewing' | 'cutting', keepExisting: true,
    pieces: [{
      name: name.trim(), outline: outline.map(up), grainLine: { from: up(grain!.from), to: up(grain!.to!) },
      notches: notches.map(up), cut, copies: Number(copies), material: material.trim() || undefined, seamAllowanceMm: Number(seam),
    }],
  }, { onSuccess: () => { reset(); setOutline([]); setGrain(null); setNotches([]); setName(''); } });

  const v = done?.result;
  const vw = v ? v.view.width / v.pxPerMm : 0, vh = v ? v.view.height / v.pxPerMm : 0;
  const handle = Math.max(vw, vh) / 120;
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-600">
        Print a calibration sheet at 100 % and check its 100 mm bar with a ruler. Lay the paper piece flat on the blue field (or, for a large
        piece, on a plain table inside the border frame), then take the photo from above with all four corner marks in view. The photo is
        traced on this device; only the finished outline is saved.
      </p>
      <p className="text-sm">
        Print:{' '}
        {SHEET_LINKS.map((l, i) => (
          <span key={l.label}>{i ? ' · ' : ''}<a className="underline" href={`/api/styles/${styleId}/pattern/calibration-sheet?kind=${l.kind}&paper=${l.paper}`}>{l.label}</a></span>
        ))}
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label className="field-label" htmlFor="photo-sheet">Photographed on</label>
          <select id="photo-sheet" className="field-input" value={sheet} onChange={(e) => setSheet(e.target.value as Sheet)}>
            <option value="sheet-A4">the A4 sheet</option>
            <option value="sheet-Letter">the Letter sheet</option>
            <option value="border-A4">the border frame</option>
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="photo-file">Photo of the piece</label>
          <input id="photo-file" type="file" accept="image/*" capture="environment" className="field-input" onChange={(e) => void handleFile(e.target.files?.[0])} />
        </div>
      </div>
      {state.status === 'tracing' ? <p className="text-sm" role="status">Tracing the photo…</p> : null}
      {state.status === 'failed' ? <p className="field-error" role="alert">{TRACE_FAILURE_TEXT[state.code] ?? TRACE_FAILURE_TEXT.failed}</p> : null}
      {v && done ? (
        <div className="space-y-3" data-testid="photo-trace">
          <p className="text-sm text-ink-600">
            Traced within {v.toleranceMm} mm; the sheet&apos;s marks fit to {v.markResidualMm.toFixed(2)} mm.
            {figures ? ` Size ${len(Math.max(...outline.map((p) => p.x)) - Math.min(...outline.map((p) => p.x)))} × ${len(maxY - Math.min(...outline.map((p) => p.y)))} · area ${area(figures.area)} · perimeter ${len(figures.perimeter)}.` : ''}
          </p>
          <div role="radiogroup" aria-label="What a tap on the photo does" className="flex flex-wrap gap-3 text-sm">
            {([['corners', 'Move corners'], ['grain', 'Mark the grain line (two taps)'], ['notches', 'Add notches']] as const).map(([m, label]) => (
              <label key={m} className="flex items-center gap-1"><input type="radio" name="photo-mode" checked={mode === m} onChange={() => setMode(m)} />{label}</label>
            ))}
          </div>
          <svg
            ref={svg} viewBox={`${v.viewOrigin.x} ${v.viewOrigin.y} ${vw} ${vh}`} className="h-[70vh] w-full max-w-3xl touch-none border border-calico-200"
            role="group" aria-label="Traced outline over the photo" data-testid="photo-trace-canvas"
            onPointerMove={handleMove} onPointerUp={() => setDragging(null)} onPointerLeave={() => setDragging(null)} onClick={handleClick}
          >
            <image href={done.viewUrl} x={v.viewOrigin.x} y={v.viewOrigin.y} width={vw} height={vh} preserveAspectRatio="none" />
            {outline.length >= 3 ? <polygon points={outline.map((p) => `${p.x},${p.y}`).join(' ')} fill="rgba(255,200,0,0.15)" stroke="#d9480f" strokeWidth={handle / 3} /> : null}
            {grain ? <line x1={grain.from.x} y1={grain.from.y} x2={(grain.to ?? grain.from).x} y2={(grain.to ?? grain.from).y} stroke="#0b7285" strokeWidth={handle / 2} /> : null}
            {notches.map((n, k) => <rect key={k} x={n.x - handle / 2} y={n.y - handle / 2} width={handle} height={handle} fill="#0b7285" />)}
            {mode === 'corners' ? outline.map((p, k) => (
              <circle
                key={k} cx={p.x} cy={p.y} r={handle} fill="#fff" stroke="#d9480f" strokeWidth={handle / 4} role="button" tabIndex={0}
                aria-label={`Corner ${k + 1}: drag, or use the arrow keys`}
                onPointerDown={(e) => { e.stopPropagation(); (e.target as Element).setPointerCapture?.(e.pointerId); setDragging(k); }}
                onKeyDown={(e) => {
                  const step = 0.5;
                  if (e.key === 'ArrowLeft') nudge(k, -step, 0); else if (e.key === 'ArrowRight') nudge(k, step, 0);
                  else if (e.key === 'ArrowUp') nudge(k, 0, -step); else if (e.key === 'ArrowDown') nudge(k, 0, step);
                }}
              />
            )) : null}
          </svg>
          <p className="text-xs text-ink-600">
            {grain?.to ? 'Grain line marked.' : 'Mark the grain line: tap its two ends.'} {notches.length ? `${notches.length} notch${notches.length > 1 ? 'es' : ''}.` : ''}{' '}
            {notches.length || grain ? <button type="button" className="underline" onClick={() => { setGrain(null); setNotches([]); }}>Clear grain line and notches</button> : null}
          </p>
          <div className="grid gap-3 sm:grid-cols-3">
            <div><label className="field-label" htmlFor="photo-name">Piece name</label><input id="photo-name" className="field-input" value={name} onChange={(e) => setName(e.target.value)} /></div>
            <div>
              <label className="field-label" htmlFor="photo-cut">Cut</label>
              <select id="photo-cut" className="field-input" value={cut} onChange={(e) => setCut(e.target.value as Cut)}>
                <option value="cut1">cut 1</option><option value="pair">cut a mirrored pair</option><option value="fold">cut on fold</option>
              </select>
            </div>
            <div><label className="field-label" htmlFor="photo-copies">Copies</label><input id="photo-copies" className="field-input" inputMode="numeric" value={copies} onChange={(e) => setCopies(e.target.value)} /></div>
            <div><label className="field-label" htmlFor="photo-material">Material</label><input id="photo-material" className="field-input" value={material} onChange={(e) => setMaterial(e.target.value)} /></div>
            <div><label className="field-label" htmlFor="photo-seam">Seam allowance (mm)</label><input id="photo-seam" className="field-input" inputMode="decimal" value={seam} onChange={(e) => setSeam(e.target.value)} /></div>
            <div>
              <label className="field-label" htmlFor="photo-outline">The paper piece&apos;s edge is the</label>
              <select id="photo-outline" className="field-input" value={outlineIs} onChange={(e) => setOutlineIs(e.target.value)}>
                <option value="">Choose…</option><option value="sewing">sewing line</option><option value="cutting">cutting line (allowance included)</option>
              </select>
            </div>
          </div>
          <button type="button" className="btn-primary" disabled={!canAccept || accept.isPending} onClick={doAccept}>{accept.isPending ? 'Saving…' : 'Add to the style\u2019s pieces'}</button>
          <ErrorNote error={accept.error} />
        </div>
      ) : null}
    </div>
  );
}
