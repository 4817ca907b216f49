import type { DocumentHeading, RollCuttingPlan, UnitSystem } from '../types';
import { documentWords } from '../document-words';
import { formatLongLength } from './document-format';
import { BOLD_FONT, BODY_FONT } from './pdf-fonts';
import { drawTable } from './pdf-layout';

/**
 * One section per roll, rolls in the order of their first lay: the roll's start length, then its lays in
 * cutting order (lay no., plies, length taken, length left after), then the expected remnant and whether
 * it is kept as stock. The remnants are those the printed cutting order leaves.
 */
export function drawRollSections(doc: PDFKit.PDFDocument, rolls: readonly RollCuttingPlan[], u: UnitSystem, heading?: DocumentHeading): void {
  const t = documentWords(heading?.language);
  const length = (mm: number) => formatLongLength(mm, u, heading?.language, heading?.locale);
  doc.font(BOLD_FONT).fontSize(11).text(t('rollSections.title'));
  doc.moveDown(0.3);
  if (!rolls.length) {
    doc.font(BODY_FONT).fontSize(9).text(t('rollSections.none'));
    doc.moveDown(0.6);
    return;
  }
  for (const roll of rolls) {
    doc.font(BOLD_FONT).fontSize(10).text(t('rollSections.roll', { roll: roll.rollLabel, lot: roll.shadeLot, length: length(roll.startLengthMm) }));
    doc.moveDown(0.3);
    drawTable(
      doc,
      [
        { header: t('rollSections.layNo'), width: 130 },
        { header: t('rollSections.plies'), width: 60 },
        { header: t('rollSections.taken'), width: 110 },
        { header: t('rollSections.left'), width: 130 },
      ],
      roll.uses.map((use) => [String(use.layNo), String(use.plies), length(use.lengthMm), length(use.remainingAfterMm)]),
    );
    const fate = t(roll.expectedRemnantMm < 0 ? 'rollSections.tooShort' : roll.isStock ? 'rollSections.kept' : 'rollSections.waste');
    doc.font(BODY_FONT).fontSize(9).text(t('rollSections.remnant', { length: length(Math.max(0, roll.expectedRemnantMm)), fate }));
    doc.moveDown(0.8);
  }
}
