import { z } from 'zod';
import { calendarDate } from './common';

export const LINE_SECTIONS = ['cutting', 'sewing', 'finishing'] as const;
/** Machine types offered in the operations table (free text is accepted too, up to 24 characters). */
export const MACHINE_TYPES = ['cutting', 'lockstitch', 'overlock', 'coverstitch', 'buttonhole', 'button sew', 'pressing', 'hand work', 'inspection'] as const;

const code = z.string().trim().min(1, 'Code is required').max(12, 'At most 12 characters').regex(/^[A-Za-z0-9-_]+$/, 'Letters, digits, - and _ only');

/**
 * One row of the operations table. pieceRateMinor: minor units per piece (pay data), optional, exact to 6 decimals
 * (0.125 is a rate of an eighth of a minor unit).
 */
export const operationInput = z.object({
  code,
  name: z.string().trim().min(1, 'Name is required').max(120, 'At most 120 characters'),
  section: z.enum(LINE_SECTIONS, { error: 'Choose cutting, sewing or finishing' }),
  machineType: z.string().trim().min(1, 'Machine type is required').max(24, 'At most 24 characters'),
  sam: z.number({ error: 'Give minutes' }).finite().positive('Must be more than 0').max(600, 'At most 600 minutes'),
  predecessors: z.array(code).default([]),
  pieceRateMinor: z
    .number()
    .min(0, 'Cannot be negative')
    .max(100_000_000)
    .refine((v) => /^-?\d+(\.\d{1,6})?$/.test(String(v)), 'At most 6 decimals of a minor unit')
    .nullable()
    .optional(),
});
export type OperationInput = z.input<typeof operationInput>;

const hhmm = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use 24-hour HH:mm, e.g. 08:00');

/**
 * PUT /line/calendar: the studio's working calendar. timeZone is an IANA name (checked on the server); workdays
 * 0 = Sunday … 6 = Saturday; holidays are dates; the overtime limit is hours a week.
 */
export const workingCalendarInput = z.object({
  timeZone: z.string().trim().min(1, 'Choose a time zone').max(64, 'At most 64 characters'),
  workdays: z
    .array(z.number().int().min(0, 'Days are 0 (Sunday) to 6 (Saturday)').max(6, 'Days are 0 (Sunday) to 6 (Saturday)'))
    .min(1, 'Pick at least one working day')
    .max(7)
    .refine((v) => new Set(v).size === v.length, 'A day is listed twice'),
  shiftStart: hhmm,
  shiftEnd: hhmm,
  breakMinutes: z.number({ error: 'Give minutes' }).int('Whole minutes only').min(0, 'Cannot be negative').max(600, 'At most 600 minutes'),
  holidays: z.array(calendarDate).max(200, 'At most 200 holidays').default([]),
  overtimeLimitHoursPerWeek: z.number().finite().min(0, 'Cannot be negative').max(80, 'At most 80 hours').nullable().default(null),
}).refine((v) => v.shiftEnd > v.shiftStart, { path: ['shiftEnd'], message: 'The shift must end after it starts' });
export type WorkingCalendarInput = z.input<typeof workingCalendarInput>;

export interface WorkingCalendarDto {
  timeZone: string;
  workdays: number[];
  shiftStart: string;
  shiftEnd: string;
  breakMinutes: number;
  holidays: string[];
  overtimeLimitHoursPerWeek: number | null;
  /** Paid minutes a working day (shift − break). */
  minutesPerDay: number;
  hoursPerWeek: number;
  /** Today in the studio's time zone. */
  today: string;
  /** False until the owner saves one: the defaults (Monday to Friday, the studio's working day, UTC) apply. */
  entered: boolean;
  /** The usual caution on working hours; local law decides. */
  caution: string;
  /** Over the ILO C1 figures (8 h a day, 48 h a week). */
  exceedsIlo: boolean;
}

/** Params of /styles/:id/operations/:operationId/…. */
export const operationParams = z.object({ id: z.coerce.number().int().positive(), operationId: z.coerce.number().int().positive() });

/**
 * PUT /styles/:id/operations/:operationId/time-study: a time-study sheet (ILO method, planning/time-study). Each
 * element lists its timed cycles (observed seconds and the pace rated on the 0–100 scale, 100 = standard) and how
 * often it happens per garment; allowances are percentages of basic time.
 */
