import type { FeatureManifest } from '@/app/feature-manifest';
import { IconMarker } from '@/components/ui/icons';
import { lazyPage } from '@/lib/routing';

/** The markers area: build a marker for a batch's size ratio and watch it shorten. */
export const markersManifest: FeatureManifest = {
  routes: [lazyPage('/markers', 'markers:write', async () => (await import('./components/markers-page')).MarkersPage)],
  nav: [{ to: '/markers', label: 'Markers', icon: IconMarker, permission: 'markers:write' }],
};
