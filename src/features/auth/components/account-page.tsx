import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { changePasswordInput, type ChangePasswordInput, type UserDto } from '@shared/schemas/auth';
import { Field } from '@/components/ui/form';
import { Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { api } from '@/lib/api-client';
import { afterSignIn, useMe } from '@/lib/auth';

export function AccountPage() {
  const me = useMe().data;
  const change = useMutation({
    mutationFn: (v: ChangePasswordInput) => api.post<{ user: UserDto }>('/auth/password', v),
    onSuccess: (d) => afterSignIn(d.user),
  });
  const form = useForm<ChangePasswordInput>({ resolver: zodResolver(changePasswordInput), defaultValues: { currentPassword: '', newPassword: '' } });
  const onSubmit = form.handleSubmit(async (v) => {
    await change.mutateAsync(v);
    form.reset();
  });
  return (
    <>
      <PageHeader title="Your account" subtitle={`${me?.name} · ${me?.email}`} />
      {me?.mustChangePassword ? (
        <p role="alert" className="mb-4 rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">
          You signed in with a temporary password. Choose your own before you go on.
        </p>
      ) : null}
      <Card title="Change password" className="max-w-md">
        <form onSubmit={onSubmit} className="space-y-4" noValidate>
          <Field label="Current password" type="password" autoComplete="current-password" {...form.register('currentPassword')} error={form.formState.errors.currentPassword?.message} />
          <Field label="New password" type="password" autoComplete="new-password" {...form.register('newPassword')} error={form.formState.errors.newPassword?.message} hint="At least 10 characters" />
          <ErrorNote error={change.error} />
          {change.isSuccess ? <p className="text-sm text-thread-700">Password changed. Other devices are signed out.</p> : null}
          <button className="btn-primary" type="submit" disabled={change.isPending}>Save password</button>
        </form>
      </Card>
    </>
  );
}
