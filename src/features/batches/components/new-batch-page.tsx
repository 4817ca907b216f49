import { useSuspenseQuery } from '@tanstack/react-query';
import { addDays } from 'date-fns';
import { dayInZone } from '@shared/format/studio-format';
import { useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { createBatchInput } from '@shared/schemas/batches';
import { Field } from '@/components/ui/form';
import { Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { styleQueries } from '@/features/styles/api/style-queries';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { useCreateBatch } from '../api/batch-queries';
import { readSizeQuantities } from './size-quantities';

export function NewBatchPage() {
  const { t } = useTranslation();
  const { data: styles } = useSuspenseQuery(styleQueries.list());
  const navigate = useNavigate();
  const create = useCreateBatch();
  const [styleId, setStyleId] = useState<number>(styles[0]?.id ?? 0);
  const style = styles.find((s) => s.id === styleId);
  const [qty, setQty] = useState<Record<string, string>>({});
  const [dueDate, setDueDate] = useState(() => dayInZone(addDays(new Date(), 21), fmt().settings.timeZone));
  const [notes, setNotes] = useState('');
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});

  const { quantities, unreadable, total } = useMemo(() => readSizeQuantities(style?.sizeRun ?? [], qty), [style, qty]);

  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = createBatchInput.safeParse({ styleId, quantities, dueDate, notes });
    const typing = Object.fromEntries(unreadable.map((s) => [`quantities.${s}`, t('newBatch.wholeNumber')]));
    if (!parsed.success || unreadable.length) {
      setFieldErrors({ ...Object.fromEntries((parsed.error?.issues ?? []).map((i) => [i.path.join('.') || 'form', i.message])), ...typing });
      return;
    }
    setFieldErrors({});
    try {
      const b = await create.mutateAsync(parsed.data);
      navigate(paths.batch.getHref(b.id));
    } catch (err) {
      if (err instanceof ApiError) setFieldErrors(err.fields);
    }
  };

  return (
    <>
      <PageHeader title={t('lists.newBatch')} subtitle={t('newBatch.subtitle')} />
      <Card>
        {styles.length === 0 ? (
          <p className="mb-4 text-sm text-ink-600">
            {t('newBatch.noStyles')} <Link className="underline" to={paths.newStyle.getHref()}>{t('home.toNewStyle')}</Link>
          </p>
        ) : null}
        <form onSubmit={handleSubmit} className="max-w-2xl space-y-5" noValidate>
          <div>
            <label className="field-label" htmlFor="styleId">{t('lists.style')}</label>
            <select id="styleId" className="field-input" value={styleId} onChange={(e) => setStyleId(Number(e.target.value))}>
              {styles.map((s) => <option key={s.id} value={s.id}>{s.code} · {s.name}</option>)}
            </select>
          </div>
          <fieldset>
            <legend className="field-label">{t('lists.quantityPerSize')}</legend>
            <div className="grid grid-cols-3 gap-3 sm:grid-cols-6">
              {style?.sizeRun.map((s) => (
                <div key={s}>
                  <label className="block text-center text-xs font-semibold text-thread-800" htmlFor={`qty-${s}`}>{s}</label>
                  <input
                    id={`qty-${s}`}
                    aria-label={t('newBatch.quantity', { size: s })}
                    inputMode="numeric"
                    className="field-input text-center"
                    value={qty[s] ?? ''}
                    placeholder="0"
                    onChange={(e) => setQty({ ...qty, [s]: e.target.value })}
                  />
                  {fieldErrors[`quantities.${s}`] ? <p className="field-error">{fieldErrors[`quantities.${s}`]}</p> : null}
                </div>
              ))}
              <div className="flex flex-col items-center justify-end rounded-lg bg-thread-700 px-2 py-2 text-calico-50">
                <span className="text-xs">{t('lists.total')}</span>
                <output aria-label={t('newBatch.totalGarments')} className="text-xl font-bold">{total}</output>
              </div>
            </div>
            {fieldErrors.quantities ? <p className="field-error">{fieldErrors.quantities}</p> : null}
          </fieldset>
          <Field label={t('newBatch.dueDate')} type="date" name="dueDate" value={dueDate} onChange={(e) => setDueDate(e.target.value)} error={fieldErrors.dueDate} />
          <div>
            <label className="field-label" htmlFor="notes">{t('newBatch.notes')}</label>
            <textarea id="notes" className="field-input" rows={2} value={notes} onChange={(e) => setNotes(e.target.value)} />
          </div>
          <ErrorNote error={create.error} />
          <button className="btn-primary" type="submit" disabled={create.isPending}>{t('newBatch.create')}</button>
        </form>
      </Card>
    </>
  );
}
