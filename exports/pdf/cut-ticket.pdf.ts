/**
 * Cut tickets: one A4 page per lay for the cutting table, with what the cutter needs at the spread.
 */
import type { CutTicketInput, LayPlan } from '../types';
import { BOLD_FONT } from './pdf-fonts';
import { CUTTING_ROOM_CAUTIONS } from './cutting-cautions';
import {
  formatLongLength,
  formatRatio,
  formatShortLength,
  spreadingModeLabel,
} from './document-format';
import { drawCautions, drawHeading, startPdf, type PdfOptions } from './pdf-layout';
import { drawRollTable } from './roll-table';

/** Document title of a cut ticket. */
export const CUT_TICKET_TITLE = 'Cut ticket';

/**
 * Builds the cut tickets PDF: one page per lay (a lay with many rolls may run onto a second page) with
 * style, batch, lay no., size ratio, garments, marker length, plies, spreading mode, end allowance, fabric,
 * the plies per roll table and the cautions. No lays gives a single page saying so.
 */
export async function buildCutTicketPdf(
  input: CutTicketInput,
  options: PdfOptions = {},
): Promise<Buffer> {
  const { doc, bytes } = startPdf(input, CUT_TICKET_TITLE, options);
  if (input.lays.length === 0) {
    drawHeading(doc, CUT_TICKET_TITLE, input, [['Batch', input.batch.code]]);
    doc.text('No lays in this cut order.');
  }
  input.lays.forEach((lay, i) => {
    if (i > 0) doc.addPage();
    drawLayTicket(doc, input, lay);
  });
  doc.end();
  return bytes;
}

function drawLayTicket(doc: PDFKit.PDFDocument, input: CutTicketInput, lay: LayPlan): void {
  const u = input.unitSystem;
  const garments = lay.ratio.reduce((sum, s) => sum + s.count, 0) * lay.plies;
  drawHeading(doc, `${CUT_TICKET_TITLE} — lay ${lay.layNo}`, input, [
    ['Style', `${input.style.code} — ${input.style.name}`],
    ['Batch', input.batch.code],
    ['Lay no.', String(lay.layNo)],
    ['Size ratio', `${formatRatio(lay.ratio)} (${garments} garments)`],
    ['Marker length', formatLongLength(lay.markerLengthMm, u, input.language, input.locale)],
    ['Plies', String(lay.plies)],
    ['Spreading mode', spreadingModeLabel(lay.spreadingMode)],
    ['End allowance, each end', formatShortLength(lay.endAllowanceMm, u, input.language, input.locale)],
    ['Fabric', `${input.fabric.description}, width ${formatShortLength(input.fabric.widthMm, u, input.language, input.locale)}`],
  ]);
  doc.font(BOLD_FONT).fontSize(10).text('Plies per roll');
  doc.moveDown(0.3);
  drawRollTable(doc, lay.rolls, u, input);
  drawCautions(doc, input.cautions ?? CUTTING_ROOM_CAUTIONS);
}
