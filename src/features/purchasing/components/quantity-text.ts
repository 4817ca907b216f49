import { parseLongLength } from '@shared/units/length-format';
import { MM_PER_YARD } from '@shared/units/units';
import { fmt } from '@/lib/format';
import { i18n } from '@/lib/i18n';
import { area } from '../words';

const imperial = () => fmt().settings.unitSystem === 'imperial';

/** A trim's unit in the person's language when it is one of the usual ones (`pcs`, `pair`); else as the studio typed it. */
export const unitText = (unit: string) => i18n.t(`${area}.units.${unit}`, { defaultValue: unit });

/** A need or order quantity with its unit; fabric (mm) in the studio's units (metres, or yards and inches). */
export const quantityText = (q: number, unit: string) => {
  if (unit === 'mm') return fmt().fabricLength(q);
  // A trim sold by the metre (tape, elastic) reads in yards and inches in an imperial studio.
  if (unit === 'm' && imperial()) return fmt().fabricLength(q * 1000);
  return `${fmt().number(q, 3)} ${unitText(unit)}`;
};


/** A trim counted in metres, typed in yards in an imperial studio like fabric. */
export const trimByYard = (unit: string) => unit === 'm' && imperial();

/** A fabric length (mm) as the number to put in an input: metres, or yards, to one decimal. */
export const fabricInputText = (mm: number) => (mm / (imperial() ? MM_PER_YARD : 1000)).toFixed(1);

/**
 * A typed fabric length in millimetres: a bare number is metres (or yards in an imperial studio); a unit may be given
 * (`2.5 yd`, `90 in`, `2,5 m`). Null when it is not a length.
 */
export function readFabricInput(text: string): number | null {
  const mm = parseLongLength(text, imperial() ? 'imperial' : 'metric');
  return mm === null ? null : Math.round(mm);
}
