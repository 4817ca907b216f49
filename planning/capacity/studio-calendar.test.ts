import { describe, expect, it } from 'vitest';
import { isTimeZone, shiftMinutes, toWorkingCalendar, zonedDay, zonedDayStart } from './studio-calendar';
import { isWorkingDay } from './working-calendar';

// Offsets from the IANA time zone database (tzdata), from memory: Africa/Nairobi UTC+3 all year;
// Pacific/Auckland UTC+13 in December (NZDT); America/Los_Angeles UTC−8 in December (PST), and its 2026 spring
// change on Sunday 8 March at 02:00 local (second Sunday of March, US rule).
describe('studio days in the studio time zone', () => {
  it('gives the next calendar day in Auckland and the previous one in Los Angeles for the same instant', () => {
    const at = new Date('2026-12-01T12:00:00Z');
    expect(zonedDay(at, 'UTC')).toBe('2026-12-01');
    expect(zonedDay(at, 'Pacific/Auckland')).toBe('2026-12-02');
    expect(zonedDay(new Date('2026-12-01T05:00:00Z'), 'America/Los_Angeles')).toBe('2026-11-30');
    expect(zonedDay(new Date('2026-11-30T21:30:00Z'), 'Africa/Nairobi')).toBe('2026-12-01');
  });

  it('starts a Nairobi day at 21:00 UTC the evening before and an Auckland December day at 11:00 UTC', () => {
    expect(zonedDayStart('2026-12-01', 'Africa/Nairobi').toISOString()).toBe('2026-11-30T21:00:00.000Z');
    expect(zonedDayStart('2026-12-01', 'Pacific/Auckland').toISOString()).toBe('2026-11-30T11:00:00.000Z');
    expect(zonedDayStart('2026-12-01', 'UTC').toISOString()).toBe('2026-12-01T00:00:00.000Z');
  });

  it('gives a 23-hour day on the day the clocks go forward', () => {
    const start = zonedDayStart('2026-03-08', 'America/Los_Angeles').getTime();
    const next = zonedDayStart('2026-03-09', 'America/Los_Angeles').getTime();
    expect((next - start) / 3_600_000).toBe(23);
  });

  it('knows IANA names and refuses made-up ones', () => {
    expect(isTimeZone('Africa/Nairobi')).toBe(true);
    expect(isTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isTimeZone('')).toBe(false);
  });
});

describe('shift and working days', () => {
  it('pays 8 hours for 08:00 to 17:00 with a 60-minute break and refuses a shift ending before it starts', () => {
    expect(shiftMinutes('08:00', '17:00', 60)).toBe(480);
    expect(() => shiftMinutes('17:00', '08:00', 0)).toThrow(/end after/);
    expect(() => shiftMinutes('08:00', '09:00', 60)).toThrow(/break/);
    expect(() => shiftMinutes('8am', '17:00', 0)).toThrow(/HH:mm/);
  });

  it('works Saturdays when the studio lists day 6 and not on its holidays', () => {
    const cal = toWorkingCalendar({ timeZone: 'Africa/Nairobi', workdays: [6, 1, 2, 3, 4, 5], shiftStart: '08:00', shiftEnd: '13:00', breakMinutes: 0, holidays: ['2026-12-12'], overtimeLimitHoursPerWeek: null });
    expect(cal.workdays).toEqual([1, 2, 3, 4, 5, 6]);
    expect(isWorkingDay(cal, '2026-12-05')).toBe(true); // a Saturday
    expect(isWorkingDay(cal, '2026-12-06')).toBe(false); // a Sunday
    expect(isWorkingDay(cal, '2026-12-12')).toBe(false); // Saturday, a holiday entered
  });
});
