import { addDays, format, parseISO } from 'date-fns';
import { balanceLine, countWorkingDays, profileLoad, scheduleBatch, workingDays, type LineBalance, type StaffedLine, type StaffLineInput, type WorkingCalendar } from '@planning';
import type { LinePlanDto, LinePlanQuery, StaffingDto } from '../../../shared/schemas/line';
import { defaultSkills } from '../../../shared/schemas/people';
import { badRequest } from '../../errors';

/** Plain operation data the plan needs. */
export interface PlanOperation {
  code: string;
  section: 'cutting' | 'sewing' | 'finishing';
  machineType: string;
  sam: number;
  predecessors: string[];
}

/** Active people per floor section, from the People page. */
export interface StaffCount {
  sewing: number;
  cutting: number;
  finishing: number;
}

/** An active person from the People page with the skills the plan uses (their own or their role's defaults). */
export interface CrewPerson {
  id: number;
  name: string;
  role: string;
  skills: Record<string, number>;
  /** True when the owner set the skills (not the role's defaults). */
  skillsSet: boolean;
}

/** Wall-clock limit of the shared-operations solve inside a request, seconds. */
export const STAFF_TIME_LIMIT_S = 5;

/**
 * Floor assumptions (listed on the page): every machinist runs every sewing machine type; Monday to
 * Friday; breaks already out of the studio's working day.
 */
export const WORKDAYS = [1, 2, 3, 4, 5];
const DAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];

export interface PlanInput {
  batchId: number;
  styleId: number;
  quantity: number;
  dueDate: string;
  today: string;
  minutesPerDay: number;
  operations: PlanOperation[];
  query: LinePlanQuery;
  staff: StaffCount;
  /** Active people, for the shared-operations plan. */
  crew: CrewPerson[];
  /** The studio's machines by type; a type not listed is not limited. */
  machines: Record<string, number>;
  /** The solved {@link staffingProblem} (people mode), or null when it was not asked for. */
  staffing: StaffingOutcome | null;
  /** The studio's working days and holidays (its working calendar); default Monday to Friday, none. */
  calendar?: { workdays: number[]; holidays: string[]; timeZone: string; entered: boolean };
}

/** What the line-staffing job answered: the plan, or the core's RangeError message. */
export type StaffingOutcome = { line: StaffedLine } | { rangeError: string };

const r2 = (n: number) => Math.round(n * 100) / 100;
const people = (n: number, role: string) => `${n} ${role}${n === 1 ? '' : 's'}`;

/**
 * Balance the sewing operations and schedule the batch. Due mode (SALBP-1): the sewing window is the working days
 * to the due date less one day each for cutting and finishing; cycle time = window minutes × efficiency ÷ garments,
 * never above the longest station a person can hold in a day. People mode (SALBP-2): stations = people present,
 * when there are enough for one machine type per station; people mode also shares the sewing operations among the
 * people present by their skills and the studio's machines (`staffing`, planning/line-staffing, solved by the
 * service as a job), which plans any number of people, and the sewing schedule runs at that plan's cycle.
 */
