import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { createStyleInput, STYLE_STATUSES, type CreateStyleInput, type StyleDto } from '@shared/schemas/styles';
import { Field } from '@/components/ui/form';
import { ErrorNote } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useTranslation } from '@/lib/i18n';
import { useSaveStyle } from '../api/style-queries';
import { area, words } from '../words';

/** The key of a sentence of the shared style schema, by its English (the schema speaks English on both sides). */
const SENTENCES = new Map(Object.entries(words.en.validation).map(([k, v]) => [v, k]));

type FormValues = z.input<typeof createStyleInput>;

export function StyleForm({ style, onSaved }: { style?: StyleDto; onSaved: (s: StyleDto) => void }) {
  const { t } = useTranslation();
  const save = useSaveStyle(style?.id);
  const [sizesText, setSizesText] = useState((style?.sizeRun ?? ['XS', 'S', 'M', 'L', 'XL']).join(', '));
  const form = useForm<FormValues>({
    resolver: zodResolver(createStyleInput),
    defaultValues: style ?? { code: '', name: '', description: '', sizeRun: ['XS', 'S', 'M', 'L', 'XL'], baseSize: 'M', status: 'draft' },
  });
  const e = form.formState.errors;
  /** A refusal in the person's language: a sentence of the schema is looked up, the server's words are already theirs. */
  const said = (message?: string) => (message && SENTENCES.has(message) ? t(`${area}.validation.${SENTENCES.get(message)}`) : message);
  const serverFields = save.error instanceof ApiError ? save.error.fields : {};
  const onSubmit = form.handleSubmit(async (v) => onSaved(await save.mutateAsync(v as CreateStyleInput)));
  return (
    <form onSubmit={onSubmit} className="grid max-w-2xl gap-4 sm:grid-cols-2" noValidate>
      <Field label={t(`${area}.form.code`)} {...form.register('code')} error={said(e.code?.message) ?? serverFields.code} />
      <Field label={t(`${area}.form.name`)} {...form.register('name')} error={said(e.name?.message)} />
      <div className="sm:col-span-2">
        <label className="field-label" htmlFor="description">{t(`${area}.form.description`)}</label>
        <textarea id="description" rows={3} className="field-input" {...form.register('description')} />
      </div>
      <Field
        label={t(`${area}.form.sizeRun`)}
        name="sizeRunText"
        value={sizesText}
        onChange={(ev) => {
          setSizesText(ev.target.value);
          form.setValue('sizeRun', ev.target.value.split(',').map((s) => s.trim()).filter(Boolean), { shouldValidate: true });
        }}
        error={said(e.sizeRun?.message ?? e.sizeRun?.root?.message) ?? (Array.isArray(e.sizeRun) ? t(`${area}.form.checkSizes`) : undefined)}
      />
      <Field label={t(`${area}.form.baseSize`)} {...form.register('baseSize')} error={said(e.baseSize?.message)} />
      <div>
        <label className="field-label" htmlFor="status">{t(`${area}.form.status`)}</label>
        <select id="status" className="field-input" {...form.register('status')}>
          {STYLE_STATUSES.map((s) => <option key={s} value={s}>{t(`styleStatus.${s}`)}</option>)}
        </select>
      </div>
      <div className="sm:col-span-2 space-y-3">
        <ErrorNote error={save.error} />
        <button type="submit" className="btn-primary" disabled={save.isPending}>{t(`${area}.form.save`)}</button>
      </div>
    </form>
  );
}
