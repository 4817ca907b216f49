import { useState } from 'react';
import type { PatternPreviewPieceDto } from '@shared/schemas/grading';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useAcceptPattern, usePatternPreview } from '../api/grading-queries';
import { useLength } from '../hooks/use-length';

type Cut = 'cut1' | 'pair' | 'fold';
interface Settings { use: boolean; cut: Cut; copies: string; material: string; seam: string }

/** One piece drawn to scale (y up), with a 10 cm bar for checking. */
function PieceDrawing({ p }: { p: PatternPreviewPieceDto }) {
  const xs = p.outline.map((q) => q[0]), ys = p.outline.map((q) => q[1]);
  const minX = Math.min(...xs), maxY = Math.max(...ys), m = 12;
  const w = p.widthMm + 2 * m, h = p.heightMm + 2 * m + 14;
  const T = ([x, y]: [number, number]) => `${(x - minX + m).toFixed(2)},${(maxY - y + m).toFixed(2)}`;
  return (
    <svg viewBox={`0 0 ${w} ${h}`} className="h-40 w-full" role="img" aria-label={`${p.name} drawn to scale`}>
      <polygon points={p.outline.map(T).join(' ')} fill="#f6efe3" stroke="#333" strokeWidth={Math.max(w, h) / 300} />
      {p.grainLine ? <polyline points={`${T(p.grainLine.from)} ${T(p.grainLine.to)}`} stroke="#2a6f6f" strokeWidth={Math.max(w, h) / 250} /> : null}
      <line x1={m} x2={m + 100} y1={h - 6} y2={h - 6} stroke="#000" strokeWidth={Math.max(w, h) / 250} />
      <text x={m} y={h - 8} fontSize={Math.max(w, h) / 30}>10 cm</text>
    </svg>
  );
}

