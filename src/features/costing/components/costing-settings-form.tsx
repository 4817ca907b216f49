import { useState } from 'react';
import type { CostingSheetDto } from '@shared/schemas/costing';
import { updateCostingSettingsInput } from '@shared/schemas/costing';
import { Field } from '@/components/ui/form';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useUpdateCostingSettings } from '../api/costing-queries';
import { parseMajor, toMajorText } from '@shared/units/money';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

/** Labour cost per minute, overheads, wastage, margin and the retail multiplier of the style. */
export function CostingSettingsForm({ sheet }: { sheet: CostingSheetDto }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.settings.${key}`, values);
  const s = sheet.settings;
  const save = useUpdateCostingSettings();
  const [v, setV] = useState({
    labour: toMajorText(s.labourCostPerMinuteMinor, sheet.currency),
    overhead: String(s.overheadPercent),
    wastage: String(s.wastagePercent),
    margin: String(s.marginPercent),
    multiplier: String(s.retailMultiplier),
  });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const labour = parseMajor(v.labour, sheet.currency);
    const body = { labourCostPerMinuteMinor: labour ?? -1, overheadPercent: Number(v.overhead), wastagePercent: Number(v.wastage), marginPercent: Number(v.margin), retailMultiplier: Number(v.multiplier) };
    const parsed = updateCostingSettingsInput.safeParse(body);
    if (!parsed.success) return setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
    setErrors({});
    try {
      await save.mutateAsync({ styleId: sheet.style.id, ...parsed.data });
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fields);
    }
  };
  const field = (key: keyof typeof v, label: string, name: string, hint?: string) => (
    <Field label={label} name={name} inputMode="decimal" value={v[key]} onChange={(e) => setV({ ...v, [key]: e.target.value })} error={errors[name]} hint={hint} />
  );
  return (
    <form onSubmit={handleSubmit} className="grid gap-4 sm:grid-cols-2 lg:grid-cols-5" noValidate>
      {field('labour', w('labour', { currency: sheet.currency }), 'labourCostPerMinuteMinor', w('labourHint'))}
      {field('overhead', w('overhead'), 'overheadPercent')}
      {field('wastage', w('wastage'), 'wastagePercent', w('wastageHint'))}
      {field('margin', w('margin'), 'marginPercent', w('marginHint'))}
      {field('multiplier', w('multiplier'), 'retailMultiplier', w('multiplierHint'))}
      <div className="sm:col-span-2 lg:col-span-5">
        <ErrorNote error={save.error} />
        <button className="btn-quiet" type="submit" disabled={save.isPending}>{w('save')}</button>
      </div>
    </form>
  );
}
