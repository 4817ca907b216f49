import { useQuery } from '@tanstack/react-query';
import { Navigate } from 'react-router';
import type { StyleDto } from '@shared/schemas/styles';
import { Spinner } from '@/components/ui/page';
import { api } from '@/lib/api-client';
import { GradingIndexPage } from './grading-page';
import { paths } from '@/config/paths';

const styleListQuery = { queryKey: ['styles', 'list'] as const, queryFn: async () => (await api.get<{ styles: StyleDto[] }>('/styles')).styles };

/** With one style, go straight to its grading; otherwise list the styles to pick from. */
export function GradingIndexRoute() {
  const { data } = useQuery(styleListQuery);
  if (!data) return <Spinner />;
  if (data.length === 1) return <Navigate to={paths.styleGrading.getHref(data[0].id)} replace />;
  return <GradingIndexPage styles={data} />;
}
