/**
 * Earned minutes, efficiency and piece-rate pay of one log. Kept here until the planning core's floor
 * module (planning/floor) lands; the service calls only these three functions, so the swap is local.
 */

/** Earned (standard) minutes of a log: pieces × SAM; a rework attempt earns nothing again. */
export function logEarnedMinutes(pieces: number, samMinutes: number, attempt: number): number {
  return attempt > 0 ? 0 : pieces * samMinutes;
}

/** Piece-rate pay of a log in minor units: pieces × rate; rework (attempt > 0) is not paid twice. */
export function logPayMinor(pieces: number, rateMinor: number | null, attempt: number): number {
  return attempt > 0 || !rateMinor ? 0 : pieces * rateMinor;
}

/**
 * Operator efficiency, percent: earned minutes ÷ attended minutes × 100 (onlineclothingstudy.com 2017/01,
 * "Efficiency formula"). Null when nobody recorded attended minutes (no division by zero).
 */
export function efficiencyPercent(earnedMinutes: number, attendedMinutes: number): number | null {
  if (!(attendedMinutes > 0)) return null;
  return Math.round((earnedMinutes / attendedMinutes) * 10000) / 100;
}
