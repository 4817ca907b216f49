import type { FeatureManifest } from '@/app/feature-manifest';
import { IconNeedle } from '@/components/ui/icons';
import { useCan } from '@/lib/auth';
import { lazyComponent, lazyPage } from '@/lib/routing';
import type { BatchDto } from '@shared/schemas/batches';

/** Paths of the line area. */
export const linePaths = { plan: { path: '/line', getHref: (batchId?: number) => (batchId ? `/line?batch=${batchId}` : '/line') } } as const;

const LinePlanPanel = lazyComponent(async () => (await import('./components/line-plan-panel')).LinePlanPanel);

function BatchLinePanel({ batch }: { batch: BatchDto }) {
  return useCan('line:plan') ? <LinePlanPanel batch={batch} /> : null;
}

/** The line area's routes, menu entries and panels; the page and its charts load when first used. */
export const lineManifest: FeatureManifest = {
  routes: [lazyPage(linePaths.plan.path, 'line:plan', async () => (await import('./components/line-page')).LinePage)],
  nav: [{ to: linePaths.plan.getHref(), label: 'Line plan', icon: IconNeedle, permission: 'line:plan' }],
  batchPanels: [{ key: 'line-plan', Panel: BatchLinePanel }],
};
