import type { ApiModule } from '../module';

/** The costing area. */
export const costingModule: ApiModule = {
  name: 'costing',
  register() {},
};
