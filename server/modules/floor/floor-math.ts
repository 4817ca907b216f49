/**
 * Earned minutes, efficiency and piece-rate pay of one log, through the planning core's floor module
 * (planning/floor via @planning). The service calls only these three functions.
 */
import { computePiecePay, earnedMinutes, efficiencyPercent as sharedEfficiencyPercent } from '@planning';
import { minor } from '@shared/units';

/** Earned (standard) minutes of a log: pieces × SAM; a rework attempt earns nothing again. */
export function logEarnedMinutes(pieces: number, samMinutes: number, attempt: number): number {
  return attempt > 0 ? 0 : earnedMinutes([{ pieces, sam: samMinutes }]);
}

/** Piece-rate pay of a log in minor units: pieces × rate; rework (attempt > 0) is not paid twice. */
export function logPayMinor(pieces: number, rateMinor: number | null, attempt: number): number {
  if (!rateMinor) return 0;
  const record = { personId: 'p', bundleId: 'b', operationId: 'o', pieces, date: '2000-01-01', isRework: attempt > 0 };
  return computePiecePay({ records: [record], rates: { o: minor(rateMinor) }, from: '2000-01-01', to: '2000-01-01' }).total;
}

/**
 * Efficiency, percent to two decimals: standard minutes earned ÷ minutes worked × 100 (the one definition
 * in planning/floor, EFFICIENCY_DEFINITION). Null when no attended minutes were recorded.
 */
export function efficiencyPercent(earned: number, attendedMinutes: number): number | null {
  return sharedEfficiencyPercent(earned, attendedMinutes);
}
