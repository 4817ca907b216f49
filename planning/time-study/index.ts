export { studyStandardMinutes, STANDARD_RATING } from './time-study';
export type { TimedObservation, TimeStudyElement, TimeStudyInput, StudiedElement, TimeStudyResult } from './time-study';
