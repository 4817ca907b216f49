import { useQuery } from '@tanstack/react-query';
import { Navigate } from 'react-router';
import { Spinner } from '@/components/ui/page';
import { styleQueries } from '@/lib/queries';
import { GradingIndexPage } from './grading-page';
import { paths } from '@/config/paths';


/** With one style, go straight to its grading; otherwise list the styles to pick from. */
export function GradingIndexRoute() {
  const { data } = useQuery(styleQueries.list());
  if (!data) return <Spinner />;
  if (data.length === 1) return <Navigate to={paths.styleGrading.getHref(data[0].id)} replace />;
  return <GradingIndexPage styles={data} />;
}
