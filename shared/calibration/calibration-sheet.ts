/**
 * The calibration sheets Seamrun prints for tracing a paper pattern from a phone photo, as plain geometry
 * shared by the PDF builder (exports/) and the tracer (grading/trace, run in a browser worker).
 *
 * Coordinates are millimetres on the printed sheet, origin at its top-left corner, x to the right, y DOWN
 * (as printed and as photographed). Each sheet carries four corner marks of our own design ("ring marks"):
 * a black square with a white square hole; inside the hole, one black dot, or two side by side on the
 * origin mark (top left), which tells the tracer which way up the sheet lies. The tracer uses the corners of
 * the square half-way between the outer edge and the hole (`midMm`): a blurred, thresholded photo moves the
 * outer edge and the hole's edge in opposite directions, so their mean stays put.
 *
 * Kinds:
 * - `sheet`: one page (A4 or Letter); the piece lies on the tinted field in the middle.
 * - `border`: a frame of {@link BORDER_OUTER_MM} laid on the table around a piece larger than a page; the
 *   piece lies on the table inside the frame's opening. Printed whole on a plotter, or tiled onto pages
 *   that are trimmed and taped mark to mark.
 */

/** Paper sizes in mm (ISO 216 A4; US Letter 8 1/2 × 11 in). */
export const CALIBRATION_PAPER_MM = { A4: { w: 210, h: 297 }, Letter: { w: 215.9, h: 279.4 } } as const;
export type CalibrationPaper = keyof typeof CALIBRATION_PAPER_MM;
export type CalibrationKind = 'sheet' | 'border';

/** Outer size of the border frame (mm) and the width of its printed band. */
export const BORDER_OUTER_MM = { w: 900, h: 640 } as const;
export const BORDER_BAND_MM = 50;

/** Length of the printed scale-check bar (mm). */
export const SCALE_BAR_MM = 100;

/** Tint of the sheet's field: a mid blue that white, cream and brown pattern papers all stand out from. */
export const FIELD_RGB = [96, 140, 208] as const;

/** An axis-aligned rectangle on the sheet (mm, y down). */
export interface SheetRect {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** One corner mark: its centre, sizes and whether it is the origin (two dots) mark. */
export interface RingMark {
  /** Which corner: 0 top left (origin), 1 top right, 2 bottom right, 3 bottom left (clockwise as printed). */
  corner: 0 | 1 | 2 | 3;
  cx: number;
  cy: number;
  /** Side of the black square, of its hole, and of the square half-way between (mm). */
  outerMm: number;
  holeMm: number;
  midMm: number;
  /** Dots in the hole: side of each (mm) and their centres. */
  dotMm: number;
  dots: { x: number; y: number }[];
}

/** Everything the printer draws and the tracer needs. */
export interface CalibrationLayout {
  kind: CalibrationKind;
  /** Size of the whole sheet or frame (mm). */
  width: number;
  height: number;
  marks: RingMark[];
  /** Where the piece lies: the tinted field (sheet) or the opening (border). */
  field: SheetRect;
  /** Plain white printed paper the tracer samples to even out the light (text and marks are skipped). */
  white: SheetRect[];
  /** The printed scale-check bar: from (x, y) to (x + SCALE_BAR_MM, y). */
  scaleBar: { x: number; y: number };
  /** Keep the piece this far inside the field's edge (mm): the tracer samples the background there. */
  clearanceMm: number;
}

function ringMarks(width: number, height: number, inset: number, outer: number): RingMark[] {
  const hole = outer * (8 / 14);
  const centres: [number, number][] = [[inset, inset], [width - inset, inset], [width - inset, height - inset], [inset, height - inset]];
  return centres.map(([cx, cy], corner) => {
    const isOrigin = corner === 0;
    const dot = isOrigin ? hole * 0.3 : hole * 0.44;
    const dots = isOrigin ? [{ x: cx - hole * 0.22, y: cy }, { x: cx + hole * 0.22, y: cy }] : [{ x: cx, y: cy }];
    return { corner: corner as 0 | 1 | 2 | 3, cx, cy, outerMm: outer, holeMm: hole, midMm: (outer + hole) / 2, dotMm: dot, dots };
  });
}

/**
 * The layout of a calibration sheet. `sheet` depends on the paper; `border` is one size whatever the paper
 * it is tiled onto. Deterministic: same arguments, same layout.
 */
export function calibrationLayout(kind: CalibrationKind, paper: CalibrationPaper = 'A4'): CalibrationLayout {
  if (kind === 'sheet') {
    const { w, h } = CALIBRATION_PAPER_MM[paper];
    const margin = 8, outer = 14, band = 26;
    const marks = ringMarks(w, h, margin + outer / 2, outer);
    return {
      kind, width: w, height: h, marks,
      field: { x: margin, y: band, w: w - 2 * margin, h: h - 2 * band },
      white: [
        { x: margin + outer + 2, y: margin, w: w - 2 * (margin + outer + 2), h: band - margin - 1 },
        { x: margin + outer + 2, y: h - band + 1, w: w - 2 * (margin + outer + 2), h: band - margin - 1 },
        { x: 2, y: band + 1, w: margin - 3, h: h - 2 * band - 2 },
        { x: w - margin + 1, y: band + 1, w: margin - 3, h: h - 2 * band - 2 },
      ],
      scaleBar: { x: (w - SCALE_BAR_MM) / 2, y: margin + 13 },
      clearanceMm: 5,
    };
  }
  const { w, h } = BORDER_OUTER_MM;
  const band = BORDER_BAND_MM, outer = 34;
  const marks = ringMarks(w, h, band / 2, outer);
  const inner = band / 2 + outer / 2 + 3;
  return {
    kind, width: w, height: h, marks,
    field: { x: band, y: band, w: w - 2 * band, h: h - 2 * band },
    white: [
      { x: inner, y: 4, w: w - 2 * inner, h: band - 8 },
      { x: inner, y: h - band + 4, w: w - 2 * inner, h: band - 8 },
      { x: 4, y: inner, w: band - 8, h: h - 2 * inner },
      { x: w - band + 4, y: inner, w: band - 8, h: h - 2 * inner },
    ],
    scaleBar: { x: band + 20, y: band / 2 },
    clearanceMm: 10,
  };
}
