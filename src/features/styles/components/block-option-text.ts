import { parseLength } from '@shared/units/length-format';

/**
 * What the owner typed in a block option's box: a length (a bare number is in cm, or in inches in an imperial
 * studio; "1 1/2 in" or "3 cm" as written) or a plain number (a comma reads as a decimal point). An empty box is
 * the block's default. Text that is neither is `isBad`, so the form can say so beside the box instead of quietly
 * keeping the default.
 */
export function readBlockOption(text: string, kind: 'length' | 'number', system: 'metric' | 'imperial'): { value: number | undefined; isBad: boolean } {
  const typed = text.trim();
  if (!typed) return { value: undefined, isBad: false };
  const unit = system === 'metric' ? 'cm' : 'in';
  const value = kind === 'length' ? parseLength(/[a-z"]/i.test(typed) ? typed : `${typed} ${unit}`, system) : Number(typed.replace(',', '.'));
  return value !== null && Number.isFinite(value) ? { value, isBad: false } : { value: undefined, isBad: true };
}

/** The server's name for a block option's field (`composition.blocks.0.seamMm`), to show its error beside the box. */
export const blockOptionField = (index: number, path: string) => `composition.blocks.${index}.${path}`;
