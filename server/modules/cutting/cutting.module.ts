import type { ApiModule } from '../module';
import { createCutPlanRepository } from './cut-plan.repository';
import { cuttingRoutes } from './cutting.routes';
import { createFabricRepository } from './fabric.repository';
import { fabricRoutes } from './fabric.routes';

/** The cutting area: fabrics and rolls, cut plans of batches, the cutter's lays and bundles. */
export const cuttingModule: ApiModule = {
  name: 'cutting',
  register(api, ctx) {
    const fabrics = createFabricRepository(ctx.ds);
    const plans = createCutPlanRepository(ctx.ds);
    api.use('/fabrics', fabricRoutes(fabrics, ctx.audit, { maxUploadBytes: ctx.env.UPLOAD_MAX_BYTES ?? 5 * 1024 * 1024, now: ctx.now }));
    const { batches, lays } = cuttingRoutes(ctx.ds, ctx.jobs, plans, fabrics, ctx.audit, ctx.now);
    api.use('/batches', batches);
    api.use('/lays', lays);
  },
};
