import type { ApiModule, ModuleContext } from '../module';
import type { StudioRepository } from '../studios/studio.repository';
import type { StyleRepository } from '../styles/style.repository';
import { createCuttingPieceSource } from './cutting-pieces.service';
import { createGradingSetRepository } from './grading-set.repository';
import { gradingRoutes } from './grading.routes';
import { createGradingService } from './grading.service';

/** The grading area: size charts, grade rules, graded sets and piece downloads under /api/styles/:id/grading. */
export function createGradingModule(ctx: ModuleContext, deps: { styles: StyleRepository; studios: StudioRepository }) {
  const sets = createGradingSetRepository(ctx.ds);
  const grading = createGradingService({ styles: deps.styles, sets, audit: ctx.audit, now: ctx.now });
  return {
    name: 'grading',
    /** `cuttingPieces` gives a style's cutting pieces per size to markers, cut plans and costing. */
    services: { grading, cuttingPieces: createCuttingPieceSource({ styles: deps.styles, sets }) },
    mount(api) {
      api.use('/styles', gradingRoutes(grading, (id) => deps.studios.get(id)));
    },
  } satisfies ApiModule & { services: unknown };
}
