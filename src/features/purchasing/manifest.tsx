import type { FeatureManifest } from '@/app/feature-manifest';

/** The purchasing area's routes, menu entries and panels. */
export const purchasingManifest: FeatureManifest = {};
