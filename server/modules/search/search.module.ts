import type { ApiModule, ModuleContext } from '../module';
import { createSearchRepository } from './search.repository';
import { searchRoutes } from './search.routes';
import { createSearchService } from './search.service';

/** The one search box of the owner and the cutter: bundles, styles, rolls, batches and people. */
export function createSearchModule(ctx: ModuleContext) {
  const search = createSearchService(createSearchRepository(ctx.ds));
  return {
    name: 'search',
    services: {},
    mount(api) {
      api.use('/search', searchRoutes(search));
    },
  } satisfies ApiModule & { services: unknown };
}
