import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Link } from 'react-router';
import { cuttingOutline, draftStyle, type BlockSpec, type BodyMeasurements, type DraftedPiece } from '@grading';
import { formatLength } from '@shared/units/length-format';
import { presetComposition, STYLE_PRESETS, type BlockSpecInput, type StyleComposition } from '@shared/schemas/style-composition';
import type { StyleDto } from '@shared/schemas/styles';
import { ErrorNote } from '@/components/ui/page';
import { fabricQueries } from '@/features/cutting/api/cutting-queries';
import { gradingQueries } from '@/features/grading/api/grading-queries';
import { useLength } from '@/features/grading/hooks/use-length';
import { usePatternNames } from '@/features/grading/hooks/use-pattern-names';
import { useCan } from '@/lib/auth';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { useSaveComposition } from '../api/style-queries';
import { area } from '../words';
import { BLOCK_FIELDS, BLOCK_NAMES, getAt, materialsOf, setAt, type BlockField, type BlockName } from './block-fields';
import { blockOptionField, readBlockOption } from './block-option-text';

const MATERIAL_CHOICES = ['self', 'lining', 'contrast', 'interfacing'];

/**
 * The pattern room's first step: the blocks a style's pieces are drafted from (a preset or a list of blocks with
 * their options, defaults shown), the fabric each material is cut from, and a drawing to scale of the base size.
 */
export function StyleBlocksCard({ style }: { style: StyleDto }) {
  const { t } = useTranslation();
  const material = (m: string) => t(`${area}.materials.${m}`, { defaultValue: m });
  const system = fmt().settings.unitSystem;
  const preset = (id: string, part: 'name' | 'description', text: string) =>
    t(`${area}.presets.${id}.${part === 'name' ? 'name' : `description.${system}`}`, { defaultValue: text });
  const canEdit = useCan('styles:write');
  const [comp, setComp] = useState<StyleComposition>(style.composition ?? { preset: null, blocks: [] });
  const [links, setLinks] = useState<Record<string, number>>(style.materialFabrics);
  const [adding, setAdding] = useState<BlockName>('bodice');
  const save = useSaveComposition(style.id);
  const fabrics = useQuery({ ...fabricQueries.list(), enabled: canEdit });
  const materials = materialsOf(comp.blocks, comp.preset);
  const setBlock = (i: number, b: BlockSpecInput) => setComp({ ...comp, blocks: comp.blocks.map((x, k) => (k === i ? b : x)) });
  const submit = () => {
    const keep = Object.fromEntries(Object.entries(links).filter(([m]) => materials.includes(m)));
    save.mutate({ composition: comp, materialFabrics: keep });
  };
  return (
    <div className="grid gap-4" data-testid="style-blocks">
      <div className="flex flex-wrap items-center gap-2">
        <span className="text-sm text-ink-600">{t(`${area}.blocks.startFrom`)}</span>
        {STYLE_PRESETS.map((p) => (
          <button key={p.id} type="button" className={comp.preset === p.id ? 'btn-primary' : 'btn-quiet'} disabled={!canEdit} title={preset(p.id, 'description', p.description)} onClick={() => setComp(presetComposition(p.id))}>
            {preset(p.id, 'name', p.name)}
          </button>
        ))}
      </div>
      {comp.preset === 'shirt-dress' && comp.blocks.length === 0 ? (
        <p className="text-sm text-ink-600">{preset(STYLE_PRESETS[0].id, 'description', STYLE_PRESETS[0].description)} {t(`${area}.blocks.shirtDressNote`)}</p>
      ) : (
        <ol className="grid gap-3">
          {comp.blocks.map((b, i) => (
            <BlockEditor key={i} index={i} spec={b} canEdit={canEdit} errors={save.error && 'fields' in save.error ? (save.error.fields as Record<string, string>) : {}} onChange={(s) => setBlock(i, s)} onRemove={() => setComp({ ...comp, blocks: comp.blocks.filter((_, k) => k !== i) })} />
          ))}
        </ol>
      )}
      {canEdit ? (
        <div className="flex flex-wrap items-end gap-2">
          <label className="text-sm">
            <span className="field-label">{t(`${area}.blocks.addBlock`)}</span>
            <select className="field-input" value={adding} onChange={(e) => setAdding(e.target.value as BlockName)} aria-label={t(`${area}.blocks.blockToAdd`)}>
              {BLOCK_NAMES.map((k) => <option key={k} value={k}>{t(`${area}.blockNames.${k}`)}</option>)}
            </select>
          </label>
          <button type="button" className="btn-quiet" onClick={() => setComp({ ...comp, blocks: [...comp.blocks, { block: adding } as BlockSpecInput] })}>{t(`${area}.blocks.add`)}</button>
        </div>
      ) : null}
      <fieldset className="grid gap-2 sm:grid-cols-2">
        <legend className="field-label">{t(`${area}.blocks.fabricOfMaterial`)}</legend>
        {materials.map((m) => (
          <label key={m} className="text-sm">
            <span className="field-label">{material(m).charAt(0).toUpperCase() + material(m).slice(1)}</span>
            <select className="field-input" aria-label={t(`${area}.blocks.fabricFor`, { material: material(m) })} disabled={!canEdit} value={links[m] ?? ''} onChange={(e) => setLinks({ ...links, [m]: Number(e.target.value) })}>
              <option value="">{t(`${area}.blocks.notLinked`)}</option>
              {(fabrics.data ?? []).map((f) => <option key={f.id} value={f.id}>{f.name}</option>)}
            </select>
            {save.error && 'fields' in save.error ? <span className="field-error">{(save.error.fields as Record<string, string>)[`materialFabrics.${m}`]}</span> : null}
          </label>
        ))}
      </fieldset>
      {canEdit ? (
        <div className="flex flex-wrap items-center gap-3">
          <button type="button" className="btn-primary" disabled={save.isPending} onClick={submit}>{save.isPending ? t(`${area}.blocks.saving`) : t(`${area}.blocks.save`)}</button>
          <Link className="btn-quiet" to={`/styles/${style.id}/grading`}>{t(`${area}.blocks.grading`)}</Link>
          {save.isSuccess ? <span className="text-sm text-ink-600" role="status">{t(`${area}.blocks.saved`)}</span> : null}
        </div>
      ) : null}
      {save.error ? <ErrorNote error={save.error} /> : null}
      <BaseSizeDrawing styleId={style.id} baseSize={style.baseSize} composition={comp} />
    </div>
  );
}

