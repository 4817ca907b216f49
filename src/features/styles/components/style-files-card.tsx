import { useMutation, useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { UploadDto, UploadKind } from '@shared/schemas/uploads';
import { Card, ErrorNote } from '@/components/ui/page';
import { api, ApiError } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

/** What a studio keeps beside a style, and what each accepts (the server judges the file by its content). */
const STYLE_FILE_KINDS: { kind: UploadKind; label: string; accept: string }[] = [
  { kind: 'sketch', label: 'Sketch', accept: '.png,.jpg,.jpeg,.webp,.gif,.svg' },
  { kind: 'photo', label: 'Photo', accept: '.png,.jpg,.jpeg,.webp' },
  { kind: 'swatch', label: 'Fabric swatch', accept: '.png,.jpg,.jpeg,.webp' },
  { kind: 'measurements', label: 'Measurements (CSV or XLSX)', accept: '.csv,.xlsx' },
];

const filesKey = (styleId: number) => ['uploads', 'style', styleId] as const;
const kb = (bytes: number) => (bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} KB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`);

/** Sketches, photos, swatches and measurement sheets of one style: upload, see, open, remove. */
export function StyleFilesCard({ styleId }: { styleId: number }) {
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
    onError: (e) => setFieldError(e instanceof ApiError ? (e.fields.file ?? e.message) : 'Upload failed'),
  });
  const remove = useMutation({ mutationFn: (id: number) => api.del(`/uploads/${id}`), onSuccess: refresh });
  const accept = STYLE_FILE_KINDS.find((k) => k.kind === kind)?.accept;

  const handleSubmit = (e: React.FormEvent) => {
    e.preventDefault();
    setFieldError('');
    if (!file) return setFieldError('Choose a file to upload');
    upload.mutate();
  };

  return (
    <Card title="Style files">
      <form onSubmit={handleSubmit} className="grid gap-3 sm:grid-cols-[12rem_1fr_auto] sm:items-end">
        <div>
          <label className="field-label" htmlFor="sf-kind">What it is</label>
          <select id="sf-kind" className="field-input" value={kind} onChange={(e) => setKind(e.target.value as UploadKind)}>
            {STYLE_FILE_KINDS.map((k) => <option key={k.kind} value={k.kind}>{k.label}</option>)}
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="sf-file">File</label>
          <input key={inputKey} id="sf-file" className="field-input" type="file" accept={accept} onChange={(e) => setFile(e.target.files?.[0] ?? null)} aria-invalid={Boolean(fieldError)} />
          {fieldError ? <p className="field-error" role="alert">{fieldError}</p> : null}
        </div>
        <button type="submit" className="btn-primary" disabled={upload.isPending}>{upload.isPending ? 'Uploading…' : 'Upload'}</button>
      </form>
      <ErrorNote error={files.error ?? remove.error} />
      {files.data?.length ? (
        <ul className="mt-4 grid gap-3 sm:grid-cols-3" aria-label="Files of this style">
          {files.data.map((u) => (
            <li key={u.id} className="rounded-lg border border-calico-200 bg-white p-2 text-sm">
              {u.mimeType.startsWith('image/') ? (
                <img src={u.url} alt={`${u.kind}: ${u.originalName}`} className="mb-2 h-32 w-full rounded object-contain" />
              ) : null}
              <div className="font-medium">{u.originalName}</div>
              <div className="text-ink-600">{STYLE_FILE_KINDS.find((k) => k.kind === u.kind)?.label ?? u.kind} · {kb(u.size)}</div>
              <div className="mt-1 flex gap-3">
                <a className="underline" href={u.url} target="_blank" rel="noreferrer">Open</a>
                <button type="button" className="underline" onClick={() => remove.mutate(u.id)}>Remove</button>
              </div>
            </li>
          ))}
        </ul>
      ) : files.data ? (
        <p className="mt-3 text-sm text-ink-600">No files yet. Keep the sketch, photos, swatches and the measurement sheet here.</p>
      ) : null}
    </Card>
  );
}
