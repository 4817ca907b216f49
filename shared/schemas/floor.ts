import { z } from 'zod';
import { calendarDate, safeText } from './common';

/** Minutes after logging during which the person who logged may undo it. */
export const UNDO_WINDOW_MS = 2 * 60 * 1000;

/** Text a bundle ticket's QR code carries: `SR-B:<batchId>:<bundleNumber>`. */
export const BUNDLE_QR_PREFIX = 'SR-B';

/** Reads a bundle ticket's QR text; null when it is not one of ours. */
export function parseBundleQr(text: string): { batchId: number; bundleNumber: number } | null {
  const m = /^SR-B:(\d{1,9}):(\d{1,9})$/.exec(text.trim());
  if (!m) return null;
  return { batchId: Number(m[1]), bundleNumber: Number(m[2]) };
}

/**
 * The person a floor log's idempotency key was made for: devices stamp each key `u<userId>-…` when the
 * log is made, so a log queued on a shared phone can be told apart from the next person's. Null when the
 * key carries no stamp (scripts and imports make their own keys).
 */
export function idempotencyKeyAuthor(key: string): number | null {
  const m = /^u(\d{1,9})-/.exec(key);
  return m ? Number(m[1]) : null;
}

export const OPERATION_SECTIONS = ['cutting', 'sewing', 'finishing'] as const;
export type OperationSection = (typeof OPERATION_SECTIONS)[number];

/** How far back a log that waited offline may be dated: a shift, a night and a weekend. Older ones are dated on arrival. */
export const OFFLINE_LOG_MAX_AGE_HOURS = 72;
/** Device clocks run a little ahead; a doneAt up to this far past the server's clock reads as now. */
export const OFFLINE_LOG_CLOCK_SKEW_MS = 5 * 60_000;

/**
 * The time a log is dated: the device's doneAt when it is plausible (not older than the offline window, not
 * ahead of the server by more than the clock skew, never later than now), else the time it arrived.
 */
export function logDate(doneAt: string | undefined, arrived: Date): Date {
  if (!doneAt) return arrived;
  const t = Date.parse(doneAt);
  if (!Number.isFinite(t)) return arrived;
  const now = arrived.getTime();
  if (t > now + OFFLINE_LOG_CLOCK_SKEW_MS || t < now - OFFLINE_LOG_MAX_AGE_HOURS * 3_600_000) return arrived;
  return new Date(Math.min(t, now));
}

/** Log one operation done on one bundle. A quality check also says pass or fail. */
export const logWorkInput = z
  .object({
    bundleNumber: z.number({ error: 'Enter the bundle number' }).int('Whole numbers only').positive('Bundle numbers start at 1'),
    batchId: z.number().int().positive().optional(),
    operationId: z.number({ error: 'Pick an operation' }).int().positive('Pick an operation'),
    idempotencyKey: z
      .string()
      .min(8, 'Key too short')
      .max(80, 'Key too long')
      .regex(/^[A-Za-z0-9_.:-]+$/, 'Letters, digits and - _ . : only'),
    outcome: z.enum(['pass', 'fail']).optional(),
    defect: safeText(200).optional(),
    /** On a failed check: the operation to do again (rework). */
    reworkOperationId: z.number().int().positive().optional(),
    /**
     * When the work was done, for a log that waited on the device for the network. The server keeps it when it
     * is in the last OFFLINE_LOG_MAX_AGE_HOURS and not ahead of its own clock; otherwise the log is dated on arrival.
     */
    doneAt: z.iso.datetime({ offset: true, error: 'A date and time, e.g. 2026-12-05T09:30:00Z' }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.outcome === 'fail' && !v.defect) ctx.addIssue({ code: 'custom', path: ['defect'], message: 'Say what the defect is' });
    if (v.outcome === 'fail' && !v.reworkOperationId)
      ctx.addIssue({ code: 'custom', path: ['reworkOperationId'], message: 'Pick the operation to send back' });
  });
export type LogWorkInput = z.input<typeof logWorkInput>;

export const bundleLookupQuery = z.object({
  number: z.coerce.number().int('Whole numbers only').positive('Bundle numbers start at 1'),
  batchId: z.coerce.number().int().positive().optional(),
});

/** Every bundle with a typed number (more than one only for bundles cut before numbers were studio-wide). */
export const bundleMatchesQuery = z.object({
  number: z.coerce.number().int('Whole numbers only').positive('Bundle numbers start at 1'),
});

/** One bundle a typed number may mean, to pick from when it is in more than one batch. */
export interface BundleChoiceDto {
  batchId: number;
  batchCode: string;
  number: number;
  size: string;
  styleName: string;
  batchStatus: string;
}

export const batchIdParam = z.object({ batchId: z.coerce.number().int().positive() });

export const periodQuery = z
  .object({ from: calendarDate, to: calendarDate })
  .refine((v) => v.from <= v.to, { path: ['to'], message: 'The end must not be before the start' });
export type PeriodQuery = z.infer<typeof periodQuery>;

/** An operation as the floor sees it; the piece rate is left out for floor roles. */
export interface FloorOperationDto {
  id: number;
  code: string;
  name: string;
  section: OperationSection;
  machineType: string;
  sam: number;
  predecessors: string[];
  /** Operations this person does first (their section, then ones they logged before). */
  isMine: boolean;
  /** A quality check: logged with pass or fail. */
  isCheck: boolean;
}

