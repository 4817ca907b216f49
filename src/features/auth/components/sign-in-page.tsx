import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate } from 'react-router';
import { loginInput, type FloorListDto, type LoginInput } from '@shared/schemas/auth';
import { ErrorNote } from '@/components/ui/page';
import { Field } from '@/components/ui/form';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';
import { floorDeviceQueries, useFloorPinLogin, useLogin, usePinLogin } from '@/lib/auth';
import { useTranslation } from '@/lib/i18n';

type Mode = 'password' | 'pin' | 'floor';

/**
 * Sign-in. On a studio tablet the owner bound to the floor, people pick their name from the floor list
 * and type only their PIN; elsewhere (a personal phone) the floor PIN goes with the e-mail.
 */
export function SignInPage() {
  const { t } = useTranslation();
  const floor = useQuery(floorDeviceQueries.list()).data;
  const [picked, setPicked] = useState<Mode | null>(null);
  const modes: Mode[] = floor ? ['floor', 'password'] : ['password', 'pin'];
  const mode = picked && modes.includes(picked) ? picked : modes[0];
  const setMode = setPicked;
  return (
    <div className="flex min-h-screen items-center justify-center bg-thread-700 px-4 py-10">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex justify-center rounded-card bg-calico-50 py-3"><Logo size={36} /></div>
        <div className="card p-6">
          <div role="tablist" className="mb-5 grid grid-cols-2 gap-1 rounded-lg bg-calico-100 p-1 text-sm">
            {modes.map((m) => (
              <button
                key={m}
                role="tab"
                type="button"
                aria-selected={mode === m}
                onClick={() => setMode(m)}
                className={`rounded-md py-1.5 font-medium ${mode === m ? 'bg-white text-thread-800 shadow' : 'text-ink-600'}`}
              >
                {t(`auth.modes.${m}`)}
              </button>
            ))}
          </div>
          {mode === 'password' ? <PasswordForm /> : mode === 'floor' && floor ? <FloorListForm floor={floor} /> : <PinForm />}
        </div>
        <p className="mt-4 text-center text-sm text-calico-100">
          {t('auth.newHere')} <Link className="font-medium underline" to={paths.newStudio.getHref()}>{t('auth.openStudio')}</Link>
        </p>
      </div>
    </div>
  );
}

function PasswordForm() {
  const { t } = useTranslation();
  const login = useLogin();
  const navigate = useNavigate();
  const form = useForm<LoginInput>({ resolver: zodResolver(loginInput), defaultValues: { email: '', password: '' } });
  const onSubmit = form.handleSubmit((v) => {
    // mutate, not mutateAsync: a refused sign-in is shown from login.error, never thrown into the console.
    login.mutate(v, { onSuccess: () => navigate(paths.home.getHref()) });
  });
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <Field label={t('auth.email')} type="email" autoComplete="username" {...form.register('email')} error={form.formState.errors.email?.message} />
      <Field label={t('auth.password')} type="password" autoComplete="current-password" {...form.register('password')} error={form.formState.errors.password?.message} />
      <ErrorNote error={login.error} />
      <button type="submit" className="btn-primary w-full" disabled={login.isPending}>
        {t('auth.signIn')}
      </button>
    </form>
  );
}

function PinForm() {
  const { t } = useTranslation();
  const login = usePinLogin();
  const navigate = useNavigate();
  const [email, setEmail] = useState('');
  const [pin, setPin] = useState('');
  const onSubmit = (e: React.FormEvent) => {
    e.preventDefault();
    login.mutate({ email: email.trim(), pin }, { onSuccess: () => navigate(paths.home.getHref()) });
  };
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <Field label={t('auth.email')} name="pin-email" type="email" autoComplete="username" value={email} onChange={(e) => setEmail(e.target.value)} />
      <Field label={t('auth.pin')} name="pin" type="password" inputMode="numeric" autoComplete="one-time-code" maxLength={6} value={pin} onChange={(e) => setPin(e.target.value.replace(/\D/g, ''))} />
      <ErrorNote error={login.error} />
      <button type="submit" className="btn-primary w-full" disabled={login.isPending}>
        {t('auth.signInWithPin')}
      </button>
    </form>
  );
}

const PIN_KEYS = ['1', '2', '3', '4', '5', '6', '7', '8', '9', '', '0', '⌫'];

/** A bound tablet: the studio's machinists and finishers by name, then a PIN pad. No e-mail on the floor. */
function FloorListForm({ floor }: { floor: FloorListDto }) {
  const { t } = useTranslation();
  const login = useFloorPinLogin();
  const navigate = useNavigate();
  const [userId, setUserId] = useState<number | null>(null);
  const [pin, setPin] = useState('');
  const person = floor.people.find((p) => p.id === userId);
  const handlePick = (id: number) => {
    setUserId(id);
    setPin('');
    login.reset();
  };
  const handleKey = (k: string) => setPin((p) => (k === '⌫' ? p.slice(0, -1) : (p + k).slice(0, 6)));
  const onSubmit = (e: React.FormEvent) => {
    e.preventDefault();
    if (!userId) return;
    login.mutate({ userId, pin }, { onSuccess: () => navigate(paths.home.getHref()) });
  };
  return (
    <div className="space-y-4">
      <p className="text-sm text-ink-600">{t('auth.floorTablet', { studio: floor.studioName })}</p>
      {floor.people.length ? (
        <div role="radiogroup" aria-label={t('auth.whoAreYou')} className="grid grid-cols-2 gap-2">
          {floor.people.map((p) => (
            <button
              key={p.id}
              type="button"
              role="radio"
              aria-checked={p.id === userId}
              onClick={() => handlePick(p.id)}
              className={`rounded-lg border px-3 py-2.5 text-left text-sm font-medium ${p.id === userId ? 'border-thread-700 bg-thread-700 text-white' : 'border-calico-200 bg-white text-thread-800'}`}
            >
              {p.name}
            </button>
          ))}
        </div>
      ) : (
        <p className="text-sm text-ink-600">{t('auth.noFloorPeople')}</p>
      )}
      {person ? (
        <form onSubmit={onSubmit} className="space-y-3" noValidate>
          <Field label={t('auth.pinFor', { name: person.name })} name="floor-pin" type="password" inputMode="numeric" autoComplete="off" maxLength={6} value={pin} onChange={(e) => setPin(e.target.value.replace(/\D/g, '').slice(0, 6))} />
          <div className="grid grid-cols-3 gap-2">
            {PIN_KEYS.map((k, i) =>
              k ? (
                <button key={k} type="button" aria-label={k === '⌫' ? t('auth.deleteDigit') : k} className="rounded-lg bg-calico-100 py-3 text-lg font-semibold text-thread-800" onClick={() => handleKey(k)}>
                  {k}
                </button>
              ) : (
                <span key={`gap-${i}`} />
              ),
            )}
          </div>
          <ErrorNote error={login.error} />
          <button type="submit" className="btn-primary w-full" disabled={login.isPending || pin.length < 4}>
            {t('auth.signIn')}
          </button>
        </form>
      ) : null}
    </div>
  );
}
