import { addDays, format, parseISO } from 'date-fns';
import { balanceLine, countWorkingDays, profileLoad, scheduleBatch, workingDays, type LineBalance, type WorkingCalendar } from '@planning';
import type { LinePlanDto, LinePlanQuery } from '../../../shared/schemas/line';
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

/**
 * Floor assumptions (listed on the page): every machinist runs every sewing machine type; Monday to
 * Friday; breaks already out of the studio's working day.
 */
export const WORKDAYS = [1, 2, 3, 4, 5];

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
}

const r2 = (n: number) => Math.round(n * 100) / 100;
const people = (n: number, role: string) => `${n} ${role}${n === 1 ? '' : 's'}`;

/**
 * Balance the sewing operations and schedule the batch. Due mode (SALBP-1): the sewing window is the working days
 * to the due date less one day each for cutting and finishing; cycle time = window minutes × efficiency ÷ garments,
 * never above the longest station a person can hold in a day. People mode (SALBP-2): stations = people present.
 */
export function planLine(input: PlanInput): LinePlanDto {
  const { query: q, quantity } = input;
  const calendar: WorkingCalendar = { workdays: WORKDAYS, minutesPerDay: input.minutesPerDay, holidays: [] };
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
  const peopleAvailable = q.people ?? crew.sewing;
  let balance: LineBalance;
  let taktMin: number | null = null;
  if (q.mode === 'people') {
    try {
      balance = balanceLine({ tasks, stations: peopleAvailable });
    } catch (e) {
      const least = balanceLine({ tasks, cycleTime: sewingSam }).count;
      throw badRequest(`people: with one machine type per station this line needs at least ${least} people (${(e as Error).message})`, { people: `At least ${least} people for this breakdown` });
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
  const maxStation = Math.max(...balance.stations.map((s) => s.time));
  const outputPerDay = Math.floor((input.minutesPerDay * q.efficiency) / maxStation + 1e-9);
  const machineOf = new Map(sewing.map((o) => [o.code, o.machineType]));
  const planned = Math.min(outputPerDay, quantity);
  const stations = balance.stations.map((s, i) => ({
    index: i,
    label: `S${i + 1}`,
    machineType: machineOf.get(s.tasks[0]) ?? '',
    operations: s.tasks,
    timeMin: r2(s.time),
    idleMin: r2(maxStation - s.time),
    loadPerDayMin: r2(s.time * planned),
    capacityPerDayMin: r2(input.minutesPerDay * q.efficiency),
    isBottleneck: i === balance.bottleneck,
  }));
  const stationCount = balance.count;
  const stages = [
    { name: 'cutting', samPerPiece: samOf('cutting'), people: crew.cutting, efficiency: q.efficiency },
    // The line runs at its bottleneck: stations × bottleneck time per garment over `stations` people.
    { name: 'sewing', samPerPiece: maxStation * stationCount, people: stationCount, efficiency: q.efficiency },
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
    workdays: WORKDAYS,
    assumptions: [
      `Staff from the People page: ${people(input.staff.sewing, 'machinist')}, each taken to run every sewing machine type; ${people(input.staff.cutting, 'cutter')}; ${people(input.staff.finishing, 'finisher')}.`,
      ...(['sewing', 'cutting', 'finishing'] as const)
        .filter((s) => input.staff[s] === 0)
        .map((s) => `Nobody active for ${s} on the People page: planned with one person.`),
      `Working week Monday to Friday, ${input.minutesPerDay / 60} h a day (the studio's working day), no holidays entered.`,
      `Operator efficiency ${Math.round(q.efficiency * 100)} %; one machine type per station; bundles of ${q.bundleSize}.`,
      'Minutes (SAM) are the demo estimates of the operations table, not published standard times.',
    ],
    balance: {
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
