import { useQuery } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router';
import { Card, PageHeader, Spinner } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { styleQueries } from '../api/style-queries';
import { StyleBlocksCard } from './style-blocks-card';
import { StyleFilesCard } from './style-files-card';
import { StyleForm } from './style-form';
import { StyleSeamsCard } from './style-seams-card';

export function NewStylePage() {
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="New style" />
      <Card><StyleForm onSaved={(s) => navigate(paths.style.getHref(s.id))} /></Card>
    </>
  );
}

export function StyleDetailPage() {
  const id = Number(useParams().id);
  const { data: style, isLoading } = useQuery(styleQueries.detail(id));
  if (isLoading || !style) return <Spinner />;
  return (
    <>
      <PageHeader title={`${style.code} · ${style.name}`} subtitle={`Size run ${style.sizeRun.join(', ')} · base ${style.baseSize}`} />
      <Card title="Style details"><StyleForm style={style} onSaved={() => undefined} /></Card>
      <div className="mt-4"><Card title="Blocks and materials"><StyleBlocksCard key={style.updatedAt} style={style} /></Card></div>
      <div className="mt-4"><Card title="Seams"><StyleSeamsCard style={style} /></Card></div>
      <div className="mt-4"><StyleFilesCard styleId={style.id} /></div>
    </>
  );
}
