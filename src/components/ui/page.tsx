import type { ReactNode } from 'react';
import { IconAlert } from './icons';
import { sentenceOf } from '@/lib/format';
import { ApiError } from '@/lib/api-client';
import { useTranslation } from '@/lib/i18n';

export function PageHeader({ title, subtitle, actions }: { title: string; subtitle?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-5 flex flex-wrap items-end justify-between gap-3">
      <div>
        <h1 className="text-2xl font-bold text-ink-900">{title}</h1>
        {subtitle ? <p className="mt-1 text-sm text-ink-600">{subtitle}</p> : null}
        <div className="stitch mt-2 w-16 text-madder-500" />
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}

export function Card({ title, children, className = '' }: { title?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section className={`card p-4 sm:p-5 ${className}`}>
      {title ? <h2 className="mb-3 text-base font-semibold text-thread-800">{title}</h2> : null}
      {children}
    </section>
  );
}

const tones = {
  teal: 'bg-thread-700/10 text-thread-800',
  red: 'bg-madder-100 text-madder-700',
  gold: 'bg-saffron-100 text-saffron-700',
  blue: 'bg-indigo-100 text-indigo-700',
  grey: 'bg-calico-200 text-ink-600',
};
export function Badge({ tone = 'grey', children }: { tone?: keyof typeof tones; children: ReactNode }) {
  return <span className={`inline-block rounded-full px-2.5 py-0.5 text-xs font-medium ${tones[tone]}`}>{children}</span>;
}

/** A safety caution panel; always defers to local codes. */
export function Caution({ title, items, source }: { title: string; items: string[]; source: string }) {
  const { t } = useTranslation();
  return (
    <aside role="note" className="rounded-card border border-saffron-500/40 bg-saffron-100 p-4 text-sm text-ink-800">
      <p className="mb-2 flex items-center gap-2 font-semibold text-saffron-700">
        <IconAlert /> {title}
      </p>
      <ul className="list-disc space-y-1 pl-5">
        {items.map((i) => (
          <li key={i}>{i}</li>
        ))}
      </ul>
      <p className="mt-2 text-xs text-ink-600">
        {source} {t('common.caution')}
      </p>
    </aside>
  );
}

/** Errors the server words in English, said in the person's language by their stable code (never by their text). */
const CODED = ['offline', 'unauthenticated', 'forbidden', 'rate_limited', 'not_found'] as const;

export function ErrorNote({ error }: { error: unknown }) {
  const { t, i18n } = useTranslation();
  if (!error) return null;
  // A refusal that names a field says something of its own (a PIN's tries left): shown as the server said it.
  const coded = error instanceof ApiError && i18n.language !== 'en' && (CODED as readonly string[]).includes(error.code) && !Object.keys(error.fields ?? {}).length;
  const message = coded ? t(`errors.${(error as ApiError).code}`) : sentenceOf(error instanceof Error ? error.message : String(error));
  return (
    <p role="alert" className="rounded-lg bg-madder-100 px-3 py-2 text-sm text-madder-700">
      {message}
    </p>
  );
}

export function Spinner({ label }: { label?: string }) {
  const { t } = useTranslation();
  return <p className="py-8 text-center text-sm text-ink-600">{label ?? t('common.loading')}</p>;
}
