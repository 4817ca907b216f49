import { capacityMinutes } from './capacity';
import { workingDays, type WorkingCalendar } from './working-calendar';

/** Load on one section (or one station within a section). */
export interface LoadUnit {
  section: string;
  station?: string;
  /** Standard minutes of work to do. */
  loadMinutes: number;
  people: number;
  /** Fraction, 0.6 = 60 %. */
  efficiency: number;
  absenteeism?: number;
}

/** One unit's day: load placed that day against its capacity (standard minutes). */
export interface LoadDay {
  date: string;
  load: number;
  capacity: number;
}

/** Load against capacity for one unit. */
export interface LoadProfile {
  section: string;
  station?: string;
  capacityPerDay: number;
  daysNeeded: number;
  days: LoadDay[];
}

/**
 * Places each unit's load on working days from `start`, filling each day to capacity
 * (people × minutes × (1 − absence) × efficiency) until the load is done. Units in input order.
 * A unit without capacity but with load throws RangeError.
 */
export function profileLoad(units: LoadUnit[], calendar: WorkingCalendar, start: string): LoadProfile[] {
  return units.map((u) => {
    const cap = capacityMinutes({ people: u.people, minutesPerDay: calendar.minutesPerDay, efficiency: u.efficiency, absenteeism: u.absenteeism });
    if (u.loadMinutes > 0 && !(cap > 0)) throw new RangeError(`${u.section} has load but no capacity`);
    const n = u.loadMinutes > 0 ? Math.ceil(u.loadMinutes / cap - 1e-9) : 0;
    const dates = workingDays(calendar, start, n);
    let left = u.loadMinutes;
    const days = dates.map((date) => {
      const load = Math.min(cap, left);
      left -= load;
      return { date, load, capacity: cap };
    });
    return { section: u.section, station: u.station, capacityPerDay: cap, daysNeeded: n, days };
  });
}
