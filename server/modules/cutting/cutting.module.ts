import type { BatchRepository } from '../batches/batch.repository';
import type { CuttingPieceSource } from '../grading/graded-pieces';
import type { MarkerRepository } from '../markers/marker.repository';
import type { ApiModule, ModuleContext } from '../module';
import { createCutPlanRepository } from './cut-plan.repository';
import { cuttingRoutes } from './cutting.routes';
import { createCuttingService } from './cutting.service';
import { createFabricRepository } from './fabric.repository';
import { createGradingSetRepository } from '../grading/grading-set.repository';
import { fabricRoutes } from './fabric.routes';

export interface CuttingModuleDeps {
  batches: BatchRepository;
  cuttingPieces: CuttingPieceSource;
  markers: Pick<MarkerRepository, 'doneForStyle'>;
  labourCostPerMinute: (studioId: number, styleId: number) => Promise<number>;
}

/** The cutting area: fabrics and rolls, cut plans of batches, the cutter's lays and bundles. */
export function createCuttingModule(ctx: ModuleContext, deps: CuttingModuleDeps) {
  const fabrics = createFabricRepository(ctx.ds);
  const plans = createCutPlanRepository(ctx.ds);
  const cutting = createCuttingService({ ...deps, plans, fabrics, gradingSets: createGradingSetRepository(ctx.ds), jobs: ctx.jobs, audit: ctx.audit, now: ctx.now });
  return {
    name: 'cutting',
    /** `fabrics` answers the markers area's fabric lookups; `onMarkerDone` is the marker queue's completion hook. */
    services: { fabrics, onMarkerDone: cutting.onMarkerDone },
    mount(api) {
      api.use('/fabrics', fabricRoutes(fabrics, ctx.audit, { maxUploadBytes: ctx.env.UPLOAD_MAX_BYTES ?? 5 * 1024 * 1024, now: ctx.now }));
      const routes = cuttingRoutes(cutting);
      api.use('/batches', routes.batches);
      api.use('/lays', routes.lays);
    },
  } satisfies ApiModule & { services: unknown };
}
