import type { ApiModule } from '../module';

/** The grading area. */
export const gradingModule: ApiModule = {
  name: 'grading',
  register() {},
};
