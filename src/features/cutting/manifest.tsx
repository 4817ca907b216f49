import type { FeatureManifest } from '@/app/feature-manifest';

/** The cutting area's routes, menu entries and panels. */
export const cuttingManifest: FeatureManifest = {};
