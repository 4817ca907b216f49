import type { FeatureManifest } from '@/app/feature-manifest';

/** The floor area's routes, menu entries and panels. */
export const floorManifest: FeatureManifest = {};
