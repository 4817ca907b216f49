import type { ApiModule } from '../module';
import { createCostingRepository } from './costing.repository';
import { batchCostingRoutes, costingRoutes } from './costing.routes';
import { createCostingService } from './costing.service';

/**
 * The costing area: a batch's costing sheet (fabric from the cut plan, trims from the bill of materials,
 * labour from the operations, overheads, margin, wholesale and retail) and its live-formula workbook.
 * Exposes ctx.services 'costing' ({ build }) for purchasing.
 */
export const costingModule: ApiModule = {
  name: 'costing',
  register(api, ctx) {
    const repo = createCostingRepository(ctx.ds);
    const service = createCostingService(repo);
    ctx.services.set('costing', service);
    api.use('/batches', batchCostingRoutes(service, ctx));
    api.use('/costing', costingRoutes(repo, ctx));
  },
};
