import type { FeatureManifest } from '@/app/feature-manifest';
import { IconChart, IconCoins } from '@/components/ui/icons';
import { lazyComponent, lazyPage } from '@/lib/routing';

const FloorHome = lazyComponent(async () => (await import('./components/floor-home')).FloorHome);

/** The floor area's routes, menu entries and panels; each page's code loads when first used. */
export const floorManifest: FeatureManifest = {
  routes: [
    lazyPage('/floor', 'progress:read', async () => (await import('./components/floor-progress-page')).FloorProgressPage),
    lazyPage('/pay', 'pay:manage', async () => (await import('./components/pay-page')).PayPage),
  ],
  nav: [
    { to: '/floor', label: 'Floor', icon: IconChart, permission: 'progress:read' },
    { to: '/pay', label: 'Pay', icon: IconCoins, permission: 'pay:manage' },
  ],
  homes: { machinist: FloorHome, finisher: FloorHome },
  batchPanels: [{ key: 'floor-progress', Panel: lazyComponent(async () => (await import('./components/batch-progress-panel')).BatchProgressPanel) }],
};
