import type { ApiModule, ModuleContext } from '../module';
import { createUploadsRepository } from './uploads.repository';
import { uploadsRoutes } from './uploads.routes';

/**
 * The uploads area: files checked by content, limited to UPLOAD_MAX_BYTES (413 past it), stored under
 * data/uploads beside the database with server-made names, metadata in the uploads table.
 */
export function createUploadsModule(ctx: ModuleContext) {
  const repo = createUploadsRepository(ctx.ds);
  return {
    name: 'uploads',
    services: {},
    mount(api) {
      api.use('/uploads', uploadsRoutes(repo, ctx));
    },
  } satisfies ApiModule & { services: unknown };
}
