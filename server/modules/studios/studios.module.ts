import type { ApiModule, ModuleContext } from '../module';
import { createStudioRepository } from './studio.repository';
import { studioRoutes } from './studio.routes';
import { createStudioService } from './studio.service';

/** The studio itself (name, currency, units, working day) at /api/studio; auth opens new studios through `studios`. */
export function createStudiosModule(ctx: ModuleContext) {
  const studios = createStudioRepository(ctx.ds, ctx.audit);
  const service = createStudioService({ studios, audit: ctx.audit });
  return {
    name: 'studio',
    services: { studios },
    mount(api) {
      api.use('/studio', studioRoutes(service));
    },
  } satisfies ApiModule & { services: unknown };
}
