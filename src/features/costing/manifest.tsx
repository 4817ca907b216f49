import type { FeatureManifest } from '@/app/feature-manifest';
import { IconCoins } from '@/components/ui/icons';
import { lazyComponent, lazyPage } from '@/lib/routing';

/** The costing area's routes, menu entries and panels; each page's code loads when first used. */
export const costingManifest: FeatureManifest = {
  routes: [
    lazyPage('/costing', 'costs:read', async () => (await import('./components/costing-index-page')).CostingIndexPage),
    lazyPage('/batches/:id/costing', 'costs:read', async () => (await import('./components/costing-page')).CostingPage),
  ],
  nav: [{ to: '/costing', label: 'Costing', icon: IconCoins, permission: 'costs:read' }],
  batchPanels: [{ key: 'costing', Panel: lazyComponent(async () => (await import('./components/costing-panel')).CostingPanel) }],
};
