import type { ApiModule } from '../module';
import { createBatchRepository } from '../batches/batch.repository';
import { createStyleRepository } from '../styles/style.repository';
import { linePlanRoutes, operationRoutes } from './line.routes';
import { createCalendarRepository } from './studio-calendar.repository';
import { createLineService } from './line.service';
import { createCrewLookup, createOperationRepository, createPresentLookup, createStaffLookup, createStudioLookup } from './operation.repository';

/** The line area: operations per style, line balancing, capacity and the batch schedule. */
export const lineModule: ApiModule = {
  name: 'line',
  register(api, ctx) {
    const service = createLineService({
      styles: createStyleRepository(ctx.ds),
      batches: createBatchRepository(ctx.ds),
      operations: createOperationRepository(ctx.ds),
      studio: createStudioLookup(ctx.ds),
      staff: createStaffLookup(ctx.ds),
      crew: createCrewLookup(ctx.ds),
      present: createPresentLookup(ctx.ds),
      calendar: createCalendarRepository(ctx.ds),
      solveStaffing: (input) => ctx.jobs.run('line-staffing', input),
      audit: ctx.audit,
      now: ctx.now,
    });
    api.use('/styles', operationRoutes(service));
    api.use('/line', linePlanRoutes(service));
  },
};
