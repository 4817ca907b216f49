/**
 * Earned minutes, efficiency and piece-rate pay of one log, through the planning core's floor module
 * (planning/floor via @planning). The service calls only these three functions.
 */
import { earnedMinutes, efficiencyPercent as sharedEfficiencyPercent, formatRate, rateMillionths, RATE_SCALE, roundHalfUp } from '@planning';

/** Earned (standard) minutes of a log: pieces × SAM; a rework attempt earns nothing again. */
export function logEarnedMinutes(pieces: number, samMinutes: number, attempt: number): number {
  return attempt > 0 ? 0 : earnedMinutes([{ pieces, sam: samMinutes }]);
}

/**
 * Piece-rate pay of one log in minor units, for the floor's running figures: pieces × exact rate, rounded half up;
 * rework (attempt > 0) is not paid twice. Pay periods never add these: they round each pay line once.
 */
export function logPayMinor(pieces: number, rate: string | number | null, attempt: number): number {
  const r = rate === null || rate === '' ? null : rateMillionths(rate);
  if (!r || attempt > 0) return 0;
  return Number(roundHalfUp(BigInt(pieces) * r, RATE_SCALE));
}

export { exactRateOf, operationRate } from '@planning';

/** A log's exact rate for pay lines: the frozen rate, or for logs from before exact rates their pay ÷ pieces. */
export function logRate(l: { pieceRate: string; payMinor: number; pieces: number }): string {
  if (l.pieceRate) return l.pieceRate;
  if (!l.payMinor || !l.pieces) return '0';
  return formatRate((BigInt(l.payMinor) * RATE_SCALE) / BigInt(l.pieces));
}

/**
 * Efficiency, percent to two decimals: standard minutes earned ÷ minutes worked × 100 (the one definition
 * in planning/floor, EFFICIENCY_DEFINITION). Null when no attended minutes were recorded.
 */
export function efficiencyPercent(earned: number, attendedMinutes: number): number | null {
  return sharedEfficiencyPercent(earned, attendedMinutes);
}
