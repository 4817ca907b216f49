import { useQuery } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router';
import { Card, PageHeader, Spinner } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';
import { styleQueries } from '../api/style-queries';
import { StyleBlocksCard } from './style-blocks-card';
import { StyleFilesCard } from './style-files-card';
import { StyleForm } from './style-form';
import { StyleSeamsCard } from './style-seams-card';

export function NewStylePage() {
  const { t } = useTranslation();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title={t(`${area}.newStyle`)} />
      <Card><StyleForm onSaved={(s) => navigate(paths.style.getHref(s.id))} /></Card>
    </>
  );
}

export function StyleDetailPage() {
  const { t } = useTranslation();
  const id = Number(useParams().id);
  const { data: style, isLoading } = useQuery(styleQueries.detail(id));
  if (isLoading || !style) return <Spinner />;
  return (
    <>
      <PageHeader title={`${style.code} · ${style.name}`} subtitle={t(`${area}.subtitle`, { sizes: style.sizeRun.join(', '), base: style.baseSize })} />
      <Card title={t(`${area}.details`)}><StyleForm style={style} onSaved={() => undefined} /></Card>
      <div className="mt-4"><Card title={t(`${area}.blocksTitle`)}><StyleBlocksCard key={style.updatedAt} style={style} /></Card></div>
      <div className="mt-4"><Card title={t(`${area}.seamsTitle`)}><StyleSeamsCard style={style} /></Card></div>
      <div className="mt-4"><StyleFilesCard styleId={style.id} /></div>
    </>
  );
}
