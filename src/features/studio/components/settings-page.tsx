import { useMutation, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { updateStudioInput, type StudioDto } from '@shared/schemas/studio';
import { Field } from '@/components/ui/form';
import { Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { api, ApiError } from '@/lib/api-client';
import { meQueries } from '@/lib/auth';
import { queryClient } from '@/lib/query-client';
import { studioQueries } from '@/lib/queries';
import { MachinesCard } from './machines-card';


export function SettingsPage() {
  const { data: studio } = useSuspenseQuery(studioQueries.detail());
  const [v, setV] = useState({ name: studio.name, currency: studio.currency, unitSystem: studio.unitSystem, workingDayHours: String(studio.workingDayHours) });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: (body: unknown) => api.patch<{ studio: StudioDto }>('/studio', body),
    onSuccess: () => {
      queryClient.invalidateQueries({ queryKey: studioQueries.detail().queryKey });
      queryClient.invalidateQueries({ queryKey: meQueries.me().queryKey });
    },
  });
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = updateStudioInput.safeParse({ ...v, workingDayHours: Number(v.workingDayHours) });
    if (!parsed.success) return setErrors(Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message])));
    setErrors({});
    try {
      await save.mutateAsync(parsed.data);
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fields);
    }
  };
  return (
    <>
      <PageHeader title="Studio settings" />
      <Card className="max-w-xl">
        <form onSubmit={handleSubmit} className="space-y-4" noValidate>
          <Field label="Studio name" name="name" value={v.name} onChange={(e) => setV({ ...v, name: e.target.value })} error={errors.name} />
          <Field label="Currency (ISO 4217)" name="currency" maxLength={3} value={v.currency} onChange={(e) => setV({ ...v, currency: e.target.value.toUpperCase() })} error={errors.currency} />
          <div>
            <label className="field-label" htmlFor="units">Units</label>
            <select id="units" className="field-input" value={v.unitSystem} onChange={(e) => setV({ ...v, unitSystem: e.target.value as 'metric' | 'imperial' })}>
              <option value="metric">Metric (mm, cm, m)</option>
              <option value="imperial">Imperial (in to 1/8, yd)</option>
            </select>
          </div>
          <Field label="Working day (hours)" name="workingDayHours" inputMode="decimal" value={v.workingDayHours} onChange={(e) => setV({ ...v, workingDayHours: e.target.value })} error={errors.workingDayHours} />
          <ErrorNote error={save.error} />
          {save.isSuccess ? <p className="text-sm text-thread-700">Saved.</p> : null}
          <button className="btn-primary" type="submit" disabled={save.isPending}>Save settings</button>
        </form>
      </Card>
      <MachinesCard studio={studio} invalidateKey={studioQueries.detail().queryKey} />
    </>
  );
}
