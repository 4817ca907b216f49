import type { BatchRepository } from '../batches/batch.repository';
import type { ApiModule, ModuleContext } from '../module';
import type { StyleRepository } from '../styles/style.repository';
import { linePlanRoutes, operationRoutes } from './line.routes';
import { createLineService } from './line.service';
import { createCrewLookup, createOperationRepository, createStaffLookup, createStudioLookup } from './operation.repository';

/** The line area: operations per style, line balancing, capacity and the batch schedule. */
export function createLineModule(ctx: ModuleContext, deps: { styles: StyleRepository; batches: BatchRepository }) {
  const line = createLineService({
    styles: deps.styles,
    batches: deps.batches,
    operations: createOperationRepository(ctx.ds),
    studio: createStudioLookup(ctx.ds),
    staff: createStaffLookup(ctx.ds),
    crew: createCrewLookup(ctx.ds),
    solveStaffing: (input) => ctx.jobs.run('line-staffing', input),
    audit: ctx.audit,
    now: ctx.now,
  });
  return {
    name: 'line',
    services: { line },
    mount(api) {
      api.use('/styles', operationRoutes(line));
      api.use('/line', linePlanRoutes(line));
    },
  } satisfies ApiModule & { services: unknown };
}
