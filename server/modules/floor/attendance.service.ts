import type { AttendanceDayDto, PutAttendanceInput } from '../../../shared/schemas/floor';
import type { Actor } from '../../auth/require';
import { badRequest, conflict } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { FloorRepository } from './floor.repository';

export type AttendanceService = ReturnType<typeof createAttendanceService>;

/**
 * Who is in on a day and for how long, recorded by the owner: it feeds the line plan's people present and the
 * minimum-wage hours of pay. A day an approved pay period covers is frozen (its pay was computed from it).
 */
export function createAttendanceService(deps: { repo: FloorRepository; audit: AuditRepository; today: (studioId: number) => Promise<string> }) {
  const { repo, audit } = deps;

  async function day(studioId: number, dayText?: string): Promise<AttendanceDayDto> {
    const d = dayText ?? (await deps.today(studioId));
    const [people, rows, period] = await Promise.all([repo.floorPeople(studioId), repo.attendanceOn(studioId, d), repo.periodCovering(studioId, d)]);
    const minutes = new Map(rows.map((r) => [r.userId, r.minutes]));
    const list = people.map((u) => ({ userId: u.id, name: u.name, role: u.role, minutes: minutes.has(u.id) ? Math.round(minutes.get(u.id)!) : null }));
    return { day: d, frozenByPeriodId: period?.id ?? null, people: list, present: list.filter((p) => (p.minutes ?? 0) > 0).length };
  }

  return {
    day,
    async save(actor: Actor, input: PutAttendanceInput): Promise<AttendanceDayDto> {
      const period = await repo.periodCovering(actor.studioId, input.day);
      if (period) throw conflict(`Pay period ${period.fromDay} to ${period.toDay} is approved; its attendance is frozen`, { day: 'In an approved pay period' });
      const known = new Set((await repo.floorPeople(actor.studioId)).map((u) => u.id));
      const i = input.entries.findIndex((e) => !known.has(e.userId));
      if (i >= 0) throw badRequest(`entries.${i}.userId: not an active person of the floor`, { [`entries.${i}.userId`]: 'Not an active person of the floor' });
      const before = await repo.attendanceOn(actor.studioId, input.day);
      await repo.saveAttendance(actor.studioId, input.day, input.entries);
      await audit.record(actor, 'attendance', 'attendance', null, before.map((r) => ({ userId: r.userId, minutes: r.minutes })), { day: input.day, entries: input.entries });
      return day(actor.studioId, input.day);
    },
  };
}
