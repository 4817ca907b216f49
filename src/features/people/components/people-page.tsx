import { useSuspenseQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import { useSearchParams } from 'react-router';
import { ROLES, type Role } from '@shared/auth/permissions';
import { createPersonInput, payoutAccountField, pinField, type PersonDto } from '@shared/schemas/people';
import { DataTable } from '@/components/ui/data-table';
import { Field } from '@/components/ui/form';
import { Badge, Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { fmt } from '@/lib/format';
import { i18n, localSentence, useTranslation } from '@/lib/i18n';
import { peopleQueries, useAddPerson, useSetPin, useUnlockPerson, useUpdatePerson } from '../api/people-queries';
import { AttendanceCard } from './attendance-card';
import { FloorTabletCard } from './floor-tablet-card';
import { area } from '../words';
import { SKILLS_PARAM, SkillsCell, SkillsEditor } from './skills-editor';

const c = createColumnHelper<PersonDto>();
/** What a payments account identifier looks like (the provider's own prefix, not a word). */
const ACCOUNT_EXAMPLE = 'acct_…';

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
      {ROLES.map((r) => <option key={r} value={r}>{t(`roles.${r}`)}</option>)}
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
      {person.active ? t(`${area}.deactivate`) : t(`${area}.reactivate`)}
    </button>
  );
}

/** The person's payments account, where live piece-rate payouts go; checked here and on the server. */
function PayoutAccountCell({ person }: { person: PersonDto }) {
  const { t } = useTranslation();
  const update = useUpdatePerson();
  const [value, setValue] = useState(person.payoutAccount);
  const [error, setError] = useState('');
  const changed = value.trim() !== person.payoutAccount;
  const save = async (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = payoutAccountField.safeParse(value);
    if (!parsed.success) return setError(localSentence(parsed.error.issues[0].message, fmt().settings));
    setError('');
    try {
      await update.mutateAsync({ id: person.id, payoutAccount: parsed.data });
    } catch (err) {
      setError(err instanceof ApiError ? (err.fields?.payoutAccount ?? err.message) : t(`${area}.couldNotSave`));
    }
  };
  return (
    <form onSubmit={save} className="flex items-center gap-1">
      <input
        aria-label={t(`${area}.payoutOf`, { name: person.name })}
        className="w-36 rounded border border-calico-300 bg-white px-2 py-1 font-mono text-xs"
        placeholder={ACCOUNT_EXAMPLE}
        value={value}
        onChange={(e) => setValue(e.target.value)}
        aria-invalid={Boolean(error)}
      />
      {changed ? <button type="submit" className="text-sm underline" disabled={update.isPending}>{t(`${area}.save`)}</button> : null}
      {error ? <span role="alert" className="text-xs text-madder-700">{error}</span> : null}
    </form>
  );
}

/**
 * The PIN column: whether the person has one, a lock after wrong tries with the way to lift it, and a new PIN
 * from the owner (a forgotten one, or after a lock).
 */
