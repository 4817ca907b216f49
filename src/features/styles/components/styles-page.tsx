import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router';
import { DataTable } from '@/components/ui/data-table';
import { IconPlus } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { useTranslation } from '@/lib/i18n';
import { styleQueries } from '../api/style-queries';
import { styleColumns } from './style-columns';

export function StylesPage() {
  const { t } = useTranslation();
  const { data } = useSuspenseQuery(styleQueries.list());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title={t('lists.styles')}
        subtitle={t('lists.stylesSubtitle')}
        actions={<Link className="btn-primary" to={paths.newStyle.getHref()}><IconPlus /> {t('lists.newStyle')}</Link>}
      />
      <DataTable data={data} columns={styleColumns} filterPlaceholder={t('lists.filterStyles')} onRowClick={(s) => navigate(paths.style.getHref(s.id))} />
    </>
  );
}
