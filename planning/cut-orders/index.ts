export * from './cut-order.types';
export * from './spreading-constants';
export { planCutOrder } from './plan-cut-order';
export { solveCutOrder, DEFAULT_CUT_TIME_LIMIT_SECONDS, type MipSolver } from './solve-cut-order';
export { allocateRolls } from './allocate-rolls';
export type { FabricRoll, LayToSpread, RollAllocationInput, RollSegment, RollUse, RollAllocation } from './allocate-rolls';
export { countRatios } from './ratio-candidates';
export { shrinkageFactor, compensateForShrinkage, shrinkageAreaFactor, NO_SHRINKAGE, type Shrinkage } from './shrinkage';
export { prepareMarkerPieces, mirrorAcrossGrain, type MarkerSourcePiece, type MarkerFabric, type MarkerPieceLabel, type PreparedMarkerPieces } from './marker-pieces';
