import type { ApiModule, ModuleContext } from '../module';
import { createFloorProgressService } from './floor-progress.service';
import { createFloorRepository } from './floor.repository';
import { floorRoutes } from './floor.routes';
import { createFloorService } from './floor.service';

/** The floor area: bundle logging from phones, progress, efficiency and piece-rate pay lines (`progress`, read by pay). */
export function createFloorModule(ctx: ModuleContext) {
  const repo = createFloorRepository(ctx.ds);
  const floor = createFloorService({ repo, audit: ctx.audit, now: ctx.now });
  const progress = createFloorProgressService({ repo, floor, now: ctx.now });
  return {
    name: 'floor',
    services: { floor, progress },
    mount(api) {
      api.use('/floor', floorRoutes(floor, progress));
    },
  } satisfies ApiModule & { services: unknown };
}
