import type { FeatureManifest } from '@/app/feature-manifest';
import { IconMarker } from '@/components/ui/icons';
import { lazyPage } from '@/lib/routing';
import { paths } from '@/config/paths';

/** The markers area: build a marker for a batch's size ratio and watch it shorten. */
export const markersManifest: FeatureManifest = {
  routes: [lazyPage(paths.markers.path, 'markers:write', async () => (await import('./components/markers-page')).MarkersPage)],
  nav: [{ to: paths.markers.getHref(), label: 'Markers', labelKey: 'markers', icon: IconMarker, permission: 'markers:write' }],
};
