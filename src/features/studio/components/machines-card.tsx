import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { MACHINE_TYPES } from '@shared/schemas/line';
import { machinesField, type StudioDto } from '@shared/schemas/studio';
import { Card, ErrorNote } from '@/components/ui/page';
import { api, ApiError } from '@/lib/api-client';
import { useTranslation } from '@/lib/i18n';
import { queryClient } from '@/lib/query-client';

type Row = { type: string; count: string };

/**
 * The studio's machines by type and count. The line plan puts no more people on a machine type than there are
 * machines of it; a type not listed is not limited.
 */
export function MachinesCard({ studio, invalidateKey }: { studio: StudioDto; invalidateKey: readonly unknown[] }) {
  const { t } = useTranslation();
  const [rows, setRows] = useState<Row[]>(Object.entries(studio.machines).map(([type, n]) => ({ type, count: String(n) })));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: (machines: Record<string, number>) => api.patch<{ studio: StudioDto }>('/studio', { machines }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invalidateKey }),
  });
  const set = (i: number, patch: Partial<Row>) => setRows(rows.map((r, k) => (k === i ? { ...r, ...patch } : r)));
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    const found: Record<string, string> = {};
    rows.forEach((r, i) => {
      if (!r.type.trim()) found[`${i}.type`] = t('machines.typeRequired');
      else if (rows.findIndex((x) => x.type.trim() === r.type.trim()) !== i) found[`${i}.type`] = t('machines.twice');
      if (!/^\d{1,3}$/.test(r.count.trim())) found[`${i}.count`] = t('machines.whole');
    });
    const parsed = machinesField.safeParse(Object.fromEntries(rows.map((r) => [r.type.trim(), Number(r.count)])));
    if (!parsed.success && !Object.keys(found).length) found.machines = parsed.error.issues[0].message;
    setErrors(found);
    if (Object.keys(found).length || !parsed.success) return;
    try {
      await save.mutateAsync(parsed.data);
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fields);
    }
  };
  const unused = MACHINE_TYPES.filter((t) => !rows.some((r) => r.type === t));
  return (
    <Card title={t('machines.title')} className="mt-5 max-w-xl">
      <p className="mb-3 text-sm text-ink-600">{t('machines.intro')}</p>
      <form onSubmit={submit} noValidate>
        <table className="mb-3 text-sm" data-testid="machines">
          <thead><tr className="text-left text-ink-600"><th className="pr-2">{t('machines.type')}</th><th className="pr-2">{t('machines.count')}</th><th /></tr></thead>
          <tbody>{rows.map((r, i) => (
            <tr key={i}>
              <td className="py-1 pr-2 align-top">
                <input aria-label={t('machines.typeRow', { row: i + 1 })} list="studio-machine-types" className="field-input w-44" value={r.type} onChange={(e) => set(i, { type: e.target.value })} aria-invalid={Boolean(errors[`${i}.type`])} />
                {errors[`${i}.type`] ? <p role="alert" className="text-xs text-madder-700">{errors[`${i}.type`]}</p> : null}
              </td>
              <td className="py-1 pr-2 align-top">
                <input aria-label={t('machines.countRow', { row: i + 1 })} inputMode="numeric" className="field-input w-20" value={r.count} onChange={(e) => set(i, { count: e.target.value })} aria-invalid={Boolean(errors[`${i}.count`] ?? errors[`machines.${r.type}`])} />
                {errors[`${i}.count`] ?? errors[`machines.${r.type}`] ? <p role="alert" className="text-xs text-madder-700">{errors[`${i}.count`] ?? errors[`machines.${r.type}`]}</p> : null}
              </td>
              <td className="py-1 align-top"><button type="button" className="text-sm underline" onClick={() => setRows(rows.filter((_, k) => k !== i))}>{t('machines.remove')}</button></td>
            </tr>
          ))}</tbody>
        </table>
        <datalist id="studio-machine-types">{MACHINE_TYPES.map((t) => <option key={t} value={t} />)}</datalist>
        {rows.length === 0 ? <p className="mb-2 text-sm text-ink-600">{t('machines.none')}</p> : null}
        {errors.machines ? <p role="alert" className="mb-2 text-xs text-madder-700">{errors.machines}</p> : null}
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-quiet" onClick={() => setRows([...rows, { type: unused[0] ?? '', count: '1' }])}>{t('machines.add')}</button>
          <button type="submit" className="btn-primary" disabled={save.isPending}>{t('machines.save')}</button>
        </div>
        <div className="mt-2"><ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} /></div>
        {save.isSuccess ? <p className="mt-2 text-sm text-thread-700">{t('machines.saved')}</p> : null}
      </form>
    </Card>
  );
}
