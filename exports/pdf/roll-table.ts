import type { DocumentHeading, RollPlan, UnitSystem } from '../types';
import { formatLongLength } from './document-format';
import { drawTable } from './pdf-layout';

/** The rolls of one lay as a table: roll, shade lot, length, plies to spread, expected remnant. */
export function drawRollTable(doc: PDFKit.PDFDocument, rolls: RollPlan[], unitSystem: UnitSystem, heading?: DocumentHeading) {
  drawTable(
    doc,
    [
      { header: 'Roll', width: 100 },
      { header: 'Shade lot', width: 105 },
      { header: 'Roll length', width: 100 },
      { header: 'Plies to spread', width: 95 },
      { header: 'Expected remnant', width: 110 },
    ],
    rolls.map((roll) => [
      roll.rollLabel,
      roll.shadeLot,
      formatLongLength(roll.lengthMm, unitSystem, heading?.language, heading?.locale),
      String(roll.pliesToSpread),
      formatLongLength(roll.expectedRemnantMm, unitSystem, heading?.language, heading?.locale),
    ]),
  );
}