export const timeStudyInput = z.object({
  elements: z
    .array(
      z.object({
        name: z.string().trim().min(1, 'Name the element').max(80, 'At most 80 characters'),
        observations: z
          .array(
            z.object({
              seconds: z.number({ error: 'Give seconds' }).finite().positive('Must be more than 0').max(3600, 'At most 3600 seconds'),
              rating: z.number({ error: 'Give a rating' }).finite().positive('Must be more than 0').max(200, 'At most 200'),
            }),
          )
          .min(1, 'Time at least one cycle')
          .max(100, 'At most 100 cycles'),
        frequency: z.number().finite().positive('Must be more than 0').max(100, 'At most 100 a garment').default(1),
      }),
    )
    .min(1, 'Add at least one element')
    .max(40, 'At most 40 elements'),
  relaxationPercent: z.number({ error: 'Give a percentage' }).finite().min(0, 'Cannot be negative').max(100, 'At most 100 %'),
  contingencyPercent: z.number().finite().min(0, 'Cannot be negative').max(20, 'At most 20 %').default(0),
});
export type TimeStudyInput = z.input<typeof timeStudyInput>;

/** The sheet as stored on the operation, with its figures (minutes per garment). */
export interface OperationTimeStudy {
  elements: { name: string; observations: { seconds: number; rating: number }[]; frequency: number; basicMinutes: number }[];
  relaxationPercent: number;
  contingencyPercent: number;
  basicMinutes: number;
  standardMinutes: number;
  studiedAt: string;
  studiedBy: string;
}

/** PUT /styles/:id/operations: the whole table; codes unique, predecessors must name rows and form no cycle. */
export const putOperationsInput = z
  .object({ operations: z.array(operationInput).max(200, 'At most 200 operations') })
  .superRefine((v, ctx) => {
    const codes = v.operations.map((o) => o.code);
    v.operations.forEach((o, i) => {
      if (codes.indexOf(o.code) !== i) ctx.addIssue({ code: 'custom', path: ['operations', i, 'code'], message: 'Code used twice' });
      o.predecessors.forEach((p, j) => {
        if (!codes.includes(p)) ctx.addIssue({ code: 'custom', path: ['operations', i, 'predecessors', j], message: `No operation ${p}` });
        if (p === o.code) ctx.addIssue({ code: 'custom', path: ['operations', i, 'predecessors', j], message: 'An operation cannot follow itself' });
      });
    });
  });
export type PutOperationsInput = z.input<typeof putOperationsInput>;

/** POST /styles/:id/operations/copy. */
export const copyOperationsInput = z.object({ fromStyleId: z.number().int().positive('Choose a style') });

/** One pin in the plan query: `<person id>:<operation code>`. */
const pinItem = /^\d{1,9}:[A-Za-z0-9-_]{1,12}$/;

/**
 * GET /line/batches/:id/plan query: balance for the due date (SALBP-1) or for the people present (SALBP-2 and
 * shared operations). `people`: how many machinists (default: everyone active on the People page). `pins`:
 * comma-separated `<person id>:<operation code>`, each keeping that person on that operation. `maxOps`: most
 * operations one person works on.
 */
export const linePlanQuery = z.object({
  mode: z.enum(['due', 'people']).default('due'),
  people: z.coerce.number().int('Whole people only').min(1, 'At least 1').max(200).optional(),
  pins: z
    .string()
    .max(2000, 'At most 2000 characters')
    .transform((v, ctx) => {
      const items = v.split(',').map((x) => x.trim()).filter(Boolean);
      const bad = items.find((x) => !pinItem.test(x));
      if (bad) ctx.addIssue({ code: 'custom', message: `${bad} is not <person id>:<operation code>` });
      return items.map((x) => ({ personId: Number(x.split(':')[0]), code: x.split(':')[1] }));
    })
    .optional(),
  maxOps: z.coerce.number().int('Whole operations only').min(1, 'At least 1').max(60, 'At most 60').optional(),
  efficiency: z.coerce.number().min(0.2, 'At least 20 %').max(1.2, 'At most 120 %').default(0.7),
  bundleSize: z.coerce.number().int().min(1).max(200).default(10),
  start: calendarDate.optional(),
});
export type LinePlanQuery = z.infer<typeof linePlanQuery>;

