import type { ApiModule } from '../module';
import { createSearchRepository } from './search.repository';
import { searchRoutes } from './search.routes';
import { createSearchService } from './search.service';

/** The one search box of the owner and the cutter: bundles, styles, rolls, batches and people. */
export const searchModule: ApiModule = {
  name: 'search',
  register(api, ctx) {
    api.use('/search', searchRoutes(createSearchService(createSearchRepository(ctx.ds))));
  },
};