export function planLine(input: PlanInput): LinePlanDto {
  const { query: q, quantity } = input;
  const calendar: WorkingCalendar = { workdays: input.calendar?.workdays ?? WORKDAYS, minutesPerDay: input.minutesPerDay, holidays: input.calendar?.holidays ?? [] };
  const start = q.start ?? workingDays(calendar, format(addDays(parseISO(input.today), 1), 'yyyy-MM-dd'), 1)[0];
  const sewing = input.operations.filter((o) => o.section === 'sewing');
  if (sewing.length === 0) throw badRequest('operations: the style has no sewing operations to balance', { operations: 'Add sewing operations first' });
  const sewingCodes = new Set(sewing.map((o) => o.code));
  const tasks = sewing.map((o) => ({ id: o.code, time: o.sam, after: o.predecessors.filter((p) => sewingCodes.has(p)), machine: o.machineType }));
  const sewingSam = sewing.reduce((s, o) => s + o.sam, 0);
  const samOf = (section: string) => input.operations.filter((o) => o.section === section).reduce((s, o) => s + o.sam, 0);
  const daysToDue = countWorkingDays(calendar, start, input.dueDate);
  // A section with nobody on the People page is planned with one person, and the page says so.
  const crew = { sewing: Math.max(1, input.staff.sewing), cutting: Math.max(1, input.staff.cutting), finishing: Math.max(1, input.staff.finishing) };
  const sewingCrew = sewingCrewOf(input.crew, sewing, q.mode === 'people' ? q.people : undefined);
  const peopleAvailable = q.people ?? Math.max(1, sewingCrew.length);
  let balance: LineBalance | null;
  let taktMin: number | null = null;
  let straightNote: string | null = null;
  const staffed: Staffed = q.mode === 'people' ? staff(input, sewing, sewingCrew) : { staffing: null, cycle: 0, note: 'not asked for in due mode', field: 'mode' };
  if (q.mode === 'people') {
    if (!staffed.staffing) throw badRequest(`people: ${staffed.note}`, { [staffed.field]: staffed.note });
    try {
      balance = balanceLine({ tasks, stations: peopleAvailable });
    } catch {
      // Too few people for one machine type per station: the shared-operations plan still plans them.
      const least = balanceLine({ tasks, cycleTime: sewingSam }).count;
      straightNote = `A straight line with one machine type per station needs at least ${least} people; the plan shares operations among the ${peopleAvailable} present.`;
      balance = null;
    }
  } else {
    const windowDays = Math.max(1, daysToDue - 2);
    const longest = Math.max(...sewing.map((o) => o.sam));
    const cycle = Math.max(longest, Math.min((windowDays * input.minutesPerDay * q.efficiency) / Math.max(quantity, 1), input.minutesPerDay * q.efficiency));
    // SALBP-1 gives the fewest stations for the takt; SALBP-2 on that count then spreads the work as evenly as it
    // can, so the bottleneck is the real one rather than whichever feasible split the search met first.
    const fewest = balanceLine({ tasks, cycleTime: r2(cycle) });
    const even = balanceLine({ tasks, stations: fewest.count });
    taktMin = r2(cycle);
    balance = { ...even, problem: 'salbp-1', method: fewest.method === 'exact' && even.method === 'exact' ? 'exact' : fewest.method, lowerBound: Math.ceil(sewingSam / cycle - 1e-9) };
  }
  const maxStation = balance ? Math.max(...balance.stations.map((s) => s.time)) : 0;
  const outputPerDay = balance ? Math.floor((input.minutesPerDay * q.efficiency) / maxStation + 1e-9) : 0;
  const machineOf = new Map(sewing.map((o) => [o.code, o.machineType]));
  const planned = Math.min(outputPerDay, quantity);
  const stations = (balance?.stations ?? []).map((s, i) => ({
    index: i,
    label: `S${i + 1}`,
    machineType: machineOf.get(s.tasks[0]) ?? '',
    operations: s.tasks,
    timeMin: r2(s.time),
    idleMin: r2(maxStation - s.time),
    loadPerDayMin: r2(s.time * planned),
    capacityPerDayMin: r2(input.minutesPerDay * q.efficiency),
    isBottleneck: i === balance!.bottleneck,
  }));
  const stationCount = balance?.count ?? 0;
  // The line runs at its bottleneck: people × bottleneck time per garment over those people. People mode runs the
  // shared-operations plan (the line the studio really runs); due mode the straight line for the takt.
  // A bundle visits every station (every person with work on the shared line) before it leaves sewing.
  const sewingStage = q.mode === 'people' && staffed.staffing
    ? { samPerPiece: staffed.cycle * sewingCrew.length, people: sewingCrew.length, stations: Math.max(1, staffed.staffing.people.filter((x) => x.operations.length > 0).length) }
    : { samPerPiece: maxStation * stationCount, people: stationCount, stations: stationCount };
  const stages = [
    { name: 'cutting', samPerPiece: samOf('cutting'), people: crew.cutting, efficiency: q.efficiency },
    { name: 'sewing', ...sewingStage, efficiency: q.efficiency },
    { name: 'finishing', samPerPiece: samOf('finishing'), people: crew.finishing, efficiency: q.efficiency },
  ].filter((s) => s.samPerPiece > 0);
  const schedule = scheduleBatch({ quantity, bundleSize: q.bundleSize, stages, calendar, start, due: input.dueDate });
  const last = schedule.stages[schedule.stages.length - 1];
  const days = workingDays(calendar, start, Math.max(1, Math.ceil(schedule.finishMinute / input.minutesPerDay - 1e-9), daysToDue));
  const plannedOutput = days.map((day, d) => {
    const end = (d + 1) * input.minutesPerDay;
    const f = last.endMinute > last.startMinute ? (end - last.startMinute) / (last.endMinute - last.startMinute) : 1;
    return { day, pieces: Math.max(0, Math.min(quantity, Math.floor(quantity * Math.min(1, Math.max(0, f)) + 1e-9))) };
  });
  // Each section's load placed from the day its stage starts, filled to capacity day by day.
  const sectionLoad = stages.flatMap((st, k) => {
    const [l] = profileLoad([{ section: st.name, loadMinutes: quantity * st.samPerPiece, people: st.people, efficiency: q.efficiency }], calendar, schedule.stages[k].startDate);
    return l.days.map((d) => ({ section: l.section, day: d.date, load: r2(d.load), capacity: r2(d.capacity) }));
  });
  return {
    batchId: input.batchId,
    styleId: input.styleId,
    quantity,
    dueDate: input.dueDate,
    start,
    mode: q.mode,
    efficiency: q.efficiency,
    minutesPerDay: input.minutesPerDay,
    workdays: calendar.workdays,
    assumptions: [
      `Staff from the People page: ${people(input.staff.sewing, 'machinist')}, each taken to run every sewing machine type; ${people(input.staff.cutting, 'cutter')}; ${people(input.staff.finishing, 'finisher')}.`,
      ...(['sewing', 'cutting', 'finishing'] as const)
        .filter((s) => input.staff[s] === 0)
        .map((s) => `Nobody active for ${s} on the People page: planned with one person.`),
      input.calendar?.entered
        ? `Working calendar: ${calendar.workdays.map((d) => DAY_NAMES[d]).join(', ')}, ${r2(input.minutesPerDay / 60)} h a day, ${calendar.holidays.length ? `${calendar.holidays.length} holiday${calendar.holidays.length === 1 ? '' : 's'}` : 'no holidays'}; days in ${input.calendar.timeZone}.`
        : `Working week Monday to Friday, ${input.minutesPerDay / 60} h a day (the studio's working day), no holidays entered.`,
      `Operator efficiency ${Math.round(q.efficiency * 100)} %; one machine type per station; bundles of ${q.bundleSize}.`,
      `Shared operations: ${people(sewingCrew.length, 'person')} at the line, each running the machine types on their skills (People page) at their pace; ${Object.keys(input.machines).length ? `machines ${Object.entries(input.machines).map(([t, n]) => `${n} ${t}`).join(', ')}` : 'no machine counts entered (not limited)'}.`,
      'Minutes (SAM) are the demo estimates of the operations table, not published standard times.',
    ],
    balance: balance && {
      problem: balance.problem,
      method: balance.method,
      cycleTimeMin: r2(balance.cycleTime),
      taktMin,
      stationCount,
      efficiencyPct: r2(balance.efficiencyAtBottleneck),
      utilisationPct: r2(taktMin ? (100 * sewingSam) / (stationCount * taktMin) : balance.efficiency),
      balanceDelayPct: r2(balance.balanceDelay),
      bottleneck: balance.bottleneck,
      lowerBound: r2(balance.lowerBound),
      sewingSam: r2(sewingSam),
      outputPerDay,
      peopleAvailable,
    },
    stations,
    staffing: staffed.staffing,
    staffingNote: straightNote,
    peopleAvailable,
    schedule: {
      stages: schedule.stages.map((s, k) => ({ name: s.name, startDate: s.startDate, endDate: s.endDate, startMinute: r2(s.startMinute), endMinute: r2(s.endMinute), daysNeeded: s.daysNeeded, people: stages[k].people, samPerPiece: r2(stages[k].samPerPiece) })),
      finishDate: schedule.finishDate,
      workingDaysToDue: schedule.workingDaysToDue,
      risk: schedule.risk,
      overtimeMinutesPerDay: Number.isFinite(schedule.overtimeMinutesPerDay) ? r2(schedule.overtimeMinutesPerDay) : -1,
      hoursPerDay: r2(schedule.hours.hoursPerDay),
      hoursPerWeek: r2(schedule.hours.hoursPerWeek),
      exceedsIlo: schedule.hours.exceedsDaily || schedule.hours.exceedsWeekly,
      caution: schedule.hours.caution,
    },
    plannedOutput,
    sectionLoad,
  };
}