/** Bring in pieces from a DXF or SVG: preview to scale, set cut, copies, material and seam allowance, accept. */
export function PatternImportCard({ styleId }: { styleId: number }) {
  const { len, area } = useLength();
  const [file, setFile] = useState<File | null>(null);
  const [units, setUnits] = useState('');
  const [outlineIs, setOutlineIs] = useState('');
  const [settings, setSettings] = useState<Settings[]>([]);
  const preview = usePatternPreview(styleId);
  const accept = useAcceptPattern(styleId);
  const fields = preview.error instanceof ApiError ? preview.error.fields : {};
  const pieces = preview.data?.pieces ?? [];
  const set = (i: number, patch: Partial<Settings>) => setSettings((s) => s.map((x, k) => (k === i ? { ...x, ...patch } : x)));
  const read = () => file && outlineIs && preview.mutate({ file, units: units || undefined, outlineIs }, {
    // Of a graded file, the base size's pieces are kept: grading makes the other sizes from the style's rules.
    onSuccess: (d) => setSettings(d.pieces.map((p) => ({ use: !p.size || !d.sizesInFile.includes(d.baseSize) || p.size === d.baseSize, cut: 'cut1', copies: String(p.quantity ?? 1), material: p.material ?? '', seam: '10' }))),
  });
  const doAccept = () => preview.data && accept.mutate({
    outlineIs: preview.data.outlineIs,
    pieces: pieces.flatMap((p, i) => (settings[i]?.use ? [{
      name: p.size ? `${p.name} ${p.size}` : p.name, outline: p.outline, grainLine: p.grainLine, notches: p.notches, drillHoles: p.drillHoles,
      cut: settings[i].cut, copies: Number(settings[i].copies), material: settings[i].material || undefined, seamAllowanceMm: Number(settings[i].seam),
    }] : [])),
  }, { onSuccess: () => preview.reset() });
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-600">A DXF (pattern exchange layers or plain outlines) or an SVG. Nothing is saved until you accept; accepted pieces replace the style’s pieces.</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <div>
          <label className="field-label" htmlFor="pattern-file">Pattern file</label>
          <input id="pattern-file" type="file" accept=".dxf,.svg" className="field-input" onChange={(e) => { setFile(e.target.files?.[0] ?? null); preview.reset(); }} />
          {fields.file ? <p className="field-error">{fields.file}</p> : null}
        </div>
        <div>
          <label className="field-label" htmlFor="pattern-outline">The outline in the file is the</label>
          <select id="pattern-outline" className="field-input" value={outlineIs} onChange={(e) => setOutlineIs(e.target.value)}>
            <option value="">Choose…</option>
            <option value="sewing">sewing line</option>
            <option value="cutting">cutting line (allowance included)</option>
          </select>
          {fields.outlineIs ? <p className="field-error">{fields.outlineIs}</p> : null}
        </div>
        <div>
          <label className="field-label" htmlFor="pattern-units">Units (if the file does not say)</label>
          <select id="pattern-units" className="field-input" value={units} onChange={(e) => setUnits(e.target.value)}>
            <option value="">From the file</option><option value="mm">mm</option><option value="cm">cm</option><option value="in">inches</option>
          </select>
          {fields.units ? <p className="field-error">{fields.units}</p> : null}
        </div>
      </div>
      <button type="button" className="btn-quiet" disabled={!file || !outlineIs || preview.isPending} onClick={read}>{preview.isPending ? 'Reading…' : 'Preview'}</button>
      <ErrorNote error={preview.error} />
      {pieces.length ? (
        <div className="space-y-3" data-testid="pattern-preview">
          {preview.data && preview.data.sizesInFile.length > 1 ? (
            <p className="text-sm text-ink-600">
              The file holds sizes {preview.data.sizesInFile.join(', ')}.{' '}
              {preview.data.sizesInFile.includes(preview.data.baseSize) ? `Only the base size ${preview.data.baseSize} is ticked: the style's grade rules make the other sizes.` : `None is the style's base size ${preview.data.baseSize}: tick the pieces to keep.`}
              {preview.data.sizesNotInRun.length ? ` Not in the style's size run: ${preview.data.sizesNotInRun.join(', ')}.` : ''}
            </p>
          ) : null}
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {pieces.map((p, i) => (
              <div key={i} className="rounded border border-calico-200 p-2 text-sm">
                <label className="flex items-center gap-2 font-medium">
                  <input type="checkbox" checked={settings[i]?.use ?? true} onChange={(e) => set(i, { use: e.target.checked })} />
                  {p.name}{p.size ? ` (${p.size})` : ''}
                </label>
                <PieceDrawing p={p} />
                <p className="text-xs text-ink-600">{len(p.widthMm)} × {len(p.heightMm)} · area {area(p.areaMm2)} · perimeter {len(p.perimeterMm)}</p>
                <div className="mt-2 grid grid-cols-2 gap-2">
                  <select aria-label={`Cut ${p.name}`} className="field-input" value={settings[i]?.cut} onChange={(e) => set(i, { cut: e.target.value as Cut })}>
                    <option value="cut1">cut 1</option><option value="pair">cut a mirrored pair</option><option value="fold">cut on fold</option>
                  </select>
                  <input aria-label={`Copies of ${p.name}`} className="field-input" inputMode="numeric" value={settings[i]?.copies} onChange={(e) => set(i, { copies: e.target.value })} />
                  <input aria-label={`Material of ${p.name}`} placeholder="Material" className="field-input" value={settings[i]?.material} onChange={(e) => set(i, { material: e.target.value })} />
                  <input aria-label={`Seam allowance of ${p.name} (mm)`} placeholder="Seam (mm)" className="field-input" inputMode="decimal" value={settings[i]?.seam} onChange={(e) => set(i, { seam: e.target.value })} />
                </div>
              </div>
            ))}
          </div>
          <button type="button" className="btn-primary" disabled={accept.isPending || !settings.some((s) => s.use)} onClick={doAccept}>{accept.isPending ? 'Saving…' : 'Accept pieces'}</button>
          <ErrorNote error={accept.error} />
        </div>
      ) : null}
    </div>
  );
}