function BlockEditor({ index, spec, canEdit, errors, onChange, onRemove }: { index: number; spec: BlockSpecInput; canEdit: boolean; errors: Record<string, string>; onChange: (s: BlockSpecInput) => void; onRemove: () => void }) {
  const { t } = useTranslation();
  return (
    <li className="rounded-lg border border-calico-200 p-3" data-testid={`block-${index}`}>
      <div className="mb-2 flex flex-wrap items-center gap-3">
        <strong>{t(`${area}.blockNames.${spec.block}`)}</strong>
        <label className="text-sm">
          {t(`${area}.blocks.material`)}{' '}
          <select className="field-input inline-block w-auto" aria-label={t(`${area}.blocks.materialOf`, { n: index + 1 })} disabled={!canEdit} value={spec.material ?? 'self'} onChange={(e) => onChange(setAt(spec, 'material', e.target.value === 'self' ? undefined : e.target.value))}>
            {[...new Set([...MATERIAL_CHOICES, spec.material ?? 'self'])].map((m) => <option key={m} value={m}>{t(`${area}.materials.${m}`, { defaultValue: m })}</option>)}
          </select>
        </label>
        {canEdit ? <button type="button" className="btn-quiet ml-auto" onClick={onRemove}>{t(`${area}.blocks.remove`)}</button> : null}
      </div>
      <div className="grid gap-2 sm:grid-cols-3">
        {BLOCK_FIELDS[spec.block].map((f) => <OptionField key={f.path} index={index} block={spec.block} field={f} spec={spec} canEdit={canEdit} error={errors[blockOptionField(index, f.path)]} onChange={onChange} />)}
      </div>
    </li>
  );
}

function OptionField({ index, block, field: f, spec, canEdit, error, onChange }: { index: number; block: BlockName; field: BlockField; spec: BlockSpecInput; canEdit: boolean; error?: string; onChange: (s: BlockSpecInput) => void }) {
  const { t } = useTranslation();
  const [isBad, setIsBad] = useState(false);
  const { len, system, lengthUnitWord, decimal } = useLength();
  const key = `${block}.${f.path.replace(/\./g, '_')}`;
  const label = t(`${area}.fieldsByUnit.${system}.${key}`, { defaultValue: '' }) || t(`${area}.fields.${key}`);
  const choice = (c: string) => t(`${area}.choices.${c}`, { defaultValue: c });
  const cell = (v: number) => (system === 'metric' ? decimal(String(Number((v / 10).toFixed(2)))) : formatLength(v, system).replace('"', ''));
  const value = getAt(spec, f.path);
  const id = `b${index}-${f.path}`;
  const set = (v: unknown) => onChange(setAt(spec, f.path, v));
  if (f.kind === 'switch') {
    const on = value === undefined ? f.default : value !== false && value !== null;
    return (
      <label className="flex items-center gap-2 text-sm" htmlFor={id}>
        <input id={id} type="checkbox" disabled={!canEdit} checked={on} onChange={(e) => set(e.target.checked === f.default ? undefined : e.target.checked ? f.on : f.on === true ? false : null)} />
        {label}
      </label>
    );
  }
  if (f.kind === 'choice') {
    return (
      <label className="text-sm" htmlFor={id}>
        <span className="field-label">{label}</span>
        <select id={id} className="field-input" disabled={!canEdit} value={(value as string | undefined) ?? ''} onChange={(e) => set(e.target.value || undefined)}>
          <option value="">{t(`${area}.blocks.defaultChoice`, { value: choice(f.default) })}</option>
          {f.choices.map((c) => <option key={c} value={c}>{choice(c)}</option>)}
        </select>
      </label>
    );
  }
  const shown = typeof f.default === 'number' ? (f.kind === 'length' ? len(f.default) : fmt().number(f.default, 3)) : t(`${area}.defaults.${system}.${f.default}`);
  return (
    <label className="text-sm" htmlFor={id}>
      <span className="field-label">{label}{f.kind === 'length' ? ` (${lengthUnitWord})` : ''}</span>
      <input
        id={id} className="field-input" disabled={!canEdit} placeholder={t(`${area}.blocks.defaultValue`, { value: shown })}
        defaultValue={value === undefined ? '' : f.kind === 'length' ? cell(value as number) : decimal(String(value))}
        aria-invalid={isBad || Boolean(error)}
        onBlur={(e) => {
          const read = readBlockOption(e.target.value, f.kind, system);
          setIsBad(read.isBad);
          if (!read.isBad) set(read.value);
        }}
      />
      {isBad || error ? <span className="field-error">{isBad ? t(`${area}.blocks.notANumber`) : error}</span> : null}
    </label>
  );
}

