import { capacityMinutes, daysNeeded } from './capacity';
import { checkWorkingHours, type WorkingHoursCheck } from './working-hours';
import { countWorkingDays, dateAtWorkingMinute, type WorkingCalendar } from './working-calendar';

/** One stage of the batch route (cutting, sewing, finishing…). */
export interface BatchStage {
  name: string;
  /** Standard minutes per garment in this stage. */
  samPerPiece: number;
  people: number;
  /** Fraction, 0.6 = 60 %. */
  efficiency: number;
  absenteeism?: number;
  /**
   * Stations a bundle passes through one after another inside the stage, each taking one bundle time
   * (bundle × minutes per piece) at the stage's pace: a sewing line of 6 stations has 6, a pooled cutting table
   * 1 (default).
   */
  stations?: number;
}

/** Input to {@link scheduleBatch}. */
export interface ScheduleBatchInput {
  quantity: number;
  /** Garments per bundle; the next stage starts once the first bundle is through (default 10). */
  bundleSize?: number;
  stages: BatchStage[];
  calendar: WorkingCalendar;
  /** First day that may be used, `yyyy-MM-dd`. */
  start: string;
  /** Due date (end of that day), `yyyy-MM-dd`. */
  due?: string;
  /** Slack below this many working days counts as `at-risk` (default 1). */
  riskSlackDays?: number;
}

/** One stage on the calendar. Minutes are working minutes from the start of the first day. */
export interface ScheduledStage {
  name: string;
  /** Minutes one garment occupies the stage's capacity: SAM ÷ (people × (1 − absence) × efficiency). */
  minutesPerPiece: number;
  startMinute: number;
  endMinute: number;
  startDate: string;
  endDate: string;
  /** Working days the stage needs on its own: ⌈Q × SAM ÷ capacity per day⌉. */
  daysNeeded: number;
}

/** Result of {@link scheduleBatch}. */
export interface BatchSchedule {
  stages: ScheduledStage[];
  finishMinute: number;
  finishDate: string;
  /** Working days from start to due (both included), null without a due date. */
  workingDaysToDue: number | null;
  risk: 'on-time' | 'at-risk' | 'late' | 'no-due-date';
  /** Extra minutes per working day (every stage) needed to finish by the due date; 0 when on time. */
  overtimeMinutesPerDay: number;
  /** Hours check of the calendar with that overtime (ILO C1). */
  hours: WorkingHoursCheck;
}

/**
 * Schedules a batch through its stages as a bundle flow. Inside a stage of S stations each bundle visits every
 * station in turn, one bundle time T = bundle × minutes per piece at each, so its first bundle leaves S × T after
 * the stage starts and the stage ends at start + Q × minutes per piece + (S − 1) × T. Stage k starts once the
 * first bundle has left stage k−1 and cannot finish before the last bundle arrives plus S × T (exact for
 * stations paced at the stage's rate: the bundle recurrence of a flow line).
 * Capacity per day follows {@link capacityMinutes}. Overtime needed is spread evenly over the working
 * days to the due date (a first estimate, not a re-plan). Throws RangeError on a stage without capacity.
 */
export function scheduleBatch(input: ScheduleBatchInput): BatchSchedule {
  const { quantity, calendar, start } = input;
  const bundle = Math.min(input.bundleSize ?? 10, Math.max(quantity, 1));
  const per = calendar.minutesPerDay;
  const stages: ScheduledStage[] = [];
  let prevStart = 0;
  let prevEnd = 0;
  let prevFirstOut = 0;
  input.stages.forEach((s, k) => {
    const cap = capacityMinutes({ people: s.people, minutesPerDay: 1, efficiency: s.efficiency, absenteeism: s.absenteeism });
    if (!(cap > 0)) throw new RangeError(`stage ${s.name} has no capacity`);
    const stations = s.stations ?? 1;
    if (!(Number.isInteger(stations) && stations >= 1)) throw new RangeError(`stage ${s.name}: stations must be a whole number ≥ 1`);
    const mpp = s.samPerPiece / cap;
    const bundleTime = bundle * mpp;
    const startMinute = k === 0 ? 0 : prevStart + prevFirstOut;
    const ownEnd = startMinute + quantity * mpp + (stations - 1) * bundleTime;
    const endMinute = k === 0 ? ownEnd : Math.max(ownEnd, prevEnd + stations * bundleTime);
    stages.push({
      name: s.name,
      minutesPerPiece: mpp,
      startMinute,
      endMinute,
      startDate: dateAtWorkingMinute(calendar, start, startMinute).date,
      endDate: dateAtWorkingMinute(calendar, start, endMinute, true).date,
      daysNeeded: daysNeeded(quantity * s.samPerPiece, cap * per),
    });
    prevStart = startMinute;
    prevEnd = endMinute;
    prevFirstOut = stations * bundleTime;
  });
  const finishMinute = prevEnd;
  const finishDate = dateAtWorkingMinute(calendar, start, finishMinute, true).date;
  const daysPerWeek = calendar.workdays.length;
  if (!input.due) {
    return { stages, finishMinute, finishDate, workingDaysToDue: null, risk: 'no-due-date', overtimeMinutesPerDay: 0, hours: checkWorkingHours(per, daysPerWeek) };
  }
  const daysToDue = countWorkingDays(calendar, start, input.due);
  const available = daysToDue * per;
  const slackDays = (available - finishMinute) / per;
  const risk = finishMinute > available + 1e-9 ? 'late' : slackDays < (input.riskSlackDays ?? 1) ? 'at-risk' : 'on-time';
  // Working faster by overtime scales every stage by per / (per + x): solve finish × per / (per + x) ≤ available.
  const overtime = risk === 'late' ? (daysToDue > 0 ? Math.max(0, (finishMinute * per) / available - per) : Infinity) : 0;
  return {
    stages,
    finishMinute,
    finishDate,
    workingDaysToDue: daysToDue,
    risk,
    overtimeMinutesPerDay: overtime,
    hours: checkWorkingHours(per + (Number.isFinite(overtime) ? overtime : 0), daysPerWeek),
  };
}