/**
 * The people who sew: active machinists, plus anyone of another role whose skills the owner set to a machine type
 * of the sewing operations. With `count` (people mode), the first `count` of them; beyond the People page, extra
 * machinists with a machinist's default skills.
 */
export function sewingCrewOf(crew: CrewPerson[], sewing: PlanOperation[], count: number | undefined): { personId: number | null; name: string; skills: Record<string, number> }[] {
  const types = new Set(sewing.map((o) => o.machineType));
  const sews = crew.filter((p) => p.role === 'machinist' || (p.skillsSet && Object.keys(p.skills).some((t) => types.has(t) && p.skills[t] > 0)));
  const out: { personId: number | null; name: string; skills: Record<string, number> }[] = sews.map((p) => ({ personId: p.id, name: p.name, skills: p.skills }));
  if (count === undefined) return out;
  for (let k = 1; out.length < count; k++) out.push({ personId: null, name: `Extra machinist ${k}`, skills: defaultSkills('machinist') });
  return out.slice(0, count);
}

type Staffed = { staffing: StaffingDto; cycle: number; note: null; field: null } | { staffing: null; cycle: 0; note: string; field: string };

const crewIds = (crew: ReturnType<typeof sewingCrewOf>) => crew.map((p, i) => (p.personId === null ? `extra-${i}` : String(p.personId)));

