import type { ApiModule } from '../module';

/** The mail area. */
export const mailModule: ApiModule = {
  name: 'mail',
  register() {},
};
