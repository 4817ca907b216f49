/** Branded units. Lengths are millimetres everywhere inside Seamrun; money is integer minor units. */
declare const brand: unique symbol;
export type Brand<T, B extends string> = T & { readonly [brand]: B };

/** A length in millimetres. */
export type Millimetres = Brand<number, 'mm'>;
/** Money in integer minor units of the studio's ISO 4217 currency (cents, pence...). */
export type MinorUnits = Brand<number, 'minor'>;

/** Exact: 1 in = 25.4 mm (international yard and pound agreement, 1959; NBS/NIST). */
export const MM_PER_INCH = 25.4;
/** Exact: 1 yd = 0.9144 m. */
export const MM_PER_YARD = 914.4;

export const mm = (n: number): Millimetres => n as Millimetres;

/** Integer minor units; throws on a non-integer or non-finite value so floats never reach a total. */
export function minor(n: number): MinorUnits {
  if (!Number.isSafeInteger(n)) throw new RangeError(`minor units must be a safe integer, got ${n}`);
  return n as MinorUnits;
}

export const inchesToMm = (inches: number): Millimetres => mm(inches * MM_PER_INCH);
export const mmToInches = (length: Millimetres | number): number => length / MM_PER_INCH;
export const yardsToMm = (yards: number): Millimetres => mm(yards * MM_PER_YARD);
export const mmToYards = (length: Millimetres | number): number => length / MM_PER_YARD;