/** The base size's pieces drafted in the browser from the blocks as edited, to scale (sewing line, cutting line, grain). */
function BaseSizeDrawing({ styleId, baseSize, composition }: { styleId: number; baseSize: string; composition: StyleComposition }) {
  const { t } = useTranslation();
  const { len } = useLength();
  const names = usePatternNames();
  const grading = useQuery(gradingQueries.detail(styleId));
  const chart = grading.data?.chart;
  const drafted = useMemo((): { pieces: DraftedPiece[] } | { error: string } | null => {
    if (!chart) return null;
    const k = chart.sizes.indexOf(baseSize);
    if (k < 0) return null;
    const m = Object.fromEntries(chart.rows.map((r) => [r.pointOfMeasure, r.values[k]])) as BodyMeasurements;
    try {
      return { pieces: draftStyle(m, { preset: composition.preset, blocks: composition.blocks as BlockSpec[] }) };
    } catch (err) {
      return { error: err instanceof Error ? err.message : String(err) };
    }
  }, [chart, baseSize, composition]);
  if (!chart) return <p className="text-sm text-ink-600">{t(`${area}.blocks.importChart`)}</p>;
  if (!drafted) return null;
  if ('error' in drafted) return <p className="field-error" role="alert">{t(`${area}.blocks.cannotDraft`, { error: drafted.error })}</p>;
  if (!drafted.pieces.length) return null;
  const gap = 40;
  let x = 0;
  const laid = drafted.pieces.map((p) => {
    const cut = cuttingOutline(p);
    const pts = cut.length ? cut : p.outline;
    const minX = Math.min(...pts.map((q) => q.x)), maxX = Math.max(...pts.map((q) => q.x));
    const minY = Math.min(...pts.map((q) => -q.y)), maxY = Math.max(...pts.map((q) => -q.y));
    const dx = x - minX;
    x += maxX - minX + gap;
    return { p, cut, dx, dy: -minY, h: maxY - minY };
  });
  const font = Math.max(18, x / 90);
  const k = Math.max(1, x / 900); // stroke widths in screen-ish pixels
  const height = Math.max(...laid.map((l) => l.h)) + 3 * font + 20;
  const d = (pts: { x: number; y: number }[], dx: number, dy: number) => `M${pts.map((q) => `${(q.x + dx).toFixed(1)},${(-q.y + dy).toFixed(1)}`).join('L')}Z`;
  return (
    <figure>
      <svg viewBox={`-20 -20 ${x + 20} ${height + 20}`} className="h-96 w-full rounded-lg border border-calico-200 bg-calico-50" role="img" aria-label={t(`${area}.blocks.drawing`, { count: drafted.pieces.length, size: baseSize })} data-testid="blocks-drawing">
        {laid.map(({ p, cut, dx, dy, h }, i) => (
          <g key={p.id} data-piece={p.id}>
            <path d={d(cut, dx, dy)} fill="none" stroke="#C9B48F" strokeWidth={1.5 * k} />
            <path d={d(p.outline, dx, dy)} fill={p.material === 'lining' ? 'rgba(120,90,160,0.08)' : p.material === 'contrast' ? 'rgba(190,90,60,0.1)' : 'rgba(15,76,92,0.06)'} stroke="#0F4C5C" strokeWidth={1.5 * k} />
            <line x1={p.grainLine.from.x + dx} y1={-p.grainLine.from.y + dy} x2={p.grainLine.to.x + dx} y2={-p.grainLine.to.y + dy} stroke="#434B50" strokeWidth={k} strokeDasharray={`${6 * k} ${3 * k}`} />
            <text x={dx + Math.min(...p.outline.map((q) => q.x))} y={dy + h + font * (i % 2 ? 2.4 : 1.2)} fontSize={font} fill="#434B50">{names.piece(p.name)} ×{p.copies}</text>
          </g>
        ))}
        <line x1={0} y1={height} x2={100} y2={height} stroke="#434B50" strokeWidth={2 * k} />
        <text x={110} y={height + font / 3} fontSize={font} fill="#434B50">{len(100)}</text>
      </svg>
      <figcaption className="mt-1 text-xs text-ink-600">{t(`${area}.blocks.caption`, { size: baseSize, bar: len(100) })}</figcaption>
    </figure>
  );
}
