import type { RouteObject } from 'react-router';

/** Routes of the later areas (grading, markers, cutting, floor, costing), composed here. */
export const EXTRA_ROUTES: RouteObject[] = [];
