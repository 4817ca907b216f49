import type { FeatureManifest } from '@/app/feature-manifest';
import { IconNeedle } from '@/components/ui/icons';
import { useCan } from '@/lib/auth';
import { lazyComponent, lazyPage } from '@/lib/routing';
import type { BatchDto } from '@shared/schemas/batches';
import { paths } from '@/config/paths';

const LinePlanPanel = lazyComponent(async () => (await import('./components/line-plan-panel')).LinePlanPanel);

function BatchLinePanel({ batch }: { batch: BatchDto }) {
  return useCan('line:plan') ? <LinePlanPanel batch={batch} /> : null;
}

/** The line area's routes, menu entries and panels; the page and its charts load when first used. */
export const lineManifest: FeatureManifest = {
  routes: [lazyPage(paths.line.path, 'line:plan', async () => (await import('./components/line-page')).LinePage)],
  nav: [{ to: paths.line.getHref(), label: 'Line plan', labelKey: 'line', icon: IconNeedle, permission: 'line:plan' }],
  batchPanels: [{ key: 'line-plan', Panel: BatchLinePanel }],
};
