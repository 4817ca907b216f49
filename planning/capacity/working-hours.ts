/** ILO limits: 8 hours a day, 48 a week (Hours of Work (Industry) Convention, 1919, No. 1). */
export const ILO_C1_MAX_HOURS_PER_DAY = 8;
export const ILO_C1_MAX_HOURS_PER_WEEK = 48;

/** Caution shown when a plan exceeds the ILO C1 limits (usual cautions; local law decides). */
export const WORKING_HOURS_CAUTION =
  'Usual cautions; follow local codes. ILO Hours of Work (Industry) Convention, 1919 (No. 1): working hours should not exceed 8 a day and 48 a week, with limited exceptions (e.g. averaging over up to three weeks). Overtime pay is at least 1.25 times the regular rate (C1 Art. 6(2)).';

/** Result of {@link checkWorkingHours}. */
export interface WorkingHoursCheck {
  hoursPerDay: number;
  hoursPerWeek: number;
  exceedsDaily: boolean;
  exceedsWeekly: boolean;
  /** The caution text when either limit is exceeded, else null. */
  caution: string | null;
}

/** Flags a plan needing more than 8 h/day or 48 h/week (ILO C1). Minutes per day and days per week in. */
export function checkWorkingHours(minutesPerDay: number, daysPerWeek: number): WorkingHoursCheck {
  const hoursPerDay = minutesPerDay / 60;
  const hoursPerWeek = hoursPerDay * daysPerWeek;
  const exceedsDaily = hoursPerDay > ILO_C1_MAX_HOURS_PER_DAY + 1e-9;
  const exceedsWeekly = hoursPerWeek > ILO_C1_MAX_HOURS_PER_WEEK + 1e-9;
  return { hoursPerDay, hoursPerWeek, exceedsDaily, exceedsWeekly, caution: exceedsDaily || exceedsWeekly ? WORKING_HOURS_CAUTION : null };
}
