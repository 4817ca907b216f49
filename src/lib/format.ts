import { format, parseISO } from 'date-fns';
import { formatMinorUnits } from '@shared/units/money';

/** Money from integer minor units, formatted by Intl for the currency. */
export const formatMoney = formatMinorUnits;

export const formatDate = (iso: string) => format(parseISO(iso), 'd MMM yyyy');

/** An efficiency percent as every page shows it (EFFICIENCY_DEFINITION in planning/floor); a dash when none. */
export const formatEfficiency = (percent: number | null) => (percent === null ? '–' : `${percent.toFixed(1)} %`);

/**
 * A server message as a sentence for a person: the API prefixes field errors with the field's path
 * ("operations: the style has no sewing operations to balance"), which the screen shows beside the field;
 * in a message on its own the path is dropped and the sentence starts with a capital.
 */
export function sentenceOf(message: string): string {
  const m = /^[A-Za-z][\w.[\]]*: (.+)$/s.exec(message.trim());
  const text = m ? m[1] : message.trim();
  return text.charAt(0).toUpperCase() + text.slice(1);
}
