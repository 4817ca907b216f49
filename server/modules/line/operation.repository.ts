import type { DataSource } from 'typeorm';
import { defaultSkills } from '../../../shared/schemas/people';
import { AttendanceEntity, OperationEntity, StudioEntity, UserEntity } from '../../entities';

export type OperationRepository = ReturnType<typeof createOperationRepository>;
type OperationRow = Omit<OperationEntity, 'id' | 'studioId' | 'styleId' | 'seq' | 'timeStudy'>;

/** Operation-breakdown queries, always scoped to one studio and style, in sequence order. */
export function createOperationRepository(ds: DataSource) {
  const repo = ds.getRepository(OperationEntity);
  return {
    /** Set one operation's standard minutes and the time study that gave them. */
    setStudy: async (studioId: number, styleId: number, id: number, sam: number, timeStudy: OperationEntity['timeStudy']) => {
      await repo.update({ id, studioId, styleId }, { sam, timeStudy });
      return repo.findOneOrFail({ where: { id, studioId, styleId } });
    },
    list: (studioId: number, styleId: number) => repo.find({ where: { studioId, styleId }, order: { seq: 'ASC', id: 'ASC' } }),
    /**
     * Replace a style's table in one transaction, matching rows by code so an operation keeps its id (work logs
     * point at it); rows whose code is gone are deleted.
     */
    replace: (studioId: number, styleId: number, rows: OperationRow[]) =>
      ds.transaction(async (m) => {
        const r = m.getRepository(OperationEntity);
        const existing = new Map((await r.find({ where: { studioId, styleId } })).map((e) => [e.code, e]));
        const keep = new Set(rows.map((x) => x.code));
        const gone = [...existing.values()].filter((e) => !keep.has(e.code)).map((e) => e.id);
        if (gone.length) await r.delete(gone);
        // A time study stays with its operation while its standard minutes do; typing other minutes drops it.
        const studyOf = (row: OperationRow) => {
          const e = existing.get(row.code);
          return e && e.sam === row.sam ? (e.timeStudy ?? null) : null;
        };
        await r.save(rows.map((row, i) => Object.assign(existing.get(row.code) ?? r.create({ studioId, styleId }), row, { seq: i + 1, timeStudy: studyOf(row) })));
        return r.find({ where: { studioId, styleId }, order: { seq: 'ASC' } });
      }),
  };
}

/** The studio's currency and working day, for sheets and the plan. */
/** Active people of a studio per floor section, from the People page: machinists sew, cutters cut, finishers finish. */
export function createStaffLookup(ds: DataSource) {
  const users = ds.getRepository(UserEntity);
  return async (studioId: number) => {
    const active = await users.find({ where: { studioId, active: true }, select: { role: true } });
    const count = (role: string) => active.filter((u) => u.role === role).length;
    return { sewing: count('machinist'), cutting: count('cutter'), finishing: count('finisher') };
  };
}

export function createStudioLookup(ds: DataSource) {
  const repo = ds.getRepository(StudioEntity);
  return async (studioId: number) => {
    const s = await repo.findOne({ where: { id: studioId } });
    return s ? { currency: s.currency, workingDayHours: s.workingDayHours, machines: s.machines ?? {} } : null;
  };
}

/** Active people of a studio with the skills the line plan uses: their own, or their role's defaults. */
export function createCrewLookup(ds: DataSource) {
  const users = ds.getRepository(UserEntity);
  return async (studioId: number) => {
    const active = await users.find({ where: { studioId, active: true }, select: { id: true, name: true, role: true, skills: true }, order: { name: 'ASC', id: 'ASC' } });
    return active.map((u) => ({ id: u.id, name: u.name, role: u.role, skills: u.skills ?? defaultSkills(u.role), skillsSet: u.skills != null }));
  };
}

/** Ids of the people recorded in (minutes above 0) on a day; null when no attendance was recorded that day. */
export function createPresentLookup(ds: DataSource) {
  const repo = ds.getRepository(AttendanceEntity);
  return async (studioId: number, day: string): Promise<Set<number> | null> => {
    const rows = await repo.find({ where: { studioId, day } });
    return rows.length ? new Set(rows.filter((r) => r.minutes > 0).map((r) => r.userId)) : null;
  };
}
