import type { ApiModule } from '../module';
import { createFloorProgressService } from './floor-progress.service';
import { createFloorRepository } from './floor.repository';
import { floorRoutes } from './floor.routes';
import { zonedDay } from '@planning';
import { createFloorService } from './floor.service';
import { createCalendarRepository } from '../line/studio-calendar.repository';
import { createAttendanceService } from './attendance.service';

/** ctx.services key of the floor's progress service ({ people, payLines, progress, daily }); the pay module reads it. */
export const FLOOR_PROGRESS_SERVICE = 'floor.progress';

/** The floor area: bundle logging from phones, progress, efficiency and piece-rate pay lines. */
export const floorModule: ApiModule = {
  name: 'floor',
  register(api, ctx) {
    const repo = createFloorRepository(ctx.ds);
    const calendars = createCalendarRepository(ctx.ds);
    const timeZone = async (studioId: number) => (await calendars.get(studioId)).calendar.timeZone;
    const floor = createFloorService({ repo, audit: ctx.audit, now: ctx.now, timeZone });
    const progress = createFloorProgressService({ repo, floor, now: ctx.now });
    ctx.services.set(FLOOR_PROGRESS_SERVICE, progress);
    // The studio's today, in its time zone (working calendar).
    const today = async (studioId: number) => zonedDay(ctx.now(), await timeZone(studioId));
    const attendance = createAttendanceService({ repo, audit: ctx.audit, today });
    api.use('/floor', floorRoutes(floor, progress, attendance));
  },
};