/**
 * The shared-operations problem for the people at the line (input to planning/line-staffing), or why there is none
 * (`note`, with the query field to blame). Pure: the service runs the solve as a job and hands the answer to
 * {@link planLine}.
 */
export function staffingProblem(input: Omit<PlanInput, 'staffing' | 'batchId' | 'styleId' | 'quantity' | 'dueDate' | 'today' | 'staff'>): { problem: StaffLineInput } | { note: string; field: string } {
  const q = input.query;
  const sewing = input.operations.filter((o) => o.section === 'sewing');
  const crew = sewingCrewOf(input.crew, sewing, q.people);
  if (sewing.length === 0) return { note: 'the style has no sewing operations', field: 'operations' };
  if (crew.length === 0) return { note: 'nobody on the People page can sew: add a machinist or give someone a sewing machine skill', field: 'people' };
  const ids = crewIds(crew);
  const codes = new Set(sewing.map((o) => o.code));
  for (const pin of q.pins ?? []) {
    if (!ids.includes(String(pin.personId))) return { note: `pins: person ${pin.personId} is not at the line`, field: 'pins' };
    if (!codes.has(pin.code)) return { note: `pins: ${pin.code} is not a sewing operation of this style`, field: 'pins' };
  }
  return {
    problem: {
      operations: sewing.map((o) => ({ id: o.code, minutes: o.sam, machine: o.machineType })),
      people: crew.map((p, i) => ({ id: ids[i], efficiency: p.skills })),
      machines: input.machines,
      maxOperationsPerPerson: q.maxOps,
      minutesPerDay: input.minutesPerDay * q.efficiency,
      pins: (q.pins ?? []).map((pin) => ({ person: String(pin.personId), operation: pin.code })),
      timeLimitSeconds: STAFF_TIME_LIMIT_S,
    },
  };
}

