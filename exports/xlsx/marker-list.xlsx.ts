/**
 * The cutter's marker list per roll as a workbook: a table of lays, a table of rolls per lay, and the
 * cutting-room cautions. Lengths are shown in the studio's unit system (m / cm or yd / in).
 */
import type { MarkerListInput } from '../types';
import { documentWords } from '../document-words';
import { cuttingRoomCautions } from '../pdf/cutting-cautions';
import {
  formatRatio,
  formatShortLength,
  longLengthUnit,
  spreadingModeLabel,
  toLongLength,
} from '../pdf/document-format';
import { MM_PER_INCH } from '@shared/units';
import {
  bandRow,
  boldRow,
  createWorkbook,
  formula,
  ref,
  workbookToBuffer,
  writeHeaderRow,
  writeTitleBlock,
} from './xlsx-theme';

/** Worksheet name of the marker list. */
export const MARKER_LIST_SHEET_NAME = 'Marker list per roll';

/**
 * Builds the marker list workbook (one worksheet, "Marker list per roll"). Lays table: lay no., size ratio,
 * garments per ply, marker length, plies, garments (= garments per ply × plies, formula), spreading mode,
 * end allowance at each end. Rolls table: lay no., roll, shade lot, roll length, plies to spread, expected
 * remnant, in lay then input order. Then the cautions (input's or `CUTTING_ROOM_CAUTIONS`).
 */
export async function buildMarkerListXlsx(input: MarkerListInput): Promise<Buffer> {
  const t = documentWords(input.language);
  const workbook = createWorkbook(input);
  const name = t('markerSheet.sheet');
  const sheet = workbook.addWorksheet(name);
  // Lengths stay numbers a spreadsheet can add up, in the studio's unit, which each header names.
  const long = t(`markerSheet.units.${longLengthUnit(input.unitSystem)}`);
  const short = t(`markerSheet.units.${input.unitSystem === 'metric' ? 'cm' : 'in'}`);
  const toShort = (lengthMm: number) =>
    Number((input.unitSystem === 'metric' ? lengthMm / 10 : lengthMm / MM_PER_INCH).toFixed(4));
  let r = writeTitleBlock(sheet, name, input, [
    [t('style'), `${input.style.code} — ${input.style.name}`],
    [t('batch'), input.batch.code],
    [
      t('fabric'),
      t('fabricWidth', { fabric: input.fabric.description, width: formatShortLength(input.fabric.widthMm, input.unitSystem, input.language, input.locale) }),
    ],
  ]);

  writeHeaderRow(sheet, r, [
    t('layNo'),
    t('sizeRatio'),
    t('markerSheet.garmentsPerPly'),
    t('markerSheet.markerLength', { unit: long }),
    t('plies'),
    t('markerSheet.garments'),
    t('spreadingMode'),
    t('markerSheet.endAllowance', { unit: short }),
  ]);
  input.lays.forEach((lay, i) => {
    const rowNo = r + 1 + i;
    const row = sheet.getRow(rowNo);
    const perPly = lay.ratio.reduce((sum, s) => sum + s.count, 0);
    row.values = [
      lay.layNo,
      formatRatio(lay.ratio),
      perPly,
      toLongLength(lay.markerLengthMm, input.unitSystem),
      lay.plies,
      formula(`${ref(3, rowNo)}*${ref(5, rowNo)}`, perPly * lay.plies),
      t(`spreading.${lay.spreadingMode}`, { defaultValue: spreadingModeLabel(lay.spreadingMode) }),
      toShort(lay.endAllowanceMm),
    ];
    row.getCell(4).numFmt = '0.000';
    bandRow(row, i, 1, 8);
  });
  r += input.lays.length + 2;

  writeHeaderRow(sheet, r, [
    t('layNo'),
    t('markerSheet.roll'),
    t('tickets.shadeLot'),
    t('markerSheet.rollLength', { unit: long }),
    t('markerSheet.pliesToSpread'),
    t('markerSheet.remnant', { unit: long }),
  ]);
  let band = 0;
  for (const lay of input.lays) {
    for (const roll of lay.rolls) {
      r += 1;
      const row = sheet.getRow(r);
      row.values = [
        lay.layNo,
        roll.rollLabel,
        roll.shadeLot,
        toLongLength(roll.lengthMm, input.unitSystem),
        roll.pliesToSpread,
        toLongLength(roll.expectedRemnantMm, input.unitSystem),
      ];
      row.getCell(4).numFmt = '0.000';
      row.getCell(6).numFmt = '0.000';
      bandRow(row, band++, 1, 6);
    }
  }

  r += 2;
  sheet.getRow(r).getCell(1).value = t('cautions.title');
  boldRow(sheet.getRow(r), 1, 1);
  for (const caution of input.cautions ?? cuttingRoomCautions(input.language)) {
    r += 1;
    sheet.getRow(r).getCell(1).value = `• ${caution}`;
  }
  sheet.getRow(r + 1).getCell(1).value = t('cautions.source');
  [10, 26, 12, 16, 12, 18, 24, 18].forEach((w, i) => (sheet.getColumn(i + 1).width = w));
  return workbookToBuffer(workbook);
}
