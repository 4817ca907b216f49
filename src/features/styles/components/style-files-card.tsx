import { useMutation, useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { UploadDto, UploadKind } from '@shared/schemas/uploads';
import { Card, ErrorNote } from '@/components/ui/page';
import { api, ApiError } from '@/lib/api-client';
import { fmt } from '@/lib/format';
import { i18n, useTranslation } from '@/lib/i18n';
import { queryClient } from '@/lib/query-client';
import { area } from '../words';

/** What a studio keeps beside a style, and what each accepts (the server judges the file by its content); names in ../words.ts. */
const STYLE_FILE_KINDS: { kind: UploadKind; accept: string }[] = [
  { kind: 'sketch', accept: '.png,.jpg,.jpeg,.webp,.gif,.svg' },
  { kind: 'photo', accept: '.png,.jpg,.jpeg,.webp' },
  { kind: 'swatch', accept: '.png,.jpg,.jpeg,.webp' },
  { kind: 'measurements', accept: '.csv,.xlsx' },
];
const kindName = (kind: string) => i18n.t(`${area}.files.kinds.${kind}`, { defaultValue: kind });

const filesKey = (styleId: number) => ['uploads', 'style', styleId] as const;
const kb = (bytes: number) => {
  const n = (v: number, digits: number) => new Intl.NumberFormat(fmt().locale, { minimumFractionDigits: digits, maximumFractionDigits: digits, useGrouping: false }).format(v);
  return bytes < 1024 * 1024
    ? i18n.t(`${area}.files.kb`, { size: n(Math.max(1, Math.round(bytes / 1024)), 0) })
    : i18n.t(`${area}.files.mb`, { size: n(bytes / 1024 / 1024, 1) });
};

/** Sketches, photos, swatches and measurement sheets of one style: upload, see, open, remove. */
export function StyleFilesCard({ styleId }: { styleId: number }) {
  const { t } = useTranslation();
  const files = useQuery({
    queryKey: filesKey(styleId),
    queryFn: async () => (await api.get<{ uploads: UploadDto[] }>(`/uploads?styleId=${styleId}`)).uploads,
  });
  const [kind, setKind] = useState<UploadKind>('sketch');
  const [file, setFile] = useState<File | null>(null);
  const [fieldError, setFieldError] = useState('');
  // A new key empties the file input after an upload.
  const [inputKey, setInputKey] = useState(0);
  const refresh = () => queryClient.invalidateQueries({ queryKey: filesKey(styleId) });
  const upload = useMutation({
    mutationFn: async () => {
      const form = new FormData();
      form.append('kind', kind);
      form.append('styleId', String(styleId));
      form.append('file', file!);
      return api.post<{ upload: UploadDto }>('/uploads', form);
    },
    onSuccess: () => {
      setFile(null);
      setInputKey((k) => k + 1);
      void refresh();
    },
    onError: (e) => setFieldError(e instanceof ApiError ? (e.fields.file ?? e.message) : t(`${area}.files.uploadFailed`)),
  });
  const remove = useMutation({ mutationFn: (id: number) => api.del(`/uploads/${id}`), onSuccess: refresh });
  const accept = STYLE_FILE_KINDS.find((k) => k.kind === kind)?.accept;

  const handleSubmit = (e: React.FormEvent) => {
    e.preventDefault();
    setFieldError('');
    if (!file) return setFieldError(t(`${area}.files.chooseFile`));
    upload.mutate();
  };

  return (
    <Card title={t(`${area}.files.title`)}>
      <form onSubmit={handleSubmit} className="grid gap-3 sm:grid-cols-[12rem_1fr_auto] sm:items-end">
        <div>
          <label className="field-label" htmlFor="sf-kind">{t(`${area}.files.whatItIs`)}</label>
          <select id="sf-kind" className="field-input" value={kind} onChange={(e) => setKind(e.target.value as UploadKind)}>
            {STYLE_FILE_KINDS.map((k) => <option key={k.kind} value={k.kind}>{kindName(k.kind)}</option>)}
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="sf-file">{t(`${area}.files.file`)}</label>
          <input key={inputKey} id="sf-file" className="field-input" type="file" accept={accept} onChange={(e) => setFile(e.target.files?.[0] ?? null)} aria-invalid={Boolean(fieldError)} />
          {fieldError ? <p className="field-error" role="alert">{fieldError}</p> : null}
        </div>
        <button type="submit" className="btn-primary" disabled={upload.isPending}>{upload.isPending ? t(`${area}.files.uploading`) : t(`${area}.files.upload`)}</button>
      </form>
      <ErrorNote error={files.error ?? remove.error} />
      {files.data?.length ? (
        <ul className="mt-4 grid gap-3 sm:grid-cols-3" aria-label={t(`${area}.files.list`)}>
          {files.data.map((u) => (
            <li key={u.id} className="rounded-lg border border-calico-200 bg-white p-2 text-sm">
              {u.mimeType.startsWith('image/') ? (
                <img src={u.url} alt={t(`${area}.files.alt`, { kind: t(`${area}.files.altKinds.${u.kind}`, { defaultValue: u.kind }), name: u.originalName })} className="mb-2 h-32 w-full rounded object-contain" />
              ) : null}
              <div className="font-medium">{u.originalName}</div>
              <div className="text-ink-600">{kindName(u.kind)} · {kb(u.size)}</div>
              <div className="mt-1 flex gap-3">
                <a className="underline" href={u.url} target="_blank" rel="noreferrer">{t(`${area}.files.open`)}</a>
                <button type="button" className="underline" onClick={() => remove.mutate(u.id)}>{t(`${area}.files.remove`)}</button>
              </div>
            </li>
          ))}
        </ul>
      ) : files.data ? (
        <p className="mt-3 text-sm text-ink-600">{t(`${area}.files.none`)}</p>
      ) : null}
    </Card>
  );
}
