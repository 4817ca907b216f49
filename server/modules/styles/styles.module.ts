import type { ApiModule, ModuleContext } from '../module';
import { createStyleRepository } from './style.repository';
import { styleRoutes } from './style.routes';
import { createStyleService } from './style.service';

/** Styles (code, size run, base size, composition) at /api/styles; grading, markers, line and batches read `styles`. */
export function createStylesModule(ctx: ModuleContext) {
  const styles = createStyleRepository(ctx.ds);
  return {
    name: 'styles',
    services: { styles },
    mount(api) {
      api.use('/styles', styleRoutes(createStyleService({ styles, audit: ctx.audit })));
    },
  } satisfies ApiModule & { services: unknown };
}
