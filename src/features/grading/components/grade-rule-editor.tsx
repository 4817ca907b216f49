import { useEffect, useState } from 'react';
import type { GradedPieceDto, GradeRuleDto } from '@shared/schemas/grading';
import { ErrorNote } from '@/components/ui/page';
import { usePutGradeRule } from '../api/grading-queries';
import { parseLength } from '@shared/units/length-format';
import { i18n, useTranslation } from '@/lib/i18n';
import { useLength } from '../hooks/use-length';
import { usePatternNames, type PatternNames } from '../hooks/use-pattern-names';
import { area } from '../words';

const ruleKey = (r: GradeRuleDto) => (r.target.kind === 'vertex' ? `v${r.target.index}` : `f:${r.target.key}`);
const ruleName = (r: GradeRuleDto, names: PatternNames) => (r.landmark ? names.part(r.landmark) : null) ?? (r.target.kind === 'vertex' ? i18n.t(`${area}.rules.outlinePoint`, { n: r.target.index }) : r.target.key);

/** Edit the movement (dx across, dy up) of one grade point for every size step in the studio's units (mm, or inches to 1/8), then redraw. */
export function GradeRuleEditor({ styleId, piece, sizes, selectedPoint, onSelectPoint, canEdit }: {
  styleId: number;
  piece: GradedPieceDto;
  sizes: string[];
  selectedPoint?: number;
  onSelectPoint: (vertex: number) => void;
  canEdit: boolean;
}) {
  const { t } = useTranslation();
  const names = usePatternNames();
  const { small, system, cellUnitWord, decimal } = useLength();
  const unit = system === 'metric' ? 'mm' : 'in';
  const shown = (v: number) => (system === 'metric' ? decimal(String(Number(v.toFixed(2)))) : small(v).replace('"', ''));
  const read = (text: string) => (text.trim() === '' ? null : parseLength(`${text} ${unit}`, 'metric'));
  const rules = piece.rules;
  const rule = rules.find((r) => r.target.kind === 'vertex' && r.target.index === selectedPoint) ?? rules[0];
  const [steps, setSteps] = useState<{ dx: string; dy: string }[]>([]);
  const save = usePutGradeRule(styleId);
  useEffect(() => {
    setSteps(rule ? rule.steps.map((s) => ({ dx: shown(s.dx), dy: shown(s.dy) })) : []);
  }, [rule, piece.id, system]);
  if (!rule) return <p className="text-sm text-ink-600">{t(`${area}.rules.noPoints`)}</p>;
  const bad = steps.some((s) => read(s.dx) === null || read(s.dy) === null);
  const submit = () =>
    save.mutate({ pieceId: piece.id, rule: { target: rule.target, landmark: rule.landmark, steps: steps.map((s) => ({ dx: read(s.dx) ?? 0, dy: read(s.dy) ?? 0 })) } });
  return (
    <div className="space-y-3">
      <label className="field-label" htmlFor="grade-point">{t(`${area}.rules.gradePoint`)}</label>
      <select id="grade-point" className="field-input" value={ruleKey(rule)} onChange={(e) => {
        const r = rules.find((x) => ruleKey(x) === e.target.value);
        if (r?.target.kind === 'vertex') onSelectPoint(r.target.index);
      }}>
        {rules.filter((r) => r.target.kind === 'vertex' && (r.landmark || r === rule)).map((r) => <option key={ruleKey(r)} value={ruleKey(r)}>{ruleName(r, names)}</option>)}
      </select>
      <p className="text-xs text-ink-600">{t(`${area}.rules.${unit === 'mm' ? 'helpMm' : 'helpIn'}`)}</p>
      <div role="region" aria-label={t(`${area}.rules.region`)} tabIndex={0} className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead><tr className="text-left text-ink-600"><th className="py-1 pr-2">{t(`${area}.rules.step`)}</th><th className="px-1">{t(`${area}.rules.across`, { unit: cellUnitWord })}</th><th className="px-1">{t(`${area}.rules.up`, { unit: cellUnitWord })}</th></tr></thead>
          <tbody>
            {steps.map((s, i) => (
              <tr key={i}>
                <td className="whitespace-nowrap py-1 pr-2 font-medium">{sizes[i]} → {sizes[i + 1]}</td>
                <td className="px-1"><input aria-label={t(`${area}.rules.acrossStep`, { from: sizes[i], to: sizes[i + 1] })} className="field-input py-1" inputMode="decimal" disabled={!canEdit} value={s.dx} onChange={(e) => setSteps(steps.map((x, j) => (j === i ? { ...x, dx: e.target.value } : x)))} /></td>
                <td className="px-1"><input aria-label={t(`${area}.rules.upStep`, { from: sizes[i], to: sizes[i + 1] })} className="field-input py-1" inputMode="decimal" disabled={!canEdit} value={s.dy} onChange={(e) => setSteps(steps.map((x, j) => (j === i ? { ...x, dy: e.target.value } : x)))} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-600">{t(`${area}.rules.stored`, { steps: rule.steps.map((s) => `${small(s.dx)} / ${small(s.dy)}`).join(' · ') })}</p>
      {canEdit ? <button type="button" className="btn-primary" disabled={bad || save.isPending} onClick={submit}>{save.isPending ? t(`${area}.rules.saving`) : t(`${area}.rules.save`)}</button> : null}
      <ErrorNote error={save.error} />
    </div>
  );
}
