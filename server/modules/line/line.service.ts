import { format } from 'date-fns';
import { can } from '../../../shared/auth/permissions';
import { putOperationsInput, type LinePlanDto, type WorkingCalendarDto, type WorkingCalendarInput, type OperationTimeStudy, type TimeStudyInput, type LinePlanQuery, type OperationDto, type OperationInput } from '../../../shared/schemas/line';
import type { OperationEntity } from '../../entities';
import type { Actor } from '../../auth/require';
import { badRequest, notFound } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { BatchRepository } from '../batches/batch.repository';
import type { StyleRepository } from '../styles/style.repository';
import { checkWorkingHours, exactRateOf, isTimeZone, operationRate, shiftMinutes, studyStandardMinutes, zonedDay, WORKING_HOURS_CAUTION, type StaffLineInput } from '@planning';
import { planLine, staffingProblem, type CrewPerson, type StaffCount, type StaffingOutcome } from './line-plan';
import type { OperationRepository } from './operation.repository';
import type { CalendarRepository } from './studio-calendar.repository';
import { operationsFromXlsx, operationsToXlsx } from './operations-sheet';
import { LISTED_ERRORS } from '../uploads/table-limits';

export interface LineServiceDeps {
  styles: StyleRepository;
  batches: BatchRepository;
  operations: OperationRepository;
  studio: (studioId: number) => Promise<{ currency: string; workingDayHours: number; machines: Record<string, number> } | null>;
  /** Active people per floor section (People page). */
  staff: (studioId: number) => Promise<StaffCount>;
  /** Active people with their skills (People page). */
  crew: (studioId: number) => Promise<CrewPerson[]>;
  /** The studio's working calendar (time zone, working days, shift, holidays). */
  calendar?: CalendarRepository;
  /** People recorded in on a day (attendance); null when no attendance was recorded that day. */
  present?: (studioId: number, day: string) => Promise<Set<number> | null>;
  /** Runs the shared-operations solve (the `line-staffing` job, server/jobs/handlers.ts). */
  solveStaffing: (input: StaffLineInput) => Promise<StaffingOutcome>;
  audit: AuditRepository;
  now: () => Date;
}

/** Piece rates are pay data: only roles that manage pay or read costs see them. */
export const maySeeRates = (actor: Pick<Actor, 'role'>) => can(actor.role, 'pay:manage') || can(actor.role, 'costs:read');

/** An operation row as the client sees it; pieceRateMinor left out unless `withRates`. */
export function presentOperation(o: OperationEntity, withRates: boolean): OperationDto {
  const dto: OperationDto = { id: o.id, seq: o.seq, code: o.code, name: o.name, section: o.section, machineType: o.machineType, sam: o.sam, predecessors: o.predecessors, timeStudy: o.timeStudy ?? null };
  if (withRates) dto.pieceRateMinor = exactRateNumber(o);
  return dto;
}

/** The exact rate as a number for the client (0.125 is exact in the 6 decimals allowed); null without one. */
const exactRateNumber = (o: Pick<OperationEntity, 'pieceRate' | 'pieceRateMinor'>) => (operationRate(o) === '' ? null : Number(operationRate(o)));

const toInput = (o: OperationEntity): OperationInput => ({ code: o.code, name: o.name, section: o.section, machineType: o.machineType, sam: o.sam, predecessors: o.predecessors, pieceRateMinor: exactRateNumber(o) });

/** Codes on a precedence cycle, found by depth-first search (empty when the table is a proper order). */
function cycleCodes(rows: { code: string; predecessors: string[] }[]): string[] {
  const after = new Map(rows.map((r) => [r.code, r.predecessors]));
  const state = new Map<string, 1 | 2>();
  const onCycle = new Set<string>();
  const visit = (c: string, stack: string[]) => {
    if (state.get(c) === 2) return;
    if (state.get(c) === 1) {
      stack.slice(stack.indexOf(c)).forEach((x) => onCycle.add(x));
      return;
    }
    state.set(c, 1);
    for (const p of after.get(c) ?? []) visit(p, [...stack, c]);
    state.set(c, 2);
  };
  rows.forEach((r) => visit(r.code, []));
  return [...onCycle];
}

