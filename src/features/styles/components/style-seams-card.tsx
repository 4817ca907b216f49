import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { draftStyle, proposeSeams, SEAM_TOLERANCE_MM, type BlockSpec, type BodyMeasurements, type DraftedPiece } from '@grading';
import type { SeamInput } from '@shared/schemas/style-composition';
import type { StyleDto } from '@shared/schemas/styles';
import { ErrorNote } from '@/components/ui/page';
import { gradingQueries } from '@/features/grading/api/grading-queries';
import { useLength } from '@/features/grading/hooks/use-length';
import { usePatternNames, type PatternNames } from '@/features/grading/hooks/use-pattern-names';
import { useCan } from '@/lib/auth';
import { i18n, useTranslation } from '@/lib/i18n';
import { useSaveComposition } from '../api/style-queries';
import { area } from '../words';

type Side = SeamInput['a'][number];

/**
 * The seams the seam check measures: proposed from the base size's drafted pieces until the owner fixes one, then
 * the style's own list. Each seam names the edges sewn together, the intended difference and the tolerance.
 */
export function StyleSeamsCard({ style }: { style: StyleDto }) {
  const { t } = useTranslation();
  const canEdit = useCan('styles:write');
  const grading = useQuery(gradingQueries.detail(style.id));
  const chart = grading.data?.chart;
  const composition = style.composition;
  const pieces = useMemo((): DraftedPiece[] | null => {
    if (!chart || !composition) return null;
    const k = chart.sizes.indexOf(style.baseSize);
    if (k < 0) return null;
    const m = Object.fromEntries(chart.rows.map((r) => [r.pointOfMeasure, r.values[k]])) as BodyMeasurements;
    try {
      return draftStyle(m, { preset: composition.preset, blocks: composition.blocks as BlockSpec[] });
    } catch {
      return null;
    }
  }, [chart, composition, style.baseSize]);
  const stored = composition?.seams ?? null;
  const initial = useMemo(() => (stored ?? (pieces ? proposeSeams(pieces) : [])) as SeamInput[], [stored, pieces]);
  const [edited, setEdited] = useState<SeamInput[] | null>(null);
  const [open, setOpen] = useState<number | null>(null);
  const save = useSaveComposition(style.id);
  const seams = edited ?? initial;
  if (!composition) return <p className="text-sm text-ink-600">{t(`${area}.seams.chooseBlocks`)}</p>;
  if (!pieces) return <p className="text-sm text-ink-600">{t(`${area}.seams.importChart`)}</p>;
  const change = (i: number, s: SeamInput) => setEdited(seams.map((x, k) => (k === i ? s : x)));
  const submit = (next: SeamInput[] | null) => save.mutate({ composition: { ...composition, seams: next }, materialFabrics: style.materialFabrics }, { onSuccess: () => { setEdited(null); setOpen(null); } });
  return (
    <div className="grid gap-3" data-testid="style-seams">
      <p className="text-sm text-ink-600">
        {stored ? t(`${area}.seams.stored`) : t(`${area}.seams.proposed`)} {t(`${area}.seams.rule`)}
      </p>
      <div role="region" aria-label={t(`${area}.seams.region`)} tabIndex={0} className="overflow-x-auto">
        <table className="w-full min-w-[640px] text-sm">
          <thead><tr className="border-b border-calico-200 text-left text-ink-600"><th className="py-1.5 pr-2">{t(`${area}.seams.cols.seam`)}</th><th className="px-2">{t(`${area}.seams.cols.first`)}</th><th className="px-2">{t(`${area}.seams.cols.sewnTo`)}</th><th className="px-2">{t(`${area}.seams.cols.longer`)}</th><th className="px-2">{t(`${area}.seams.cols.tolerance`)}</th><th /></tr></thead>
          <tbody>
            {seams.map((s, i) => (
              <SeamRow key={i} seam={s} pieces={pieces} canEdit={canEdit} isOpen={open === i} onOpen={() => setOpen(open === i ? null : i)} onChange={(x) => change(i, x)} onRemove={() => { setEdited(seams.filter((_, k) => k !== i)); setOpen(null); }} />
            ))}
          </tbody>
        </table>
      </div>
      {canEdit ? (
        <div className="flex flex-wrap items-center gap-2">
          <button type="button" className="btn-quiet" onClick={() => { setEdited([...seams, blankSeam(pieces, seams.length)]); setOpen(seams.length); }}>{t(`${area}.seams.add`)}</button>
          <button type="button" className="btn-primary" disabled={!edited || save.isPending} onClick={() => submit(seams)}>{save.isPending ? t(`${area}.seams.saving`) : t(`${area}.seams.save`)}</button>
          {stored ? <button type="button" className="btn-quiet" disabled={save.isPending} onClick={() => submit(null)}>{t(`${area}.seams.useProposed`)}</button> : null}
          {save.isSuccess ? <span className="text-sm text-ink-600" role="status">{t(`${area}.seams.saved`)}</span> : null}
        </div>
      ) : null}
      <ErrorNote error={save.error} />
    </div>
  );
}

function blankSeam(pieces: DraftedPiece[], n: number): SeamInput {
  const p = pieces[0];
  const edge = p.edges[0]?.name ?? '';
  return { name: i18n.t(`${area}.seams.newName`, { n: n + 1 }), a: [{ pieceId: p.id, edges: [edge] }], b: [{ pieceId: p.id, edges: [edge] }], toleranceMm: SEAM_TOLERANCE_MM.side };
}

function sideText(sides: Side[], pieces: DraftedPiece[], names: PatternNames): string {
  return sides.map((s) => names.side(pieces.find((p) => p.id === s.pieceId)?.name ?? i18n.t(`${area}.seams.missingPiece`, { id: s.pieceId }), s.edges)).join(i18n.t(`${area}.seams.sideJoin`));
}

