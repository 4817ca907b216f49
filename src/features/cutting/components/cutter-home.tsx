import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { Badge, Card, PageHeader, Spinner } from '@/components/ui/page';
import { layQueries } from '../api/cutting-queries';
import { CuttingCautions } from './cutting-cautions';
import { metres, ratioLabel } from './cutting-format';
import { paths } from '@/config/paths';
import { useTranslation } from '@/lib/i18n';

/** The cutter's home: today's lays in cutting order, the next one first. */
export function CutterHome({ name }: { name: string }) {
  const { t } = useTranslation();
  const { data: lays, isLoading } = useQuery(layQueries.list());
  if (isLoading || !lays) return <Spinner />;
  const planned = lays.filter((l) => l.status === 'planned');
  const done = lays.filter((l) => l.status === 'cut');
  return (
    <>
      <PageHeader title={t('home.goodDay', { name: name.split(' ')[0] })} subtitle={t('cutter.subtitle')} />
      <Card title={t('cutter.lays')}>
        {planned.length === 0 ? <p className="text-sm text-ink-600">{t('cutter.noLays')}</p> : null}
        <ol className="space-y-2">
          {planned.map((l, i) => (
            <li key={l.id}>
              <Link to={paths.lay.getHref(l.id)} className={`block rounded-lg border p-3 ${i === 0 ? 'border-thread-700 bg-thread-700/5' : 'border-calico-200'}`}>
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <span className="font-semibold text-thread-800">{t('home.lay', { batch: l.batchCode, seq: l.seq })}{l.fabricName ? <span className="font-normal text-ink-600"> · {l.fabricName}</span> : null}</span>
                  {i === 0 ? <Badge tone="teal">{t('cutter.next')}</Badge> : null}
                </div>
                <p className="text-sm">{t('cutter.layLine', { ratio: ratioLabel(l.ratio), plies: t('common.plies', { count: l.plies }), length: metres(l.markerLengthMm) })}</p>
                <p className="text-xs text-ink-600">{t('cutter.rolls', { rolls: l.rolls.map((r) => `${r.label} (${r.shadeLot})`).join(', ') })}</p>
              </Link>
            </li>
          ))}
        </ol>
      </Card>
      {done.length ? (
        <Card title={t('cutter.cut')} className="mt-5">
          <ul className="text-sm">{done.map((l) => <li key={l.id}><Link className="underline" to={paths.lay.getHref(l.id)}>{t('home.lay', { batch: l.batchCode, seq: l.seq })}</Link> · {t('common.bundles', { count: l.bundleCount })}</li>)}</ul>
        </Card>
      ) : null}
      <div className="mt-5"><CuttingCautions /></div>
    </>
  );
}
