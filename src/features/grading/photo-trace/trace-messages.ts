import type { CalibrationKind, CalibrationPaper } from '@shared/calibration/calibration-sheet';
import type { Point } from '@shared/geometry/types';

/** Page → trace worker. */
export interface TraceRequest {
  bitmap: ImageBitmap;
  kind: CalibrationKind;
  paper: CalibrationPaper;
  toleranceMm: number;
}

/** Trace worker → page: the outline in mm on the sheet (y down) and the top-down view it was traced on. */
export type TraceResponse =
  | {
      ok: true;
      outline: Point[];
      toleranceMm: number;
      markResidualMm: number;
      pxPerMm: number;
      view: { width: number; height: number; data: Uint8ClampedArray };
      viewOrigin: Point;
    }
  | { ok: false; code: 'marks_not_found' | 'no_piece' | 'piece_touches_edge' | 'failed'; message: string };
