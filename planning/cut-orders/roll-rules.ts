import { mm, type Millimetres } from '@shared/units';

/**
 * Widths closer than this count as equal (mm): a roll measured at the marker's own width is not refused
 * for a rounding difference.
 */
export const ROLL_WIDTH_TOLERANCE_MM = 0.5;

/** A roll refused for a lay because it is narrower than the lay's marker. */
export interface RollWidthRefusal {
  rollId: string;
  rollWidth: Millimetres;
  markerWidth: Millimetres;
  /** One plain sentence naming the roll and both widths (mm; the server may reword in the studio's units). */
  message: string;
}

/**
 * Null when a roll can carry a marker, else why not: a roll narrower than the marker would leave the
 * pieces along one edge short of fabric, so that roll is refused for the lay. A roll of unknown width
 * is not refused here (the cutter checks it at the table).
 */
export function checkRollWidth(
  roll: { id: string; label?: string; width?: Millimetres | number },
  markerWidth: Millimetres | number,
  tolerance = ROLL_WIDTH_TOLERANCE_MM,
): RollWidthRefusal | null {
  if (roll.width === undefined || !(roll.width < markerWidth - tolerance)) return null;
  const name = roll.label ?? roll.id;
  return {
    rollId: roll.id,
    rollWidth: mm(roll.width),
    markerWidth: mm(markerWidth),
    message: `Roll ${name} is ${fmt(roll.width)} mm wide, narrower than the ${fmt(markerWidth)} mm marker: it cannot be spread for this lay`,
  };
}

const fmt = (n: number) => String(Math.round(n * 10) / 10);

/** Allowances taken off a supplier's ticket length before a roll is planned (percent of the ticket length). */
export interface PackingListAllowance {
  /** Rolls often measure shorter than their ticket. Default 1 % (common practice, no published figure). */
  shortLengthPercent?: number;
  /** Flaws cut out when they reach the spread. Default 1 % (common practice, no published figure). */
  flawPercent?: number;
}

export const DEFAULT_SHORT_LENGTH_PERCENT = 1;
export const DEFAULT_FLAW_PERCENT = 1;

/**
 * Length a plan may count on from a roll known only by its packing-list (ticket) length:
 * ticket × (1 − short-length % − flaw %), rounded down to the millimetre so a plan never counts on
 * more than the roll gives. Throws RangeError on a negative length or allowances outside [0, 50) % each.
 */
export function usableTicketLength(ticketLength: Millimetres | number, allowance: PackingListAllowance = {}): Millimetres {
  const s = allowance.shortLengthPercent ?? DEFAULT_SHORT_LENGTH_PERCENT;
  const f = allowance.flawPercent ?? DEFAULT_FLAW_PERCENT;
  if (!(ticketLength >= 0)) throw new RangeError(`ticket length must be at least 0 mm, got ${ticketLength}`);
  for (const p of [s, f]) if (!(p >= 0 && p < 50)) throw new RangeError(`an allowance must be at least 0 % and below 50 %, got ${p}`);
  // Whole percent steps in hundredths keep 50 000 mm × 98 % at exactly 49 000 mm.
  return mm(Math.floor((ticketLength * Math.round((100 - s - f) * 100)) / 10_000 + 1e-9));
}
