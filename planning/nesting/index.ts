export * from './types';
export { nestPieces } from './nest-pieces';
export { checkLayout, type LayoutCheck, type LayoutCheckOptions } from './checker';
export { SIMPLIFY_MIN_VERTICES, SIMPLIFY_TOLERANCE_MM, SIMPLIFY_TOLERANCE_RELATIVE, defaultSimplifyTolerance } from './simplify-outline';
export { markerBoardBuffer, markerItemCount, sharedMarkerBoard } from './marker-board';
