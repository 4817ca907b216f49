import { useState } from 'react';
import type { PatternPreviewPieceDto } from '@shared/schemas/grading';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useAcceptPattern, usePatternPreview } from '../api/grading-queries';
import { parseLength } from '@shared/units/length-format';
import { useTranslation } from '@/lib/i18n';
import { useLength } from '../hooks/use-length';
import { area } from '../words';
import { FieldError } from '@/components/ui/form';

type Cut = 'cut1' | 'pair' | 'fold';
interface Settings { use: boolean; cut: Cut; copies: string; material: string; seam: string }

/** One piece drawn to scale (y up), with a 10 cm bar for checking (4 in in an imperial studio). */
function PieceDrawing({ p }: { p: PatternPreviewPieceDto }) {
  const { t } = useTranslation();
  const { system, len } = useLength();
  const bar = system === 'imperial' ? 101.6 : 100;
  const xs = p.outline.map((q) => q[0]), ys = p.outline.map((q) => q[1]);
  const minX = Math.min(...xs), maxY = Math.max(...ys), m = 12;
  const w = p.widthMm + 2 * m, h = p.heightMm + 2 * m + 14;
  const T = ([x, y]: [number, number]) => `${(x - minX + m).toFixed(2)},${(maxY - y + m).toFixed(2)}`;
  return (
    <svg viewBox={`0 0 ${w} ${h}`} className="h-40 w-full" role="img" aria-label={t(`${area}.pattern.drawn`, { piece: p.name })}>
      <polygon points={p.outline.map(T).join(' ')} fill="#f6efe3" stroke="#333" strokeWidth={Math.max(w, h) / 300} />
      {p.grainLine ? <polyline points={`${T(p.grainLine.from)} ${T(p.grainLine.to)}`} stroke="#2a6f6f" strokeWidth={Math.max(w, h) / 250} /> : null}
      <line x1={m} x2={m + bar} y1={h - 6} y2={h - 6} stroke="#000" strokeWidth={Math.max(w, h) / 250} />
      <text x={m} y={h - 8} fontSize={Math.max(w, h) / 30}>{len(bar)}</text>
    </svg>
  );
}