function PinCell({ person }: { person: PersonDto }) {
  const { t } = useTranslation();
  const unlock = useUnlockPerson();
  const setPin = useSetPin();
  const [open, setOpen] = useState(false);
  const [pin, setPinText] = useState('');
  const [error, setError] = useState('');
  const [done, setDone] = useState(false);
  const lockedUntil = [person.pinLockedUntil, person.passwordLockedUntil].filter((x): x is string => Boolean(x) && Date.parse(x!) > Date.now()).sort().at(-1);
  const save = async (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = pinField.safeParse(pin);
    if (!parsed.success) return setError(localSentence(parsed.error.issues[0].message, fmt().settings));
    setError('');
    try {
      await setPin.mutateAsync({ id: person.id, pin: parsed.data });
      setOpen(false);
      setPinText('');
      setDone(true);
    } catch (err) {
      setError(err instanceof ApiError ? (err.fields?.pin ?? err.message) : t(`${area}.couldNotSave`));
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
      <span>{person.hasPin ? t(`${area}.yes`) : '—'}</span>
      {lockedUntil ? (
        <>
          <span title={t(`${area}.pin.lockedTitle`, { time: fmt().time(lockedUntil) })}><Badge tone="red">{t(`${area}.pin.locked`)}</Badge></span>
          <button type="button" className="text-sm underline" aria-label={t(`${area}.pin.unlockOf`, { name: person.name })} disabled={unlock.isPending} onClick={() => unlock.mutate(person.id)}>
            {t(`${area}.pin.unlock`)}
          </button>
        </>
      ) : null}
      {open ? (
        <form onSubmit={save} className="flex items-center gap-1">
          <input
            aria-label={t(`${area}.pin.newPinOf`, { name: person.name })}
            className="w-20 rounded border border-calico-300 bg-white px-2 py-1 font-mono text-xs"
            inputMode="numeric"
            autoComplete="off"
            value={pin}
            onChange={(e) => setPinText(e.target.value.trim())}
            aria-invalid={Boolean(error)}
          />
          <button type="submit" className="text-sm underline" disabled={setPin.isPending}>{t(`${area}.pin.set`)}</button>
          <button type="button" className="text-sm underline" onClick={() => { setOpen(false); setError(''); }}>{t(`${area}.pin.cancel`)}</button>
        </form>
      ) : (
        <button type="button" className="text-sm underline" aria-label={t(`${area}.pin.newPinOf`, { name: person.name })} onClick={() => { setOpen(true); setDone(false); }}>
          {t(`${area}.pin.newPin`)}
        </button>
      )}
      {error ? <span role="alert" className="basis-full text-xs text-madder-700">{error}</span> : null}
      {done ? <span role="status" className="basis-full text-xs text-thread-700">{t(`${area}.pin.done`)}</span> : null}
    </div>
  );
}

const w = (key: string) => () => i18n.t(`${area}.${key}`);

const columns = [
  c.accessor('name', { header: w('cols.name') }),
  c.accessor('email', { header: w('cols.signIn') }),
  c.accessor('role', { header: w('cols.role'), cell: (i) => <RoleCell person={i.row.original} /> }),
  c.accessor('active', { header: w('cols.status'), cell: (i) => (i.getValue() ? <Badge tone="teal">{w('active')()}</Badge> : <Badge tone="red">{w('inactive')()}</Badge>) }),
  c.accessor('hasPin', { header: w('cols.pin'), cell: (i) => <PinCell person={i.row.original} /> }),
  c.accessor('skills', { header: w('cols.skills'), enableSorting: false, cell: (i) => <SkillsCell person={i.row.original} /> }),
  c.accessor('payoutAccount', { header: w('cols.payout'), enableSorting: false, cell: (i) => <PayoutAccountCell person={i.row.original} /> }),
  c.display({ id: 'actions', header: '', cell: (i) => <ActiveCell person={i.row.original} /> }),
];

function AddPersonForm() {
  const { t } = useTranslation();
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
      <Field label={t(`${area}.form.name`)} name="name" value={v.name} onChange={set('name')} error={errors.name} />
      <Field label={t(`${area}.form.email`)} name="email" value={v.email} onChange={set('email')} error={errors.email} />
      <div>
        <label className="field-label" htmlFor="new-role">{t(`${area}.form.role`)}</label>
        <select id="new-role" className="field-input" value={v.role} onChange={set('role')}>
          {ROLES.map((r) => <option key={r} value={r}>{t(`roles.${r}`)}</option>)}
        </select>
      </div>
      <Field label={t(`${area}.form.password`)} name="temporaryPassword" type="text" value={v.temporaryPassword} onChange={set('temporaryPassword')} error={errors.temporaryPassword} hint={t(`${area}.form.passwordHint`)} />
      <Field label={t(`${area}.form.pin`)} name="pin" inputMode="numeric" value={v.pin} onChange={set('pin')} error={errors.pin} hint={t(`${area}.form.pinHint`)} />
      <div className="flex items-end"><button className="btn-primary" type="submit" disabled={add.isPending}>{t(`${area}.form.add`)}</button></div>
      <div className="sm:col-span-3"><ErrorNote error={add.error && !(add.error instanceof ApiError && Object.keys(add.error.fields).length) ? add.error : null} /></div>
    </form>
  );
}

export function PeoplePage() {
  const { t } = useTranslation();
  const { data } = useSuspenseQuery(peopleQueries.list());
  const [params] = useSearchParams();
  const editing = data.find((p) => p.id === Number(params.get(SKILLS_PARAM)));
  return (
    <>
      <PageHeader title={t(`${area}.title`)} subtitle={t(`${area}.subtitle`)} />
      <Card title={t(`${area}.add`)} className="mb-5"><AddPersonForm /></Card>
      <AttendanceCard />
      <FloorTabletCard />
      <DataTable data={data} columns={columns} filterPlaceholder={t(`${area}.filter`)} />
      {editing ? <SkillsEditor key={editing.id} person={editing} /> : null}
    </>
  );
}
