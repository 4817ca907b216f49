import type { ApiModule } from '../module';

/** The line area. */
export const lineModule: ApiModule = {
  name: 'line',
  register() {},
};
