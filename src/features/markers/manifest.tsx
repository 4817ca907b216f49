import type { FeatureManifest } from '@/app/feature-manifest';

/** The markers area's routes, menu entries and panels. */
export const markersManifest: FeatureManifest = {};
