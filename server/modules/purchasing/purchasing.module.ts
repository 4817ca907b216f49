import type { ApiModule } from '../module';

/** The purchasing area. */
export const purchasingModule: ApiModule = {
  name: 'purchasing',
  register() {},
};
