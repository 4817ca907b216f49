/**
 * The cut ticket of one material of a batch: which pieces to cut from that material's fabric, in which sizes and
 * how many, so the self fabric, the lining and the contrast each go to the table with their own list.
 */
import type { DocumentHeading, UnitSystem } from '../types';
import { BOLD_FONT } from './pdf-fonts';
import { documentWords, wordFor } from '../document-words';
import { cuttingRoomCautions } from './cutting-cautions';
import { formatShortLength } from './document-format';
import { contentWidth, drawCautions, drawHeading, drawTable, startPdf, type PdfOptions } from './pdf-layout';

/** Input of {@link buildMaterialCutTicketPdf}; lengths mm. */
export interface MaterialCutTicketInput extends DocumentHeading {
  unitSystem: UnitSystem;
  style: { code: string; name: string };
  batch: { code: string };
  /** The style's material ('self', 'lining', 'contrast', 'interfacing' or the owner's own name). */
  material: string;
  /** The fabric linked to the material, or null when none is linked yet. */
  fabric: { description: string; widthMm: number } | null;
  /** Garments per size, in run order. */
  sizes: { size: string; quantity: number }[];
  /** The material's pieces and how many of each are cut per garment (a mirrored pair counts 2). */
  pieces: { name: string; copiesPerGarment: number; mirrored: boolean }[];
}

/** Document title of a material's cut ticket (in English; the document's language names it in its own). */
export const MATERIAL_CUT_TICKET_TITLE = 'Cut ticket by material';

/**
 * Builds one material's cut ticket: style, batch, material, fabric, garments; then a table with a row per piece
 * (copies per garment, then copies to cut in each size = copies per garment × garments of that size, and the
 * total) and a last row with every piece added up; then the cutting-room cautions. Sizes with no garments are
 * left out. A material with no pieces prints a line saying so.
 */
export async function buildMaterialCutTicketPdf(input: MaterialCutTicketInput, options: PdfOptions = {}): Promise<Buffer> {
  const t = documentWords(input.language);
  const title = t('material.title');
  const material = wordFor(t, 'material.names', input.material);
  const { doc, bytes } = startPdf(input, title, options);
  const sizes = input.sizes.filter((s) => s.quantity > 0);
  const garments = sizes.reduce((a, s) => a + s.quantity, 0);
  const width = input.fabric && formatShortLength(input.fabric.widthMm, input.unitSystem, input.language, input.locale);
  drawHeading(doc, `${title}${input.language === 'fr' ? '\u202f' : ''}: ${material}`, input, [
    [t('style'), `${input.style.code} — ${input.style.name}`],
    [t('batch'), input.batch.code],
    [t('material.material'), material],
    [t('fabric'), input.fabric ? t('fabricWidth', { fabric: input.fabric.description, width }) : t('material.notLinked')],
    [t('material.garments'), `${garments} (${sizes.map((s) => `${s.size} ${s.quantity}`).join(', ')})`],
  ]);
  if (input.pieces.length === 0) doc.text(t('material.noPieces', { material }));
  else {
    doc.font(BOLD_FONT).fontSize(10).text(t('material.piecesToCut'));
    doc.moveDown(0.3);
    const width = contentWidth(doc);
    // Sizes take 30–40 pt each; the piece name (with "left + right") takes what is left.
    const fixed = 150 + 90 + 55;
    const sizeWidth = Math.max(30, Math.min(40, (width - fixed) / Math.max(1, sizes.length)));
    const columns = [
      { header: t('material.piece'), width: Math.max(150, width - 90 - 55 - sizeWidth * sizes.length) },
      { header: t('material.perGarment'), width: 90 },
      ...sizes.map((s) => ({ header: s.size, width: sizeWidth })),
      { header: t('material.total'), width: 55 },
    ];
    const rows = input.pieces.map((p) => {
      const counts = sizes.map((s) => p.copiesPerGarment * s.quantity);
      return [`${p.name}${p.mirrored ? t('material.pairs') : ''}`, String(p.copiesPerGarment), ...counts.map(String), String(counts.reduce((a, c) => a + c, 0))];
    });
    const perGarment = input.pieces.reduce((a, p) => a + p.copiesPerGarment, 0);
    rows.push([t('material.allPieces'), String(perGarment), ...sizes.map((s) => String(perGarment * s.quantity)), String(perGarment * garments)]);
    drawTable(doc, columns, rows);
  }
  drawCautions(doc, cuttingRoomCautions(input.language), input);
  doc.end();
  return bytes;
}
