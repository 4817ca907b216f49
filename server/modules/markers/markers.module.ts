import type { ApiModule } from '../module';

/** The markers area. */
export const markersModule: ApiModule = {
  name: 'markers',
  register() {},
};
