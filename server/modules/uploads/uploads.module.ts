import type { ApiModule } from '../module';
import { createUploadsRepository } from './uploads.repository';
import { uploadsRoutes } from './uploads.routes';

/**
 * The uploads area: files checked by content, limited to UPLOAD_MAX_BYTES (413 past it), stored under
 * data/uploads beside the database with server-made names, metadata in the uploads table.
 */
export const uploadsModule: ApiModule = {
  name: 'uploads',
  register(api, ctx) {
    api.use('/uploads', uploadsRoutes(createUploadsRepository(ctx.ds), ctx));
  },
};
