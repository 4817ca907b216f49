import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { Link, useNavigate } from 'react-router';
import { createStudioInput, type CreateStudioInput, type UserDto } from '@shared/schemas/auth';
import { Field } from '@/components/ui/form';
import { Logo } from '@/components/ui/logo';
import { ErrorNote } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { afterSignIn } from '@/lib/auth';
import { i18n, useTranslation } from '@/lib/i18n';
import { LANGUAGES, isTimeZone, type Language } from '@shared/format/studio-format';
import { area } from '../words';

/** The browser's time zone, so a new studio's dates are in its own time from the first day (UTC when unknown). */
function browserTimeZone(): string | undefined {
  const zone = Intl.DateTimeFormat().resolvedOptions().timeZone;
  return zone && isTimeZone(zone) ? zone : undefined;
}

export function NewStudioPage() {
  const { t } = useTranslation();
  const w = (key: string) => t(`${area}.${key}`);
  const navigate = useNavigate();
  const create = useMutation({
    mutationFn: (v: CreateStudioInput) => api.post<{ user: UserDto }>('/auth/studios', v),
    onSuccess: (d) => afterSignIn(d.user),
  });
  const form = useForm<CreateStudioInput>({
    resolver: zodResolver(createStudioInput),
    defaultValues: {
      studioName: '',
      currency: 'KES',
      unitSystem: 'metric',
      language: (LANGUAGES as readonly string[]).includes(i18n.language) ? (i18n.language as Language) : 'en',
      timeZone: browserTimeZone(),
      ownerName: '',
      email: '',
      password: '',
    },
  });
  const e = form.formState.errors;
  const onSubmit = form.handleSubmit((v) => {
    create.mutate(v, { onSuccess: () => navigate(paths.home.getHref()) });
  });
  return (
    <div className="flex min-h-screen items-center justify-center bg-thread-700 px-4 py-10">
      <div className="w-full max-w-md">
        <div className="mb-6 flex justify-center rounded-card bg-calico-50 py-3"><Logo size={36} /></div>
        <form onSubmit={onSubmit} className="card space-y-4 p-6" noValidate>
          <h1 className="text-xl font-bold">{w('title')}</h1>
          <p className="text-sm text-ink-600">{w('intro')}</p>
          <Field label={w('studioName')} {...form.register('studioName')} error={e.studioName?.message} />
          <div className="grid grid-cols-2 gap-3">
            <Field label={w('currency')} maxLength={3} {...form.register('currency', { setValueAs: (v: string) => v.toUpperCase() })} error={e.currency?.message} />
            <div>
              <label className="field-label" htmlFor="unitSystem">{w('units')}</label>
              <select id="unitSystem" className="field-input" {...form.register('unitSystem')}>
                <option value="metric">{w('metric')}</option>
                <option value="imperial">{w('imperial')}</option>
              </select>
            </div>
          </div>
          <div>
            <label className="field-label" htmlFor="language">{w('language')}</label>
            <select id="language" className="field-input" {...form.register('language')}>
              {LANGUAGES.map((l) => <option key={l} value={l}>{t(`languages.${l}`)}</option>)}
            </select>
          </div>
          <Field label={w('yourName')} {...form.register('ownerName')} error={e.ownerName?.message} />
          <Field label={w('email')} type="email" {...form.register('email')} error={e.email?.message} />
          <Field label={w('password')} type="password" autoComplete="new-password" {...form.register('password')} error={e.password?.message} hint={w('passwordHint')} />
          <ErrorNote error={create.error} />
          <button type="submit" className="btn-primary w-full" disabled={create.isPending}>{w('create')}</button>
          <p className="text-center text-sm"><Link className="underline" to={paths.signIn.getHref()}>{w('back')}</Link></p>
        </form>
      </div>
    </div>
  );
}
