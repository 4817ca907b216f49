import type { RouteObject } from 'react-router';
import type { NavItem } from '@/components/layouts/app-shell';
import { costingManifest } from '@/features/costing/manifest';
import { cuttingManifest } from '@/features/cutting/manifest';
import { floorManifest } from '@/features/floor/manifest';
import { gradingManifest } from '@/features/grading/manifest';
import { lineManifest } from '@/features/line/manifest';
import { markersManifest } from '@/features/markers/manifest';
import { purchasingManifest } from '@/features/purchasing/manifest';
import type { FeatureManifest } from './feature-manifest';

/** Feature areas in menu order. */
const MANIFESTS: FeatureManifest[] = [
  gradingManifest,
  markersManifest,
  cuttingManifest,
  lineManifest,
  floorManifest,
  costingManifest,
  purchasingManifest,
];

export const EXTRA_ROUTES: RouteObject[] = MANIFESTS.flatMap((m) => m.routes ?? []);
export const EXTRA_NAV: NavItem[] = MANIFESTS.flatMap((m) => m.nav ?? []);
export const EXTRA_HOMES = Object.assign({}, ...MANIFESTS.map((m) => m.homes ?? {}));
export const BATCH_PANELS = MANIFESTS.flatMap((m) => m.batchPanels ?? []);
export const SIGN_OUT_CHECKS = MANIFESTS.flatMap((m) => (m.beforeSignOut ? [m.beforeSignOut] : []));