/** One operation's state on one bundle. */
export interface BundleOperationState {
  operationId: number;
  done: boolean;
  /** Current attempt (0 first time, counts up after rework). */
  attempt: number;
  doneBy: string | null;
  doneAt: string | null;
}

export interface BundleDto {
  id: number;
  batchId: number;
  batchCode: string;
  number: number;
  size: string;
  shadeLot: string;
  plyFrom: number;
  plyTo: number;
  pieces: number;
  styleName: string;
  operations: FloorOperationDto[];
  states: BundleOperationState[];
  /** The style's spec sheet points a checker measures against. */
  specNotes: string[];
}

export interface WorkLogDto {
  id: number;
  bundleId: number;
  bundleNumber: number;
  batchId: number;
  operationId: number;
  operationCode: string;
  operationName: string;
  attempt: number;
  pieces: number;
  earnedMinutes: number;
  /** What this log pays the person who logged it (0 for rework). */
  payMinor: number;
  currency: string;
  outcome: string;
  defect: string;
  userId: number;
  userName: string;
  createdAt: string;
  /** Until when the person who logged it may undo it. */
  undoUntil: string;
}

export interface LogWorkResult {
  log: WorkLogDto;
  /** Predecessors not yet done on this bundle (logged anyway). */
  warnings: string[];
}

export interface TodayDto {
  day: string;
  logs: WorkLogDto[];
  pieces: number;
  bundleOps: number;
  earningsMinor: number;
  currency: string;
}

export interface OperationProgress {
  operationId: number;
  code: string;
  name: string;
  section: OperationSection;
  bundlesDone: number;
  piecesDone: number;
  /** Bundles whose predecessors are done but this operation is not: work waiting at this operation. */
  bundlesReady: number;
  bundlesTotal: number;
}

export interface SectionProgress {
  section: OperationSection;
  piecesDone: number;
  piecesTotal: number;
  /** Cutting with a cut plan: the percentage of its lays cut (`laysDone` of `laysTotal`). */
  percent: number;
  laysDone?: number;
  laysTotal?: number;
}

export interface DailyOutput {
  day: string;
  pieces: number;
}

export interface PersonEfficiency {
  userId: number;
  name: string;
  role: string;
  pieces: number;
  earnedMinutes: number;
  attendedMinutes: number;
  /** Earned ÷ attended minutes × 100; null without attendance. */
  efficiencyPercent: number | null;
  payMinor: number;
}

export interface ProgressDto {
  batchId: number;
  batchCode: string;
  totalPieces: number;
  bundles: number;
  operations: OperationProgress[];
  sections: SectionProgress[];
  /** Bundles by stage: not started, in sewing, in finishing, packed. */
  stages: { stage: 'cut' | 'sewing' | 'finishing' | 'packed'; bundles: number }[];
  daily: { day: string; pieces: number; planned: number }[];
  people: PersonEfficiency[];
  packedPieces: number;
}

/** GET /floor/attendance?day=: one day's attendance (default: today in the studio). */
export const attendanceQuery = z.object({ day: calendarDate.optional() });

/** PUT /floor/attendance: minutes each person was at work on a day (0 = absent). */
export const putAttendanceInput = z.object({
  day: calendarDate,
  entries: z
    .array(
      z.object({
        userId: z.number({ error: 'Pick a person' }).int().positive('Pick a person'),
        minutes: z.number({ error: 'Give minutes' }).int('Whole minutes only').min(0, 'Cannot be negative').max(1440, 'At most 24 hours'),
      }),
    )
    .min(1, 'Enter at least one person')
    .max(500, 'At most 500 people'),
});
export type PutAttendanceInput = z.infer<typeof putAttendanceInput>;

/** One person's attendance on a day: minutes null when nothing was recorded. */
export interface AttendanceRowDto {
  userId: number;
  name: string;
  role: string;
  minutes: number | null;
}

export interface AttendanceDayDto {
  day: string;
  /** Set when an approved pay period covers the day: its attendance is frozen. */
  frozenByPeriodId: number | null;
  people: AttendanceRowDto[];
  /** People with minutes above 0: who is in. */
  present: number;
}

/** A person's own count and earnings over some days (their own studio's days). */
export interface MyFiguresDto {
  fromDay: string;
  toDay: string;
  /** Pieces of first attempts (rework is not counted again). */
  pieces: number;
  /** Bundle operations logged, rework included. */
  bundleOps: number;
  /** Piece pay: each operation's pieces × rate, rounded once, as the pay period pays it. */
  earningsMinor: number;
}

/** GET /floor/me/summary: today, this week (Monday on) and the pay period not yet approved. */
export interface MySummaryDto {
  currency: string;
  today: MyFiguresDto;
  week: MyFiguresDto;
  /** Work not yet in an approved pay period: what the next approval pays (before any top-up or premium). */
  payPeriod: MyFiguresDto;
}

/** A bundle operation sent back by a failed check to the person who did it: theirs to redo (not paid again). */
export interface ReworkDto {
  bundleNumber: number;
  batchId: number;
  batchCode: string;
  operationId: number;
  operationCode: string;
  operationName: string;
  /** The attempt to log now (1 for the first rework). */
  attempt: number;
  defect: string;
  checkedBy: string;
  checkedAt: string | null;
}
