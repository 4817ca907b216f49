/**
 * Upper bounds on what a studio can enter for stock, receipts, quantities and prices. Each is far above
 * anything a small studio handles (so it never gets in the way) and far below what breaks arithmetic or
 * the database (1e308 used to be accepted). The API answers 400 naming the field when one is passed.
 */

/** One roll's length, mm: 1 km. Woven rolls are usually 30–120 m (common practice). */
export const MAX_ROLL_LENGTH_MM = 1_000_000;
/** Fabric or roll width, mm: 5 m, above the widest looms (about 3.2 m, common practice). */
export const MAX_WIDTH_MM = 5_000;
/** Plies in one lay. */
export const MAX_PLIES = 300;
/** A trim's stock on hand, one receipt line or one order line, in the trim's unit (or mm of fabric): ten million. */
export const MAX_STOCK_QUANTITY = 10_000_000;
/** A price or an amount in minor units: one billion (ten million in a two-decimal currency). */
export const MAX_PRICE_MINOR = 1_000_000_000;
/** Lines on one purchase order or one receipt. */
export const MAX_ORDER_LINES = 500;
/** Rolls named in one plan, or entered in one go. */
export const MAX_ROLLS_AT_ONCE = 500;

/** "10,000,000" — limits in messages, grouped the same way on every machine. */
export const limitText = (n: number) => String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
