export * from './line-staffing.types';
export { staffLine, loadLineSolver, DEFAULT_STAFF_TIME_LIMIT_S } from './staff-line';
export { PIN_MIN_SHARE } from './staffing-model';
