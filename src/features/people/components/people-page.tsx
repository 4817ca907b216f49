import { useSuspenseQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import { useSearchParams } from 'react-router';
import { ROLE_LABELS, ROLES, type Role } from '@shared/auth/permissions';
import { createPersonInput, payoutAccountField, type PersonDto } from '@shared/schemas/people';
import { DataTable } from '@/components/ui/data-table';
import { Field } from '@/components/ui/form';
import { Badge, Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { useTranslation } from '@/lib/i18n';
import { peopleQueries, useAddPerson, useUpdatePerson } from '../api/people-queries';
import { AttendanceCard } from './attendance-card';
import { FloorTabletCard } from './floor-tablet-card';
import { area } from '../words';
import { SKILLS_PARAM, SkillsCell, SkillsEditor } from './skills-editor';

const c = createColumnHelper<PersonDto>();

function RoleCell({ person }: { person: PersonDto }) {
  const { t } = useTranslation();
  const update = useUpdatePerson();
  const me = useMe().data;
  return (
    <select
      aria-label={t(`${area}.roleOf`, { name: person.name })}
      className="rounded border border-calico-300 bg-white px-2 py-1 text-sm"
      value={person.role}
      disabled={person.id === me?.id}
      onChange={(e) => update.mutate({ id: person.id, role: e.target.value as Role })}
    >
      {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
    </select>
  );
}

function ActiveCell({ person }: { person: PersonDto }) {
  const { t } = useTranslation();
  const update = useUpdatePerson();
  const me = useMe().data;
  if (person.id === me?.id) return <Badge tone="teal">{t(`${area}.you`)}</Badge>;
  return (
    <button type="button" className="text-sm underline" onClick={() => update.mutate({ id: person.id, active: !person.active })}>
      {person.active ? 'Deactivate' : 'Reactivate'}
    </button>
  );
}

/** The person's payments account, where live piece-rate payouts go; checked here and on the server. */
function PayoutAccountCell({ person }: { person: PersonDto }) {
  const update = useUpdatePerson();
  const [value, setValue] = useState(person.payoutAccount);
  const [error, setError] = useState('');
  const changed = value.trim() !== person.payoutAccount;
  const save = async (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = payoutAccountField.safeParse(value);
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError('');
    try {
      await update.mutateAsync({ id: person.id, payoutAccount: parsed.data });
    } catch (err) {
      setError(err instanceof ApiError ? (err.fields?.payoutAccount ?? err.message) : 'Could not save');
    }
  };
  return (
    <form onSubmit={save} className="flex items-center gap-1">
      <input
        aria-label={`Payments account of ${person.name}`}
        className="w-36 rounded border border-calico-300 bg-white px-2 py-1 font-mono text-xs"
        placeholder="acct_…"
        value={value}
        onChange={(e) => setValue(e.target.value)}
        aria-invalid={Boolean(error)}
      />
      {changed ? <button type="submit" className="text-sm underline" disabled={update.isPending}>Save</button> : null}
      {error ? <span role="alert" className="text-xs text-madder-700">{error}</span> : null}
    </form>
  );
}

const columns = [
  c.accessor('name', { header: 'Name' }),
  c.accessor('email', { header: 'Sign-in' }),
  c.accessor('role', { header: 'Role', cell: (i) => <RoleCell person={i.row.original} /> }),
  c.accessor('active', { header: 'Status', cell: (i) => (i.getValue() ? <Badge tone="teal">active</Badge> : <Badge tone="red">inactive</Badge>) }),
  c.accessor('hasPin', { header: 'PIN', cell: (i) => (i.getValue() ? 'yes' : '—') }),
  c.accessor('skills', { header: 'Skills (pace)', enableSorting: false, cell: (i) => <SkillsCell person={i.row.original} /> }),
  c.accessor('payoutAccount', { header: 'Payments account', enableSorting: false, cell: (i) => <PayoutAccountCell person={i.row.original} /> }),
  c.display({ id: 'actions', header: '', cell: (i) => <ActiveCell person={i.row.original} /> }),
];

function AddPersonForm() {
  const add = useAddPerson();
  const [v, setV] = useState({ name: '', email: '', role: 'machinist' as Role, temporaryPassword: '', pin: '' });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const input = { ...v, temporaryPassword: v.temporaryPassword || undefined, pin: v.pin || undefined };
    const parsed = createPersonInput.safeParse(input);
    if (!parsed.success) return setErrors(Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message])));
    try {
      await add.mutateAsync(parsed.data);
      setErrors({});
      setV({ name: '', email: '', role: 'machinist', temporaryPassword: '', pin: '' });
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fields);
    }
  };
  const set = (k: keyof typeof v) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => setV({ ...v, [k]: e.target.value });
  return (
    <form onSubmit={handleSubmit} className="grid gap-3 sm:grid-cols-3" noValidate>
      <Field label="Name" name="name" value={v.name} onChange={set('name')} error={errors.name} />
      <Field label="Email or username" name="email" value={v.email} onChange={set('email')} error={errors.email} />
      <div>
        <label className="field-label" htmlFor="new-role">Role</label>
        <select id="new-role" className="field-input" value={v.role} onChange={set('role')}>
          {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
        </select>
      </div>
      <Field label="Temporary password" name="temporaryPassword" type="text" value={v.temporaryPassword} onChange={set('temporaryPassword')} error={errors.temporaryPassword} hint="They change it at first sign-in" />
      <Field label="Floor PIN (4–6 digits)" name="pin" inputMode="numeric" value={v.pin} onChange={set('pin')} error={errors.pin} hint="For the shared floor tablet" />
      <div className="flex items-end"><button className="btn-primary" type="submit" disabled={add.isPending}>Add person</button></div>
      <div className="sm:col-span-3"><ErrorNote error={add.error && !(add.error instanceof ApiError && Object.keys(add.error.fields).length) ? add.error : null} /></div>
    </form>
  );
}

export function PeoplePage() {
  const { data } = useSuspenseQuery(peopleQueries.list());
  const [params] = useSearchParams();
  const editing = data.find((p) => p.id === Number(params.get(SKILLS_PARAM)));
  return (
    <>
      <PageHeader title="People" subtitle="Your cutter, machinists and finishers, and what each may do." />
      <Card title="Add a person" className="mb-5"><AddPersonForm /></Card>
      <AttendanceCard />
      <FloorTabletCard />
      <DataTable data={data} columns={columns} filterPlaceholder="Filter people…" />
      {editing ? <SkillsEditor key={editing.id} person={editing} /> : null}
    </>
  );
}
