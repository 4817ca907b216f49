export * from './working-calendar';
export * from './capacity';
export * from './working-hours';
export { scheduleBatch } from './schedule-batch';
export type { BatchStage, ScheduleBatchInput, ScheduledStage, BatchSchedule } from './schedule-batch';
export { profileLoad } from './load-profile';
export type { LoadUnit, LoadDay, LoadProfile } from './load-profile';
export * from './studio-calendar';
