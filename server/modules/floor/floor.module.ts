import type { ApiModule } from '../module';

/** The floor area. */
export const floorModule: ApiModule = {
  name: 'floor',
  register() {},
};
