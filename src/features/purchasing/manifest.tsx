import type { FeatureManifest } from '@/app/feature-manifest';
import { IconMail, IconTruck } from '@/components/ui/icons';
import { lazyComponent, lazyPage } from '@/lib/routing';
import { paths } from '@/config/paths';

/** The purchasing area's routes, menu entries and panels; each page's code loads when first used. */
export const purchasingManifest: FeatureManifest = {
  routes: [
    lazyPage(paths.purchasing.path, 'suppliers:manage', async () => (await import('./components/purchasing-page')).PurchasingPage),
    lazyPage(paths.outbox.path, 'suppliers:manage', async () => (await import('./components/outbox-page')).OutboxPage),
  ],
  nav: [
    { to: paths.purchasing.getHref(), label: 'Suppliers', labelKey: 'purchasing', icon: IconTruck, permission: 'suppliers:manage' },
    { to: paths.outbox.getHref(), label: 'Outbox', labelKey: 'outbox', icon: IconMail, permission: 'suppliers:manage' },
  ],
  batchPanels: [{ key: 'needs', Panel: lazyComponent(async () => (await import('./components/needs-panel')).NeedsPanel) }],
};
