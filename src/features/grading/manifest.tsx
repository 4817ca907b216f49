import type { FeatureManifest } from '@/app/feature-manifest';
import { IconPattern } from '@/components/ui/icons';
import { lazyPage } from '@/lib/routing';
import { paths } from '@/config/paths';

/** The grading area's routes, menu entries and panels; each page's code loads when first used. */
export const gradingManifest: FeatureManifest = {
  routes: [
    lazyPage(paths.grading.path, 'grading:write', async () => (await import('./components/grading-index-route')).GradingIndexRoute),
    lazyPage(paths.styleGrading.path, 'grading:read', async () => (await import('./components/grading-page')).GradingPage),
  ],
  nav: [{ to: paths.grading.getHref(), label: 'Pattern & grading', labelKey: 'grading', icon: IconPattern, permission: 'grading:write' }],
};
