import { useMemo, useRef, useState, type PointerEvent as ReactPointerEvent } from 'react';
import { polygonArea, polygonPerimeter } from '@shared/geometry/polygon';
import type { Point } from '@shared/geometry/types';
import { ErrorNote } from '@/components/ui/page';
import { useAcceptPattern } from '../api/grading-queries';
import { parseLength } from '@shared/units/length-format';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { useLength } from '../hooks/use-length';
import { TRACE_FAILURES, useTracePhoto } from '../photo-trace/use-trace-photo';
import { area } from '../words';

type Cut = 'cut1' | 'pair' | 'fold';
type Mode = 'corners' | 'grain' | 'notches';
type Sheet = 'sheet-A4' | 'sheet-Letter' | 'border-A4';

/** The sheets to print; their names are `photo.sheets.<label>` in ../words.ts. */
const SHEET_LINKS: { label: string; kind: 'sheet' | 'border'; paper: 'A4' | 'Letter' | 'whole' }[] = [
  { label: 'sheetA4', kind: 'sheet', paper: 'A4' },
  { label: 'sheetLetter', kind: 'sheet', paper: 'Letter' },
  { label: 'borderA4', kind: 'border', paper: 'A4' },
  { label: 'borderLetter', kind: 'border', paper: 'Letter' },
  { label: 'borderWhole', kind: 'border', paper: 'whole' },
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
  const { t } = useTranslation();
  const { len, area: areaOf, small, system, cellUnitWord } = useLength();
  /** A fine length (the trace's tolerance): millimetres, or inches to the nearest 1/64 in an imperial studio. */
  const fine = (mm: number, digits?: number) => {
    if (system === 'metric') {
      const n = digits === undefined ? fmt().number(mm, 2) : new Intl.NumberFormat(fmt().locale, { minimumFractionDigits: digits, maximumFractionDigits: digits }).format(mm);
      return `${n} mm`;
    }
    let num = Math.round((mm / 25.4) * 64), den = 64;
    if (num === 0) return '< 1/64"';
    while (num % 2 === 0 && den > 1) { num /= 2; den /= 2; }
    return den === 1 ? `${num}"` : `${Math.floor(num / den) ? `${Math.floor(num / den)} ` : ''}${num % den}/${den}"`;
  };
  /** A seam allowance as shown and typed: millimetres, or inches with fractions (`3/8`). */
  const seamMm = (text: string) => (system === 'metric' ? Number(text.replace(',', '.')) : (parseLength(`${text} in`, 'imperial') ?? NaN));
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
  const [seam, setSeam] = useState(() => (system === 'metric' ? '10' : len(9.525).replace('"', '')));
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
      notches: notches.map(up), cut, copies: Number(copies), material: material.trim() || undefined, seamAllowanceMm: seamMm(seam),
    }],
  }, { onSuccess: () => { reset(); setOutline([]); setGrain(null); setNotches([]); setName(''); } });

  const v = done?.result;
  const vw = v ? v.view.width / v.pxPerMm : 0, vh = v ? v.view.height / v.pxPerMm : 0;
  const handle = Math.max(vw, vh) / 120;
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-600">
        {t(`${area}.photo.help`, { bar: small(100) })}
      </p>
      <p className="text-sm">
        {t(`${area}.photo.print`)}{' '}
        {SHEET_LINKS.map((l, i) => (
          <span key={l.label}>{i ? ' · ' : ''}<a className="underline" href={`/api/styles/${styleId}/pattern/calibration-sheet?kind=${l.kind}&paper=${l.paper}`}>{t(`${area}.photo.sheets.${l.label}`)}</a></span>
        ))}
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label className="field-label" htmlFor="photo-sheet">{t(`${area}.photo.photographedOn`)}</label>
          <select id="photo-sheet" className="field-input" value={sheet} onChange={(e) => setSheet(e.target.value as Sheet)}>
            <option value="sheet-A4">{t(`${area}.photo.onA4`)}</option>
            <option value="sheet-Letter">{t(`${area}.photo.onLetter`)}</option>
            <option value="border-A4">{t(`${area}.photo.onBorder`)}</option>
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="photo-file">{t(`${area}.photo.photo`)}</label>
          <input id="photo-file" type="file" accept="image/*" capture="environment" className="field-input" onChange={(e) => void handleFile(e.target.files?.[0])} />
        </div>
      </div>
      {state.status === 'tracing' ? <p className="text-sm" role="status">{t(`${area}.photo.tracing`)}</p> : null}
      {state.status === 'failed' ? <p className="field-error" role="alert">{t(`${area}.photo.failures.${TRACE_FAILURES.includes(state.code) ? state.code : 'failed'}`)}</p> : null}
      {v && done ? (
        <div className="space-y-3" data-testid="photo-trace">
          <p className="text-sm text-ink-600">
            {t(`${area}.photo.traced`, { tolerance: fine(v.toleranceMm), residual: fine(v.markResidualMm, 2) })}
            {figures ? t(`${area}.photo.figures`, { width: len(Math.max(...outline.map((p) => p.x)) - Math.min(...outline.map((p) => p.x))), height: len(maxY - Math.min(...outline.map((p) => p.y))), area: areaOf(figures.area), perimeter: len(figures.perimeter) }) : ''}
          </p>
          <div role="radiogroup" aria-label={t(`${area}.photo.tapDoes`)} className="flex flex-wrap gap-3 text-sm">
            {(['corners', 'grain', 'notches'] as const).map((m) => (
              <label key={m} className="flex items-center gap-1"><input type="radio" name="photo-mode" checked={mode === m} onChange={() => setMode(m)} />{t(`${area}.photo.modes.${m}`)}</label>
            ))}
          </div>
          <svg
            ref={svg} viewBox={`${v.viewOrigin.x} ${v.viewOrigin.y} ${vw} ${vh}`} className="h-[70vh] w-full max-w-3xl touch-none border border-calico-200"
            role="group" aria-label={t(`${area}.photo.canvas`)} data-testid="photo-trace-canvas"
            onPointerMove={handleMove} onPointerUp={() => setDragging(null)} onPointerLeave={() => setDragging(null)} onClick={handleClick}
          >
            <image href={done.viewUrl} x={v.viewOrigin.x} y={v.viewOrigin.y} width={vw} height={vh} preserveAspectRatio="none" />
            {outline.length >= 3 ? <polygon points={outline.map((p) => `${p.x},${p.y}`).join(' ')} fill="rgba(255,200,0,0.15)" stroke="#d9480f" strokeWidth={handle / 3} /> : null}
            {grain ? <line x1={grain.from.x} y1={grain.from.y} x2={(grain.to ?? grain.from).x} y2={(grain.to ?? grain.from).y} stroke="#0b7285" strokeWidth={handle / 2} /> : null}
            {notches.map((n, k) => <rect key={k} x={n.x - handle / 2} y={n.y - handle / 2} width={handle} height={handle} fill="#0b7285" />)}
            {mode === 'corners' ? outline.map((p, k) => (
              <circle
                key={k} cx={p.x} cy={p.y} r={handle} fill="#fff" stroke="#d9480f" strokeWidth={handle / 4} role="button" tabIndex={0}
                aria-label={t(`${area}.photo.corner`, { n: k + 1 })}
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
            {grain?.to ? t(`${area}.photo.grainMarked`) : t(`${area}.photo.markGrain`)} {notches.length ? t(`${area}.photo.notches`, { count: notches.length }) : ''}{' '}
            {notches.length || grain ? <button type="button" className="underline" onClick={() => { setGrain(null); setNotches([]); }}>{t(`${area}.photo.clear`)}</button> : null}
          </p>
          <div className="grid gap-3 sm:grid-cols-3">
            <div><label className="field-label" htmlFor="photo-name">{t(`${area}.photo.name`)}</label><input id="photo-name" className="field-input" value={name} onChange={(e) => setName(e.target.value)} /></div>
            <div>
              <label className="field-label" htmlFor="photo-cut">{t(`${area}.photo.cut`)}</label>
              <select id="photo-cut" className="field-input" value={cut} onChange={(e) => setCut(e.target.value as Cut)}>
                {(['cut1', 'pair', 'fold'] as const).map((c) => <option key={c} value={c}>{t(`${area}.cut.${c}`)}</option>)}
              </select>
            </div>
            <div><label className="field-label" htmlFor="photo-copies">{t(`${area}.photo.copies`)}</label><input id="photo-copies" className="field-input" inputMode="numeric" value={copies} onChange={(e) => setCopies(e.target.value)} /></div>
            <div><label className="field-label" htmlFor="photo-material">{t(`${area}.photo.material`)}</label><input id="photo-material" className="field-input" value={material} onChange={(e) => setMaterial(e.target.value)} /></div>
            <div><label className="field-label" htmlFor="photo-seam">{t(`${area}.photo.seam`, { unit: cellUnitWord })}</label><input id="photo-seam" className="field-input" inputMode="decimal" value={seam} onChange={(e) => setSeam(e.target.value)} /></div>
            <div>
              <label className="field-label" htmlFor="photo-outline">{t(`${area}.photo.edgeIs`)}</label>
              <select id="photo-outline" className="field-input" value={outlineIs} onChange={(e) => setOutlineIs(e.target.value)}>
                <option value="">{t(`${area}.pattern.choose`)}</option><option value="sewing">{t(`${area}.pattern.sewing`)}</option><option value="cutting">{t(`${area}.pattern.cutting`)}</option>
              </select>
            </div>
          </div>
          <button type="button" className="btn-primary" disabled={!canAccept || accept.isPending} onClick={doAccept}>{accept.isPending ? t(`${area}.photo.saving`) : t(`${area}.photo.add`)}</button>
          <ErrorNote error={accept.error} />
        </div>
      ) : null}
    </div>
  );
}
