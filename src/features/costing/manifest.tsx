import type { FeatureManifest } from '@/app/feature-manifest';

/** The costing area's routes, menu entries and panels. */
export const costingManifest: FeatureManifest = {};
