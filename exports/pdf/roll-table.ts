import type { DocumentHeading, RollPlan, UnitSystem } from '../types';
import { formatLongLength } from './document-format';
import { drawTable } from './pdf-layout';
import { documentWords } from '../document-words';

/** The rolls of one lay as a table: roll, shade lot, length, plies to spread, expected remnant. */
export function drawRollTable(doc: PDFKit.PDFDocument, rolls: RollPlan[], unitSystem: UnitSystem, heading?: DocumentHeading) {
  const t = documentWords(heading?.language);
  drawTable(
    doc,
    [
      { header: t('rolls.roll'), width: 100 },
      { header: t('rolls.shadeLot'), width: 105 },
      { header: t('rolls.length'), width: 100 },
      { header: t('rolls.plies'), width: 95 },
      { header: t('rolls.remnant'), width: 110 },
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
