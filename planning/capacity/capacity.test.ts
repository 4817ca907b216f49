import { describe, expect, it } from 'vitest';
import { capacityMinutes, daysNeeded, floorCapacity, piecesPerDay, taktTime } from './capacity';
import { checkWorkingHours, WORKING_HOURS_CAUTION } from './working-hours';
import { countWorkingDays, workingDays, type WorkingCalendar } from './working-calendar';
import { scheduleBatch } from './schedule-batch';
import { profileLoad } from './load-profile';

const weekdays: WorkingCalendar = { workdays: [1, 2, 3, 4, 5], minutesPerDay: 480, holidays: [] };

describe('capacity worked examples', () => {
  // onlineclothingstudy.com 2012/02, "Formula for calculating sewing room capacity" (web article), E3 [quoted]
  it('reproduces the five-line floor: 29 268.0 min/day and 1 463 shirts at SAM 20', () => {
    const lines = [[30, 0.4], [28, 0.5], [32, 0.55], [32, 0.45], [25, 0.39]].map(([people, efficiency]) => ({ people, minutesPerDay: 480, efficiency, absenteeism: 0.1 }));
    expect(lines.map(capacityMinutes).map((v) => Number(v.toFixed(1)))).toEqual([5184.0, 6048.0, 7603.2, 6220.8, 4212.0]);
    const floor = floorCapacity(lines, 20);
    expect(floor.minutes).toBeCloseTo(29268.0, 6);
    expect(floor.pieces).toBe(1463);
  });
  // garmentsmerchandising.com, "Sewing line capacity" (web article), E4 [quoted]
  it('gives 328 pcs/day for 30 machines, 8 h, 60 %, 5 % absence, SAM 25', () => {
    const cap = capacityMinutes({ people: 30, minutesPerDay: 480, efficiency: 0.6, absenteeism: 0.05 });
    expect(cap / 25).toBeCloseTo(328.32, 9);
    expect(piecesPerDay(cap, 25)).toBe(328);
  });
  // garmentsmerchandising.com, "How to calculate garments production" (web article), E5 [quoted]
  it('gives 201 polos/day for 20 operators, 480 − 60 min, SAM 25, 60 %', () => {
    expect(piecesPerDay(capacityMinutes({ people: 20, minutesPerDay: 480 - 60, efficiency: 0.6 }), 25)).toBe(201);
    expect(piecesPerDay(capacityMinutes({ people: 20, minutesPerDay: 420, efficiency: 1 }), 25)).toBe(336);
  });
  // assemblymag.com, article 93267 (web article), E6 [quoted]
  it('gives a takt of 0.96 min (57.6 s) for 480 min and 500 units', () => {
    expect(taktTime(480, 500)).toBeCloseTo(0.96, 12);
    expect(taktTime(480 * 60, 500)).toBeCloseTo(57.6, 12);
  });
  it('counts days needed, zero for no load', () => {
    expect(daysNeeded(1000, 480)).toBe(3);
    expect(daysNeeded(960, 480)).toBe(2);
    expect(daysNeeded(0, 0)).toBe(0);
    expect(() => daysNeeded(1, 0)).toThrow(RangeError);
  });
});

describe('working calendar and hours', () => {
  it('skips weekends and holidays (dates passed in)', () => {
    const cal = { ...weekdays, holidays: ['2025-01-01'] };
    expect(workingDays(cal, '2024-12-30', 4)).toEqual(['2024-12-30', '2024-12-31', '2025-01-02', '2025-01-03']);
    expect(countWorkingDays(cal, '2024-12-30', '2025-01-05')).toBe(4);
  });
  // ILO Convention C1, Hours of Work (Industry), 1919 [quoted]: ≤ 8 h/day, ≤ 48 h/week
  it('flags more than 8 h/day or 48 h/week with the ILO C1 caution', () => {
    expect(checkWorkingHours(480, 6).caution).toBeNull();
    const daily = checkWorkingHours(540, 5);
    expect(daily.exceedsDaily).toBe(true);
    expect(daily.caution).toBe(WORKING_HOURS_CAUTION);
    expect(checkWorkingHours(480, 7).exceedsWeekly).toBe(true);
    expect(WORKING_HOURS_CAUTION).toContain('No. 1');
  });
});

describe('scheduleBatch', () => {
  const stages = [
    { name: 'cutting', samPerPiece: 2, people: 1, efficiency: 1 },
    { name: 'sewing', samPerPiece: 20, people: 10, efficiency: 1 },
    { name: 'finishing', samPerPiece: 4, people: 2, efficiency: 1 },
  ];
  it('starts each stage one bundle after the previous and finishes after the last bundle', () => {
    const s = scheduleBatch({ quantity: 100, bundleSize: 10, stages, calendar: weekdays, start: '2025-03-03' });
    expect(s.stages.map((x) => x.startMinute)).toEqual([0, 20, 40]);
    expect(s.stages.map((x) => x.endMinute)).toEqual([200, 220, 240]);
    expect(s.finishDate).toBe('2025-03-03');
    expect(s.risk).toBe('no-due-date');
  });
  it('reports lateness, the overtime needed and the hours caution', () => {
    const s = scheduleBatch({ quantity: 1000, bundleSize: 10, stages, calendar: weekdays, start: '2025-03-03', due: '2025-03-05' });
    // sewing limits: 1000 × 2 min = 2000 min + bundle lags > 3 × 480 available
    expect(s.risk).toBe('late');
    expect(s.overtimeMinutesPerDay).toBeGreaterThan(0);
    expect(s.hours.exceedsDaily).toBe(true);
    expect(s.hours.caution).toBe(WORKING_HOURS_CAUTION);
    expect(s.finishDate).toBe('2025-03-07');
  });
  it('marks a plan finishing within a day of the due date as at risk', () => {
    const s = scheduleBatch({ quantity: 200, bundleSize: 10, stages, calendar: weekdays, start: '2025-03-03', due: '2025-03-03' });
    expect(s.risk).toBe('at-risk');
  });
});

