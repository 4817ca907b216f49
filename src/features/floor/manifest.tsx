import type { FeatureManifest } from '@/app/feature-manifest';
import { IconChart, IconCoins } from '@/components/ui/icons';
import { lazyComponent, lazyPage } from '@/lib/routing';
import { paths } from '@/config/paths';
import { outboxSignOutWarning } from './lib/outbox';

const FloorHome = lazyComponent(async () => (await import('./components/floor-home')).FloorHome);

/** The floor area's routes, menu entries and panels; each page's code loads when first used. */
export const floorManifest: FeatureManifest = {
  routes: [
    lazyPage(paths.floor.path, 'progress:read', async () => (await import('./components/floor-progress-page')).FloorProgressPage),
    lazyPage(paths.pay.path, 'pay:manage', async () => (await import('./components/pay-page')).PayPage),
  ],
  nav: [
    { to: paths.floor.getHref(), label: 'Floor', labelKey: 'floor', icon: IconChart, permission: 'progress:read' },
    { to: paths.pay.getHref(), label: 'Pay', labelKey: 'pay', icon: IconCoins, permission: 'pay:manage' },
  ],
  homes: { machinist: FloorHome, finisher: FloorHome },
  batchPanels: [{ key: 'floor-progress', Panel: lazyComponent(async () => (await import('./components/batch-progress-panel')).BatchProgressPanel) }],
  beforeSignOut: outboxSignOutWarning,
};
