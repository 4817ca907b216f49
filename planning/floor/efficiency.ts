/**
 * Operator efficiency, % = earned minutes (pieces × SAM) ÷ attended minutes × 100
 * (onlineclothingstudy.com 2017/01, "Efficiency formula", web article). 0 when nothing attended.
 */
export function operatorEfficiency(input: { pieces: number; sam: number; attendedMinutes: number }): number {
  const { pieces, sam, attendedMinutes } = input;
  if (pieces < 0 || sam < 0 || attendedMinutes < 0) throw new RangeError('efficiency inputs must be non-negative');
  return attendedMinutes > 0 ? ((pieces * sam) / attendedMinutes) * 100 : 0;
}

/** Earned minutes per operation, summed: Σ pieces × SAM (no rework: rework earns no standard minutes). */
export function earnedMinutes(work: { pieces: number; sam: number }[]): number {
  return work.reduce((acc, w) => acc + w.pieces * w.sam, 0);
}

/**
 * Line efficiency, % = output × garment SAM ÷ (operators × hours × 60) × 100
 * (onlineclothingstudy.com 2011/09, Prasanta Sarkar, web article). 0 when no minutes attended.
 */
export function lineEfficiency(input: { output: number; sam: number; operators: number; hours: number }): number {
  const attended = input.operators * input.hours * 60;
  return attended > 0 ? ((input.output * input.sam) / attended) * 100 : 0;
}

/**
 * What "efficiency" means on every page of Seamrun (pay, floor progress, the line plan's expected figure):
 * standard minutes earned ÷ minutes worked, as a percentage (common practice; the operator efficiency above).
 */
export const EFFICIENCY_DEFINITION = 'Standard minutes earned ÷ minutes worked';

/**
 * Efficiency in percent, to two decimals: standard minutes earned (pieces × SAM, rework earns none) ÷ minutes
 * worked (attended) × 100. Null when no minutes were worked, so "no attendance" never reads as 0 %.
 */
export function efficiencyPercent(earnedStandardMinutes: number, workedMinutes: number): number | null {
  if (!(workedMinutes > 0)) return null;
  // operatorEfficiency takes pieces × SAM; the earned minutes go in as one piece of that many minutes.
  return Math.round(operatorEfficiency({ pieces: 1, sam: earnedStandardMinutes, attendedMinutes: workedMinutes }) * 100) / 100;
}