describe('scheduleBatch against a discrete-event simulation of bundles (issue 19)', () => {
  /**
   * Independent check: bundles of `bundle` garments (the last one smaller) flow through every station of every
   * stage in turn; a station serves one bundle at a time, first come first served, taking size × minutes per
   * piece. Departure recurrence of a flow line: D[j][s] = max(D[j−1][s], D[j][s−1]) + service. Returns, per stage,
   * the minute its first bundle enters and the minute its last bundle leaves.
   */
  function simulate(quantity: number, bundle: number, stages: { mpp: number; stations: number }[]) {
    const sizes: number[] = [];
    for (let left = quantity; left > 0; left -= bundle) sizes.push(Math.min(bundle, left));
    const line = stages.flatMap((st, k) => Array.from({ length: st.stations }, () => ({ k, mpp: st.mpp })));
    const done = new Array<number>(line.length).fill(0);
    const firstIn = stages.map(() => Infinity);
    const lastOut = stages.map(() => 0);
    for (const size of sizes) {
      let ready = 0;
      line.forEach((station, s) => {
        const begin = Math.max(ready, done[s]);
        if (s === 0 || line[s - 1].k !== station.k) firstIn[station.k] = Math.min(firstIn[station.k], begin);
        done[s] = begin + size * station.mpp;
        ready = done[s];
        lastOut[station.k] = Math.max(lastOut[station.k], ready);
      });
    }
    return { firstIn, lastOut };
  }
  // Minutes per piece per stage = SAM ÷ (people × efficiency); efficiency 1 keeps the arithmetic plain.
  const cases: [string, { name: string; samPerPiece: number; people: number; efficiency: number; stations?: number }[]][] = [
    ['a 6-station sewing line between cutting and finishing', [
      { name: 'cutting', samPerPiece: 2, people: 1, efficiency: 1 },
      { name: 'sewing', samPerPiece: 24, people: 6, efficiency: 1, stations: 6 },
      { name: 'finishing', samPerPiece: 3, people: 2, efficiency: 1 },
    ]],
    ['a slow cutter feeding a faster 4-station line', [
      { name: 'cutting', samPerPiece: 6, people: 1, efficiency: 1 },
      { name: 'sewing', samPerPiece: 8, people: 4, efficiency: 1, stations: 4 },
      { name: 'finishing', samPerPiece: 1, people: 1, efficiency: 1 },
    ]],
    ['two lines in a row, the second slower', [
      { name: 'sewing', samPerPiece: 9, people: 3, efficiency: 1, stations: 3 },
      { name: 'sewing 2', samPerPiece: 20, people: 5, efficiency: 1, stations: 5 },
    ]],
  ];
  it.each(cases)('starts and ends every stage when the simulation does with %s', (_, stages) => {
    const s = scheduleBatch({ quantity: 120, bundleSize: 10, stages, calendar: weekdays, start: '2025-03-03' });
    const sim = simulate(120, 10, stages.map((st) => ({ mpp: st.samPerPiece / st.people, stations: st.stations ?? 1 })));
    s.stages.forEach((st, k) => {
      expect(st.startMinute).toBeCloseTo(sim.firstIn[k], 9);
      expect(st.endMinute).toBeCloseTo(sim.lastOut[k], 9);
    });
  });
  it('ends sewing at start + Q × cycle + (stations − 1) × bundle time, not at start + Q × cycle', () => {
    // 6 stations at a 4-minute cycle, bundles of 10: the first bundle leaves after 6 × 40 min.
    const s = scheduleBatch({ quantity: 100, bundleSize: 10, stages: [{ name: 'sewing', samPerPiece: 24, people: 6, efficiency: 1, stations: 6 }], calendar: weekdays, start: '2025-03-03' });
    expect(s.stages[0].endMinute).toBe(100 * 4 + 5 * 40);
  });
  it('is never earlier than the simulation when the last bundle is short', () => {
    for (const [, stages] of cases) {
      const s = scheduleBatch({ quantity: 95, bundleSize: 10, stages, calendar: weekdays, start: '2025-03-03' });
      const sim = simulate(95, 10, stages.map((st) => ({ mpp: st.samPerPiece / st.people, stations: st.stations ?? 1 })));
      expect(s.finishMinute).toBeGreaterThanOrEqual(sim.lastOut.at(-1)! - 1e-9);
    }
  });
});

describe('profileLoad', () => {
  it('fills days to capacity per section', () => {
    const [p] = profileLoad([{ section: 'sewing', loadMinutes: 10000, people: 10, efficiency: 0.5 }], weekdays, '2025-03-07');
    expect(p.capacityPerDay).toBe(2400);
    expect(p.daysNeeded).toBe(5);
    expect(p.days.map((d) => d.date)).toEqual(['2025-03-07', '2025-03-10', '2025-03-11', '2025-03-12', '2025-03-13']);
    expect(p.days[4].load).toBe(400);
  });
});
