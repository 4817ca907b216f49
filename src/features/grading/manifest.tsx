import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Navigate } from 'react-router';
import type { Permission } from '@shared/auth/permissions';
import type { StyleDto } from '@shared/schemas/styles';
import type { FeatureManifest } from '@/app/feature-manifest';
import { IconDress } from '@/components/ui/icons';
import { Spinner } from '@/components/ui/page';
import { api } from '@/lib/api-client';
import { useCan, useMe } from '@/lib/auth';
import { GradingIndexPage, GradingPage } from './components/grading-page';

/** Paths of the grading area. */
export const gradingPaths = {
  index: { path: '/grading', getHref: () => '/grading' },
  style: { path: '/styles/:id/grading', getHref: (styleId: number) => `/styles/${styleId}/grading` },
} as const;

function Allow({ permission, children }: { permission: Permission; children: ReactNode }) {
  const me = useMe();
  const ok = useCan(permission);
  if (me.isLoading) return <Spinner />;
  return ok ? <>{children}</> : <Navigate to="/" replace />;
}

const styleListQuery = { queryKey: ['styles', 'list'] as const, queryFn: async () => (await api.get<{ styles: StyleDto[] }>('/styles')).styles };

function GradingIndexRoute() {
  const { data } = useQuery(styleListQuery);
  if (!data) return <Spinner />;
  if (data.length === 1) return <Navigate to={gradingPaths.style.getHref(data[0].id)} replace />;
  return <GradingIndexPage styles={data} />;
}

/** The grading area's routes, menu entries and panels. */
export const gradingManifest: FeatureManifest = {
  routes: [
    { path: gradingPaths.index.path, element: <Allow permission="grading:write"><GradingIndexRoute /></Allow> },
    { path: gradingPaths.style.path, element: <Allow permission="grading:read"><GradingPage /></Allow> },
  ],
  nav: [{ to: gradingPaths.index.getHref(), label: 'Pattern & grading', icon: IconDress, permission: 'grading:write' }],
};
