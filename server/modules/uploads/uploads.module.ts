import type { ApiModule } from '../module';

/** The uploads area. */
export const uploadsModule: ApiModule = {
  name: 'uploads',
  register() {},
};