export interface OperationDto {
  id: number;
  seq: number;
  code: string;
  name: string;
  section: (typeof LINE_SECTIONS)[number];
  machineType: string;
  sam: number;
  predecessors: string[];
  /** Present only for roles that may see pay or costs. */
  pieceRateMinor?: number | null;
  /** The time study that set `sam`, when one did. */
  timeStudy?: OperationTimeStudy | null;
}

export interface StationDto {
  index: number;
  label: string;
  machineType: string;
  operations: string[];
  /** Standard minutes per garment at this station. */
  timeMin: number;
  idleMin: number;
  /** Per working day at the plan's daily output: standard minutes of work and of capacity. */
  loadPerDayMin: number;
  capacityPerDayMin: number;
  isBottleneck: boolean;
}

/** One person on the shared-operations line: what they sew and how their minutes compare with the cycle. */
export interface StaffedPersonDto {
  /** Null for an extra machinist added by the `people` count beyond the People page. */
  personId: number | null;
  name: string;
  /** Minutes per garment: Σ share × SAM ÷ pace over their operations. */
  loadMin: number;
  idleMin: number;
  /** Load ÷ cycle × 100. */
  loadPct: number;
  isBottleneck: boolean;
  operations: { code: string; machineType: string; share: number; minutes: number; pinned: boolean }[];
}

/**
 * The people present staffed on the sewing operations (planning/line-staffing): each operation shared among the
 * people able to run its machine type, for the most garments a day, solved exactly by HiGHS.
 */
export interface StaffingDto {
  method: 'exact' | 'time-limit';
  /** Relative gap to the proven bound, %, 0 when exact. */
  gapPct: number;
  /** Minutes per garment at the busiest person. */
  cycleMin: number;
  /** Whole garments per working day at the plan's efficiency. */
  garmentsPerDay: number;
  bottleneck: string;
  /** Σ idle minutes per garment over the people planned. */
  idleMin: number;
  people: StaffedPersonDto[];
  machines: Record<string, number>;
  maxOperationsPerPerson: number | null;
}

export interface LinePlanDto {
  batchId: number;
  styleId: number;
  quantity: number;
  dueDate: string;
  start: string;
  mode: 'due' | 'people';
  efficiency: number;
  minutesPerDay: number;
  workdays: number[];
  /** Demo assumptions the plan rests on (staff skills, calendar), in words. */
  assumptions: string[];
  /**
   * The straight line, one machine type per station: null in people mode when the people present are fewer than
   * the stations it needs (the shared-operations plan in `staffing` still plans them).
   */
  balance: {
    problem: 'salbp-1' | 'salbp-2';
    method: 'exact' | 'rpw' | 'partial-search';
    /** Largest station time (min per garment) of the balanced line. */
    cycleTimeMin: number;
    /** Due mode: the takt the due date allows (min per garment), else null. */
    taktMin: number | null;
    stationCount: number;
    /** Balance efficiency at the bottleneck: Σ SAM ÷ (stations × largest station time) × 100. */
    efficiencyPct: number;
    /** Against the cycle time: Σ SAM ÷ (stations × cycle time) × 100 (low when the target is easy). */
    utilisationPct: number;
    balanceDelayPct: number;
    bottleneck: number;
    lowerBound: number;
    sewingSam: number;
    /** Garments per working day the balanced line can make at the plan's efficiency. */
    outputPerDay: number;
    peopleAvailable: number;
  } | null;
  stations: StationDto[];
  /** People mode: the operations shared among the people present, which the sewing schedule follows. Null in due mode. */
  staffing: StaffingDto | null;
  /** People mode: why the straight line (`balance`) is null, in words; else null. */
  staffingNote: string | null;
  /** Machinists planned in people mode (People page or the `people` count). */
  peopleAvailable: number;
  schedule: {
    stages: { name: string; startDate: string; endDate: string; startMinute: number; endMinute: number; daysNeeded: number; people: number; samPerPiece: number }[];
    finishDate: string;
    workingDaysToDue: number | null;
    risk: 'on-time' | 'at-risk' | 'late' | 'no-due-date';
    overtimeMinutesPerDay: number;
    hoursPerDay: number;
    hoursPerWeek: number;
    exceedsIlo: boolean;
    caution: string | null;
  };
  /** Planned garments finished by the end of each working day, cumulative. */
  plannedOutput: { day: string; pieces: number }[];
  /** Load against capacity per section per working day (standard minutes). */
  sectionLoad: { section: string; day: string; load: number; capacity: number }[];
}
