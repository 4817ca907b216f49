import type { FeatureManifest } from '@/app/feature-manifest';

/** The grading area's routes, menu entries and panels. */
export const gradingManifest: FeatureManifest = {};
