import type { ApiModule } from '../module';

/** The pay area. */
export const payModule: ApiModule = {
  name: 'pay',
  register() {},
};
