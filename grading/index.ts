// Public API of the grading core: size charts, designation and size mix, pattern pieces and blocks, grade rules.
export { POINTS_OF_MEASURE, computeGrades, isPointOfMeasure, measurementsForSize, sizeIndex } from './size-charts/size-chart';
export type { PointOfMeasure, SizeChart, SizeGrades } from './size-charts/size-chart';
export { parseSizeChartTable, sizeChartToRows } from './size-charts/size-chart-table';
export type { ParseSizeChartResult, TableError } from './size-charts/size-chart-table';
export { buildSpecSheet } from './size-charts/spec-sheet';
export type { EaseSpec, SpecSheetRow } from './size-charts/spec-sheet';
export { EN13402_BUST_LIMITS_CM, EN13402_BUST_NOMINAL_CM, designateByBust, en13402BustIntervals } from './size-charts/en13402';
export type { BustDesignation } from './size-charts/en13402';
export { sizeMix } from './size-charts/size-mix';
export type { SizeInterval, SizeMixResult } from './size-charts/size-mix';
export { DEMO_SIZE_RUN, demoSizeChart } from './size-charts/demo-size-chart';

export { OutlineBuilder, edgePoints, segmentAllowances } from './pieces/piece';
export type { CutInstruction, EdgeOptions, InternalLine, Piece, PieceEdge } from './pieces/piece';
export { MITRE_LIMIT, cuttingOutline, distanceToRing, validateCuttingOutline } from './pieces/cutting-outline';
export type { CuttingOutlineIssue } from './pieces/cutting-outline';
export { edgeLength, measurePiece } from './pieces/piece-measure';
export type { PieceMeasurements } from './pieces/piece-measure';

export type { BodyMeasurements } from './blocks/measure-input';
export {
  BACK_NECK_DEPTH_MM, CHEST_LINE_ABOVE_BUST_POINT_MM, DART_SHORT_OF_BUST_POINT_MM, SHOULDER_DROP_MM,
  draftBodiceBack, draftBodiceFront,
} from './blocks/bodice-block';
export type { BodiceOptions } from './blocks/bodice-block';
export { draftSkirt } from './blocks/skirt-block';
export type { SkirtOptions } from './blocks/skirt-block';
export { draftSleeve, sleeveCapLength, solveBicepForCap } from './blocks/sleeve-block';
export type { SleeveOptions } from './blocks/sleeve-block';
export { circleSkirtRadius, draftCircleSkirt, flounceFullness } from './blocks/circle-skirt-block';
export type { CircleFraction, CircleSkirtInput } from './blocks/circle-skirt-block';
export { draftFacing } from './blocks/facing-block';
export type { FacingOptions } from './blocks/facing-block';
export { draftRectangle } from './blocks/rectangle-block';
export type { RectangleInput } from './blocks/rectangle-block';
export { SHIRT_DRESS_STYLE, draftShirtDress } from './blocks/shirt-dress';
export { piecesPerGarment, polylineSplitAt, unfoldPiece } from './blocks/drafted-piece';
export type { DraftedPiece, PieceMaterial } from './blocks/drafted-piece';
export {
  ARMHOLE_NOTCH_BACK_MM, ARMHOLE_NOTCH_FRONT_MM, FITTED_CHEST_LINE_MM, FITTED_DART_SHORT_MM, ROUND_NECK_START_MM,
  SHOULDER_PAD_EXTRA_WIDTH_MM, V_NECK_DEPTH_MM, ZIP_ALLOWANCE_MM, draftFittedBodiceBack, draftFittedBodiceFront,
} from './blocks/fitted-bodice-block';
export type { FittedBodiceOptions, FrontNeckline } from './blocks/fitted-bodice-block';
export { HEM_CIRCLE_MM, draftCircleRing } from './blocks/circle-ring-block';
export type { CircleRingInput, RingCut } from './blocks/circle-ring-block';
export { HEM_STRAIGHT_SKIRT_MM, draftSkirtShape } from './blocks/skirt-shapes-block';
export type { SkirtShape, SkirtShapeOptions } from './blocks/skirt-shapes-block';
export { MIN_BICEP_EASE_MM, draftSetInSleeve, solveHalfBicep } from './blocks/set-in-sleeve-block';
export type { SetInSleeveOptions, SleeveLength } from './blocks/set-in-sleeve-block';
export { FACING_WIDTH_MM, draftBodiceFacings, draftPeplum, draftWaistband } from './blocks/trim-pieces-block';
export type { FacingKind, PeplumOptions, WaistbandOptions } from './blocks/trim-pieces-block';
export { BLOCK_NAMES, draftBlocks, openOutPieces } from './blocks/draft-blocks';
export type { BlockSpec } from './blocks/draft-blocks';
export { draftStyle } from './blocks/draft-style';
export type { StyleDraftSpec } from './blocks/draft-style';

export { cumulativeMove, displacementFor } from './grade-rules/grade-rule';
export type { GradeMove, GradeRule, GradeTarget } from './grade-rules/grade-rule';
export { proposeGradeRules } from './grade-rules/propose-grade-rules';
export { proposeRulesFromRedraft } from './grade-rules/propose-from-redraft';
export type { RedraftStyle } from './grade-rules/propose-from-redraft';
export { gradePiece, ungradePiece } from './grade-rules/grade-piece';
export type { GradeIssue, GradedPiece } from './grade-rules/grade-piece';
export { checkSeams } from './grade-rules/seam-check';
export { SEAM_TOLERANCE_MM, proposeSeams, seamProblem } from './grade-rules/propose-seams';
export type { SeamCheck, SeamSide, SeamSpec } from './grade-rules/seam-check';
export { SHIRT_DRESS_SEAMS, gradeStyle } from './grade-rules/grade-style';
export type { GradedStyle } from './grade-rules/grade-style';

// Tracing a piece from a photo of a calibration sheet.
export * from './trace/index';
