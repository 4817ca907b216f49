import { useState } from 'react';
import { useSearchParams } from 'react-router';
import { MACHINE_TYPES } from '@shared/schemas/line';
import { skillsField, type PersonDto } from '@shared/schemas/people';
import { Badge, Card, ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useUpdatePerson } from '../api/people-queries';

/** The person whose skills are open for editing lives in the URL (`?skills=<id>`), so the link can be shared. */
export const SKILLS_PARAM = 'skills';

const paceText = (v: number) => v.toFixed(2).replace(/0$/, '');

/** The skills column: machine types with pace, and the button that opens the editor below the table. */
export function SkillsCell({ person }: { person: PersonDto }) {
  const [, setParams] = useSearchParams();
  const entries = Object.entries(person.skills);
  return (
    <div className="flex max-w-xs flex-wrap items-center gap-1 text-xs">
      {entries.length ? entries.map(([t, v]) => <span key={t} className="rounded bg-calico-100 px-1">{t} {paceText(v)}</span>) : <span className="text-ink-600">none</span>}
      {person.skillsSet ? null : <Badge tone="grey">role defaults</Badge>}
      <button type="button" className="text-sm underline" aria-label={`Edit skills of ${person.name}`} onClick={() => setParams((p) => { p.set(SKILLS_PARAM, String(person.id)); return p; })}>Edit</button>
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
      if (!r.type.trim()) found[`${i}.type`] = 'Machine type is required';
      if (rows.findIndex((x) => x.type.trim() === r.type.trim()) !== i) found[`${i}.type`] = 'Listed twice';
      const pace = Number(r.pace);
      if (r.pace.trim() === '' || !Number.isFinite(pace) || pace < 0.1 || pace > 2) found[`${i}.pace`] = 'A pace from 0.1 to 2';
    });
    const parsed = skillsField.safeParse(Object.fromEntries(rows.map((r) => [r.type.trim(), Number(r.pace)])));
    if (!parsed.success && !Object.keys(found).length) found.skills = parsed.error.issues[0].message;
    setErrors(found);
    if (Object.keys(found).length === 0 && parsed.success) void save(parsed.data);
  };
  const unused = MACHINE_TYPES.filter((t) => !rows.some((r) => r.type === t));
  return (
    <Card title={`Skills of ${person.name}`} className="mt-5">
      <p className="mb-3 text-sm text-ink-600">
        The machine types {person.name} runs and their pace against the standard minutes: 1.0 is standard, 0.8 takes a quarter longer, 1.2 is faster.
        The line plan shares operations only among people with the operation&apos;s machine type.
      </p>
      <form onSubmit={submit} noValidate>
        <table className="mb-3 text-sm" data-testid="skills">
          <thead><tr className="text-left text-ink-600"><th className="pr-2">Machine type</th><th className="pr-2">Pace</th><th /></tr></thead>
          <tbody>{rows.map((r, i) => (
            <tr key={i}>
              <td className="py-1 pr-2 align-top">
                <input aria-label={`Machine type, row ${i + 1}`} list="machine-types" className="field-input w-44" value={r.type} onChange={(e) => set(i, { type: e.target.value })} aria-invalid={Boolean(errors[`${i}.type`])} />
                {errors[`${i}.type`] ? <p role="alert" className="text-xs text-madder-700">{errors[`${i}.type`]}</p> : null}
              </td>
              <td className="py-1 pr-2 align-top">
                <input aria-label={`Pace, row ${i + 1}`} inputMode="decimal" className="field-input w-20" value={r.pace} onChange={(e) => set(i, { pace: e.target.value })} aria-invalid={Boolean(errors[`${i}.pace`] ?? errors[`skills.${r.type}`])} />
                {errors[`${i}.pace`] ?? errors[`skills.${r.type}`] ? <p role="alert" className="text-xs text-madder-700">{errors[`${i}.pace`] ?? errors[`skills.${r.type}`]}</p> : null}
              </td>
              <td className="py-1 align-top"><button type="button" className="text-sm underline" onClick={() => setRows(rows.filter((_, k) => k !== i))}>Remove</button></td>
            </tr>
          ))}</tbody>
        </table>
        <datalist id="machine-types">{MACHINE_TYPES.map((t) => <option key={t} value={t} />)}</datalist>
        {errors.skills ? <p role="alert" className="mb-2 text-xs text-madder-700">{errors.skills}</p> : null}
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-quiet" onClick={() => setRows([...rows, { type: unused[0] ?? '', pace: '1' }])}>Add machine type</button>
          <button type="submit" className="btn-primary" disabled={update.isPending}>Save skills</button>
          <button type="button" className="btn-quiet" disabled={update.isPending || !person.skillsSet} onClick={() => void save(null)}>Use role defaults</button>
          <button type="button" className="btn-quiet" onClick={close}>Cancel</button>
        </div>
        <div className="mt-2"><ErrorNote error={update.error && !(update.error instanceof ApiError && Object.keys(update.error.fields).length) ? update.error : null} /></div>
      </form>
    </Card>
  );
}
