import type { ApiModule } from '../module';
import { createFloorProgressService } from './floor-progress.service';
import { createFloorRepository } from './floor.repository';
import { floorRoutes } from './floor.routes';
import { createFloorService, dayOf } from './floor.service';
import { createAttendanceService } from './attendance.service';

/** ctx.services key of the floor's progress service ({ people, payLines, progress, daily }); the pay module reads it. */
export const FLOOR_PROGRESS_SERVICE = 'floor.progress';

/** The floor area: bundle logging from phones, progress, efficiency and piece-rate pay lines. */
export const floorModule: ApiModule = {
  name: 'floor',
  register(api, ctx) {
    const repo = createFloorRepository(ctx.ds);
    const floor = createFloorService({ repo, audit: ctx.audit, now: ctx.now });
    const progress = createFloorProgressService({ repo, floor, now: ctx.now });
    ctx.services.set(FLOOR_PROGRESS_SERVICE, progress);
    const attendance = createAttendanceService({ repo, audit: ctx.audit, today: async () => dayOf(ctx.now()) });
    api.use('/floor', floorRoutes(floor, progress, attendance));
  },
};
