// Tracing a paper pattern piece from a photo of a calibration sheet: the pure geometry and colour steps.
// The OpenCV steps (marks, rectifying, contours) live with the client's worker, which hands the cv module in.
export { homographyApply, homographyFromPoints, homographyInvert, homographyMultiply } from './homography';
export type { Homography } from './homography';
export { TRACE_SIMPLIFY_TOLERANCE_MM, ringSimplify } from './ring-simplify';
export { outlineError } from './outline-error';
export type { OutlineError } from './outline-error';
export { quadRefineCorners } from './quad-fit';
export { TraceError, pieceLikelihood, ringRefineToLevel } from './piece-mask';
export type { FloatImage, PieceLikelihood, PixelRect, RgbaImage, TraceFailure } from './piece-mask';