/** Shares of the sewing operations among the crew, from the solved problem, or why there is no such plan. */
function staff(input: PlanInput, sewing: PlanOperation[], crew: ReturnType<typeof sewingCrewOf>): Staffed {
  const q = input.query;
  const fail = (note: string, field = 'people'): Staffed => ({ staffing: null, cycle: 0, note, field });
  const asked = staffingProblem(input);
  if ('note' in asked) return fail(asked.note, asked.field);
  if (!input.staffing) return fail('the shared-operations plan was not made', 'people');
  const ids = crewIds(crew);
  const effPerDay = input.minutesPerDay * q.efficiency;
  try {
    if ('rangeError' in input.staffing) throw new RangeError(input.staffing.rangeError);
    const r = input.staffing.line;
    const byId = new Map(ids.map((id, i) => [id, crew[i]]));
    const machineOf = new Map(sewing.map((o) => [o.code, o]));
    const pinned = new Set((q.pins ?? []).map((pin) => `${pin.personId}:${pin.code}`));
    const people = r.loads.map((l) => {
      const c = byId.get(l.person)!;
      return {
        personId: c.personId,
        name: c.name,
        loadMin: r2(l.minutes),
        idleMin: r2(l.idle),
        loadPct: r2((100 * l.minutes) / r.cycleMinutes),
        isBottleneck: l.person === r.bottleneck,
        operations: r.assignments.filter((a) => a.person === l.person).map((a) => {
          const op = machineOf.get(a.operation)!;
          return { code: a.operation, machineType: op.machineType, share: Math.round(a.share * 1000) / 1000, minutes: r2((a.share * op.sam) / c.skills[op.machineType]), pinned: pinned.has(`${l.person}:${a.operation}`) };
        }),
      };
    });
    return {
      staffing: {
        method: r.method,
        gapPct: r2(100 * r.gap),
        cycleMin: r2(r.cycleMinutes),
        garmentsPerDay: Math.floor(effPerDay / r.cycleMinutes + 1e-9),
        bottleneck: byId.get(r.bottleneck)!.name,
        idleMin: r2(r.loads.reduce((a, l) => a + l.idle, 0)),
        people,
        machines: input.machines,
        maxOperationsPerPerson: q.maxOps ?? null,
      },
      cycle: r.cycleMinutes,
      note: null,
      field: null,
    };
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
    const m = e.message.match(/^operations\[(\d+)\]\.machine: (.*)$/);
    if (m) return fail(`${m[2]} (${sewing[Number(m[1])].code}): give someone that skill on the People page`, 'skills');
    const pin = e.message.match(/^pins\[(\d+)\]: \S+ cannot run (.*)$/);
    if (pin) {
      const who = crew[ids.indexOf(String(q.pins![Number(pin[1])].personId))]?.name ?? 'that person';
      return fail(`pins: ${who} cannot run ${pin[2]} (not on their skills)`, 'pins');
    }
    if (e.message.startsWith('pins')) return fail(e.message.replace(/^pins\[\d+\]/, 'pins'), 'pins');
    if (e.message.startsWith('maxOperationsPerPerson')) return fail(e.message.replace('maxOperationsPerPerson', 'maxOps'), 'maxOps');
    return fail(e.message, 'machines');
  }
}
