import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { changePasswordInput, type ChangePasswordInput, type UpdateMeInput, type UserDto } from '@shared/schemas/auth';
import { LANGUAGES } from '@shared/format/studio-format';
import { Field } from '@/components/ui/form';
import { Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { api } from '@/lib/api-client';
import { afterSignIn, meQueries, useMe } from '@/lib/auth';
import { useTranslation } from '@/lib/i18n';
import { queryClient } from '@/lib/query-client';

/** The person's own language: theirs wins on their phone; empty follows the studio's. */
function LanguageCard({ me }: { me: UserDto }) {
  const { t } = useTranslation();
  const save = useMutation({
    mutationFn: (body: UpdateMeInput) => api.patch<{ user: UserDto }>('/auth/me', body),
    onSuccess: (d) => queryClient.setQueryData(meQueries.me().queryKey, d.user),
  });
  return (
    <Card title={t('auth.account.languageCard')} className="mb-5 max-w-md">
      <label className="field-label" htmlFor="own-language">{t('auth.account.language')}</label>
      <select
        id="own-language"
        className="field-input"
        value={me.ownLanguage ?? ''}
        disabled={save.isPending}
        onChange={(e) => save.mutate({ language: (e.target.value || null) as UpdateMeInput['language'] })}
      >
        <option value="">{t('auth.account.followStudio', { language: t(`languages.${me.studioLanguage}`) })}</option>
        {LANGUAGES.map((l) => <option key={l} value={l} lang={l}>{t(`languages.${l}`)}</option>)}
      </select>
      <ErrorNote error={save.error} />
      {save.isSuccess ? <p className="mt-2 text-sm text-thread-700">{t('auth.account.languageSaved')}</p> : null}
    </Card>
  );
}

export function AccountPage() {
  const { t } = useTranslation();
  const me = useMe().data;
  const change = useMutation({
    mutationFn: (v: ChangePasswordInput) => api.post<{ user: UserDto }>('/auth/password', v),
    onSuccess: (d) => afterSignIn(d.user),
  });
  const form = useForm<ChangePasswordInput>({ resolver: zodResolver(changePasswordInput), defaultValues: { currentPassword: '', newPassword: '' } });
  const onSubmit = form.handleSubmit((v) => {
    change.mutate(v, { onSuccess: () => form.reset() });
  });
  return (
    <>
      <PageHeader title={t('auth.account.title')} subtitle={`${me?.name} · ${me?.email}`} />
      {me?.mustChangePassword ? (
        <p role="alert" className="mb-4 rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">
          {t('auth.account.temporary')}
        </p>
      ) : null}
      {me ? <LanguageCard me={me} /> : null}
      <Card title={t('auth.account.changePassword')} className="max-w-md">
        <form onSubmit={onSubmit} className="space-y-4" noValidate>
          <Field label={t('auth.account.current')} type="password" autoComplete="current-password" {...form.register('currentPassword')} error={form.formState.errors.currentPassword?.message} />
          <Field label={t('auth.account.new')} type="password" autoComplete="new-password" {...form.register('newPassword')} error={form.formState.errors.newPassword?.message} hint={t('auth.account.hint')} />
          <ErrorNote error={change.error} />
          {change.isSuccess ? <p className="text-sm text-thread-700">{t('auth.account.changed')}</p> : null}
          <button className="btn-primary" type="submit" disabled={change.isPending}>{t('auth.account.savePassword')}</button>
        </form>
      </Card>
    </>
  );
}
