import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate } from 'react-router';
import { loginInput, type LoginInput } from '@shared/schemas/auth';
import { ErrorNote } from '@/components/ui/page';
import { Field } from '@/components/ui/form';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';
import { useLogin, usePinLogin } from '@/lib/auth';

export function SignInPage() {
  const [mode, setMode] = useState<'password' | 'pin'>('password');
  return (
    <div className="flex min-h-screen items-center justify-center bg-thread-700 px-4 py-10">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex justify-center rounded-card bg-calico-50 py-3"><Logo size={36} /></div>
        <div className="card p-6">
          <div role="tablist" className="mb-5 grid grid-cols-2 gap-1 rounded-lg bg-calico-100 p-1 text-sm">
            {(['password', 'pin'] as const).map((m) => (
              <button
                key={m}
                role="tab"
                type="button"
                aria-selected={mode === m}
                onClick={() => setMode(m)}
                className={`rounded-md py-1.5 font-medium ${mode === m ? 'bg-white text-thread-800 shadow' : 'text-ink-600'}`}
              >
                {m === 'password' ? 'Password' : 'Floor PIN'}
              </button>
            ))}
          </div>
          {mode === 'password' ? <PasswordForm /> : <PinForm />}
        </div>
        <p className="mt-4 text-center text-sm text-calico-100">
          New here? <Link className="font-medium underline" to={paths.newStudio.getHref()}>Open a new studio</Link>
        </p>
      </div>
    </div>
  );
}

function PasswordForm() {
  const login = useLogin();
  const navigate = useNavigate();
  const form = useForm<LoginInput>({ resolver: zodResolver(loginInput), defaultValues: { email: '', password: '' } });
  const onSubmit = form.handleSubmit(async (v) => {
    await login.mutateAsync(v);
    navigate(paths.home.getHref());
  });
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <Field label="Email" type="email" autoComplete="username" {...form.register('email')} error={form.formState.errors.email?.message} />
      <Field label="Password" type="password" autoComplete="current-password" {...form.register('password')} error={form.formState.errors.password?.message} />
      <ErrorNote error={login.error} />
      <button type="submit" className="btn-primary w-full" disabled={login.isPending}>
        Sign in
      </button>
    </form>
  );
}

function PinForm() {
  const login = usePinLogin();
  const navigate = useNavigate();
  const [email, setEmail] = useState('');
  const [pin, setPin] = useState('');
  const onSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    await login.mutateAsync({ email: email.trim(), pin });
    navigate(paths.home.getHref());
  };
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <Field label="Email" name="pin-email" type="email" autoComplete="username" value={email} onChange={(e) => setEmail(e.target.value)} />
      <Field label="PIN" name="pin" type="password" inputMode="numeric" autoComplete="one-time-code" maxLength={6} value={pin} onChange={(e) => setPin(e.target.value.replace(/\D/g, ''))} />
      <ErrorNote error={login.error} />
      <button type="submit" className="btn-primary w-full" disabled={login.isPending}>
        Sign in with PIN
      </button>
    </form>
  );
}
