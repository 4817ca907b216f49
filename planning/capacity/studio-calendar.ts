import type { WorkingCalendar } from './working-calendar';

/**
 * A studio's working calendar as the owner enters it: its IANA time zone, working weekdays (0 = Sunday … 6 =
 * Saturday, so Saturday work is 6), one shift with its unpaid break, holidays and a weekly overtime limit. Seamrun
 * plans with it; local law decides what it may be.
 */
export interface StudioCalendar {
  /** IANA time zone name, e.g. Africa/Nairobi. */
  timeZone: string;
  workdays: number[];
  /** Shift start and end, 24-hour `HH:mm` in the studio's zone; the end after the start (no overnight shift). */
  shiftStart: string;
  shiftEnd: string;
  /** Unpaid break minutes inside the shift. */
  breakMinutes: number;
  /** Non-working dates, `yyyy-MM-dd`. */
  holidays: string[];
  /** Most overtime hours a person may work in a week; null when none entered. */
  overtimeLimitHoursPerWeek: number | null;
}

/** True when `name` is a time zone this runtime's IANA database knows (e.g. Africa/Nairobi, UTC). */
export function isTimeZone(name: string): boolean {
  if (!name || name.length > 64) return false;
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/**
 * The calendar date (`yyyy-MM-dd`) in `timeZone` at the instant `at`: the studio's "today". Uses the runtime's IANA
 * database through Intl (no I/O). Throws RangeError for an unknown zone.
 */
export function zonedDay(at: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(at);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}`;
}

/**
 * The UTC instant at which `day` (`yyyy-MM-dd`) starts in `timeZone`: local midnight, or the first instant of the
 * day when a clock change skips midnight. Found by correcting a UTC guess with the zone's offset twice.
 */
export function zonedDayStart(day: string, timeZone: string): Date {
  const [y, m, d] = day.split('-').map(Number);
  const target = Date.UTC(y, m - 1, d);
  let t = target;
  for (let i = 0; i < 3; i++) {
    const local = localMillis(new Date(t), timeZone);
    t += target - local;
  }
  // A skipped midnight lands after the day's start: step back to the first instant whose local date is `day`.
  while (zonedDay(new Date(t - 60_000), timeZone) === day) t -= 60_000;
  return new Date(t);
}

/** The wall-clock time in `timeZone` at `at`, read as if it were UTC (milliseconds). */
function localMillis(at: Date, timeZone: string): number {
  const parts = new Intl.DateTimeFormat('en-US', { timeZone, hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric', second: 'numeric' }).formatToParts(at);
  const n = (t: string) => Number(parts.find((p) => p.type === t)?.value ?? 0);
  return Date.UTC(n('year'), n('month') - 1, n('day'), n('hour'), n('minute'), n('second'));
}

const hm = (text: string) => {
  const m = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(text);
  return m ? Number(m[1]) * 60 + Number(m[2]) : null;
};

/**
 * Paid minutes of one shift: end − start − break. Throws RangeError for a time not `HH:mm`, an end not after the
 * start, or a break not shorter than the shift.
 */
export function shiftMinutes(shiftStart: string, shiftEnd: string, breakMinutes: number): number {
  const a = hm(shiftStart);
  const b = hm(shiftEnd);
  if (a == null || b == null) throw new RangeError('shift times must be HH:mm');
  if (b <= a) throw new RangeError('the shift must end after it starts');
  if (!(Number.isInteger(breakMinutes) && breakMinutes >= 0 && breakMinutes < b - a)) throw new RangeError('the break must be shorter than the shift');
  return b - a - breakMinutes;
}

/** The planning calendar (working days, paid minutes a day, holidays) of a studio calendar. */
export function toWorkingCalendar(c: StudioCalendar): WorkingCalendar {
  return { workdays: [...new Set(c.workdays)].sort(), minutesPerDay: shiftMinutes(c.shiftStart, c.shiftEnd, c.breakMinutes), holidays: [...c.holidays].sort() };
}
