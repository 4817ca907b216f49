import type { FeatureManifest } from '@/app/feature-manifest';
import { IconScissors } from '@/components/ui/icons';
import { lazyComponent, lazyPage } from '@/lib/routing';
import { paths } from '@/config/paths';

/** The cutting area: fabric and rolls, the batch's cut plan, the cutter's home and lay pages. */
export const cuttingManifest: FeatureManifest = {
  routes: [
    lazyPage(paths.fabrics.path, 'fabric:read', async () => (await import('./components/fabrics-page')).FabricsPage),
    lazyPage(paths.lay.path, 'cutting:work', async () => (await import('./components/lay-page')).LayPage),
  ],
  nav: [{ to: paths.fabrics.getHref(), label: 'Fabric', labelKey: 'fabrics', icon: IconScissors, permission: 'fabric:read' }],
  homes: { cutter: lazyComponent(async () => (await import('./components/cutter-home')).CutterHome) },
  batchPanels: [{ key: 'cut-plan', Panel: lazyComponent(async () => (await import('./components/cut-plan-panel')).CutPlanPanel) }],
};
