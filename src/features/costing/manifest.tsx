import type { FeatureManifest } from '@/app/feature-manifest';
import { IconTag } from '@/components/ui/icons';
import { lazyComponent, lazyPage } from '@/lib/routing';
import { paths } from '@/config/paths';

/** The costing area's routes, menu entries and panels; each page's code loads when first used. */
export const costingManifest: FeatureManifest = {
  routes: [
    lazyPage(paths.costing.path, 'costs:read', async () => (await import('./components/costing-index-page')).CostingIndexPage),
    lazyPage(paths.batchCosting.path, 'costs:read', async () => (await import('./components/costing-page')).CostingPage),
  ],
  nav: [{ to: paths.costing.getHref(), label: 'Costing', labelKey: 'costing', icon: IconTag, permission: 'costs:read' }],
  batchPanels: [{ key: 'costing', Panel: lazyComponent(async () => (await import('./components/costing-panel')).CostingPanel) }],
};
