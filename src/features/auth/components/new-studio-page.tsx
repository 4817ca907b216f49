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

export function NewStudioPage() {
  const navigate = useNavigate();
  const create = useMutation({
    mutationFn: (v: CreateStudioInput) => api.post<{ user: UserDto }>('/auth/studios', v),
    onSuccess: (d) => afterSignIn(d.user),
  });
  const form = useForm<CreateStudioInput>({
    resolver: zodResolver(createStudioInput),
    defaultValues: { studioName: '', currency: 'KES', unitSystem: 'metric', ownerName: '', email: '', password: '' },
  });
  const e = form.formState.errors;
  const onSubmit = form.handleSubmit(async (v) => {
    await create.mutateAsync(v);
    navigate(paths.home.getHref());
  });
  return (
    <div className="flex min-h-screen items-center justify-center bg-thread-700 px-4 py-10">
      <div className="w-full max-w-md">
        <div className="mb-6 flex justify-center rounded-card bg-calico-50 py-3"><Logo size={36} /></div>
        <form onSubmit={onSubmit} className="card space-y-4 p-6" noValidate>
          <h1 className="text-xl font-bold">Open a new studio</h1>
          <p className="text-sm text-ink-600">You become the studio's owner and can add your cutter and floor staff.</p>
          <Field label="Studio name" {...form.register('studioName')} error={e.studioName?.message} />
          <div className="grid grid-cols-2 gap-3">
            <Field label="Currency (ISO 4217)" maxLength={3} {...form.register('currency', { setValueAs: (v: string) => v.toUpperCase() })} error={e.currency?.message} />
            <div>
              <label className="field-label" htmlFor="unitSystem">Units</label>
              <select id="unitSystem" className="field-input" {...form.register('unitSystem')}>
                <option value="metric">Metric (cm, m)</option>
                <option value="imperial">Imperial (in, yd)</option>
              </select>
            </div>
          </div>
          <Field label="Your name" {...form.register('ownerName')} error={e.ownerName?.message} />
          <Field label="Email" type="email" {...form.register('email')} error={e.email?.message} />
          <Field label="Password" type="password" autoComplete="new-password" {...form.register('password')} error={e.password?.message} hint="At least 10 characters" />
          <ErrorNote error={create.error} />
          <button type="submit" className="btn-primary w-full" disabled={create.isPending}>Create studio</button>
          <p className="text-center text-sm"><Link className="underline" to={paths.signIn.getHref()}>Back to sign in</Link></p>
        </form>
      </div>
    </div>
  );
}
