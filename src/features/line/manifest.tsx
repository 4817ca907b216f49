import type { FeatureManifest } from '@/app/feature-manifest';

/** The line area's routes, menu entries and panels. */
export const lineManifest: FeatureManifest = {};
