/**
 * The cutter's marker list per roll as a PDF: the lays table, then per lay the rolls to spread, then the
 * cutting-room cautions.
 */
import type { MarkerListInput } from '../types';
import { BOLD_FONT } from './pdf-fonts';
import { cuttingRoomCautions } from './cutting-cautions';
import { documentWords } from '../document-words';
import {
  formatLongLength,
  formatRatio,
  formatShortLength,
  spreadingModeLabel,
} from './document-format';
import { drawCautions, drawHeading, drawTable, startPdf, type PdfOptions } from './pdf-layout';
import { drawRollTable } from './roll-table';
import { drawRollSections } from './roll-sections';

/** Document title of the marker list. */
export const MARKER_LIST_TITLE = 'Marker list per roll';

/**
 * Builds the marker list PDF (A4): heading with studio, date, style, batch and fabric; a lays table (lay no.,
 * size ratio, marker length, plies, spreading mode, end allowance each end); with `byRoll`, one section per
 * roll in cutting order (its lays, plies, length left after each, expected remnant), else one rolls table per
 * lay (roll, shade lot, length, plies to spread, expected remnant); the cautions (input's or `CUTTING_ROOM_CAUTIONS`).
 * Lengths in m/cm or yd/in per the unit system. Pages follow the content; an input with no lays still
 * gives one page with the heading and cautions.
 */
export async function buildMarkerListPdf(
  input: MarkerListInput,
  options: PdfOptions = {},
): Promise<Buffer> {
  const t = documentWords(input.language);
  const title = input.language && input.language !== 'en' ? t('markerList') : MARKER_LIST_TITLE;
  const { doc, bytes } = startPdf(input, title, options);
  const u = input.unitSystem;
  drawHeading(doc, title, input, [
    [t('style'), `${input.style.code} — ${input.style.name}`],
    [t('batch'), input.batch.code],
    [t('fabric'), t('fabricWidth', { fabric: input.fabric.description, width: formatShortLength(input.fabric.widthMm, u, input.language, input.locale) })],
  ]);
  drawTable(
    doc,
    [
      { header: t('layNo'), width: 45 },
      { header: t('sizeRatio'), width: 120 },
      { header: t('markerLength'), width: 80 },
      { header: t('plies'), width: 40 },
      { header: t('spreadingMode'), width: 115 },
      { header: t('endAllowance'), width: 115 },
    ],
    input.lays.map((lay) => [
      String(lay.layNo),
      formatRatio(lay.ratio),
      formatLongLength(lay.markerLengthMm, u, input.language, input.locale),
      String(lay.plies),
      t(`spreading.${lay.spreadingMode}`, { defaultValue: spreadingModeLabel(lay.spreadingMode) }),
      formatShortLength(lay.endAllowanceMm, u, input.language, input.locale),
    ]),
  );
  if (input.byRoll) drawRollSections(doc, input.byRoll, u, input);
  else {
    for (const lay of input.lays) {
      doc.font(BOLD_FONT).fontSize(10).text(t('layRolls', { lay: lay.layNo }));
      doc.moveDown(0.3);
      drawRollTable(doc, lay.rolls, u, input);
    }
  }
  drawCautions(doc, input.cautions ?? cuttingRoomCautions(input.language), input);
  doc.end();
  return bytes;
}
