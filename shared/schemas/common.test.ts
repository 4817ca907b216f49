import { describe, expect, it } from 'vitest';
import { calendarDate, isCalendarDate } from './common';

// Source: the Gregorian calendar rules as ISO 8601-1:2019 §3.2.1 uses them: months of 28–31 days, February
// 29 days in years divisible by 4, except centuries not divisible by 400 (2000 leap, 2100 not).
describe('calendar dates', () => {
  it('accepts days that exist, including 29 February of leap years', () => {
    for (const d of ['2026-01-31', '2026-11-30', '2024-02-29', '2000-02-29', '2026-12-31']) expect(isCalendarDate(d), d).toBe(true);
  });

  it('refuses days that do not exist even when they match the pattern', () => {
    for (const d of ['2026-11-31', '2026-13-45', '2026-02-29', '2100-02-29', '2026-04-31', '2026-00-10', '2026-01-00', '0000-01-01']) {
      expect(isCalendarDate(d), d).toBe(false);
    }
  });

  it('says why a date is refused when the schema parses it', () => {
    expect(calendarDate.safeParse('2026-11-31').error?.issues[0].message).toBe('Not a real date: that day does not exist in the calendar');
    expect(calendarDate.safeParse('31/11/2026').error?.issues[0].message).toBe('Use a date as YYYY-MM-DD');
  });
});
