/**
 * Cut tickets: one A4 page per lay for the cutting table, with what the cutter needs at the spread.
 */
import type { CutTicketInput, LayPlan } from '../types';
import { BOLD_FONT } from './pdf-fonts';
import { cuttingRoomCautions } from './cutting-cautions';
import { documentWords } from '../document-words';
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
  const t = documentWords(input.language);
  const title = input.language && input.language !== 'en' ? t('cutTicket') : CUT_TICKET_TITLE;
  const { doc, bytes } = startPdf(input, title, options);
  if (input.lays.length === 0) {
    drawHeading(doc, title, input, [[t('batch'), input.batch.code]]);
    doc.text(t('noLays'));
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
  const t = documentWords(input.language);
  const garments = lay.ratio.reduce((sum, s) => sum + s.count, 0) * lay.plies;
  drawHeading(doc, t('cutTicketLay', { lay: lay.layNo }), input, [
    [t('style'), `${input.style.code} — ${input.style.name}`],
    [t('batch'), input.batch.code],
    [t('layNo'), String(lay.layNo)],
    [t('sizeRatio'), t('ratioGarments', { ratio: formatRatio(lay.ratio), count: garments })],
    [t('markerLength'), formatLongLength(lay.markerLengthMm, u, input.language, input.locale)],
    [t('plies'), String(lay.plies)],
    [t('spreadingMode'), t(`spreading.${lay.spreadingMode}`, { defaultValue: spreadingModeLabel(lay.spreadingMode) })],
    [t('endAllowanceEach'), formatShortLength(lay.endAllowanceMm, u, input.language, input.locale)],
    [t('fabric'), t('fabricWidth', { fabric: input.fabric.description, width: formatShortLength(input.fabric.widthMm, u, input.language, input.locale) })],
  ]);
  doc.font(BOLD_FONT).fontSize(10).text(t('pliesPerRoll'));
  doc.moveDown(0.3);
  drawRollTable(doc, lay.rolls, u, input);
  drawCautions(doc, input.cautions ?? cuttingRoomCautions(input.language), input);
}
