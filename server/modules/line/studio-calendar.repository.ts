import type { DataSource } from 'typeorm';
import { toWorkingCalendar, type StudioCalendar, type WorkingCalendar } from '@planning';
import { StudioEntity, StudioWorkRulesEntity } from '../../entities';

/** A studio's calendar as planned with: the entered one, or the defaults (Monday to Friday, the working day's hours, UTC). */
export interface ResolvedCalendar {
  calendar: StudioCalendar;
  working: WorkingCalendar;
  entered: boolean;
}

export type CalendarRepository = ReturnType<typeof createCalendarRepository>;

/** The studio's working calendar (studio_work_rules), read by the line plan, pay and the floor. */
export function createCalendarRepository(ds: DataSource) {
  const rules = ds.getRepository(StudioWorkRulesEntity);
  return {
    async get(studioId: number): Promise<ResolvedCalendar> {
      const row = await rules.findOneBy({ studioId });
      if (row?.shiftStart && row.shiftEnd && row.workdays?.length) {
        const calendar: StudioCalendar = {
          timeZone: row.timeZone,
          workdays: row.workdays,
          shiftStart: row.shiftStart,
          shiftEnd: row.shiftEnd,
          breakMinutes: row.breakMinutes,
          holidays: row.holidays ?? [],
          overtimeLimitHoursPerWeek: row.overtimeLimitHoursPerWeek,
        };
        return { calendar, working: toWorkingCalendar(calendar), entered: true };
      }
      const studio = await ds.getRepository(StudioEntity).findOneBy({ id: studioId });
      const minutes = Math.round((studio?.workingDayHours ?? 8) * 60);
      const end = 8 * 60 + minutes;
      const calendar: StudioCalendar = {
        timeZone: row?.timeZone ?? 'UTC',
        workdays: [1, 2, 3, 4, 5],
        shiftStart: '08:00',
        shiftEnd: `${String(Math.min(23, Math.floor(end / 60))).padStart(2, '0')}:${String(end >= 24 * 60 ? 59 : end % 60).padStart(2, '0')}`,
        breakMinutes: 0,
        holidays: [],
        overtimeLimitHoursPerWeek: null,
      };
      return { calendar, working: { workdays: calendar.workdays, minutesPerDay: minutes, holidays: [] }, entered: false };
    },
    /** Save the calendar, making the studio's row on first save (one row per studio: unique index). */
    async save(studioId: number, c: StudioCalendar) {
      const row = (await rules.findOneBy({ studioId })) ?? rules.create({ studioId });
      await rules.save(Object.assign(row, c));
    },
  };
}
