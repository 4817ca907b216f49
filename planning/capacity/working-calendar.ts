import { addDays, format, getDay, parseISO } from 'date-fns';

/** A studio's working calendar. Dates are ISO `yyyy-MM-dd` strings passed in (never "today"). */
export interface WorkingCalendar {
  /** Working weekdays, 0 = Sunday … 6 = Saturday. */
  workdays: number[];
  /** Paid working minutes per day, breaks already taken out. */
  minutesPerDay: number;
  /** Non-working dates, `yyyy-MM-dd`. */
  holidays: string[];
}

/** True when the ISO date is a working day of the calendar. */
export function isWorkingDay(calendar: WorkingCalendar, isoDate: string): boolean {
  return calendar.workdays.includes(getDay(parseISO(isoDate))) && !calendar.holidays.includes(isoDate);
}

/**
 * The first `count` working days on or after `fromIso`, as ISO dates in order. Throws RangeError
 * when the calendar has no working weekday (would never end).
 */
export function workingDays(calendar: WorkingCalendar, fromIso: string, count: number): string[] {
  if (calendar.workdays.length === 0 || calendar.minutesPerDay <= 0) throw new RangeError('calendar has no working time');
  const out: string[] = [];
  let d = parseISO(fromIso);
  while (out.length < count) {
    const iso = format(d, 'yyyy-MM-dd');
    if (isWorkingDay(calendar, iso)) out.push(iso);
    d = addDays(d, 1);
  }
  return out;
}

/** Working days from `fromIso` to `toIso`, both included (0 when `toIso` is earlier). */
export function countWorkingDays(calendar: WorkingCalendar, fromIso: string, toIso: string): number {
  let n = 0;
  for (let d = parseISO(fromIso); format(d, 'yyyy-MM-dd') <= toIso; d = addDays(d, 1)) {
    if (isWorkingDay(calendar, format(d, 'yyyy-MM-dd'))) n += 1;
  }
  return n;
}

/**
 * The working day on which working minute `minute` (0-based, counted from the start of the first
 * working day on or after `fromIso`) falls, and the minute within that day. Minute 0 → first day.
 * A stage that ends exactly at a day's last minute is reported on that day (`minute` is exclusive).
 */
export function dateAtWorkingMinute(calendar: WorkingCalendar, fromIso: string, minute: number, isEnd = false): { date: string; minuteOfDay: number } {
  const per = calendar.minutesPerDay;
  const dayIndex = isEnd && minute > 0 ? Math.ceil(minute / per) - 1 : Math.floor(minute / per);
  const days = workingDays(calendar, fromIso, dayIndex + 1);
  return { date: days[dayIndex], minuteOfDay: minute - dayIndex * per };
}
