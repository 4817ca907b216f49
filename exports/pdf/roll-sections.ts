import type { RollCuttingPlan, UnitSystem } from '../types';
import { formatLongLength } from './document-format';
import { BOLD_FONT, BODY_FONT } from './pdf-fonts';
import { drawTable } from './pdf-layout';

/**
 * One section per roll, rolls in the order of their first lay: the roll's start length, then its lays in
 * cutting order (lay no., plies, length taken, length left after), then the expected remnant and whether
 * it is kept as stock. The remnants are those the printed cutting order leaves.
 */
export function drawRollSections(doc: PDFKit.PDFDocument, rolls: readonly RollCuttingPlan[], u: UnitSystem): void {
  doc.font(BOLD_FONT).fontSize(11).text('Rolls in cutting order');
  doc.moveDown(0.3);
  if (!rolls.length) {
    doc.font(BODY_FONT).fontSize(9).text('No roll is allocated to this cut order.');
    doc.moveDown(0.6);
    return;
  }
  for (const roll of rolls) {
    doc.font(BOLD_FONT).fontSize(10).text(`Roll ${roll.rollLabel} · shade lot ${roll.shadeLot} · ${formatLongLength(roll.startLengthMm, u)} at the start`);
    doc.moveDown(0.3);
    drawTable(
      doc,
      [
        { header: 'Lay no. (cutting order)', width: 130 },
        { header: 'Plies', width: 60 },
        { header: 'Length taken', width: 110 },
        { header: 'Left on the roll after', width: 130 },
      ],
      roll.uses.map((use) => [String(use.layNo), String(use.plies), formatLongLength(use.lengthMm, u), formatLongLength(use.remainingAfterMm, u)]),
    );
    const fate = roll.expectedRemnantMm < 0 ? 'the roll is too short for these lays' : roll.isStock ? 'kept as a remnant' : 'end-of-roll waste';
    doc.font(BODY_FONT).fontSize(9).text(`Expected remnant: ${formatLongLength(Math.max(0, roll.expectedRemnantMm), u)} (${fate})`);
    doc.moveDown(0.8);
  }
}
