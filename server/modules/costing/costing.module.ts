import type { CuttingPieceSource } from '../grading/graded-pieces';
import type { ApiModule, ModuleContext } from '../module';
import { createCostingRepository } from './costing.repository';
import { batchCostingRoutes, costingRoutes } from './costing.routes';
import { createCostingService } from './costing.service';

/**
 * The costing area: a batch's costing sheet (fabric from the cut plan, trims from the bill of materials,
 * labour from the operations, overheads, margin, wholesale and retail) and its live-formula workbook.
 * Its service builds the sheet purchasing reads quantities from; `labourCostPerMinute` prices cut plans.
 */
export function createCostingModule(ctx: ModuleContext, deps: { cuttingPieces: CuttingPieceSource }) {
  const repo = createCostingRepository(ctx.ds, deps.cuttingPieces);
  const costing = createCostingService(repo);
  return {
    name: 'costing',
    services: {
      costing,
      labourCostPerMinute: async (studioId: number, styleId: number) => (await repo.settings(studioId, styleId))?.labourCostPerMinuteMinor ?? 0,
    },
    mount(api) {
      api.use('/batches', batchCostingRoutes(costing, ctx));
      api.use('/costing', costingRoutes(repo, ctx));
    },
  } satisfies ApiModule & { services: unknown };
}
