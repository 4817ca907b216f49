import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router';
import { DataTable } from '@/components/ui/data-table';
import { IconPlus } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { styleQueries } from '../api/style-queries';
import { styleColumns } from './style-columns';

export function StylesPage() {
  const { data } = useSuspenseQuery(styleQueries.list());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title="Styles"
        subtitle="Each style has a size run and a base size; its pattern is graded from the base."
        actions={<Link className="btn-primary" to={paths.newStyle.getHref()}><IconPlus /> New style</Link>}
      />
      <DataTable data={data} columns={styleColumns} filterPlaceholder="Filter styles…" onRowClick={(s) => navigate(paths.style.getHref(s.id))} />
    </>
  );
}
