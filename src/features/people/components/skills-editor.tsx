import { useState } from 'react';
import { useSearchParams } from 'react-router';
import { MACHINE_TYPES } from '@shared/schemas/line';
import { skillsField, type PersonDto } from '@shared/schemas/people';
import { Badge, Card, ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { fmt } from '@/lib/format';
import { localSentence, useTranslation } from '@/lib/i18n';
import { machineTypeLabel } from '@/features/line/hooks/machine-type';
import { useUpdatePerson } from '../api/people-queries';
import { area } from '../words';

/** The person whose skills are open for editing lives in the URL (`?skills=<id>`), so the link can be shared. */
export const SKILLS_PARAM = 'skills';

/** A pace as `1.0`, `0.85`: one or two decimals, in the studio's number style. */
const paceText = (v: number) => new Intl.NumberFormat(fmt().locale, { minimumFractionDigits: 1, maximumFractionDigits: 2 }).format(v);

/** The skills column: machine types with pace, and the button that opens the editor below the table. */
export function SkillsCell({ person }: { person: PersonDto }) {
  const { t } = useTranslation();
  const [, setParams] = useSearchParams();
  const entries = Object.entries(person.skills);
  return (
    <div className="flex max-w-xs flex-wrap items-center gap-1 text-xs">
      {entries.length ? entries.map(([type, v]) => <span key={type} className="rounded bg-calico-100 px-1">{machineTypeLabel(type)} {paceText(v)}</span>) : <span className="text-ink-600">{t(`${area}.skills.none`)}</span>}
      {person.skillsSet ? null : <Badge tone="grey">{t(`${area}.skills.roleDefaults`)}</Badge>}
      <button type="button" className="text-sm underline" aria-label={t(`${area}.skills.editOf`, { name: person.name })} onClick={() => setParams((p) => { p.set(SKILLS_PARAM, String(person.id)); return p; })}>{t(`${area}.skills.edit`)}</button>
    </div>
  );
}

type Row = { type: string; pace: string };

/**
 * Edits one person's skills: the machine types they run, each with their pace against standard minutes (1.0 =
 * standard, 0.8 = slower, 1.2 = faster). Checked with the same schema the server uses; nothing is saved until
 * every row is right. "Use role defaults" clears the person's own list.
 */
export function SkillsEditor({ person }: { person: PersonDto }) {
  const { t } = useTranslation();
  const [, setParams] = useSearchParams();
  const update = useUpdatePerson();
  const [rows, setRows] = useState<Row[]>(Object.entries(person.skills).map(([type, v]) => ({ type, pace: String(v) })));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const close = () => setParams((p) => { p.delete(SKILLS_PARAM); return p; });
  const set = (i: number, patch: Partial<Row>) => setRows(rows.map((r, k) => (k === i ? { ...r, ...patch } : r)));
  const save = async (skills: Record<string, number> | null) => {
    try {
      await update.mutateAsync({ id: person.id, skills });
      close();
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fields);
    }
  };
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const found: Record<string, string> = {};
    rows.forEach((r, i) => {
      if (!r.type.trim()) found[`${i}.type`] = t(`${area}.skills.typeRequired`);
      if (rows.findIndex((x) => x.type.trim() === r.type.trim()) !== i) found[`${i}.type`] = t(`${area}.skills.twice`);
      const pace = Number(r.pace);
      if (r.pace.trim() === '' || !Number.isFinite(pace) || pace < 0.1 || pace > 2) found[`${i}.pace`] = t(`${area}.skills.paceRange`, { min: fmt().number(0.1), max: fmt().number(2) });
    });
    const parsed = skillsField.safeParse(Object.fromEntries(rows.map((r) => [r.type.trim(), Number(r.pace)])));
    if (!parsed.success && !Object.keys(found).length) found.skills = localSentence(parsed.error.issues[0].message, fmt().settings);
    setErrors(found);
    if (Object.keys(found).length === 0 && parsed.success) void save(parsed.data);
  };
  const unused = MACHINE_TYPES.filter((type) => !rows.some((r) => r.type === type));
  return (
    <Card title={t(`${area}.skills.title`, { name: person.name })} className="mt-5">
      <p className="mb-3 text-sm text-ink-600">{t(`${area}.skills.intro`, { name: person.name })}</p>
      <form onSubmit={submit} noValidate>
        <table className="mb-3 text-sm" data-testid="skills">
          <thead><tr className="text-left text-ink-600"><th className="pr-2">{t(`${area}.skills.type`)}</th><th className="pr-2">{t(`${area}.skills.pace`)}</th><th /></tr></thead>
          <tbody>{rows.map((r, i) => (
            <tr key={i}>
              <td className="py-1 pr-2 align-top">
                <input aria-label={t(`${area}.skills.typeRow`, { row: i + 1 })} list="machine-types" className="field-input w-44" value={r.type} onChange={(e) => set(i, { type: e.target.value })} aria-invalid={Boolean(errors[`${i}.type`])} />
                {errors[`${i}.type`] ? <p role="alert" className="text-xs text-madder-700">{errors[`${i}.type`]}</p> : null}
              </td>
              <td className="py-1 pr-2 align-top">
                <input aria-label={t(`${area}.skills.paceRow`, { row: i + 1 })} inputMode="decimal" className="field-input w-20" value={r.pace} onChange={(e) => set(i, { pace: e.target.value })} aria-invalid={Boolean(errors[`${i}.pace`] ?? errors[`skills.${r.type}`])} />
                {errors[`${i}.pace`] ?? errors[`skills.${r.type}`] ? <p role="alert" className="text-xs text-madder-700">{errors[`${i}.pace`] ?? errors[`skills.${r.type}`]}</p> : null}
              </td>
              <td className="py-1 align-top"><button type="button" className="text-sm underline" onClick={() => setRows(rows.filter((_, k) => k !== i))}>{t(`${area}.skills.remove`)}</button></td>
            </tr>
          ))}</tbody>
        </table>
        <datalist id="machine-types">{MACHINE_TYPES.map((type) => <option key={type} value={type} label={machineTypeLabel(type)} />)}</datalist>
        {errors.skills ? <p role="alert" className="mb-2 text-xs text-madder-700">{errors.skills}</p> : null}
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-quiet" onClick={() => setRows([...rows, { type: unused[0] ?? '', pace: '1' }])}>{t(`${area}.skills.addType`)}</button>
          <button type="submit" className="btn-primary" disabled={update.isPending}>{t(`${area}.skills.save`)}</button>
          <button type="button" className="btn-quiet" disabled={update.isPending || !person.skillsSet} onClick={() => void save(null)}>{t(`${area}.skills.useDefaults`)}</button>
          <button type="button" className="btn-quiet" onClick={close}>{t(`${area}.skills.cancel`)}</button>
        </div>
        <div className="mt-2"><ErrorNote error={update.error && !(update.error instanceof ApiError && Object.keys(update.error.fields).length) ? update.error : null} /></div>
      </form>
    </Card>
  );
}