export type LineService = ReturnType<typeof createLineService>;

/** Operations tables per style and the line plan per batch. */
export function createLineService({ styles, batches, operations, studio, staff, crew, present, calendar, solveStaffing, audit, now }: LineServiceDeps) {
  async function styleOf(actor: Actor, styleId: number) {
    const s = await styles.get(actor.studioId, styleId);
    if (!s) throw notFound('Style');
    return s;
  }

  async function save(actor: Actor, styleId: number, rows: OperationInput[], action: string) {
    const parsed = putOperationsInput.safeParse({ operations: rows });
    if (!parsed.success) {
      const fields: Record<string, string> = {};
      for (const i of parsed.error.issues) fields[i.path.join('.')] ??= i.message;
      throw badRequest(`${Object.keys(fields)[0]}: ${Object.values(fields)[0]}`, fields);
    }
    const cycle = cycleCodes(parsed.data.operations);
    if (cycle.length) {
      const fields = Object.fromEntries(parsed.data.operations.flatMap((o, i) => (cycle.includes(o.code) ? [[`operations.${i}.predecessors`, `Loop in the order: ${cycle.join(' → ')}`]] : [])));
      throw badRequest(`operations: the order loops (${cycle.join(', ')})`, fields);
    }
    const before = (await operations.list(actor.studioId, styleId)).map(toInput);
    const withRates = maySeeRates(actor);
    const prior = new Map(before.map((b) => [b.code, b.pieceRateMinor ?? null]));
    const saved = await operations.replace(actor.studioId, styleId, parsed.data.operations.map((o) => {
      // A role that cannot see rates cannot change them either: keep what was stored.
      const rate = withRates ? (o.pieceRateMinor ?? null) : (prior.get(o.code) ?? null);
      const exact = rate == null ? null : exactRateOf(rate);
      return { ...o, pieceRateMinor: exact?.pieceRateMinor ?? null, pieceRate: exact?.pieceRate ?? null };
    }));
    await audit.record(actor, action, 'operations', styleId, before, saved.map(toInput));
    return saved.map((o) => presentOperation(o, withRates));
  }

  return {
    async list(actor: Actor, styleId: number) {
      await styleOf(actor, styleId);
      return (await operations.list(actor.studioId, styleId)).map((o) => presentOperation(o, maySeeRates(actor)));
    },
    async put(actor: Actor, styleId: number, rows: OperationInput[]) {
      await styleOf(actor, styleId);
      return save(actor, styleId, rows, 'update_operations');
    },
    /**
     * Set an operation's standard minutes from a time-study sheet (planning/time-study, ILO method) and keep the
     * sheet on the operation. Standard minutes are stored to 0.0001 min.
     */
    async timeStudy(actor: Actor, styleId: number, operationId: number, input: TimeStudyInput) {
      await styleOf(actor, styleId);
      const op = (await operations.list(actor.studioId, styleId)).find((o) => o.id === operationId);
      if (!op) throw notFound('Operation');
      const elements = input.elements.map((e) => ({ name: e.name, frequency: e.frequency ?? 1, observations: e.observations }));
      let result;
      try {
        result = studyStandardMinutes({
          elements: elements.map((e) => ({ name: e.name, frequency: e.frequency, observations: e.observations.map((o) => ({ minutes: o.seconds / 60, rating: o.rating })) })),
          relaxationPercent: input.relaxationPercent,
          contingencyPercent: input.contingencyPercent ?? 0,
        });
      } catch (e) {
        if (e instanceof RangeError) throw badRequest(`elements: ${e.message}`, { elements: e.message });
        throw e;
      }
      const sam = Math.round(result.standardMinutes * 10_000) / 10_000;
      if (!(sam > 0) || sam > 600) throw badRequest('elements: the study gives standard minutes outside 0–600', { elements: 'Standard minutes must be above 0 and at most 600' });
      const study: OperationTimeStudy = {
        elements: elements.map((e, i) => ({ ...e, basicMinutes: result.elements[i].basicMinutes })),
        relaxationPercent: input.relaxationPercent,
        contingencyPercent: input.contingencyPercent ?? 0,
        basicMinutes: result.basicMinutes,
        standardMinutes: sam,
        studiedAt: now().toISOString(),
        studiedBy: actor.name,
      };
      const saved = await operations.setStudy(actor.studioId, styleId, op.id, sam, study);
      await audit.record(actor, 'time_study', 'operation', op.id, { sam: op.sam }, { sam, study });
      return presentOperation(saved, maySeeRates(actor));
    },
    /** The studio's working calendar with its weekly hours and the usual caution. */
    async calendar(actor: Actor): Promise<WorkingCalendarDto> {
      if (!calendar) throw notFound('Calendar');
      const c = await calendar.get(actor.studioId);
      const check = checkWorkingHours(c.working.minutesPerDay, c.working.workdays.length);
      return {
        ...c.calendar,
        minutesPerDay: c.working.minutesPerDay,
        hoursPerWeek: Math.round(check.hoursPerWeek * 100) / 100,
        today: zonedDay(now(), c.calendar.timeZone),
        entered: c.entered,
        caution: WORKING_HOURS_CAUTION,
        exceedsIlo: check.exceedsDaily || check.exceedsWeekly,
      };
    },
    async saveCalendar(actor: Actor, input: WorkingCalendarInput): Promise<WorkingCalendarDto> {
      if (!calendar) throw notFound('Calendar');
      if (!isTimeZone(input.timeZone)) throw badRequest('timeZone: not a time zone name, e.g. Africa/Nairobi', { timeZone: 'Not a time zone name, e.g. Africa/Nairobi' });
      const breakMinutes = input.breakMinutes;
      try {
        shiftMinutes(input.shiftStart, input.shiftEnd, breakMinutes);
      } catch (e) {
        if (e instanceof RangeError) throw badRequest(`breakMinutes: ${e.message}`, { breakMinutes: 'The break must be shorter than the shift' });
        throw e;
      }
      const before = await calendar.get(actor.studioId);
      const next = {
        timeZone: input.timeZone,
        workdays: [...input.workdays].sort((a, b) => a - b),
        shiftStart: input.shiftStart,
        shiftEnd: input.shiftEnd,
        breakMinutes,
        holidays: [...new Set(input.holidays ?? [])].sort(),
        overtimeLimitHoursPerWeek: input.overtimeLimitHoursPerWeek ?? null,
      };
      await calendar.save(actor.studioId, next);
      await audit.record(actor, 'working_calendar', 'studio', actor.studioId, before.entered ? before.calendar : undefined, next);
      return this.calendar(actor);
    },
    async copy(actor: Actor, styleId: number, fromStyleId: number) {
      await styleOf(actor, styleId);
      if (fromStyleId === styleId) throw badRequest('fromStyleId: choose another style', { fromStyleId: 'Choose another style' });
      await styleOf(actor, fromStyleId);
      const rows = (await operations.list(actor.studioId, fromStyleId)).map(toInput);
      if (rows.length === 0) throw badRequest('fromStyleId: that style has no operations', { fromStyleId: 'That style has no operations' });
      return save(actor, styleId, rows, 'copy_operations');
    },
    async exportXlsx(actor: Actor, styleId: number) {
      const style = await styleOf(actor, styleId);
      const st = await studio(actor.studioId);
      const rows = (await operations.list(actor.studioId, styleId)).map(toInput);
      return { body: await operationsToXlsx(rows, { currency: st?.currency ?? 'KES', withRates: maySeeRates(actor), created: now() }), filename: `${style.code}-operations.xlsx` };
    },
    async importXlsx(actor: Actor, styleId: number, buf: Buffer | undefined) {
      await styleOf(actor, styleId);
      if (!buf) throw badRequest('file: attach an XLSX file', { file: 'Attach an XLSX file' });
      const st = await studio(actor.studioId);
      const res = await operationsFromXlsx(buf, st?.currency ?? 'KES');
      if (!res.ok) {
        const fields = Object.fromEntries(res.errors.slice(0, LISTED_ERRORS).map((e) => [`row ${e.row}, column ${e.column}`, e.message]));
        const count = `${res.errors.length} problem${res.errors.length > 1 ? 's' : ''}${res.errors.length > LISTED_ERRORS ? `, the first ${LISTED_ERRORS} listed` : ''}`;
        throw badRequest(`row ${res.errors[0].row}, column ${res.errors[0].column}: ${res.errors[0].message} (${count}; nothing imported)`, fields);
      }
      return save(actor, styleId, res.rows, 'import_operations');
    },
    async plan(actor: Actor, batchId: number, query: LinePlanQuery): Promise<LinePlanDto> {
      const batch = await batches.get(actor.studioId, batchId);
      if (!batch) throw notFound('Batch');
      const ops = await operations.list(actor.studioId, batch.styleId);
      const st = await studio(actor.studioId);
      const quantity = Object.values(batch.quantities).reduce((a, b) => a + b, 0);
      // People present: those recorded in today when attendance was taken, else everyone active on the People page.
      const cal = calendar ? await calendar.get(actor.studioId) : null;
      // Today is the studio's own day, in its time zone.
      const today = cal ? zonedDay(now(), cal.calendar.timeZone) : format(now(), 'yyyy-MM-dd');
      const everyone = await crew(actor.studioId);
      const inToday = present ? await present(actor.studioId, today) : null;
      const people = inToday ? everyone.filter((p) => inToday.has(p.id)) : everyone;
      const activeStaff = await staff(actor.studioId);
      const count = (role: string) => people.filter((p) => p.role === role).length;
      const staffNow = inToday ? { sewing: count('machinist'), cutting: count('cutter'), finishing: count('finisher') } : activeStaff;
      const minutesPerDay = cal?.entered ? cal.working.minutesPerDay : Math.round((st?.workingDayHours ?? 8) * 60);
      const machines = st?.machines ?? {};
      // People mode shares the operations among the people present: the solve runs as a job.
      const asked = query.mode === 'people' ? staffingProblem({ operations: ops, crew: people, machines, minutesPerDay, query }) : null;
      const staffing = asked && 'problem' in asked ? await solveStaffing(asked.problem) : null;
      try {
        const plan = planLine({
          batchId: batch.id, styleId: batch.styleId, quantity, dueDate: batch.dueDate, today,
          minutesPerDay, operations: ops, query, staff: staffNow, crew: people, machines, staffing,
          calendar: cal ? { workdays: cal.working.workdays, holidays: cal.working.holidays, timeZone: cal.calendar.timeZone, entered: cal.entered } : undefined,
        });
        const limit = cal?.calendar.overtimeLimitHoursPerWeek;
        const weeklyOvertime = (plan.schedule.overtimeMinutesPerDay * plan.workdays.length) / 60;
        if (limit != null && plan.schedule.overtimeMinutesPerDay > 0 && weeklyOvertime > limit + 1e-9) {
          plan.assumptions.push(`The due date needs about ${Math.round(weeklyOvertime * 10) / 10} h of overtime a week, above the studio's limit of ${limit} h.`);
        }
        plan.assumptions.push(
          inToday
            ? `People present from today's attendance (${today}): ${people.length} of ${everyone.length} active.`
            : `No attendance recorded today (${today}): everyone active on the People page is taken as present.`,
        );
        return plan;
      } catch (e) {
        if (e instanceof RangeError) throw badRequest(`plan: ${e.message}`, { plan: e.message });
        throw e;
      }
    },
  };
}
