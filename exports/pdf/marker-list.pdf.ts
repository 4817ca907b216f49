/**
 * The cutter's marker list per roll as a PDF: the lays table, then per lay the rolls to spread, then the
 * cutting-room cautions.
 */
import type { MarkerListInput } from '../types';
import { BOLD_FONT } from './pdf-fonts';
import { CUTTING_ROOM_CAUTIONS } from './cutting-cautions';
import {
  formatLongLength,
  formatRatio,
  formatShortLength,
  spreadingModeLabel,
} from './document-format';
import { drawCautions, drawHeading, drawTable, startPdf, type PdfOptions } from './pdf-layout';
import { drawRollTable } from './roll-table';

/** Document title of the marker list. */
export const MARKER_LIST_TITLE = 'Marker list per roll';

/**
 * Builds the marker list PDF (A4): heading with studio, date, style, batch and fabric; a lays table (lay no.,
 * size ratio, marker length, plies, spreading mode, end allowance each end); one rolls table per lay (roll,
 * shade lot, length, plies to spread, expected remnant); the cautions (input's or `CUTTING_ROOM_CAUTIONS`).
 * Lengths in m/cm or yd/in per the unit system. Pages follow the content; an input with no lays still
 * gives one page with the heading and cautions.
 */
export async function buildMarkerListPdf(
  input: MarkerListInput,
  options: PdfOptions = {},
): Promise<Buffer> {
  const { doc, bytes } = startPdf(input, MARKER_LIST_TITLE, options);
  const u = input.unitSystem;
  drawHeading(doc, MARKER_LIST_TITLE, input, [
    ['Style', `${input.style.code} — ${input.style.name}`],
    ['Batch', input.batch.code],
    ['Fabric', `${input.fabric.description}, width ${formatShortLength(input.fabric.widthMm, u, input.language, input.locale)}`],
  ]);
  drawTable(
    doc,
    [
      { header: 'Lay no.', width: 45 },
      { header: 'Size ratio', width: 120 },
      { header: 'Marker length', width: 80 },
      { header: 'Plies', width: 40 },
      { header: 'Spreading mode', width: 115 },
      { header: 'End allowance (each end)', width: 115 },
    ],
    input.lays.map((lay) => [
      String(lay.layNo),
      formatRatio(lay.ratio),
      formatLongLength(lay.markerLengthMm, u, input.language, input.locale),
      String(lay.plies),
      spreadingModeLabel(lay.spreadingMode),
      formatShortLength(lay.endAllowanceMm, u, input.language, input.locale),
    ]),
  );
  for (const lay of input.lays) {
    doc.font(BOLD_FONT).fontSize(10).text(`Lay ${lay.layNo}: rolls`);
    doc.moveDown(0.3);
    drawRollTable(doc, lay.rolls, u, input);
  }
  drawCautions(doc, input.cautions ?? CUTTING_ROOM_CAUTIONS);
  doc.end();
  return bytes;
}
