import { queryOptions, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Link } from 'react-router';
import type { SearchHitDto } from '@shared/schemas/search';
import { paths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCan } from '@/lib/auth';
import { useTranslation } from '@/lib/i18n';
import { IconSearch } from '../ui/icons';

export const searchQueries = {
  all: () => ({ queryKey: ['search'] as const }),
  find: (q: string) =>
    queryOptions({
      queryKey: ['search', q],
      queryFn: async () => (await api.get<{ hits: SearchHitDto[] }>(`/search?q=${encodeURIComponent(q)}`)).hits,
      staleTime: 30_000,
    }),
};

/** Where a hit opens, for what this person may open: the owner goes to batches and styles, the cutter to lays. */
function hrefOf(hit: SearchHitDto, canPlan: boolean): string {
  switch (hit.kind) {
    case 'bundle':
      return hit.layId ? paths.lay.getHref(hit.layId) : paths.home.getHref();
    case 'batch':
      return canPlan ? paths.batch.getHref(hit.id) : hit.layId ? paths.lay.getHref(hit.layId) : paths.home.getHref();
    case 'style':
      return canPlan ? paths.style.getHref(hit.id) : paths.styleGrading.getHref(hit.id);
    case 'roll':
      return `${paths.fabrics.getHref()}?q=${encodeURIComponent(hit.title)}`;
    case 'person':
      return `${paths.people.getHref()}?q=${encodeURIComponent(hit.title)}`;
  }
}

/** The one search box of the owner and the cutter (bundle number or QR text, style, roll, batch, person). */
export function SearchBox({ onGo }: { onGo: () => void }) {
  const { t } = useTranslation();
  const canPlan = useCan('batches:write');
  const [text, setText] = useState('');
  const [q, setQ] = useState('');
  useEffect(() => {
    const timer = setTimeout(() => setQ(text.trim()), 250);
    return () => clearTimeout(timer);
  }, [text]);
  const hits = useQuery({ ...searchQueries.find(q), enabled: q.length > 0 });
  const go = () => {
    setText('');
    setQ('');
    onGo();
  };
  return (
    <div className="mb-4">
      <form role="search" onSubmit={(e) => e.preventDefault()} className="relative">
        <label htmlFor="app-search" className="sr-only">{t('search.label')}</label>
        <IconSearch className="pointer-events-none absolute left-2.5 top-2.5 text-ink-600" width={16} height={16} />
        <input
          id="app-search"
          type="search"
          className="field-input pl-8"
          placeholder={t('search.placeholder')}
          autoComplete="off"
          value={text}
          onChange={(e) => setText(e.target.value)}
        />
      </form>
      {q && hits.data ? (
        <ul aria-label={t('search.label')} className="mt-2 space-y-1 rounded-lg bg-calico-50 p-2 text-sm text-ink-900">
          {hits.data.length === 0 ? <li className="px-2 py-1 text-ink-600">{t('search.none', { q })}</li> : null}
          {hits.data.map((h) => (
            <li key={`${h.kind}-${h.id}`}>
              <Link to={hrefOf(h, canPlan)} onClick={go} className="block rounded px-2 py-1 hover:bg-calico-100">
                <span className="text-xs text-ink-600">{t(`search.kinds.${h.kind}`)}</span>{' '}
                <b>{h.title}</b> <span className="text-ink-600">{h.detail}</span>
              </Link>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
