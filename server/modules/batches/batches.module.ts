import type { ApiModule, ModuleContext } from '../module';
import type { StyleRepository } from '../styles/style.repository';
import { createBatchRepository } from './batch.repository';
import { batchRoutes } from './batch.routes';
import { createBatchService } from './batch.service';

/** Batches (a style in quantities per size, due on a date) at /api/batches; markers, cutting and line read `batches`. */
export function createBatchesModule(ctx: ModuleContext, deps: { styles: StyleRepository }) {
  const batches = createBatchRepository(ctx.ds);
  return {
    name: 'batches',
    services: { batches },
    mount(api) {
      api.use('/batches', batchRoutes(createBatchService({ batches, styles: deps.styles, audit: ctx.audit })));
    },
  } satisfies ApiModule & { services: unknown };
}
