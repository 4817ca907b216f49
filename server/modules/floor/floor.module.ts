import type { ApiModule, ModuleContext } from '../module';
import { createFloorProgressService } from './floor-progress.service';
import { createFloorRepository } from './floor.repository';
import { floorRoutes } from './floor.routes';
import { zonedDay } from '@planning';
import { createFloorService } from './floor.service';
import { createCalendarRepository } from '../line/studio-calendar.repository';
import { createAttendanceService } from './attendance.service';

/** The floor area: bundle logging from phones, progress, efficiency and piece-rate pay lines (`progress`, read by pay). */
export function createFloorModule(ctx: ModuleContext) {
  const repo = createFloorRepository(ctx.ds);
  const calendars = createCalendarRepository(ctx.ds);
  const timeZone = async (studioId: number) => (await calendars.get(studioId)).calendar.timeZone;
  const floor = createFloorService({ repo, audit: ctx.audit, now: ctx.now, timeZone });
  const progress = createFloorProgressService({ repo, floor, now: ctx.now });
  // The studio's today, in its time zone (working calendar).
  const today = async (studioId: number) => zonedDay(ctx.now(), await timeZone(studioId));
  const attendance = createAttendanceService({ repo, audit: ctx.audit, today });
  return {
    name: 'floor',
    services: { progress },
    mount(api) {
      api.use('/floor', floorRoutes(floor, progress, attendance));
    },
  } satisfies ApiModule & { services: unknown };
}