/** Bring in pieces from a DXF or SVG: preview to scale, set cut, copies, material and seam allowance, accept. */
export function PatternImportCard({ styleId }: { styleId: number }) {
  const { t } = useTranslation();
  const { len, area: areaOf, system, cellUnitWord } = useLength();
  /** A seam allowance as shown and typed: millimetres, or inches with fractions (`3/8`). */
  const seamText = (mm: number) => (system === 'metric' ? String(mm) : len(mm).replace('"', ''));
  const seamMm = (text: string) => (system === 'metric' ? Number(text.replace(',', '.')) : (parseLength(`${text} in`, 'imperial') ?? NaN));
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
    onSuccess: (d) => setSettings(d.pieces.map((p) => ({ use: !p.size || !d.sizesInFile.includes(d.baseSize) || p.size === d.baseSize, cut: 'cut1', copies: String(p.quantity ?? 1), material: p.material ?? '', seam: seamText(system === 'metric' ? 10 : 9.525) }))),
  });
  const doAccept = () => preview.data && accept.mutate({
    outlineIs: preview.data.outlineIs,
    pieces: pieces.flatMap((p, i) => (settings[i]?.use ? [{
      name: p.size ? `${p.name} ${p.size}` : p.name, outline: p.outline, grainLine: p.grainLine, notches: p.notches, drillHoles: p.drillHoles,
      cut: settings[i].cut, copies: Number(settings[i].copies), material: settings[i].material || undefined, seamAllowanceMm: seamMm(settings[i].seam),
    }] : [])),
  }, { onSuccess: () => preview.reset() });
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-600">{t(`${area}.pattern.help`)}</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <div>
          <label className="field-label" htmlFor="pattern-file">{t(`${area}.pattern.file`)}</label>
          <input id="pattern-file" type="file" accept=".dxf,.svg" className="field-input" onChange={(e) => { setFile(e.target.files?.[0] ?? null); preview.reset(); }} />
          {fields.file ? <FieldError>{fields.file}</FieldError> : null}
        </div>
        <div>
          <label className="field-label" htmlFor="pattern-outline">{t(`${area}.pattern.outlineIs`)}</label>
          <select id="pattern-outline" className="field-input" value={outlineIs} onChange={(e) => setOutlineIs(e.target.value)}>
            <option value="">{t(`${area}.pattern.choose`)}</option>
            <option value="sewing">{t(`${area}.pattern.sewing`)}</option>
            <option value="cutting">{t(`${area}.pattern.cutting`)}</option>
          </select>
          {fields.outlineIs ? <FieldError>{fields.outlineIs}</FieldError> : null}
        </div>
        <div>
          <label className="field-label" htmlFor="pattern-units">{t(`${area}.pattern.units`)}</label>
          <select id="pattern-units" className="field-input" value={units} onChange={(e) => setUnits(e.target.value)}>
            <option value="">{t(`${area}.pattern.fromFile`)}</option><option value="mm">{t(`${area}.pattern.mm`)}</option><option value="cm">{t(`${area}.pattern.cm`)}</option><option value="in">{t(`${area}.pattern.inches`)}</option>
          </select>
          {fields.units ? <FieldError>{fields.units}</FieldError> : null}
        </div>
      </div>
      <button type="button" className="btn-quiet" disabled={!file || !outlineIs || preview.isPending} onClick={read}>{preview.isPending ? t(`${area}.pattern.reading`) : t(`${area}.pattern.preview`)}</button>
      <ErrorNote error={preview.error} />
      {pieces.length ? (
        <div className="space-y-3" data-testid="pattern-preview">
          {preview.data && preview.data.sizesInFile.length > 1 ? (
            <p className="text-sm text-ink-600">
              {t(`${area}.pattern.sizesInFile`, { sizes: preview.data.sizesInFile.join(', ') })}{' '}
              {t(`${area}.pattern.${preview.data.sizesInFile.includes(preview.data.baseSize) ? 'onlyBase' : 'noneBase'}`, { base: preview.data.baseSize })}
              {preview.data.sizesNotInRun.length ? t(`${area}.pattern.notInRun`, { sizes: preview.data.sizesNotInRun.join(', ') }) : ''}
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
                <p className="text-xs text-ink-600">{t(`${area}.pattern.figures`, { width: len(p.widthMm), height: len(p.heightMm), area: areaOf(p.areaMm2), perimeter: len(p.perimeterMm) })}</p>
                <div className="mt-2 grid grid-cols-2 gap-2">
                  <select aria-label={t(`${area}.pattern.cutOf`, { piece: p.name })} className="field-input" value={settings[i]?.cut} onChange={(e) => set(i, { cut: e.target.value as Cut })}>
                    {(['cut1', 'pair', 'fold'] as const).map((c) => <option key={c} value={c}>{t(`${area}.cut.${c}`)}</option>)}
                  </select>
                  <input aria-label={t(`${area}.pattern.copiesOf`, { piece: p.name })} className="field-input" inputMode="numeric" value={settings[i]?.copies} onChange={(e) => set(i, { copies: e.target.value })} />
                  <input aria-label={t(`${area}.pattern.materialOf`, { piece: p.name })} placeholder={t(`${area}.pattern.material`)} className="field-input" value={settings[i]?.material} onChange={(e) => set(i, { material: e.target.value })} />
                  <input aria-label={t(`${area}.pattern.seamOf`, { piece: p.name, unit: cellUnitWord })} placeholder={t(`${area}.pattern.seam`, { unit: cellUnitWord })} className="field-input" inputMode="decimal" value={settings[i]?.seam} onChange={(e) => set(i, { seam: e.target.value })} />
                </div>
              </div>
            ))}
          </div>
          <button type="button" className="btn-primary" disabled={accept.isPending || !settings.some((s) => s.use)} onClick={doAccept}>{accept.isPending ? t(`${area}.pattern.saving`) : t(`${area}.pattern.accept`)}</button>
          <ErrorNote error={accept.error} />
        </div>
      ) : null}
    </div>
  );
}
