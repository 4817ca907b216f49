/**
 * Bundle tickets: for each bundle a header with a QR code and the bundle's particulars, then one tear-off
 * coupon per operation (operation, SAM, bundle no.), separated by dashed cut lines, for piece-rate records.
 */
import QRCode from 'qrcode';
import type { BundleOperation, BundleTicketsInput } from '../types';
import { BODY_FONT, BOLD_FONT } from './pdf-fonts';
import { formatPlyRange } from './document-format';
import { documentWords } from '../document-words';
import {
  contentWidth,
  drawCutLine,
  drawHeading,
  INK,
  startPdf,
  TEAL,
  type PdfOptions,
} from './pdf-layout';

/** Document title of the bundle tickets. */
export const BUNDLE_TICKETS_TITLE = 'Bundle ticket';

const QR_SIZE = 110;
const COUPON_HEIGHT = 46;

/**
 * Builds the bundle tickets PDF: one A4 page per bundle (more when its coupons overflow) with the QR code
 * of `qrText` (PNG, error correction M), bundle no., style, size, shade lot, plies, pieces and lay, then one
 * coupon per operation in list order. No bundles gives a single page with the heading.
 */
export async function buildBundleTicketsPdf(
  input: BundleTicketsInput,
  options: PdfOptions = {},
): Promise<Buffer> {
  const t = documentWords(input.language);
  const title = t('tickets.title');
  const { doc, bytes } = startPdf(input, title, options);
  if (input.bundles.length === 0)
    drawHeading(doc, title, input, [[t('batch'), input.batch.code]]);
  for (const [i, bundle] of input.bundles.entries()) {
    if (i > 0) doc.addPage();
    const qr = await QRCode.toBuffer(bundle.qrText, {
      errorCorrectionLevel: 'M',
      margin: 1,
      width: 330,
    });
    drawHeading(doc, t('tickets.titleBundle', { bundle: bundle.bundleNo }), input);
    const x = doc.page.margins.left;
    const top = doc.y;
    doc.image(qr, x + contentWidth(doc) - QR_SIZE, top, { width: QR_SIZE, height: QR_SIZE });
    doc
      .font(BOLD_FONT)
      .fontSize(26)
      .fillColor(TEAL)
      .text(t('tickets.bundle', { bundle: bundle.bundleNo }), x, top);
    doc.fillColor(INK).fontSize(11);
    const facts: [string, string][] = [
      [t('style'), `${input.style.code} — ${input.style.name}`],
      [t('batch'), input.batch.code],
      [t('tickets.size'), bundle.size],
      [t('tickets.shadeLot'), bundle.shadeLot],
      [t('tickets.plies'), formatPlyRange(bundle.plyFrom, bundle.plyTo)],
      [t('tickets.pieces'), String(bundle.pieces)],
      [t('tickets.layNo'), String(bundle.layNo)],
    ];
    for (const [label, value] of facts) {
      doc
        .font(BOLD_FONT)
        .text(`${label}: `, x, doc.y, { continued: true })
        .font(BODY_FONT)
        .text(value);
    }
    doc
      .fontSize(7)
      .fillColor('#555555')
      .text(bundle.qrText, x + contentWidth(doc) - QR_SIZE, top + QR_SIZE + 2, {
        width: QR_SIZE,
        align: 'center',
      });
    doc.fillColor(INK);
    doc.y = Math.max(doc.y, top + QR_SIZE + 16) + 10;
    drawCoupons(doc, input, bundle, input.operations);
  }
  doc.end();
  return bytes;
}

function drawCoupons(
  doc: PDFKit.PDFDocument,
  input: BundleTicketsInput,
  bundle: BundleTicketsInput['bundles'][number],
  operations: readonly BundleOperation[],
): void {
  const x = doc.page.margins.left;
  const width = contentWidth(doc);
  const t = documentWords(input.language);
  for (const op of operations) {
    if (doc.y + COUPON_HEIGHT > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      doc
        .font(BOLD_FONT)
        .fontSize(11)
        .text(t('tickets.continued', { bundle: bundle.bundleNo }), x, doc.page.margins.top);
      doc.moveDown(0.5);
    }
    const y = doc.y;
    drawCutLine(doc, y);
    doc
      .font(BOLD_FONT)
      .fontSize(11)
      .fillColor(INK)
      .text(op.name, x + 4, y + 9, { width: width * 0.55, lineBreak: false, ellipsis: true });
    doc.font(BODY_FONT).fontSize(9);
    const sam = new Intl.NumberFormat(input.locale, { minimumFractionDigits: 2, maximumFractionDigits: 2 }).format(op.samMinutes);
    doc.text(t('tickets.sam', { sam }), x + 4, y + 26, { lineBreak: false });
    const right = t('tickets.coupon', { bundle: bundle.bundleNo, style: input.style.code, size: bundle.size, count: bundle.pieces });
    doc.text(right, x + width * 0.45, y + 26, {
      width: width * 0.55 - 4,
      align: 'right',
      lineBreak: false,
    });
    doc.x = x;
    doc.y = y + COUPON_HEIGHT;
  }
  if (operations.length) drawCutLine(doc, doc.y);
}
