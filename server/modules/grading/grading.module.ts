import type { ApiModule } from '../module';
import { createStyleRepository } from '../styles/style.repository';
import { loadCuttingPieces } from './graded-pieces';
import { createGradingSetRepository } from './grading-set.repository';
import { gradingRoutes } from './grading.routes';
import { createGradingService } from './grading.service';

/** ctx.services key under which the grading area offers {@link loadCuttingPieces} (bound to ctx.ds). */
export const GRADING_CUTTING_PIECES_SERVICE = 'grading.cuttingPieces';

/** The grading area: size charts, grade rules, graded sets and piece downloads under /api/styles/:id/grading. */
export const gradingModule: ApiModule = {
  name: 'grading',
  register(api, ctx) {
    const service = createGradingService({
      styles: createStyleRepository(ctx.ds),
      sets: createGradingSetRepository(ctx.ds),
      audit: ctx.audit,
      now: ctx.now,
    });
    ctx.services.set(GRADING_CUTTING_PIECES_SERVICE, (studioId: number, styleId: number) => loadCuttingPieces(ctx.ds, studioId, styleId));
    api.use('/styles', gradingRoutes(service));
  },
};