function SeamRow({ seam, pieces, canEdit, isOpen, onOpen, onChange, onRemove }: {
  seam: SeamInput; pieces: DraftedPiece[]; canEdit: boolean; isOpen: boolean; onOpen: () => void; onChange: (s: SeamInput) => void; onRemove: () => void;
}) {
  const { t } = useTranslation();
  const names = usePatternNames();
  const { small } = useLength();
  return (
    <>
      <tr className="border-b border-calico-100 align-top">
        <td className="py-1.5 pr-2 font-medium">{names.seam(seam.name)}</td>
        <td className="px-2 py-1.5">{sideText(seam.a, pieces, names)}</td>
        <td className="px-2 py-1.5">{sideText(seam.b, pieces, names)}</td>
        <td className="px-2 py-1.5">{small(seam.easeMm ?? 0)}</td>
        <td className="px-2 py-1.5">{small(seam.toleranceMm)}</td>
        <td className="px-2 py-1.5">{canEdit ? <button type="button" className="btn-quiet" aria-expanded={isOpen} onClick={onOpen}>{isOpen ? t(`${area}.seams.close`) : t(`${area}.seams.fix`)}</button> : null}</td>
      </tr>
      {isOpen ? (
        <tr><td colSpan={6} className="bg-calico-50 p-3"><SeamEditor seam={seam} pieces={pieces} onChange={onChange} onRemove={onRemove} /></td></tr>
      ) : null}
    </>
  );
}

function SeamEditor({ seam, pieces, onChange, onRemove }: { seam: SeamInput; pieces: DraftedPiece[]; onChange: (s: SeamInput) => void; onRemove: () => void }) {
  const { t } = useTranslation();
  const { cell, parseCell, cellUnit, cellUnitWord } = useLength();
  const [error, setError] = useState<string | null>(null);
  const setSide = (which: 'a' | 'b', k: number, side: Side) => onChange({ ...seam, [which]: seam[which].map((x, j) => (j === k ? side : x)) });
  const lengthField = (label: string, value: number, apply: (mm: number) => void) => (
    <label className="text-sm">
      <span className="field-label">{label} ({cellUnitWord})</span>
      <input className="field-input" defaultValue={cell(value)} onBlur={(e) => {
        const v = parseCell(e.target.value.trim() || '0');
        if (v === null) setError(t(`${area}.seams.badLength`, { label, example: t(`${area}.seams.${cellUnit === 'mm' ? 'exampleMm' : 'exampleIn'}`) }));
        else { setError(null); apply(v); }
      }} />
    </label>
  );
  return (
    <div className="grid gap-3">
      <label className="text-sm">
        <span className="field-label">{t(`${area}.seams.name`)}</span>
        <input className="field-input" value={seam.name} onChange={(e) => onChange({ ...seam, name: e.target.value })} />
      </label>
      {(['a', 'b'] as const).map((which) => seam[which].map((side, k) => (
        <SideFields key={`${which}${k}`} label={seam[which].length > 1 ? t(`${area}.seams.part`, { side: t(`${area}.seams.cols.${which === 'a' ? 'first' : 'sewnTo'}`), n: k + 1 }) : t(`${area}.seams.cols.${which === 'a' ? 'first' : 'sewnTo'}`)} side={side} pieces={pieces} onChange={(s) => setSide(which, k, s)} />
      )))}
      <div className="grid gap-2 sm:grid-cols-2">
        {lengthField(t(`${area}.seams.longerBy`), seam.easeMm ?? 0, (v) => onChange({ ...seam, easeMm: v }))}
        {lengthField(t(`${area}.seams.cols.tolerance`), seam.toleranceMm, (v) => onChange({ ...seam, toleranceMm: v }))}
      </div>
      {error ? <p className="field-error" role="alert">{error}</p> : null}
      <div><button type="button" className="btn-quiet" onClick={onRemove}>{t(`${area}.seams.removeSeam`)}</button></div>
    </div>
  );
}

function SideFields({ label, side, pieces, onChange }: { label: string; side: Side; pieces: DraftedPiece[]; onChange: (s: Side) => void }) {
  const { t } = useTranslation();
  const pn = usePatternNames();
  const piece = pieces.find((p) => p.id === side.pieceId);
  const names = [...new Set((piece?.edges ?? []).map((e) => e.name))];
  const current = side.edges.join(' + ');
  const choices = names.includes(current) ? names : [current, ...names];
  return (
    <div className="grid gap-2 sm:grid-cols-2">
      <label className="text-sm">
        <span className="field-label">{t(`${area}.seams.piece`, { side: label })}</span>
        <select className="field-input" value={side.pieceId} onChange={(e) => {
          const p = pieces.find((x) => x.id === e.target.value);
          onChange({ pieceId: e.target.value, edges: [p?.edges[0]?.name ?? ''] });
        }}>
          {piece ? null : <option value={side.pieceId}>{t(`${area}.seams.missingPieceOption`, { id: side.pieceId })}</option>}
          {pieces.filter((p) => p.material !== 'interfacing').map((p) => <option key={p.id} value={p.id}>{pn.piece(p.name)}</option>)}
        </select>
      </label>
      <label className="text-sm">
        <span className="field-label">{t(`${area}.seams.edge`, { side: label })}</span>
        <select className="field-input" value={current} onChange={(e) => onChange({ ...side, edges: e.target.value.split(' + ') })}>
          {choices.map((c) => <option key={c} value={c}>{pn.part(c)}</option>)}
        </select>
      </label>
    </div>
  );
}
