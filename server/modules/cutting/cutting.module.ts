import type { ApiModule } from '../module';

/** The cutting area. */
export const cuttingModule: ApiModule = {
  name: 'cutting',
  register() {},
};
